import { acceptHMRUpdate, defineStore } from 'pinia';
import { computed, ref } from 'vue';
import type { CreateUserInput, PatchUserInput, User } from '../../shared/schemas/users';
import * as usersApi from '../api/users';

export const useUsersStore = defineStore('users', () => {
  const items = ref<User[]>([]);
  const loading = ref(false);

  /** Active people first, then by name. */
  const sorted = computed(() =>
    [...items.value].sort((a, b) => Number(b.active) - Number(a.active) || a.name.localeCompare(b.name)),
  );

  async function load(): Promise<void> {
    loading.value = true;
    try {
      items.value = await usersApi.listUsers();
    } finally {
      loading.value = false;
    }
  }

  async function create(input: CreateUserInput): Promise<User> {
    const user = await usersApi.createUser(input);
    items.value = [...items.value, user];
    return user;
  }

  /**
   * Applies the patch at once (role and active flag change in the table
   * without waiting) and rolls back when the server refuses.
   */
  async function update(id: number, patch: PatchUserInput): Promise<User> {
    const before = items.value.find((u) => u.id === id);
    const { password: _password, ...visible } = patch;
    if (before) items.value = items.value.map((u) => (u.id === id ? { ...u, ...visible } : u));
    try {
      const user = await usersApi.patchUser(id, patch);
      items.value = items.value.map((u) => (u.id === id ? user : u));
      return user;
    } catch (error) {
      if (before) items.value = items.value.map((u) => (u.id === id ? before : u));
      throw error;
    }
  }

  return { items, sorted, loading, load, create, update };
});

if (import.meta.hot) import.meta.hot.accept(acceptHMRUpdate(useUsersStore, import.meta.hot));
