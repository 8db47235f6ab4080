import type { RouteLocationRaw, RouteRecordRaw } from 'vue-router';
import type { Role } from '../../shared/schemas/users';
import { useAuthStore } from '../stores/auth';
import type { RouteRoles } from './route-meta';

type Can = (roles: readonly Role[]) => boolean;

/** Whether a person for whom `can` answers may open a route with these roles. */
export function allows(roles: RouteRoles | undefined, can: Can): boolean {
  if (roles === 'public') return true;
  return roles !== undefined && can(roles);
}

/** The routes of a table that appear in the navigation for `can`, in table order. */
export function navRoutes(table: readonly RouteRecordRaw[], can: Can): RouteRecordRaw[] {
  return table.filter((r) => r.meta?.nav !== undefined && typeof r.name === 'string' && allows(r.meta.roles, can));
}

/** `/` leads to the first screen the signed-in role may use; anonymous people sign in. */
export function homeLocation(table: readonly RouteRecordRaw[]): RouteLocationRaw {
  const auth = useAuthStore();
  if (!auth.user) return { name: 'sign-in' };
  const first = navRoutes(table, auth.can)[0];
  return first ? { name: first.name as string } : { name: 'not-allowed' };
}
