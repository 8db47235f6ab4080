// Tube calibration multiplies D in the steps run in a tube, only when the
// recipe opts in. Check against the closed form: a constant-source junction
// depth scales as √(Dt) (Crank 1975, erfc solution), so a factor f on D
// moves it by √f.
import { describe, expect, it } from 'vitest';
import { computeRecipe } from '../../shared/engine/index';
import { parseRecipeDocument, type RecipeDocumentInput } from '../../shared/schemas/recipe';

function doc(useTubeCalibration: boolean): RecipeDocumentInput {
  return {
    schemaVersion: 1,
    substrate: { type: 'n', background: { concentration: 1e15 } },
    options: { useTubeCalibration },
    steps: [{ id: 'p', kind: 'predeposition', dopant: 'B', tempC: 1000, timeMin: 60, surface: { mode: 'fixed', concentration: 1e19 }, tubeId: 7 }],
  };
}

const parse = (d: RecipeDocumentInput) => {
  const r = parseRecipeDocument(d);
  if (!r.ok) throw new Error(JSON.stringify(r.issues));
  return r.doc;
};

describe('tube calibration', () => {
  it.each([0.5, 1.3, 2])('a factor %s moves an erfc junction by √f and is reported', (f) => {
    const plain = computeRecipe(parse(doc(true)));
    const calibrated = computeRecipe(parse(doc(true)), { tubeFactors: { 7: f } });
    expect(calibrated.final.junctionDepthsUm[0] / plain.final.junctionDepthsUm[0]).toBeCloseTo(Math.sqrt(f), 3);
    expect(calibrated.steps[0].dopants[0]).toMatchObject({ calibrationFactor: f });
    expect(calibrated.steps[0].dopants[0].dtCm2 / plain.steps[0].dopants[0].dtCm2).toBeCloseTo(f, 10);
    expect(calibrated.calibration).toEqual({ optedIn: true, factors: [{ tubeId: 7, factor: f }] });
  });

  it('is ignored when the recipe does not opt in, and for other tubes', () => {
    const base = computeRecipe(parse(doc(false)));
    const notOpted = computeRecipe(parse(doc(false)), { tubeFactors: { 7: 2 } });
    expect(notOpted.final.junctionDepthsUm).toEqual(base.final.junctionDepthsUm);
    expect(notOpted.calibration).toEqual({ optedIn: false, factors: [] });
    const otherTube = computeRecipe(parse(doc(true)), { tubeFactors: { 8: 2 } });
    expect(otherTube.final.junctionDepthsUm).toEqual(base.final.junctionDepthsUm);
  });

  it('refuses a factor that is not a positive number, naming the option', () => {
    expect(() => computeRecipe(parse(doc(true)), { tubeFactors: { 7: -1 } })).toThrow(/positive/);
  });
});
