import type { LotComparison, Measurement, UploadFields } from '../../shared/schemas/measurements';
import { ApiError, apiGet, toApiError } from './client';

export interface LotMeasurements {
  /** Newest first. */
  measurements: Measurement[];
  /** The newest profile and four-point-probe set against the stored prediction; null without a stored result. */
  comparison: LotComparison | null;
}

export const listMeasurements = (lotId: number) => apiGet<LotMeasurements>(`/api/lots/${lotId}/measurements`);

/**
 * Uploads one CSV file against a lot (multipart: `file` plus the form fields).
 * The JSON helper in client.ts cannot send a file, so this call builds its own
 * request and turns failures into the same ApiError: 400 `invalid_file` with one
 * issue per bad line, 413 too big, 415 not CSV.
 */
export async function uploadMeasurement(lotId: number, file: File, fields: UploadFields): Promise<Measurement> {
  const form = new FormData();
  for (const [key, value] of Object.entries(fields)) if (value !== undefined && value !== '') form.append(key, String(value));
  form.append('file', file, file.name);
  let response: Response;
  try {
    response = await fetch(`/api/lots/${lotId}/measurements`, { method: 'POST', body: form, credentials: 'same-origin', headers: { Accept: 'application/json' } });
  } catch {
    throw new ApiError(0, 'network_error', 'The server could not be reached. Check the connection and try again.');
  }
  const body: unknown = await response.json().catch(() => undefined);
  if (!response.ok) throw toApiError(response, body);
  if (typeof body === 'object' && body !== null && 'data' in body) return (body as { data: Measurement }).data;
  throw new ApiError(response.status, 'bad_response', 'The server sent an answer the app does not understand.');
}
