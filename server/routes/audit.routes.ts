import { auditQuerySchema } from '../../shared/schemas/signoff';
import type { Db } from '../db/index';
import { parseQuery } from '../middleware/validate';
import { auditCsv, listAudit } from '../services/audit-trail.service';
import { defineRoutes } from './define-routes';

export function auditRoutes(db: Db) {
  const r = defineRoutes('/api/audit');

  r.get('/', ['admin', 'lead'], async (req, res) => {
    res.json({ data: await listAudit(db, parseQuery(auditQuerySchema, req)) });
  });

  r.get('/export.csv', ['admin', 'lead'], async (req, res) => {
    const csv = await auditCsv(db, parseQuery(auditQuerySchema, req));
    res.type('text/csv; charset=utf-8');
    res.attachment(`tubewright-audit-${new Date().toISOString().slice(0, 10)}.csv`);
    res.send(csv);
  });

  return r;
}
