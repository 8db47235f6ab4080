import type {
  CreateRecipeInput,
  ListRecipesQuery,
  PatchRecipeInput,
  RecipeDetail,
  RecipeListPage,
} from '../../shared/schemas/recipes-api';
import { apiGet, apiPatch, apiPost } from './client';

/** Query string of a recipe list request, leaving out unset filters. */
export function recipesQueryString(query: ListRecipesQuery): string {
  const params = new URLSearchParams();
  for (const [key, value] of Object.entries(query)) {
    if (value !== undefined && value !== null && value !== '') params.set(key, String(value));
  }
  const text = params.toString();
  return text ? `?${text}` : '';
}

export const listRecipes = (query: ListRecipesQuery = {}, signal?: AbortSignal) =>
  apiGet<RecipeListPage>(`/api/recipes${recipesQueryString(query)}`, { signal });

/** Creates a recipe; with `document` it imports a JSON export. */
export const createRecipe = (input: CreateRecipeInput) => apiPost<RecipeDetail>('/api/recipes', input);

export const getRecipe = (id: number) => apiGet<RecipeDetail>(`/api/recipes/${id}`);

export const patchRecipe = (id: number, input: PatchRecipeInput) => apiPatch<RecipeDetail>(`/api/recipes/${id}`, input);
