// vitest globalSetup: a throwaway MariaDB on its own port and temporary data
// folder (never the development one), migrated, for the whole server project.
import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import type { TestProject } from 'vitest/node';
import { connectDatabase } from '../../server/db/index';
import { startLocalMariaDb } from '../../server/db/local-mariadb';
import { runMigrations } from '../../server/db/migrate';
import { freePort } from './free-port';

declare module 'vitest' {
  export interface ProvidedContext {
    databaseUrl: string;
    databaseDir: string;
    databasePort: number;
  }
}

export default async function setup(project: TestProject) {
  const dir = mkdtempSync(join(tmpdir(), 'tw-db-'));
  const port = await freePort();
  const mariadb = await startLocalMariaDb({ dataDir: dir, port, installIfMissing: true, log: () => undefined });
  const database = connectDatabase(mariadb.url, 2);
  await runMigrations(database.db);
  await database.close();
  project.provide('databaseUrl', mariadb.url);
  project.provide('databaseDir', dir);
  project.provide('databasePort', port);
  return async () => {
    await mariadb.stop();
    rmSync(dir, { recursive: true, force: true });
  };
}
