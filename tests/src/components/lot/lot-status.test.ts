import { describe, expect, it } from 'vitest';
import { LOT_STATUS_MOVES, LOT_STATUSES } from '../../../../shared/schemas/lots';
import { isFinal, isInFlight, LOT_MOVE_LABELS } from '../../../../src/components/lot/lot-status';

describe('moves of a lot on the floor (the shared rule the server enforces)', () => {
  it.each([
    { from: 'open', to: ['in_progress', 'scrapped'] },
    { from: 'in_progress', to: ['complete', 'scrapped'] },
    { from: 'complete', to: [] },
    { from: 'scrapped', to: [] },
  ] as const)('$from → $to', ({ from, to }) => {
    expect(LOT_STATUS_MOVES[from]).toEqual(to);
  });

  it('covers every status the server knows, and only open or running lots are in flight', () => {
    expect(Object.keys(LOT_STATUS_MOVES).sort()).toEqual([...LOT_STATUSES].sort());
    expect(LOT_STATUSES.filter(isInFlight)).toEqual(['open', 'in_progress']);
    expect(LOT_STATUSES.filter(isFinal)).toEqual(['complete', 'scrapped']);
  });

  it('names a button for every move the rule allows', () => {
    const targets = new Set(Object.values(LOT_STATUS_MOVES).flat());
    for (const status of targets) expect(LOT_MOVE_LABELS[status]).toMatch(/\w/);
  });
});
