import { describe, expect, it } from 'vitest';
import type { Role } from '../../../shared/schemas/users';
import { navRoutes } from '../../../src/router/home';
import { routes } from '../../../src/router/routes';

const canAs = (role: Role) => (roles: readonly Role[]) => roles.includes(role);

describe('navigation from the route table', () => {
  it.each([
    { role: 'engineer' as const, names: ['bench', 'lots', 'recipes', 'compare', 'tubes', 'calibration'] },
    { role: 'lead' as const, names: ['bench', 'lots', 'recipes', 'compare', 'sign-off', 'tubes', 'calibration', 'audit'] },
    { role: 'operator' as const, names: ['lots', 'recipes', 'tubes'] },
    {
      role: 'admin' as const,
      names: ['bench', 'lots', 'recipes', 'compare', 'sign-off', 'tubes', 'calibration', 'people', 'audit', 'outbox'],
    },
  ])('shows $role only the screens the role may open', ({ role, names }) => {
    expect(navRoutes(routes, canAs(role)).map((r) => r.name)).toEqual(names);
  });

  it('gives every route a title and a roles entry', () => {
    for (const route of routes) {
      expect(route.meta?.title, String(route.name)).toBeTruthy();
      expect(route.meta?.roles, String(route.name)).toBeDefined();
    }
  });
});
