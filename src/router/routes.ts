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
    path: '/bench',
    name: 'bench',
    component: () => import('../views/BenchView.vue'),
    meta: { title: 'Bench', roles: ['engineer', 'lead', 'admin'], nav: { label: 'Bench', icon: 'pi pi-home' } },
  },
  // Lots come before Recipes so that an operator's home (first nav route) is Lots.
  {
    path: '/lots',
    name: 'lots',
    component: () => import('../views/LotsView.vue'),
    meta: { title: 'Lots', roles: ROLES, nav: { label: 'Lots', icon: 'pi pi-box' } },
  },
  {
    path: '/lots/:id(\\d+)',
    name: 'lot',
    component: () => import('../views/LotDetailView.vue'),
    meta: { title: 'Lot', roles: ROLES },
  },
  {
    path: '/recipes',
    name: 'recipes',
    component: () => import('../views/RecipesView.vue'),
    meta: { title: 'Recipes', roles: ROLES, nav: { label: 'Recipes', icon: 'pi pi-list' } },
  },
  {
    path: '/recipes/:id(\\d+)',
    name: 'recipe',
    component: () => import('../views/RecipeWorkspaceView.vue'),
    meta: { title: 'Recipe', roles: ROLES },
  },
  {
    path: '/compare',
    name: 'compare',
    component: () => import('../views/CompareView.vue'),
    meta: { title: 'Compare', roles: ['engineer', 'lead', 'admin'], nav: { label: 'Compare', icon: 'pi pi-arrows-h' } },
  },
  {
    path: '/sign-off',
    name: 'sign-off',
    component: () => import('../views/SignoffView.vue'),
    meta: { title: 'Sign-off', roles: ['lead', 'admin'], nav: { label: 'Sign-off', icon: 'pi pi-verified' } },
  },
  {
    path: '/tubes',
    name: 'tubes',
    component: () => import('../views/TubesView.vue'),
    meta: { title: 'Tubes', roles: ROLES, nav: { label: 'Tubes', icon: 'pi pi-sliders-h' } },
  },
  {
    path: '/calibration',
    name: 'calibration',
    component: () => import('../views/CalibrationView.vue'),
    meta: { title: 'Calibration', roles: ['engineer', 'lead', 'admin'], nav: { label: 'Calibration', icon: 'pi pi-chart-scatter' } },
  },
  {
    path: '/people',
    name: 'people',
    component: () => import('../views/PeopleView.vue'),
    meta: { title: 'People', roles: ['admin'], nav: { label: 'People', icon: 'pi pi-users' } },
  },
  {
    path: '/audit',
    name: 'audit',
    component: () => import('../views/AuditTrailView.vue'),
    meta: { title: 'Audit trail', roles: ['admin', 'lead'], nav: { label: 'Audit trail', icon: 'pi pi-history' } },
  },
  {
    path: '/outbox',
    name: 'outbox',
    component: () => import('../views/OutboxView.vue'),
    meta: { title: 'Outbox', roles: ['admin'], nav: { label: 'Outbox', icon: 'pi pi-envelope' } },
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
