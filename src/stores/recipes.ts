import { acceptHMRUpdate, defineStore } from 'pinia';
import { computed, ref } from 'vue';
import type {
  CreateRecipeInput,
  ListRecipesQuery,
  PersonRef,
  RecipeDetail,
  RecipeListPage,
} from '../../shared/schemas/recipes-api';
import * as recipesApi from '../api/recipes';

const emptyPage = (): RecipeListPage => ({ rows: [], total: 0, page: 1, pageSize: 20 });

/** The Recipes list as the server pages, sorts and filters it, and creating recipes. */
export const useRecipesStore = defineStore('recipes', () => {
  const page = ref<RecipeListPage>(emptyPage());
  const query = ref<ListRecipesQuery>({ page: 1, pageSize: 20, sort: 'updatedAt', order: 'desc' });
  const loading = ref(false);
  /** Owners met in any page so far: the owner filter offers them (the people list is admin-only). */
  const ownersSeen = ref<Record<number, PersonRef>>({});
  let inFlight: AbortController | null = null;

  const owners = computed(() => Object.values(ownersSeen.value).sort((a, b) => a.name.localeCompare(b.name)));

  /** Loads one page; a newer call cancels an older one still on its way. */
  async function load(next: ListRecipesQuery = query.value): Promise<void> {
    inFlight?.abort();
    const controller = new AbortController();
    inFlight = controller;
    query.value = next;
    loading.value = true;
    try {
      page.value = await recipesApi.listRecipes(next, controller.signal);
      for (const row of page.value.rows) ownersSeen.value[row.owner.id] = row.owner;
    } catch (error) {
      if (error instanceof DOMException && error.name === 'AbortError') return;
      throw error;
    } finally {
      if (inFlight === controller) {
        loading.value = false;
        inFlight = null;
      }
    }
  }

  /** Creates (or, with a document, imports) a recipe; the list reloads on the next load(). */
  async function create(input: CreateRecipeInput): Promise<RecipeDetail> {
    const created = await recipesApi.createRecipe(input);
    ownersSeen.value[created.owner.id] = created.owner;
    return created;
  }

  return { page, query, loading, owners, load, create };
});

if (import.meta.hot) import.meta.hot.accept(acceptHMRUpdate(useRecipesStore, import.meta.hot));
