import { describe, expect, it } from 'vitest';
import type { RecipeResult } from '../../../../shared/engine/types';
import { lotTargets } from '../../../../src/components/lot/lot-targets';

/** Only the final layer matters here; the numbers are made up for the arithmetic. */
function resultWith(final: Partial<RecipeResult['final']>): RecipeResult {
  return {
    final: { junctionDepthsUm: [], sheetResistanceOhmSq: null, surfaceNetCm3: 1e19, surfaceType: 'p', oxideThicknessUm: 0, ...final },
  } as RecipeResult;
}

// Windows are the traveller's (shared/rules/acceptance-windows.ts, common practice):
// ±10 % junction depth, ±10 % sheet resistance, ±25 % surface concentration, ±5 % oxide.
describe('predicted targets of a lot', () => {
  it.each([
    { key: 'xj-0', predicted: 1.5, windowPct: 10, low: 1.35, high: 1.65, unit: 'µm' },
    { key: 'rs', predicted: 120, windowPct: 10, low: 108, high: 132, unit: 'Ω/□' },
    { key: 'cs', predicted: 2e19, windowPct: 25, low: 1.5e19, high: 2.5e19, unit: 'cm⁻³' },
    { key: 'tox', predicted: 250, windowPct: 5, low: 237.5, high: 262.5, unit: 'nm' },
  ])('$key: $predicted $unit ± $windowPct % → $low … $high', ({ key, predicted, windowPct, low, high, unit }) => {
    const rows = lotTargets(resultWith({ junctionDepthsUm: [1.5], sheetResistanceOhmSq: 120, surfaceNetCm3: 2e19, oxideThicknessUm: 0.25 }));
    const row = rows.find((r) => r.key === key)!;
    expect(row).toMatchObject({ predicted, windowPct, unit });
    expect(row.low).toBeCloseTo(low, 9 - Math.log10(predicted));
    expect(row.high).toBeCloseTo(high, 9 - Math.log10(predicted));
  });

  it('numbers several junctions and leaves out what the result does not have', () => {
    const rows = lotTargets(resultWith({ junctionDepthsUm: [0.4, 2.1], sheetResistanceOhmSq: null, surfaceType: 'n' }));
    expect(rows.map((r) => r.label)).toEqual(['Junction depth 1', 'Junction depth 2', 'Surface concentration (n-type)']);
  });
});
