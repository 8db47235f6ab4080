import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { fromIsoDate, isoDatesToRange, rangeToIsoDates, toIsoDate } from '../../../../src/components/common/calendar-date';

// Run in a zone far from UTC, where toISOString() would give the neighbouring day.
const zone = process.env.TZ;
beforeEach(() => {
  process.env.TZ = 'Pacific/Auckland';
});
afterEach(() => {
  if (zone === undefined) delete process.env.TZ;
  else process.env.TZ = zone;
});

describe('calendar days between the date picker and the API', () => {
  it('runs where the UTC day differs from the local one', () => {
    expect(new Date(2026, 0, 5).toISOString().slice(0, 10)).toBe('2026-01-04');
  });

  it('turns a picked calendar day into YYYY-MM-DD and back without a time-zone shift', () => {
    expect(toIsoDate(new Date(2026, 0, 5, 0, 0))).toBe('2026-01-05');
    expect(toIsoDate(new Date(2026, 0, 5, 23, 59))).toBe('2026-01-05');
    expect(toIsoDate(fromIsoDate('2026-12-31'))).toBe('2026-12-31');
  });

  it.each(['31.12.2026', '2026-02-31', '2026-1-5', '', null])('does not read %j as a day', (text) => {
    expect(fromIsoDate(text)).toBeNull();
  });

  it('reads a finished range as first and last day, in order even when picked backwards', () => {
    expect(rangeToIsoDates([new Date(2026, 2, 1), new Date(2026, 2, 9)])).toEqual({ from: '2026-03-01', to: '2026-03-09' });
    expect(rangeToIsoDates([new Date(2026, 2, 9), new Date(2026, 2, 1)])).toEqual({ from: '2026-03-01', to: '2026-03-09' });
  });

  it('reads a half-picked range as "from that day on", and a cleared one as no days', () => {
    expect(rangeToIsoDates([new Date(2026, 2, 1), null])).toEqual({ from: '2026-03-01', to: null });
    expect(rangeToIsoDates(null)).toEqual({ from: null, to: null });
    expect(rangeToIsoDates([])).toEqual({ from: null, to: null });
  });

  it('gives the picker back the days it was set to', () => {
    expect(rangeToIsoDates(isoDatesToRange('2026-03-01', '2026-03-09'))).toEqual({ from: '2026-03-01', to: '2026-03-09' });
    expect(isoDatesToRange('2026-03-01', null)).toEqual([new Date(2026, 2, 1), null]);
    expect(isoDatesToRange(null, '2026-03-09')).toBeNull();
  });
});
