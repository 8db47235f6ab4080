import type { AuditPage, AuditQuery } from '../../shared/schemas/signoff';
import { apiGet } from './client';
import { toQueryString } from './query-string';

export const listAudit = (query: AuditQuery, signal?: AbortSignal) => apiGet<AuditPage>(`/api/audit${toQueryString(query)}`, { signal });

/** The same filters as CSV (all matching rows; no paging). */
export function auditExportUrl(query: AuditQuery): string {
  const { page: _page, pageSize: _size, ...filters } = query;
  return `/api/audit/export.csv${toQueryString(filters)}`;
}
