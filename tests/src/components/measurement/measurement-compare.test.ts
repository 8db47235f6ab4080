import { describe, expect, it } from 'vitest';
import { ACCEPTANCE_WINDOWS } from '../../../../shared/rules/acceptance-windows';
import type { LotComparison } from '../../../../shared/schemas/measurements';
import { comparisonRows, verdictOf } from '../../../../src/components/measurement/measurement-compare';

describe('verdictOf', () => {
  it.each([
    [0, 10, 'in'],
    [9.99, 10, 'in'],
    [10, 10, 'in'],
    [-10, 10, 'in'],
    [10.01, 10, 'out'],
    [-25, 10, 'out'],
    [null, 10, null],
    [Number.NaN, 10, null],
  ])('Δ %s %% against ±%s %% is %s', (pct, window, expected) => {
    expect(verdictOf(pct, window)).toBe(expected);
  });
});

describe('comparisonRows', () => {
  const comparison: LotComparison = {
    predicted: { junctionDepthUm: 1.549, sheetResistanceOhmSq: 114.3, surfaceConcentrationCm3: 1.5e19 },
    measured: { junctionDepthUm: 1.745, sheetResistanceOhmSq: 111.6 },
    delta: { junctionDepthUm: 0.196, junctionDepthPct: 12.65, sheetResistanceOhmSq: -2.7, sheetResistancePct: -2.36 },
  };

  it('puts junction depth and sheet resistance against the traveller windows, with units', () => {
    const rows = comparisonRows(comparison);
    expect(rows.map((r) => [r.key, r.unit, r.windowPct, r.verdict])).toEqual([
      ['xj', 'µm', ACCEPTANCE_WINDOWS.junctionDepthPct, 'out'],
      ['rs', 'Ω/□', ACCEPTANCE_WINDOWS.sheetResistancePct, 'in'],
    ]);
    expect(rows[0]).toMatchObject({ predicted: 1.549, measured: 1.745, delta: 0.196 });
  });

  it('has no verdict where nothing was measured', () => {
    const rows = comparisonRows({
      ...comparison,
      measured: { junctionDepthUm: null, sheetResistanceOhmSq: null },
      delta: { junctionDepthUm: null, junctionDepthPct: null, sheetResistanceOhmSq: null, sheetResistancePct: null },
    });
    expect(rows.map((r) => r.verdict)).toEqual([null, null]);
  });
});
