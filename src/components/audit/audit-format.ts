// Words and filters of the Audit trail screen. Filters live in the page's
// address, so a filtered view (say, one lot's history) can be linked to.
import type { LocationQuery, LocationQueryRaw, RouteLocationRaw } from 'vue-router';
import type { AuditQuery, AuditRow } from '../../../shared/schemas/signoff';
import { fromIsoDate } from '../common/calendar-date';

/** Readable names of the actions the server records (an unknown action shows its code). */
export const AUDIT_ACTION_LABELS: Record<string, string> = {
  'version.submit': 'Submitted for sign-off',
  'version.release': 'Signed and released',
  'version.return': 'Returned to Draft',
  'version.retire': 'Retired',
  'version.save': 'Draft saved',
  'version.copy': 'New version made',
  'recipe.create': 'Recipe created',
  'recipe.import': 'Recipe imported',
  'recipe.update': 'Recipe renamed or described',
  'lot.open': 'Lot opened',
  'lot.update': 'Lot changed',
  'lot.print': 'Traveller printed',
  'measurement.upload': 'Measurements uploaded',
  'tube.create': 'Tube added',
  'tube.update': 'Tube changed',
  'tube.calibrate': 'Tube calibrated',
  'person.create': 'Person added',
  'person.update': 'Person changed',
  'person.deactivate': 'Person deactivated',
  'person.reactivate': 'Person reactivated',
  'session.sign-in': 'Signed in',
};

export const AUDIT_ENTITY_LABELS: Record<string, string> = {
  recipe_version: 'Recipe version',
  recipe: 'Recipe',
  lot: 'Lot',
  tube: 'Tube',
  user: 'Person',
};

export const actionLabel = (action: string) => AUDIT_ACTION_LABELS[action] ?? action;
export const entityLabel = (type: string) => AUDIT_ENTITY_LABELS[type] ?? type;

export interface AuditFilters {
  from: string | null;
  to: string | null;
  actorId: number | null;
  action: string | null;
  entityType: string | null;
  entityId: number | null;
}

export const NO_FILTERS: AuditFilters = { from: null, to: null, actorId: null, action: null, entityType: null, entityId: null };

function one(value: LocationQuery[string]): string | null {
  const v = Array.isArray(value) ? value[0] : value;
  return typeof v === 'string' && v.trim() !== '' ? v.trim() : null;
}

function positiveInt(value: LocationQuery[string]): number | null {
  const n = Number(one(value));
  return Number.isInteger(n) && n > 0 ? n : null;
}

function isoDate(value: LocationQuery[string]): string | null {
  const v = one(value);
  return fromIsoDate(v) ? v : null;
}

/** Filters from the page address; anything malformed is left out rather than sent. */
export function filtersFromQuery(query: LocationQuery): AuditFilters {
  return {
    from: isoDate(query.from),
    to: isoDate(query.to),
    actorId: positiveInt(query.actorId),
    action: one(query.action),
    entityType: one(query.entityType),
    entityId: positiveInt(query.entityId),
  };
}

/** The page address for filters (and a page number above 1). */
export function filtersToQuery(filters: AuditFilters, page = 1): LocationQueryRaw {
  const out: LocationQueryRaw = {};
  for (const [key, value] of Object.entries(filters)) if (value !== null && value !== '') out[key] = String(value);
  if (page > 1) out.page = String(page);
  return out;
}

/** The API query for filters and a page. */
export function toAuditQuery(filters: AuditFilters, page: number, pageSize: number): AuditQuery {
  const query: AuditQuery = { page, pageSize };
  for (const [key, value] of Object.entries(filters) as [keyof AuditFilters, string | number | null][]) {
    if (value !== null && value !== '') (query as Record<string, unknown>)[key] = value;
  }
  return query;
}

/** A transition as "In review → Released"; a single state alone; '' when there is none. */
export function transitionText(from: string | null, to: string | null): string {
  const word = (s: string) => s.replace(/_/g, ' ').replace(/^./, (c) => c.toUpperCase());
  if (from && to) return `${word(from)} → ${word(to)}`;
  return to ? `→ ${word(to)}` : from ? `${word(from)} →` : '';
}

const positive = (v: unknown): v is number => typeof v === 'number' && Number.isInteger(v) && v > 0;

/** How the Record cell names a row's record: "v3" for a recipe version that says its number, else "#id". */
export function recordText(row: AuditRow): string {
  if (row.entityId === null) return '';
  if (row.entityType === 'recipe_version' && positive(row.details?.versionNo)) return `v${row.details.versionNo}`;
  return `#${row.entityId}`;
}

/**
 * Where a row's record opens in the app, or null. A recipe version opens in
 * its recipe's workspace, which needs the recipe id: rows written before the
 * server recorded it in details stay plain text.
 */
export function recordRoute(row: AuditRow): RouteLocationRaw | null {
  if (row.entityId === null) return null;
  if (row.entityType === 'lot') return { name: 'lot', params: { id: row.entityId } };
  if (row.entityType === 'recipe') return { name: 'recipe', params: { id: row.entityId } };
  const recipeId = row.details?.recipeId;
  if (row.entityType === 'recipe_version' && positive(recipeId)) {
    return { name: 'recipe', params: { id: recipeId }, query: { version: row.entityId } };
  }
  return null;
}
