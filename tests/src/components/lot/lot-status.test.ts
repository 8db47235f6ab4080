import { describe, expect, it } from 'vitest';
import { LOT_STATUSES } from '../../../../shared/schemas/lots';
import { isFinal, isInFlight, LOT_NEXT } from '../../../../src/components/lot/lot-status';

describe('moves of a lot on the floor', () => {
  it.each([
    { from: 'open', to: ['in_progress', 'scrapped'] },
    { from: 'in_progress', to: ['complete', 'scrapped'] },
    { from: 'complete', to: [] },
    { from: 'scrapped', to: [] },
  ] as const)('$from → $to', ({ from, to }) => {
    expect(LOT_NEXT[from]).toEqual(to);
  });

  it('covers every status the server knows, and only open or running lots are in flight', () => {
    expect(Object.keys(LOT_NEXT).sort()).toEqual([...LOT_STATUSES].sort());
    expect(LOT_STATUSES.filter(isInFlight)).toEqual(['open', 'in_progress']);
    expect(LOT_STATUSES.filter(isFinal)).toEqual(['complete', 'scrapped']);
  });
});
