import type { Server } from 'node:http';
import { join } from 'node:path';
import { createApp } from './app';
import { appConfigFromEnv, PROJECT_ROOT } from './config';
import { connectDatabase } from './db/index';
import { runMigrations } from './db/migrate';
import { seedDemo } from './db/seed';
import { seedScenario } from './db/seed-scenario';
import { backfillReleasedListColumns } from './services/recipes.service';
import type { Env } from './env';
import { createMailer, deliverOutbox, type Mailer } from './services/mail/outbox.service';
import { startSmtpFake, type SmtpFake } from './services/mail/smtp-fake';

export interface Running {
  url: string;
  stop(): Promise<void>;
}

/** Connects, migrates, optionally seeds the demo, and listens. */
export async function serve(env: Env, databaseUrl: string, opts: { seed: boolean; serveClient: boolean }): Promise<Running> {
  const database = connectDatabase(databaseUrl);
  await runMigrations(database.db);
  await backfillReleasedListColumns(database.db);
  if (opts.seed) {
    await seedDemo(database.db);
    await seedScenario(database.db);
  }
  const listenUrl = `http://${env.HOST === '0.0.0.0' ? '127.0.0.1' : env.HOST}:${env.PORT}`;
  const { mailer, fake } = await mailSetup(env, env.APP_URL ?? listenUrl);
  const created = createApp(database, appConfigFromEnv(env, opts.serveClient ? join(PROJECT_ROOT, 'dist', 'client') : undefined), { mailer });
  // Failed mail is retried with back-off; this also sends what another process queued.
  const mailTimer = setInterval(() => void deliverOutbox(database.db, mailer).catch((e) => console.error(e)), 60_000);
  mailTimer.unref();
  const server: Server = await new Promise((ok) => {
    const s = created.app.listen(env.PORT, env.HOST, () => ok(s));
  });
  return {
    url: listenUrl,
    async stop() {
      clearInterval(mailTimer);
      await new Promise<void>((ok) => server.close(() => ok()));
      server.closeAllConnections();
      await created.close();
      await database.close();
      await fake?.stop();
    },
  };
}

/**
 * SMTP_URL when set. Otherwise, outside production, an in-process SMTP fake
 * receives the mail (the Outbox screen shows what was sent); in production
 * without SMTP_URL mail stays queued in the outbox.
 */
async function mailSetup(env: Env, appUrl: string): Promise<{ mailer?: Mailer; fake?: SmtpFake }> {
  if (env.SMTP_URL) return { mailer: createMailer(env.SMTP_URL, env.MAIL_FROM, appUrl) };
  if (env.NODE_ENV === 'production') {
    console.warn('SMTP_URL is not set: e-mail stays queued in the outbox.');
    return {};
  }
  const fake = await startSmtpFake();
  return { mailer: createMailer(fake.url, env.MAIL_FROM, appUrl), fake };
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
