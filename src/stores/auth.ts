import { acceptHMRUpdate, defineStore } from 'pinia';
import { computed, ref } from 'vue';
import type { Role, SignInInput, User } from '../../shared/schemas/users';
import * as authApi from '../api/auth';
import { ApiError, onUnauthorized } from '../api/client';

export const SESSION_ENDED_NOTICE =
  'Your session has ended (signed out, expired or the account was deactivated). Sign in again to continue.';

export const useAuthStore = defineStore('auth', () => {
  /** The signed-in person, or null. */
  const user = ref<User | null>(null);
  /** True once /api/me has answered (with a person or with 401). */
  const loaded = ref(false);
  /** A message for the sign-in page (why the person landed there). */
  const notice = ref('');
  let loading: Promise<void> | null = null;

  const role = computed<Role | null>(() => user.value?.role ?? null);

  /** Whether the signed-in person holds one of `roles`. */
  function can(roles: readonly Role[]): boolean {
    return role.value !== null && roles.includes(role.value);
  }

  /** Asks the server who is signed in. Network errors propagate (the caller shows them). */
  async function loadMe(): Promise<void> {
    try {
      user.value = await authApi.fetchMe();
    } catch (error) {
      if (!(error instanceof ApiError) || error.status !== 401) throw error;
      user.value = null;
    }
    loaded.value = true;
  }

  /** Loads /api/me once; later calls reuse the answer. */
  function ensureLoaded(): Promise<void> {
    if (loaded.value) return Promise.resolve();
    loading ??= loadMe().finally(() => {
      loading = null;
    });
    return loading;
  }

  async function signIn(input: SignInInput): Promise<User> {
    const signedIn = await authApi.signIn(input);
    user.value = signedIn;
    loaded.value = true;
    notice.value = '';
    return signedIn;
  }

  async function signOut(): Promise<void> {
    try {
      await authApi.signOut();
    } finally {
      user.value = null;
    }
  }

  /** The server said 401 on a call: the session is gone (expired, signed out elsewhere, deactivated). */
  function expire(): void {
    if (user.value === null) return;
    user.value = null;
    notice.value = SESSION_ENDED_NOTICE;
  }

  onUnauthorized(expire);

  return { user, loaded, notice, role, can, loadMe, ensureLoaded, signIn, signOut, expire };
});

if (import.meta.hot) import.meta.hot.accept(acceptHMRUpdate(useAuthStore, import.meta.hot));
