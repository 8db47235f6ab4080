import { acceptHMRUpdate, defineStore } from 'pinia';
import { ref } from 'vue';
import type { CreateRecipeInput, ListRecipesQuery, RecipeDetail, RecipeListPage } from '../../shared/schemas/recipes-api';
import * as recipesApi from '../api/recipes';

const emptyPage = (): RecipeListPage => ({ rows: [], total: 0, page: 1, pageSize: 20 });

/** The Recipes list as the server pages, sorts and filters it, and creating recipes. */
export const useRecipesStore = defineStore('recipes', () => {
  const page = ref<RecipeListPage>(emptyPage());
  const query = ref<ListRecipesQuery>({ page: 1, pageSize: 20, sort: 'updatedAt', order: 'desc' });
  const loading = ref(false);
  let inFlight: AbortController | null = null;

  /** Loads one page; a newer call cancels an older one still on its way. */
  async function load(next: ListRecipesQuery = query.value): Promise<void> {
    inFlight?.abort();
    const controller = new AbortController();
    inFlight = controller;
    query.value = next;
    loading.value = true;
    try {
      page.value = await recipesApi.listRecipes(next, controller.signal);
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
  const create = (input: CreateRecipeInput): Promise<RecipeDetail> => recipesApi.createRecipe(input);

  return { page, query, loading, load, create };
});

if (import.meta.hot) import.meta.hot.accept(acceptHMRUpdate(useRecipesStore, import.meta.hot));
