import type { RouteRecordRaw } from 'vue-router';
import { ROLES } from '../../shared/schemas/users';
import { homeLocation } from './home';
import './route-meta';

/*
 * The one route table. Every route states who may open it (`meta.roles`,
 * mirrored by the server's role middleware) and its title; a route with
 * `meta.nav` appears in the shell's navigation for those roles, in this order.
 * The first nav route a role may use is that role's home (see `/`).
 */
export const routes: RouteRecordRaw[] = [
  {
    path: '/sign-in',
    name: 'sign-in',
    component: () => import('../views/SignInView.vue'),
    meta: { title: 'Sign in', roles: 'public' },
  },
  {
    path: '/tubes',
    name: 'tubes',
    component: () => import('../views/TubesView.vue'),
    meta: { title: 'Tubes', roles: ROLES, nav: { label: 'Tubes', icon: 'pi pi-sliders-h' } },
  },
  {
    path: '/people',
    name: 'people',
    component: () => import('../views/PeopleView.vue'),
    meta: { title: 'People', roles: ['admin'], nav: { label: 'People', icon: 'pi pi-users' } },
  },
  {
    path: '/not-allowed',
    name: 'not-allowed',
    component: () => import('../views/NotAllowedView.vue'),
    meta: { title: 'Not allowed', roles: ROLES },
  },
  {
    path: '/',
    name: 'home',
    redirect: () => homeLocation(routes),
    meta: { title: 'Home', roles: ROLES },
  },
  {
    path: '/:unknown(.*)*',
    name: 'not-found',
    component: () => import('../views/NotFoundView.vue'),
    meta: { title: 'Not found', roles: ROLES },
  },
];
