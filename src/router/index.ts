import { watch } from 'vue';
import { createRouter, createWebHistory, type RouteLocationNormalized } from 'vue-router';
import { useAuthStore } from '../stores/auth';
import { allows } from './home';
import { routes } from './routes';

export const router = createRouter({
  history: createWebHistory(),
  routes,
});

/** A `next` target is only followed when it is a path inside the app (no open redirect). */
export function safeNext(value: unknown): string | null {
  return typeof value === 'string' && value.startsWith('/') && !value.startsWith('//') ? value : null;
}

router.beforeEach(async (to: RouteLocationNormalized) => {
  const auth = useAuthStore();
  try {
    await auth.ensureLoaded();
  } catch {
    // Server unreachable: continue as anonymous; the sign-in page shows the server state.
  }

  if (to.meta.roles === 'public') {
    // A signed-in person has nothing to do on the sign-in page.
    if (to.name === 'sign-in' && auth.user) return safeNext(to.query.next) ?? { name: 'home' };
    return true;
  }
  if (!auth.user) return { name: 'sign-in', query: { next: to.fullPath } };
  if (!allows(to.meta.roles, auth.can)) return { name: 'not-allowed', query: { path: to.fullPath } };
  return true;
});

router.afterEach((to) => {
  document.title = to.meta.title ? `${to.meta.title} · Tubewright` : 'Tubewright';
});

/**
 * When any API call answers 401 the auth store drops the person; send them
 * to sign-in, keeping where they were as ?next= so they come back after.
 */
export function followSessionEnd(): void {
  const auth = useAuthStore();
  watch(
    () => auth.user,
    (user) => {
      const current = router.currentRoute.value;
      if (auth.loaded && !user && current.meta.roles !== 'public') {
        void router.push({ name: 'sign-in', query: { next: current.fullPath } });
      }
    },
  );
}
