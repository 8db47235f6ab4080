import { idParam } from '../../shared/schemas/api';
import { retireSchema, returnSchema, signOffSchema, submitSchema } from '../../shared/schemas/signoff';
import type { Db } from '../db/index';
import { parseBody, parseParams } from '../middleware/validate';
import { deliverOutbox, type Mailer } from '../services/mail/outbox.service';
import { getVersion } from '../services/recipes.service';
import { retireVersion, returnVersion, reviewQueue, signOffVersion, submitVersion } from '../services/signoff.service';
import { defineRoutes } from './define-routes';

export function signoffRoutes(db: Db, mailer: Mailer | undefined, onMailError: (e: unknown) => void) {
  const r = defineRoutes('/api');
  /** Mail goes out after the commit and never holds up the answer. */
  const sendMail = () => void deliverOutbox(db, mailer).catch(onMailError);

  r.get('/sign-off/queue', ['lead', 'admin'], async (req, res) => {
    res.json({ data: await reviewQueue(db, req.user!) });
  });

  r.post('/versions/:id/submit', ['engineer', 'lead'], async (req, res) => {
    const { id } = parseParams(idParam, req);
    const { note } = parseBody(submitSchema, req);
    await submitVersion(db, mailer, req.user!, id, note);
    sendMail();
    res.json({ data: await getVersion(db, req.user!, id) });
  });

  r.post('/versions/:id/sign-off', ['lead'], async (req, res) => {
    const { id } = parseParams(idParam, req);
    const input = parseBody(signOffSchema, req);
    await signOffVersion(db, mailer, req.user!, id, input);
    sendMail();
    res.json({ data: await getVersion(db, req.user!, id) });
  });

  r.post('/versions/:id/return', ['lead'], async (req, res) => {
    const { id } = parseParams(idParam, req);
    const { comment } = parseBody(returnSchema, req);
    await returnVersion(db, mailer, req.user!, id, comment);
    sendMail();
    res.json({ data: await getVersion(db, req.user!, id) });
  });

  r.post('/versions/:id/retire', ['lead'], async (req, res) => {
    const { id } = parseParams(idParam, req);
    const { comment } = parseBody(retireSchema, req);
    await retireVersion(db, req.user!, id, comment);
    res.json({ data: await getVersion(db, req.user!, id) });
  });

  return r;
}
