import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import { createPinia, setActivePinia } from 'pinia';
import { usePeopleStore } from '../../../src/stores/people';

const directory = [
  { id: 1, name: 'Ada Engineer', role: 'engineer', active: true },
  { id: 2, name: 'Lee Lead', role: 'lead', active: true },
];

beforeEach(() => setActivePinia(createPinia()));
afterEach(() => vi.unstubAllGlobals());

describe('usePeopleStore.load', () => {
  it('reads the people directory that every role may see', async () => {
    const fetch = vi.fn(async () => new Response(JSON.stringify({ data: directory }), { status: 200 }));
    vi.stubGlobal('fetch', fetch);
    const store = usePeopleStore();
    await store.load();
    expect(fetch).toHaveBeenCalledWith('/api/users/directory', expect.objectContaining({ method: 'GET' }));
    expect(store.items).toEqual(directory);
  });

  it('shares one request between screens asking at once, and keeps the last list when a reload fails', async () => {
    const fetch = vi.fn(async () => new Response(JSON.stringify({ data: directory }), { status: 200 }));
    vi.stubGlobal('fetch', fetch);
    const store = usePeopleStore();
    await Promise.all([store.load(), store.load()]);
    expect(fetch).toHaveBeenCalledTimes(1);
    vi.stubGlobal('fetch', vi.fn(async () => new Response('', { status: 503 })));
    await expect(store.load()).rejects.toMatchObject({ status: 503 });
    expect(store.items).toEqual(directory);
  });
});
