import { idParam } from '../../shared/schemas/api';
import type { Db } from '../db/index';
import { parseParams } from '../middleware/validate';
import { listOutbox, retryMessage, type Mailer } from '../services/mail/outbox.service';
import { defineRoutes } from './define-routes';

export function outboxRoutes(db: Db, mailer: Mailer | undefined) {
  const r = defineRoutes('/api/outbox');

  r.get('/', ['admin'], async (_req, res) => {
    res.json({ data: { messages: await listOutbox(db), delivering: Boolean(mailer) } });
  });

  r.post('/:id/retry', ['admin'], async (req, res) => {
    const { id } = parseParams(idParam, req);
    res.json({ data: await retryMessage(db, mailer, id) });
  });

  return r;
}
