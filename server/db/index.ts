import { drizzle, type MySql2Database } from 'drizzle-orm/mysql2';
import mysql from 'mysql2/promise';
import * as schema from './schema';

export type Db = MySql2Database<typeof schema>;

export interface Database {
  pool: mysql.Pool;
  db: Db;
  close(): Promise<void>;
}

/** One pool per process; every query in the server goes through it. */
export function connectDatabase(url: string, connectionLimit = 10): Database {
  const pool = mysql.createPool({
    uri: url,
    connectionLimit,
    // Timestamps are stored and read as UTC.
    timezone: 'Z',
    dateStrings: false,
    supportBigNumbers: true,
  });
  const db = drizzle(pool, { schema, mode: 'default' });
  return { pool, db, close: () => pool.end() };
}
