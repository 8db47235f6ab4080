import type { LotComparison, Measurement, UploadFields } from '../../shared/schemas/measurements';
import { apiGet, apiPostForm } from './client';

export interface LotMeasurements {
  /** Newest first. */
  measurements: Measurement[];
  /** The newest profile and four-point-probe set against the stored prediction; null without a stored result. */
  comparison: LotComparison | null;
}

export const listMeasurements = (lotId: number) => apiGet<LotMeasurements>(`/api/lots/${lotId}/measurements`);

/**
 * Uploads one CSV file against a lot (multipart: `file` plus the form fields).
 * Failures are ApiErrors: 400 `invalid_file` with one issue per bad line, 413
 * too big, 415 not CSV.
 */
export function uploadMeasurement(lotId: number, file: File, fields: UploadFields): Promise<Measurement> {
  const form = new FormData();
  for (const [key, value] of Object.entries(fields)) if (value !== undefined && value !== '') form.append(key, String(value));
  form.append('file', file, file.name);
  return apiPostForm<Measurement>(`/api/lots/${lotId}/measurements`, form);
}
