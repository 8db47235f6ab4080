import type { RequestHandler } from 'express';
import type { Role } from '../../shared/schemas/users';
import { forbidden, unauthenticated } from '../http-error';

/** Who may call a route: named roles, anyone signed in, or the public. */
export type Access = readonly Role[] | 'signed-in' | 'public';

/** Server-side gate for one route; every route declares one (see routes/define-routes.ts). */
export function requireAccess(access: Access): RequestHandler {
  return (req, _res, next) => {
    if (access === 'public') return next();
    if (!req.user) return next(unauthenticated());
    if (access === 'signed-in' || access.includes(req.user.role)) return next();
    next(forbidden(`This needs the role ${access.join(' or ')}`));
  };
}
