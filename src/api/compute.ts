import type { RecipeResult } from '../../shared/engine/types';
import type { RecipeDocumentInput } from '../../shared/schemas/recipe';
import { apiPost } from './client';

/** The server's authoritative computation of a document (the preview runs the same engine in the browser). */
export const computeOnServer = (document: RecipeDocumentInput) => apiPost<RecipeResult>('/api/compute', document);
