import { describe, expect, it } from 'vitest';
import type { AuditRow } from '../../../../shared/schemas/signoff';
import { filtersFromQuery, filtersToQuery, NO_FILTERS, recordRoute, recordText, toAuditQuery, transitionText } from '../../../../src/components/audit/audit-format';

describe('audit trail filters in the page address', () => {
  it('reads good values and drops malformed ones', () => {
    expect(filtersFromQuery({ from: '2026-03-01', to: '2026-02-30', actorId: '4', action: 'lot.open', entityType: 'lot', entityId: '-2' })).toEqual({
      from: '2026-03-01',
      to: null,
      actorId: 4,
      action: 'lot.open',
      entityType: 'lot',
      entityId: null,
    });
  });

  it('round-trips filters through the address', () => {
    const filters = { ...NO_FILTERS, from: '2026-01-31', entityType: 'recipe_version', entityId: 12 };
    expect(filtersFromQuery(filtersToQuery(filters) as Record<string, string>)).toEqual(filters);
    expect(filtersToQuery(filters, 3)).toMatchObject({ page: '3' });
    expect(filtersToQuery(filters, 1)).not.toHaveProperty('page');
  });

  it('sends only the filters that are set, with the page', () => {
    expect(toAuditQuery({ ...NO_FILTERS, actorId: 2 }, 2, 50)).toEqual({ page: 2, pageSize: 50, actorId: 2 });
  });

  it.each([
    { from: 'in_review', to: 'released', text: 'In review → Released' },
    { from: null, to: 'open', text: '→ Open' },
    { from: null, to: null, text: '' },
  ])('shows $from → $to as "$text"', ({ from, to, text }) => {
    expect(transitionText(from, to)).toBe(text);
  });
});

const row = (over: Partial<AuditRow>): AuditRow => ({
  id: 1,
  at: '2026-03-01T10:00:00Z',
  actor: { id: 2, name: 'Lee Lead' },
  actorRole: 'lead',
  action: 'version.release',
  entityType: 'recipe_version',
  entityId: 12,
  fromState: 'in_review',
  toState: 'released',
  comment: null,
  contentHash: null,
  details: null,
  ...over,
});

describe('the record an audit row is about', () => {
  it('opens a recipe version in its recipe workspace at that version, named by its number', () => {
    const r = row({ details: { recipeId: 4, versionNo: 3, meaning: 'approved' } });
    expect(recordRoute(r)).toEqual({ name: 'recipe', params: { id: 4 }, query: { version: 12 } });
    expect(recordText(r)).toBe('v3');
  });

  it.each([
    { case: 'no details', details: null },
    { case: 'details without the recipe', details: { versionNo: 3 } },
    { case: 'a recipe id that is not an id', details: { recipeId: '4', versionNo: 3 } },
  ])('leaves an older version row ($case) as plain text', ({ details }) => {
    expect(recordRoute(row({ details }))).toBeNull();
  });

  it('names a version by its id when the row does not say its number', () => {
    expect(recordText(row({ details: { recipeId: 4 } }))).toBe('#12');
  });

  it.each([
    { entityType: 'lot', entityId: 9, to: { name: 'lot', params: { id: 9 } } },
    { entityType: 'recipe', entityId: 4, to: { name: 'recipe', params: { id: 4 } } },
    { entityType: 'tube', entityId: 2, to: null },
    { entityType: 'lot', entityId: null, to: null },
  ])('links a $entityType #$entityId row to $to', ({ entityType, entityId, to }) => {
    expect(recordRoute(row({ entityType, entityId, details: { recipeId: 4 } }))).toEqual(to);
  });
});
