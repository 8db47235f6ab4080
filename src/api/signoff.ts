import type { RecipeVersion } from '../../shared/schemas/recipes-api';
import type { QueueItem, SignOffInput } from '../../shared/schemas/signoff';
import { apiGet, apiPost } from './client';

/** Versions in review, oldest first (leads and admins). */
export const getSignoffQueue = () => apiGet<QueueItem[]>('/api/sign-off/queue');

/** Draft → In review; 422 'tube_rules' or 'engine_input' with issues at steps.N… while the document is not fit. */
export const submitVersion = (id: number, note = '') => apiPost<RecipeVersion>(`/api/versions/${id}/submit`, { note });

/** In review → Released; 403 'wrong_password', 403 for the author, 409 'wrong_state' when someone acted first. */
export const signOffVersion = (id: number, input: SignOffInput) => apiPost<RecipeVersion>(`/api/versions/${id}/sign-off`, input);

/** In review → Draft with the lead's comment. */
export const returnVersion = (id: number, comment: string) => apiPost<RecipeVersion>(`/api/versions/${id}/return`, { comment });

/** Released → Retired. */
export const retireVersion = (id: number, comment = '') => apiPost<RecipeVersion>(`/api/versions/${id}/retire`, { comment });

/** The version's run traveller; anything not released prints marked NOT RELEASED. */
export const versionTravellerUrl = (id: number) => `/api/versions/${id}/traveller.pdf`;
