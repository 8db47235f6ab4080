import { describe, expect, it } from 'vitest';
import { diffOutcomes, numberDelta } from '../../../shared/compare/diff-outcomes';
import { computeRecipe } from '../../../shared/engine';
import { parseRecipeDocument } from '../../../shared/schemas/recipe';
import { boronTwoStep } from '../../support/sample-recipes';

function compute(driveMin: number, tempC = 1100) {
  const input = boronTwoStep({ boron: 1, anneal: 3 });
  const steps = input.steps.map((s) => (s.kind === 'anneal' ? { ...s, timeMin: driveMin, tempC } : s));
  const parsed = parseRecipeDocument({ ...input, steps });
  if (!parsed.ok) throw new Error(JSON.stringify(parsed.issues));
  return computeRecipe(parsed.doc);
}

describe('numberDelta', () => {
  it.each([
    [2, 3, 1, 50],
    [4, 3, -1, -25],
    [0, 1, 1, null],
    [null, 1, null, null],
    [1, undefined, null, null],
  ])('from %s to %s: delta %s, percent %s', (a, b, delta, percent) => {
    expect(numberDelta(a, b)).toEqual({ a: a ?? null, b: b ?? null, delta, percent });
  });
});

describe('diffOutcomes', () => {
  it('a longer drive-in deepens the junction and lowers the sheet resistance', () => {
    const d = diffOutcomes(compute(60), compute(120));
    expect(d.junctionDepthUm.delta!).toBeGreaterThan(0);
    expect(d.sheetResistanceOhmSq.delta!).toBeLessThan(0);
    expect(d.thermalBudget.map((t) => t.dopant)).toEqual(['B']);
  });

  it('the thermal budget difference is the Dt of the extra drive time at the setpoint', () => {
    const a = compute(60);
    const b = compute(120);
    const drive = a.steps[1].dopants[0];
    const extraDt = drive.diffusivityCm2s * 60 * 60; // D (cm²/s) × 60 min (same setpoint, same ramps)
    expect(diffOutcomes(a, b).thermalBudget[0].dtCm2.delta).toBeCloseTo(extraDt, 20);
  });

  it('keeps unknowns as null when a result is missing', () => {
    const d = diffOutcomes(null, compute(60));
    expect(d.junctionDepthUm).toMatchObject({ a: null, delta: null, percent: null });
    expect(d.thermalBudget[0].dtCm2.a).toBeNull();
  });
});
