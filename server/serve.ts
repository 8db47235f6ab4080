import type { Server } from 'node:http';
import { join } from 'node:path';
import { createApp } from './app';
import { appConfigFromEnv, PROJECT_ROOT } from './config';
import { connectDatabase } from './db/index';
import { runMigrations } from './db/migrate';
import { seedDemo } from './db/seed';
import type { Env } from './env';

export interface Running {
  url: string;
  stop(): Promise<void>;
}

/** Connects, migrates, optionally seeds the demo, and listens. */
export async function serve(env: Env, databaseUrl: string, opts: { seed: boolean; serveClient: boolean }): Promise<Running> {
  const database = connectDatabase(databaseUrl);
  await runMigrations(database.db);
  if (opts.seed) await seedDemo(database.db);
  const created = createApp(database, appConfigFromEnv(env, opts.serveClient ? join(PROJECT_ROOT, 'dist', 'client') : undefined));
  const server: Server = await new Promise((ok) => {
    const s = created.app.listen(env.PORT, env.HOST, () => ok(s));
  });
  return {
    url: `http://${env.HOST === '0.0.0.0' ? '127.0.0.1' : env.HOST}:${env.PORT}`,
    async stop() {
      await new Promise<void>((ok) => server.close(() => ok()));
      server.closeAllConnections();
      await created.close();
      await database.close();
    },
  };
}

/** Runs `cleanup` once on Ctrl-C, SIGTERM or a fatal error, then exits. */
export function onShutdown(cleanup: () => Promise<void>): void {
  let done = false;
  const run = async (code: number) => {
    if (done) return;
    done = true;
    try {
      await cleanup();
    } finally {
      process.exit(code);
    }
  };
  process.on('SIGINT', () => void run(0));
  process.on('SIGTERM', () => void run(0));
  process.on('uncaughtException', (e) => {
    console.error(e);
    void run(1);
  });
}
