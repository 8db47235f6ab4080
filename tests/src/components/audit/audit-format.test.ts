import { describe, expect, it } from 'vitest';
import { filtersFromQuery, filtersToQuery, fromIsoDate, NO_FILTERS, toAuditQuery, toIsoDate, transitionText } from '../../../../src/components/audit/audit-format';

describe('audit trail filters in the page address', () => {
  it('reads good values and drops malformed ones', () => {
    expect(filtersFromQuery({ from: '2026-03-01', to: '03/09/2026', actorId: '4', action: 'lot.open', entityType: 'lot', entityId: '-2' })).toEqual({
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

  it('turns a picked calendar day into YYYY-MM-DD and back without a time-zone shift', () => {
    expect(toIsoDate(new Date(2026, 0, 5, 23, 59))).toBe('2026-01-05');
    expect(toIsoDate(fromIsoDate('2026-12-31'))).toBe('2026-12-31');
    expect(fromIsoDate('31.12.2026')).toBeNull();
  });

  it.each([
    { from: 'in_review', to: 'released', text: 'In review → Released' },
    { from: null, to: 'open', text: '→ Open' },
    { from: null, to: null, text: '' },
  ])('shows $from → $to as "$text"', ({ from, to, text }) => {
    expect(transitionText(from, to)).toBe(text);
  });
});
