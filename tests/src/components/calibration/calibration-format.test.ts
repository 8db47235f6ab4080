import { describe, expect, it } from 'vitest';
import { computeRecipe } from '../../../../shared/engine';
import { parseRecipeDocument } from '../../../../shared/schemas/recipe';
import { formatFactor, qualityText, rangeText, rmsPct, xjShiftPct } from '../../../../src/components/calibration/calibration-format';

describe('calibration text', () => {
  it.each([
    [1.1791240529, '× 1.179'],
    [0.85, '× 0.8500'],
    [null, '—'],
    [Number.NaN, '—'],
  ])('factor %s reads %s', (f, text) => {
    expect(formatFactor(f)).toBe(text);
  });

  it.each([
    [0.0812, '8.1 %'],
    [0.001, '0.1 %'],
    [0, '0.0 %'],
    [null, '—'],
  ])('RMS log error %s reads %s', (rms, text) => {
    expect(rmsPct(rms)).toBe(text);
  });

  it('shows quality as before → after and the 1σ range as low – high', () => {
    expect(qualityText({ rmsLogErrorBefore: 0.078, rmsLogErrorAfter: 0.012 })).toBe('7.8 % → 1.2 %');
    expect(rangeText([1.1421, 1.2175])).toBe('1.142 – 1.218');
  });
});

describe('xjShiftPct', () => {
  // A constant-source (erfc) diffusion has xj = 2√(Dt)·erfc⁻¹(Cb/Cs) with Cs set by solid
  // solubility, not by D (A. S. Grove, Physics and Technology of Semiconductor Devices,
  // Wiley 1967, ch. 3): a factor f on D moves xj by √f exactly. The engine agrees.
  it.each([0.8, 1.18, 1.5])('matches the engine for a predeposition alone in a tube with factor %s', (f) => {
    const parsed = parseRecipeDocument({
      schemaVersion: 1,
      substrate: { type: 'n', background: { concentration: 1e15 } },
      options: { useTubeCalibration: true },
      steps: [{ id: 'p', kind: 'predeposition', dopant: 'B', tempC: 1000, timeMin: 30, tubeId: 7 }],
    });
    if (!parsed.ok) throw new Error(JSON.stringify(parsed.issues));
    const plain = computeRecipe(parsed.doc).final.junctionDepthsUm[0];
    const scaled = computeRecipe(parsed.doc, { tubeFactors: { 7: f } }).final.junctionDepthsUm[0];
    expect((scaled / plain - 1) * 100).toBeCloseTo(xjShiftPct(f), 1);
  });
});
