import { sql } from 'drizzle-orm';
import type { Db } from '../db/index';
import { defineRoutes } from './define-routes';
import pkg from '../../package.json';

export function healthRoutes(db: Db) {
  const r = defineRoutes('/api');
  r.get('/health', 'public', async (_req, res) => {
    let database: 'ok' | 'down' = 'ok';
    try {
      await db.execute(sql`SELECT 1`);
    } catch {
      database = 'down';
    }
    res.status(database === 'ok' ? 200 : 503).json({ data: { app: 'ok', database, version: pkg.version } });
  });
  return r;
}
