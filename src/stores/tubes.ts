import { acceptHMRUpdate, defineStore } from 'pinia';
import { computed, ref } from 'vue';
import type { CreateTubeInput, PatchTubeInput, Tube } from '../../shared/schemas/tubes';
import * as tubesApi from '../api/tubes';

export const useTubesStore = defineStore('tubes', () => {
  const items = ref<Tube[]>([]);
  const loading = ref(false);
  /** True after the first successful load. */
  const loaded = ref(false);

  const sorted = computed(() => [...items.value].sort((a, b) => a.name.localeCompare(b.name)));

  async function load(): Promise<void> {
    loading.value = true;
    try {
      items.value = await tubesApi.listTubes();
      loaded.value = true;
    } finally {
      loading.value = false;
    }
  }

  async function create(input: CreateTubeInput): Promise<Tube> {
    const tube = await tubesApi.createTube(input);
    items.value = [...items.value, tube];
    return tube;
  }

  async function update(id: number, patch: PatchTubeInput): Promise<Tube> {
    const tube = await tubesApi.patchTube(id, patch);
    items.value = items.value.map((t) => (t.id === id ? tube : t));
    return tube;
  }

  return { items, sorted, loading, loaded, load, create, update };
});

if (import.meta.hot) import.meta.hot.accept(acceptHMRUpdate(useTubesStore, import.meta.hot));
