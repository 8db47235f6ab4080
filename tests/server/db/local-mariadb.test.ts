import { describe, expect, it, inject } from 'vitest';
import mysql from 'mysql2/promise';
import { startLocalMariaDb } from '../../../server/db/local-mariadb';
import { connectDatabase } from '../../../server/db/index';
import { seedDemo, DEMO_PEOPLE, DEMO_TUBES } from '../../../server/db/seed';
import { resetDatabase } from '../../support/test-app';
import { tubes, users } from '../../../server/db/schema';

describe('private MariaDB', () => {
  it('reuses the instance already running on a data folder, without stopping it', async () => {
    const again = await startLocalMariaDb({ dataDir: inject('databaseDir'), port: inject('databasePort'), log: () => undefined });
    expect(again.reused).toBe(true);
    expect(again.url).toBe(inject('databaseUrl'));
    await again.stop();
    const conn = await mysql.createConnection(inject('databaseUrl'));
    const [rows] = await conn.query('SELECT CURRENT_USER() AS u');
    expect((rows as Array<{ u: string }>)[0].u).toMatch(/^tubewright@/);
    await conn.end();
  });

  it('the application user is not root and cannot reach other databases', async () => {
    const conn = await mysql.createConnection(inject('databaseUrl'));
    await expect(conn.query('SELECT * FROM mysql.user')).rejects.toThrow(/denied/i);
    await conn.end();
  });
});

describe('demo seed', () => {
  it('is idempotent', async () => {
    const database = connectDatabase(inject('databaseUrl'), 2);
    await resetDatabase(database);
    const first = await seedDemo(database.db);
    const second = await seedDemo(database.db);
    expect(first.created).toBe(DEMO_PEOPLE.length + DEMO_TUBES.length);
    expect(second.created).toBe(0);
    expect(await database.db.select().from(users)).toHaveLength(DEMO_PEOPLE.length);
    expect(await database.db.select().from(tubes)).toHaveLength(DEMO_TUBES.length);
    await database.close();
  });
});
