import type { Role } from '../../shared/schemas/users';

/** Who may open a route: a list of roles, or 'public' (no sign-in needed). */
export type RouteRoles = readonly Role[] | 'public';

/** Shown in the app shell's navigation, in route-table order. */
export interface RouteNav {
  label: string;
  /** A PrimeIcons class, e.g. 'pi pi-box'. */
  icon: string;
}

declare module 'vue-router' {
  interface RouteMeta {
    /** Page title (the browser tab reads "<title> · Tubewright"). */
    title: string;
    roles: RouteRoles;
    nav?: RouteNav;
  }
}
