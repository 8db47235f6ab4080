import type { RequestHandler } from 'express';
import { signInSchema } from '../../shared/schemas/users';
import type { Db } from '../db/index';
import { HttpError, unauthenticated } from '../http-error';
import { parseBody } from '../middleware/validate';
import { recordAudit } from '../services/audit.service';
import { authenticate, getUser } from '../services/users.service';
import { defineRoutes } from './define-routes';

export function authRoutes(db: Db, signInLimiter: RequestHandler) {
  const r = defineRoutes('/api');

  r.post('/auth/sign-in', 'public', signInLimiter, async (req, res) => {
    const { email, password } = parseBody(signInSchema, req);
    const user = await authenticate(db, email, password);
    if (!user) throw new HttpError(401, 'invalid_credentials', 'E-mail or password is wrong, or the account is inactive');
    // A fresh session id at sign-in: a planted id never becomes an authenticated one.
    await new Promise<void>((ok, fail) => req.session.regenerate((e) => (e ? fail(e) : ok())));
    req.session.userId = user.id;
    await new Promise<void>((ok, fail) => req.session.save((e) => (e ? fail(e) : ok())));
    await recordAudit(db, { actor: { id: user.id, role: user.role }, action: 'session.sign-in', entityType: 'user', entityId: user.id });
    res.json({ data: user });
  });

  r.post('/auth/sign-out', 'public', async (req, res) => {
    if (req.session) await new Promise<void>((ok, fail) => req.session.destroy((e) => (e ? fail(e) : ok())));
    res.clearCookie('tw.sid');
    res.status(204).end();
  });

  r.get('/me', 'signed-in', async (req, res) => {
    if (!req.user) throw unauthenticated();
    res.json({ data: await getUser(db, req.user.id) });
  });

  return r;
}
