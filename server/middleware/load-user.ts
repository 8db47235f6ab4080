import type { RequestHandler } from 'express';
import type { Db } from '../db/index';
import { findActiveUser } from '../services/users.service';

/**
 * Loads the session's person on every request, so a deactivated person or a
 * changed role takes effect at once, on every server process.
 */
export function loadUser(db: Db): RequestHandler {
  return async (req, _res, next) => {
    const id = req.session?.userId;
    if (!id) return next();
    const user = await findActiveUser(db, id);
    if (user) {
      req.user = user;
      return next();
    }
    req.session.destroy(() => next());
  };
}
