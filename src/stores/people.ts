import { acceptHMRUpdate, defineStore } from 'pinia';
import { ref } from 'vue';
import type { PersonSummary } from '../../shared/schemas/users';
import * as usersApi from '../api/users';

/**
 * The people directory every role may read (the full people list is for
 * admins). Screens call load() when they open, so someone added meanwhile
 * shows up; the last list stays on screen while the new one is on its way.
 */
export const usePeopleStore = defineStore('people', () => {
  const items = ref<PersonSummary[]>([]);
  let inFlight: Promise<void> | null = null;

  /** Loads the directory; calls made while one is on its way share it. */
  function load(): Promise<void> {
    inFlight ??= usersApi
      .listDirectory()
      .then((list) => {
        items.value = list;
      })
      .finally(() => {
        inFlight = null;
      });
    return inFlight;
  }

  return { items, load };
});

if (import.meta.hot) import.meta.hot.accept(acceptHMRUpdate(usePeopleStore, import.meta.hot));
