import type { RecipeVersion, SaveVersionInput } from '../../shared/schemas/recipes-api';
import { apiGet, apiPost, apiPut } from './client';

export const getVersion = (id: number) => apiGet<RecipeVersion>(`/api/versions/${id}`);

/** Saves a draft at the revision it was read; 409 'stale' or 'not_draft' when that no longer holds. */
export const saveVersion = (id: number, input: SaveVersionInput) => apiPut<RecipeVersion>(`/api/versions/${id}`, input);

/** "New version from this one": a new draft of the same recipe. */
export const copyVersion = (id: number, note = '') => apiPost<RecipeVersion>(`/api/versions/${id}/copy`, { note });
