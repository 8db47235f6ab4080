import fc from 'fast-check';
import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { computeRecipe } from '../../shared/engine/compute-recipe';
import { EngineInputError } from '../../shared/engine/errors';
import { ENGINE_VERSION } from '../../shared/engine/types';
import { parseRecipeDocument, type RecipeDocumentInput } from '../../shared/schemas/recipe';
import { tenStepRecipe } from './fixtures/ten-step-recipe';

const parse = (input: unknown) => {
  const p = parseRecipeDocument(input);
  if (!p.ok) throw new Error(JSON.stringify(p.issues));
  return p.doc;
};

function allNumbers(value: unknown, out: number[] = []): number[] {
  if (typeof value === 'number') out.push(value);
  else if (Array.isArray(value)) value.forEach((v) => allNumbers(v, out));
  else if (value && typeof value === 'object') Object.values(value).forEach((v) => allNumbers(v, out));
  return out;
}

describe('computeRecipe', () => {
  it('computes the documented worked example analytically, with its published figures', () => {
    const text = readFileSync(new URL('../../shared/schemas/examples/boron-two-step.recipe.json', import.meta.url), 'utf8');
    const r = computeRecipe(parse(JSON.parse(text)));
    expect(r.engineVersion).toBe(ENGINE_VERSION);
    expect(r.parameterSetId).toBe('fair-1981');
    expect(r.method).toBe('analytic');
    expect(r.steps.map((s) => s.method)).toEqual(['analytic', 'analytic']);
    // The figures quoted in shared/schemas/recipe-document.md (rounded there).
    expect(r.steps[0].junctionDepthsUm[0]).toBeCloseTo(0.178, 3);
    expect(r.final.junctionDepthsUm[0]).toBeCloseTo(2.13, 2);
    expect(r.final.sheetResistanceOhmSq!).toBeCloseTo(117, 0);
    expect(r.final.dopants[0].retainedDoseCm2 / 6.0e14).toBeCloseTo(1, 2);
    expect(r.profile.depthUm).toHaveLength(400);
    expect(r.warnings).toEqual([]);
  });

  it.each([
    ['predeposition', [{ id: 'p', kind: 'predeposition', dopant: 'B', tempC: 1000, timeMin: 30 }]],
    ['predeposition + drive-in', [
      { id: 'p', kind: 'predeposition', dopant: 'P', tempC: 950, timeMin: 20 },
      { id: 'd', kind: 'anneal', tempC: 1100, timeMin: 60, loadTempC: 800 },
    ]],
    ['implant + anneal (reflect)', [
      { id: 'i', kind: 'implant', dopant: 'B', doseCm2: 1e14, rpUm: 0.1, dRpUm: 0.035 },
      { id: 'a', kind: 'anneal', tempC: 1050, timeMin: 30, loadTempC: 800 },
    ]],
    ['shallow implant + anneal (lose)', [
      { id: 'i', kind: 'implant', dopant: 'B', doseCm2: 1e14, rpUm: 0.02, dRpUm: 0.02 },
      { id: 'a', kind: 'anneal', tempC: 1000, timeMin: 20 },
    ], 'lose'],
  ])('analytic and numerical junction depths agree within 1 %%: %s', (_name, steps, surface = 'reflect') => {
    const input = (method: string) => ({
      schemaVersion: 1,
      substrate: { type: steps[0].dopant === 'P' ? 'p' : 'n', background: { concentration: 1e15 } },
      options: { method, implantSurface: surface },
      steps,
    });
    const a = computeRecipe(parse(input('analytic')));
    const n = computeRecipe(parse(input('numerical')));
    expect(a.final.junctionDepthsUm.length).toBeGreaterThan(0);
    expect(n.final.junctionDepthsUm.length).toBe(a.final.junctionDepthsUm.length);
    a.final.junctionDepthsUm.forEach((x, i) => expect(Math.abs(n.final.junctionDepthsUm[i] / x - 1)).toBeLessThan(0.01));
    expect(Math.abs(n.final.sheetResistanceOhmSq! / a.final.sheetResistanceOhmSq! - 1)).toBeLessThan(0.01);
  });

  it('finds both junctions of a buried implant into a substrate of the same type as the surface', () => {
    const r = computeRecipe(parse({
      schemaVersion: 1,
      substrate: { type: 'n', background: { concentration: 1e16 } },
      steps: [{ id: 'i', kind: 'implant', dopant: 'B', doseCm2: 1e13, rpUm: 0.5, dRpUm: 0.08 }],
    }));
    expect(r.final.junctions.map((j) => [j.above, j.below])).toEqual([['n', 'p'], ['p', 'n']]);
    expect(r.final.junctionDepthsUm[0]).toBeLessThan(0.5);
    expect(r.final.junctionDepthsUm[1]).toBeGreaterThan(0.5);
  });

  it('warns when a setpoint is outside the parameter set validity, naming the step and field', () => {
    const r = computeRecipe(parse({
      schemaVersion: 1,
      substrate: { type: 'n', background: { concentration: 1e15 } },
      steps: [{ id: 'cold', kind: 'predeposition', dopant: 'B', tempC: 700, timeMin: 30 }],
    }));
    expect(r.warnings).toContainEqual(expect.objectContaining({ code: 'temperature-outside-validity', stepId: 'cold', path: 'steps.0.tempC' }));
  });

  it('uses the solver for concentration-dependent diffusion above nᵢ and says why', () => {
    const r = computeRecipe(parse({
      schemaVersion: 1,
      substrate: { type: 'p', background: { concentration: 1e15 } },
      options: { concentrationDependent: true },
      steps: [
        { id: 'i', kind: 'implant', dopant: 'As', doseCm2: 5e15, rpUm: 0.03, dRpUm: 0.012 },
        { id: 'a', kind: 'anneal', tempC: 1000, timeMin: 30 },
      ],
    }));
    expect(r.steps[1].method).toBe('numerical');
    expect(r.steps[1].methodReason).toContain('concentration-dependent');
    expect(Math.abs(r.final.dopants[0].retainedDoseCm2 / 5e15 - 1)).toBeLessThan(1e-6);
  });

  it('an oxidation consumes silicon, grows oxide and reports OED and segregation factors', () => {
    const r = computeRecipe(parse({
      schemaVersion: 1,
      substrate: { type: 'n', background: { concentration: 1e15 } },
      steps: [
        { id: 'i', kind: 'implant', dopant: 'B', doseCm2: 1e15, rpUm: 0.1, dRpUm: 0.035 },
        { id: 'o', kind: 'oxidation', ambient: 'wet-o2', tempC: 1000, timeMin: 60 },
      ],
    }));
    const ox = r.steps[1].oxide!;
    expect(ox.grownUm).toBeGreaterThan(0.2);
    expect(ox.siliconConsumedUm / ox.grownUm).toBeCloseTo(0.44, 1);
    expect(r.steps[1].dopants[0].oedFactor).toBeGreaterThanOrEqual(1);
    expect(ox.segregation[0]).toMatchObject({ dopant: 'B' });
    expect(r.final.dopants[0].retainedDoseCm2).toBeLessThan(1e15);
    expect(r.warnings.map((w) => w.code)).toContain('oxidation-approximation');
  });

  it('reports the thermal budget per dopant with cumulative Dt since the dopant entered', () => {
    const r = computeRecipe(parse(tenStepRecipe('auto')));
    const p = (i: number) => r.steps[i].dopants.find((d) => d.dopant === 'P')!;
    const sb = (i: number) => r.steps[i].dopants.find((d) => d.dopant === 'Sb')!;
    expect(p(1).cumulativeDtCm2).toBeCloseTo(p(0).dtCm2 + p(1).dtCm2, 20);
    expect(sb(4).present).toBe(false);
    expect(sb(4).cumulativeDtCm2).toBe(0);
    expect(sb(5).cumulativeDtCm2).toBe(sb(5).dtCm2);
    expect(p(1).diffusionLengthUm).toBeCloseTo(2 * p(1).sqrtDtUm, 12);
  });

  it('refuses a background resistivity the conversion cannot handle with an EngineInputError naming the field', () => {
    const doc = parse({ schemaVersion: 1, substrate: { type: 'n', background: { resistivity: 20000 } }, steps: [] });
    try {
      computeRecipe(doc);
    } catch (e) {
      expect(e).toBeInstanceOf(EngineInputError);
      expect((e as EngineInputError).path).toBe('substrate.background.resistivity');
      return;
    }
    // Within range of the conversion, the result is simply computed.
    expect(computeRecipe(doc).substrate.resistivityOhmCm).toBe(20000);
  });
});

const dopant = fc.constantFrom('B', 'P', 'As', 'Sb');
const furnace = {
  tempC: fc.double({ min: 700, max: 1250, noNaN: true }),
  timeMin: fc.double({ min: 0, max: 600, noNaN: true }),
  loadTempC: fc.double({ min: 600, max: 700, noNaN: true }),
  rampUpCPerMin: fc.double({ min: 1, max: 20, noNaN: true }),
  rampDownCPerMin: fc.double({ min: 1, max: 20, noNaN: true }),
};
const step = fc.oneof(
  fc.record({ kind: fc.constant('predeposition'), dopant, ...furnace,
    surface: fc.oneof(fc.constant({ mode: 'solubility' }), fc.record({ mode: fc.constant('fixed'), concentration: fc.double({ min: 1e16, max: 1e21, noNaN: true }) })) }),
  fc.record({ kind: fc.constant('implant'), dopant, doseCm2: fc.double({ min: 1e11, max: 1e16, noNaN: true }),
    rpUm: fc.double({ min: 0, max: 1, noNaN: true }), dRpUm: fc.double({ min: 0.005, max: 0.3, noNaN: true }) }),
  fc.record({ kind: fc.constant('anneal'), ambient: fc.constantFrom('inert', 'dry-o2', 'wet-o2'), ...furnace }),
  fc.record({ kind: fc.constant('oxidation'), ambient: fc.constantFrom('dry-o2', 'wet-o2'), ...furnace }),
);
const validRecipe = fc.record({
  type: fc.constantFrom('n', 'p'),
  bg: fc.double({ min: 1e13, max: 1e18, noNaN: true }),
  method: fc.constantFrom('auto', 'analytic', 'numerical'),
  implantSurface: fc.constantFrom('reflect', 'lose'),
  concentrationDependent: fc.boolean(),
  parameterSet: fc.constantFrom('fair-1981', 'fuller-jaeger'),
  steps: fc.array(step, { minLength: 0, maxLength: 5 }),
}).map((r): RecipeDocumentInput => ({
  schemaVersion: 1,
  substrate: { type: r.type, background: { concentration: r.bg } },
  parameterSet: r.parameterSet,
  options: { method: r.method, implantSurface: r.implantSurface, concentrationDependent: r.concentrationDependent, points: 60 },
  steps: r.steps.map((s, i) => ({ ...s, id: `s${i}` }) as RecipeDocumentInput['steps'][number]),
}));

describe('properties', () => {
  it('random valid recipes: no NaN/Infinity, doses ≥ 0, junction depths positive and ascending', () => {
    fc.assert(
      fc.property(validRecipe, (input) => {
        const r = computeRecipe(parse(input));
        for (const x of allNumbers(r)) expect(Number.isFinite(x)).toBe(true);
        for (const d of r.final.dopants) expect(d.retainedDoseCm2).toBeGreaterThanOrEqual(0);
        for (const s of [...r.steps.map((s) => s.junctionDepthsUm), r.final.junctionDepthsUm]) {
          s.forEach((x, i) => {
            expect(x).toBeGreaterThan(0);
            if (i > 0) expect(x).toBeGreaterThan(s[i - 1]);
          });
        }
      }),
      { numRuns: 60, seed: 42 },
    );
  });

  it('random invalid input: a clear {ok:false, issues} or an EngineInputError, never another throw', () => {
    const junk = fc.oneof(fc.anything(), fc.double(), fc.string(), fc.constant(null), fc.constant(Number.NaN));
    const invalid = fc.oneof(
      fc.anything(),
      validRecipe.chain((doc) =>
        fc.record({ field: fc.constantFrom('tempC', 'timeMin', 'doseCm2', 'rpUm', 'dRpUm', 'dopant', 'kind', 'id', 'loadTempC', 'surface'), value: junk }).map(({ field, value }) => ({
          ...doc,
          steps: doc.steps.length ? [{ ...doc.steps[0], [field]: value }, ...doc.steps.slice(1)] : [{ id: 'x', kind: 'anneal', [field]: value }],
        })),
      ),
    );
    fc.assert(
      fc.property(invalid, (input) => {
        const p = parseRecipeDocument(input);
        if (!p.ok) {
          expect(p.issues.length).toBeGreaterThan(0);
          for (const i of p.issues) expect(typeof i.message).toBe('string');
          return;
        }
        try {
          const r = computeRecipe(p.doc);
          for (const x of allNumbers(r)) expect(Number.isFinite(x)).toBe(true);
        } catch (e) {
          expect(e).toBeInstanceOf(EngineInputError);
        }
      }),
      { numRuns: 200, seed: 7 },
    );
  });
});
