import { Router, type RequestHandler } from 'express';
import { requireAccess, type Access } from '../middleware/require-access';

export type Method = 'get' | 'post' | 'patch' | 'put' | 'delete';

export interface RouteEntry {
  method: Method;
  path: string;
  access: Access;
}

/**
 * A Router whose every route must state who may call it. The entries feed the
 * role-matrix test, which fails when a route exists without a matrix row.
 */
export function defineRoutes(base: string) {
  const router = Router();
  const entries: RouteEntry[] = [];
  const add =
    (method: Method) =>
    (path: string, access: Access, ...handlers: RequestHandler[]) => {
      entries.push({ method, path: base + (path === '/' ? '' : path), access });
      router[method](path, requireAccess(access), ...handlers);
    };
  return {
    base,
    router,
    entries,
    get: add('get'),
    post: add('post'),
    patch: add('patch'),
    put: add('put'),
    delete: add('delete'),
  };
}

export type RouteModule = ReturnType<typeof defineRoutes>;
