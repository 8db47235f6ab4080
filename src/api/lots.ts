import type { CreateLotInput, Lot, LotStatus } from '../../shared/schemas/lots';
import { apiGet, apiPatch, apiPost, toApiError } from './client';
import { readNdjson } from './ndjson';
import { toQueryString } from './query-string';

export interface LotListQuery {
  status?: LotStatus;
  versionId?: number;
  recipeId?: number;
}

export const listLots = (query: LotListQuery = {}) => apiGet<Lot[]>(`/api/lots${toQueryString(query)}`);

export const getLot = (id: number) => apiGet<Lot>(`/api/lots/${id}`);

/** Opens a lot against a released version; 409 when the lot id exists, 422 with field issues otherwise. */
export const createLot = (input: CreateLotInput) => apiPost<Lot>('/api/lots', input);

export const patchLot = (id: number, input: { status?: LotStatus; notes?: string }) => apiPatch<Lot>(`/api/lots/${id}`, input);

export const lotTravellerUrl = (id: number) => `/api/lots/${id}/traveller.pdf`;

export interface PrintedBatch {
  pdf: Blob;
  fileName: string;
}

type BatchLine =
  | { progress: { done: number; total: number } }
  | { pdf: string; fileName?: string }
  | { error: { code: string; message: string } };

function base64ToBlob(base64: string, type: string): Blob {
  const bytes = Uint8Array.from(atob(base64), (c) => c.charCodeAt(0));
  return new Blob([bytes], { type });
}

/**
 * Many travellers in one PDF. The server streams NDJSON: progress lines while
 * it lays out each lot, then the PDF (base64) or an error; `onProgress` hears
 * every progress line so a bar can follow.
 */
export async function printTravellers(lotIds: number[], onProgress: (done: number, total: number) => void): Promise<PrintedBatch> {
  const response = await fetch('/api/lots/travellers', {
    method: 'POST',
    headers: { 'Content-Type': 'application/json', Accept: 'application/x-ndjson' },
    credentials: 'same-origin',
    body: JSON.stringify({ lotIds }),
  });
  if (!response.ok || !response.body) {
    const body = await response.json().catch(() => undefined);
    throw toApiError(response, body);
  }
  // An object, not two lets: the callback's assignments stay visible to the type checker.
  const out: { printed: PrintedBatch | null; failure: string | null } = { printed: null, failure: null };
  await readNdjson<BatchLine>(response.body, (line) => {
    if ('progress' in line) onProgress(line.progress.done, line.progress.total);
    else if ('pdf' in line) out.printed = { pdf: base64ToBlob(line.pdf, 'application/pdf'), fileName: line.fileName ?? 'travellers.pdf' };
    else if ('error' in line) out.failure = line.error.message;
  });
  if (out.failure) throw new Error(out.failure);
  if (!out.printed) throw new Error('The server ended the answer before the PDF arrived; nothing was printed.');
  return out.printed;
}
