import { describe, expect, it } from 'vitest';
import type { Role } from '../../../shared/schemas/users';
import { allows, navRoutes } from '../../../src/router/home';
import { routes } from '../../../src/router/routes';

const canAs = (role: Role) => (roles: readonly Role[]) => roles.includes(role);
const route = (name: string) => routes.find((r) => r.name === name)!;

describe('sign-off, audit, outbox and lot screens in the route table', () => {
  it('makes Lots the operator’s home (first screen in the navigation)', () => {
    expect(navRoutes(routes, canAs('operator'))[0]?.name).toBe('lots');
  });

  // Mirrors the server's role matrix for the calls each screen needs.
  it.each([
    { name: 'sign-off', roles: ['lead', 'admin'] },
    { name: 'audit', roles: ['admin', 'lead'] },
    { name: 'outbox', roles: ['admin'] },
    { name: 'lots', roles: ['engineer', 'lead', 'operator', 'admin'] },
    { name: 'lot', roles: ['engineer', 'lead', 'operator', 'admin'] },
  ] as const)('$name opens for $roles only', ({ name, roles }) => {
    for (const role of ['engineer', 'lead', 'operator', 'admin'] as const) {
      expect(allows(route(name).meta?.roles, canAs(role)), `${name} as ${role}`).toBe((roles as readonly string[]).includes(role));
    }
  });
});
