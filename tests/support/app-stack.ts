// A whole running stack for browser tests and client benchmarks: a throwaway
// MariaDB, the client built into a temporary folder, and the real server
// (demo data seeded) on a free port.
import { mkdtempSync, rmSync } from 'node:fs';
import type { Server } from 'node:http';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { build } from 'vite';
import { createApp } from '../../server/app';
import { PROJECT_ROOT } from '../../server/config';
import { connectDatabase } from '../../server/db/index';
import { startLocalMariaDb } from '../../server/db/local-mariadb';
import { runMigrations } from '../../server/db/migrate';
import { seedDemo } from '../../server/db/seed';
import { seedScenario } from '../../server/db/seed-scenario';
import { freePort } from './free-port';
import { TEST_CONFIG } from './test-config';
import { createMailer } from '../../server/services/mail/outbox.service';
import { startSmtpFake } from '../../server/services/mail/smtp-fake';

export interface AppStack {
  baseUrl: string;
  databaseUrl: string;
  clientDir: string;
  stop(): Promise<void>;
}

export async function startAppStack(): Promise<AppStack> {
  const dir = mkdtempSync(join(tmpdir(), 'tw-stack-'));
  const clientDir = join(dir, 'client');
  const [dbPort, appPort] = [await freePort(), await freePort()];
  const [mariadb] = await Promise.all([
    startLocalMariaDb({ dataDir: join(dir, 'db'), port: dbPort, installIfMissing: true, log: () => undefined }),
    build({ root: PROJECT_ROOT, logLevel: 'error', build: { outDir: clientDir, emptyOutDir: true } }),
  ]);
  const database = connectDatabase(mariadb.url, 5);
  await runMigrations(database.db);
  await seedDemo(database.db);
  await seedScenario(database.db);
  const smtp = await startSmtpFake();
  const baseUrl = `http://127.0.0.1:${appPort}`;
  const created = createApp(database, { ...TEST_CONFIG, clientDir }, { mailer: createMailer(smtp.url, 'Tubewright <tubewright@pilotline.example>', baseUrl) });
  const server: Server = await new Promise((ok) => {
    const s = created.app.listen(appPort, '127.0.0.1', () => ok(s));
  });
  return {
    baseUrl,
    databaseUrl: mariadb.url,
    clientDir,
    async stop() {
      server.closeAllConnections();
      await new Promise<void>((ok) => server.close(() => ok()));
      await created.close();
      await database.close();
      await smtp.stop();
      await mariadb.stop();
      rmSync(dir, { recursive: true, force: true });
    },
  };
}
