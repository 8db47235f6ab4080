import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import { createPinia, setActivePinia } from 'pinia';
import { apiGet } from '../../../src/api/client';
import { SESSION_ENDED_NOTICE, useAuthStore } from '../../../src/stores/auth';

const lead = {
  id: 2,
  email: 'lead@pilotline.example',
  name: 'Lena Lead',
  role: 'lead' as const,
  active: true,
  createdAt: '2025-01-01T00:00:00Z',
  updatedAt: '2025-01-01T00:00:00Z',
};

function answer(status: number, body?: unknown) {
  return new Response(body === undefined ? null : JSON.stringify(body), { status });
}

const unauthenticated = { error: { code: 'unauthenticated', message: 'Sign in' } };

beforeEach(() => setActivePinia(createPinia()));
afterEach(() => vi.unstubAllGlobals());

describe('useAuthStore', () => {
  it('loads /api/me once and answers can() by role', async () => {
    const fetchMock = vi.fn(async () => answer(200, { data: lead }));
    vi.stubGlobal('fetch', fetchMock);
    const auth = useAuthStore();
    await Promise.all([auth.ensureLoaded(), auth.ensureLoaded()]);
    await auth.ensureLoaded();
    expect(fetchMock).toHaveBeenCalledTimes(1);
    expect(auth.role).toBe('lead');
    expect(auth.can(['lead', 'admin'])).toBe(true);
    expect(auth.can(['admin'])).toBe(false);
  });

  it('treats 401 from /api/me as nobody signed in, without a notice', async () => {
    vi.stubGlobal('fetch', vi.fn(async () => answer(401, unauthenticated)));
    const auth = useAuthStore();
    await auth.ensureLoaded();
    expect(auth.loaded).toBe(true);
    expect(auth.user).toBeNull();
    expect(auth.can(['engineer', 'lead', 'operator', 'admin'])).toBe(false);
    expect(auth.notice).toBe('');
  });

  it('keeps the person signed out on wrong credentials and rethrows', async () => {
    vi.stubGlobal('fetch', vi.fn(async () => answer(401, { error: { code: 'invalid_credentials', message: 'Wrong' } })));
    const auth = useAuthStore();
    await expect(auth.signIn({ email: lead.email, password: 'x' })).rejects.toMatchObject({ code: 'invalid_credentials' });
    expect(auth.user).toBeNull();
  });

  it('drops the person with a notice when any later call answers 401', async () => {
    vi.stubGlobal('fetch', vi.fn(async () => answer(200, { data: lead })));
    const auth = useAuthStore();
    await auth.signIn({ email: lead.email, password: 'correct horse' });
    expect(auth.user?.id).toBe(2);

    vi.stubGlobal('fetch', vi.fn(async () => answer(401, unauthenticated)));
    await apiGet('/api/tubes').catch(() => undefined);
    expect(auth.user).toBeNull();
    expect(auth.notice).toBe(SESSION_ENDED_NOTICE);
  });

  it('forgets the person on sign-out', async () => {
    vi.stubGlobal('fetch', vi.fn(async () => answer(200, { data: lead })));
    const auth = useAuthStore();
    await auth.signIn({ email: lead.email, password: 'correct horse' });
    vi.stubGlobal('fetch', vi.fn(async () => answer(204)));
    await auth.signOut();
    expect(auth.user).toBeNull();
  });
});
