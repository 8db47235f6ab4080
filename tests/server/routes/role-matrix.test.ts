// Every API route × every role × anonymous. The matrix below is the written
// contract of who may do what; a route added without a row here fails.
import { describe, expect, it } from 'vitest';
import request from 'supertest';
import type { Access } from '../../../server/middleware/require-access';
import { ROLES, type Role } from '../../../shared/schemas/users';
import { useTestApp, type Agent } from '../../support/test-app';

const ALL: Access = 'signed-in';
const MATRIX: Record<string, Access> = {
  'POST /api/auth/sign-in': 'public',
  'POST /api/auth/sign-out': 'public',
  'GET /api/me': ALL,
  'GET /api/health': 'public',
  'GET /api/users': ['admin'],
  'GET /api/users/directory': ALL,
  'POST /api/users': ['admin'],
  'PATCH /api/users/:id': ['admin'],
  'GET /api/tubes': ALL,
  'GET /api/tubes/:id': ALL,
  'POST /api/tubes': ['admin'],
  'PATCH /api/tubes/:id': ['admin'],
  'POST /api/compute': ['engineer', 'lead', 'admin'],
  'GET /api/recipes': ALL,
  'POST /api/recipes': ['engineer', 'lead'],
  'GET /api/recipes/:id': ALL,
  'PATCH /api/recipes/:id': ['engineer', 'lead'],
  'GET /api/versions/:id': ALL,
  'PUT /api/versions/:id': ['engineer', 'lead'],
  'POST /api/versions/:id/copy': ['engineer', 'lead'],
  'GET /api/sign-off/queue': ['lead', 'admin'],
  'POST /api/versions/:id/submit': ['engineer', 'lead'],
  'POST /api/versions/:id/sign-off': ['lead'],
  'POST /api/versions/:id/return': ['lead'],
  'POST /api/versions/:id/retire': ['lead'],
  'GET /api/audit': ['admin', 'lead'],
  'GET /api/audit/export.csv': ['admin', 'lead'],
  'GET /api/outbox': ['admin'],
  'POST /api/outbox/:id/retry': ['admin'],
  'GET /api/versions/:id/traveller.pdf': ALL,
  'GET /api/lots': ALL,
  'POST /api/lots': ['operator', 'engineer'],
  'POST /api/lots/travellers': ALL,
  'GET /api/lots/:id': ALL,
  'PATCH /api/lots/:id': ['operator', 'engineer'],
  'GET /api/lots/:id/traveller.pdf': ALL,
  'GET /api/lots/:id/measurements': ALL,
  'POST /api/lots/:id/measurements': ['operator', 'engineer'],
  'GET /api/tubes/:id/calibrations': ALL,
  'POST /api/tubes/:id/calibrations': ['engineer', 'lead'],
  'GET /api/calibrations/active': ALL,
};

const ctx = useTestApp();

/** Route layers Express really has, so a route bypassing defineRoutes is noticed too. */
function countExpressRoutes(stack: Array<{ route?: unknown; handle?: { stack?: unknown[] } }>): number {
  return stack.reduce(
    (n, layer) => n + (layer.route ? 1 : layer.handle?.stack ? countExpressRoutes(layer.handle.stack as never) : 0),
    0,
  );
}

describe('role matrix', () => {
  it('lists every declared route, and only those', () => {
    const declared = Object.fromEntries(ctx.created.routes.map((r) => [`${r.method.toUpperCase()} ${r.path}`, r.access]));
    expect(declared).toEqual(MATRIX);
    const router = (ctx.created.app as unknown as { router: { stack: never[] } }).router;
    expect(countExpressRoutes(router.stack)).toBe(ctx.created.routes.length);
  });

  const cases = Object.entries(MATRIX).flatMap(([route, access]) =>
    [...ROLES, 'anonymous' as const].map((who) => ({ route, access, who })),
  );

  it.each(cases)('$route as $who', async ({ route, access, who }) => {
    const [method, path] = route.split(' ');
    if (path === '/api/auth/sign-out') return; // would end the shared agent's session; covered in auth tests
    const agent: Agent = who === 'anonymous' ? request.agent(ctx.created.app) : await agentFor(who);
    const url = path.replace(':id', '1');
    const res = await agent[method.toLowerCase() as 'get' | 'post' | 'patch' | 'put'](url).send({});
    const allowed = access === 'public' || (who !== 'anonymous' && (access === 'signed-in' || access.includes(who)));
    if (allowed) {
      expect([401, 403]).not.toContain(res.status);
    } else if (who === 'anonymous') {
      expect(res.status).toBe(401);
      expect(res.body.error.code).toBe('unauthenticated');
    } else {
      expect(res.status).toBe(403);
      expect(res.body.error.code).toBe('forbidden');
    }
  });
});

describe('malformed ids', () => {
  const withId = Object.entries(MATRIX).filter(([route]) => route.includes(':id'));

  it.each(withId)('%s answers 400 naming id for a malformed id', async (route, access) => {
    const [method, path] = route.split(' ');
    const role: Role = access === 'signed-in' || access === 'public' ? 'admin' : access[0];
    const agent = await agentFor(role);
    for (const bad of ['abc', '0', '-3', '1.5']) {
      const res = await agent[method.toLowerCase() as 'get' | 'post' | 'patch' | 'put'](path.replace(':id', bad)).send({});
      expect(res.status, `${route} with id ${bad}`).toBe(400);
      expect(res.body.error.issues.map((i: { path: string }) => i.path)).toContain('id');
    }
  });
});

const agents = new Map<Role, Promise<Agent>>();
function agentFor(role: Role): Promise<Agent> {
  if (!agents.has(role)) agents.set(role, ctx.signIn(role));
  return agents.get(role)!;
}
