import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import { createPinia, setActivePinia } from 'pinia';
import { useUsersStore } from '../../../src/stores/users';

const person = {
  id: 5,
  email: 'op@pilotline.example',
  name: 'Otto Operator',
  role: 'operator' as const,
  active: true,
  createdAt: '2025-01-01T00:00:00Z',
  updatedAt: '2025-01-01T00:00:00Z',
};

beforeEach(() => setActivePinia(createPinia()));
afterEach(() => vi.unstubAllGlobals());

describe('useUsersStore.update', () => {
  it('shows the change at once and keeps the server answer', async () => {
    const store = useUsersStore();
    store.items = [person];
    let resolve!: (r: Response) => void;
    vi.stubGlobal('fetch', vi.fn(() => new Promise<Response>((r) => (resolve = r))));
    const pending = store.update(5, { role: 'engineer' });
    expect(store.items[0].role).toBe('engineer');
    resolve(new Response(JSON.stringify({ data: { ...person, role: 'engineer', updatedAt: '2025-02-01T00:00:00Z' } }), { status: 200 }));
    await pending;
    expect(store.items[0].updatedAt).toBe('2025-02-01T00:00:00Z');
  });

  it('rolls back when the server refuses', async () => {
    const store = useUsersStore();
    store.items = [person];
    const refusal = { error: { code: 'conflict', message: 'You cannot deactivate yourself' } };
    vi.stubGlobal('fetch', vi.fn(async () => new Response(JSON.stringify(refusal), { status: 409 })));
    await expect(store.update(5, { active: false })).rejects.toMatchObject({ status: 409 });
    expect(store.items[0].active).toBe(true);
  });
});
