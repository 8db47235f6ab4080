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
  const [db, built] = await Promise.allSettled([
    startLocalMariaDb({ dataDir: join(dir, 'db'), port: dbPort, installIfMissing: true, log: () => undefined }),
    build({ root: PROJECT_ROOT, logLevel: 'error', build: { outDir: clientDir, emptyOutDir: true } }),
  ]);
  if (db.status === 'rejected' || built.status === 'rejected') {
    if (db.status === 'fulfilled') await db.value.stop();
    rmSync(dir, { recursive: true, force: true });
    throw db.status === 'rejected' ? db.reason : (built as PromiseRejectedResult).reason;
  }
  const mariadb = db.value;
  const database = connectDatabase(mariadb.url, 5);
  const smtp = await startSmtpFake();
  const baseUrl = `http://127.0.0.1:${appPort}`;
  const cleanUp = async () => {
    await database.close();
    await smtp.stop();
    await mariadb.stop();
    rmSync(dir, { recursive: true, force: true });
  };
  let created: ReturnType<typeof createApp>;
  let server: Server;
  try {
    await runMigrations(database.db);
    await seedDemo(database.db);
    await seedScenario(database.db);
    created = createApp(database, { ...TEST_CONFIG, clientDir }, { mailer: createMailer(smtp.url, 'Tubewright <tubewright@pilotline.example>', baseUrl) });
    server = await new Promise((ok) => {
      const s = created.app.listen(appPort, '127.0.0.1', () => ok(s));
    });
  } catch (e) {
    // A failed start must not leave a MariaDB running behind the test run.
    await cleanUp();
    throw e;
  }
  return {
    baseUrl,
    databaseUrl: mariadb.url,
    clientDir,
    async stop() {
      server.closeAllConnections();
      await new Promise<void>((ok) => server.close(() => ok()));
      await created.close();
      await cleanUp();
    },
  };
}
