import { describe, expect, it } from 'vitest';
import { computeRecipe } from '../../shared/engine/compute-recipe';
import { signChanges } from '../../shared/engine/junctions';
import { constantSourceProfile, limitedSourceProfile } from '../../shared/engine/profiles-analytic';
import {
  createWorkspace,
  diffuseCoupled,
  diffuseUniform,
  gridDose,
  interpolateProfile,
  surfaceRefinedGrid,
} from '../../shared/engine/solver-fd';
import { parseRecipeDocument, type RecipeDocumentInput } from '../../shared/schemas/recipe';
import { tenStepRecipe } from './fixtures/ten-step-recipe';

const UM = 1e-4;
const parse = (input: RecipeDocumentInput) => {
  const p = parseRecipeDocument(input);
  if (!p.ok) throw new Error(JSON.stringify(p.issues));
  return p.doc;
};

describe('surfaceRefinedGrid', () => {
  it('spans the depth with spacing growing away from the surface', () => {
    const g = surfaceRefinedGrid(5 * UM, 200);
    expect(g.xCm[0]).toBe(0);
    expect(g.xCm[g.n - 1]).toBe(5 * UM);
    expect(g.spacingCm[g.n - 2] / g.spacingCm[0]).toBeGreaterThan(50);
    let width = 0;
    for (let i = 0; i < g.n; i++) width += g.widthCm[i];
    expect(width / (5 * UM)).toBeCloseTo(1, 12);
  });
});

describe('diffuseUniform against closed forms', () => {
  it('a fixed surface reproduces the erfc profile (junction depth within 0.5 %)', () => {
    const dt = 1e-11;
    const g = surfaceRefinedGrid(20 * Math.sqrt(dt), 320);
    const c = new Float64Array(g.n);
    diffuseUniform(c, g, dt, { kind: 'fixed', valueCm3: 1e20 }, createWorkspace(g.n), 80);
    const numeric = signChanges((x) => interpolateProfile(c, g, x) - 1e15, g.xCm)[0];
    const exact = signChanges((x) => constantSourceProfile(1e20, dt, x) - 1e15, g.xCm)[0];
    expect(Math.abs(numeric / exact - 1)).toBeLessThan(0.005);
  });

  it('a closed surface conserves the dose to 1e-6 and spreads a thin sheet into the drive-in Gaussian', () => {
    const dt = 1e-9;
    const g = surfaceRefinedGrid(12 * Math.sqrt(dt), 320);
    const c = new Float64Array(g.n);
    for (let i = 0; i < g.n; i++) c[i] = limitedSourceProfile(1e14, 1e-12, g.xCm[i]); // thin start
    const q0 = gridDose(c, g);
    diffuseUniform(c, g, dt - 1e-12, { kind: 'closed' }, createWorkspace(g.n), 80);
    expect(Math.abs(gridDose(c, g) / q0 - 1)).toBeLessThan(1e-6);
    const x = 3 * Math.sqrt(dt);
    expect(interpolateProfile(c, g, x) / limitedSourceProfile(q0, dt, x)).toBeCloseTo(1, 2);
  });

  it('concentration-dependent diffusion with closed surfaces conserves every species to 1e-6', () => {
    const g = surfaceRefinedGrid(2 * UM, 200);
    const ws = createWorkspace(g.n);
    const b = new Float64Array(g.n);
    const p = new Float64Array(g.n);
    for (let i = 0; i < g.n; i++) {
      b[i] = 1e20 * Math.exp(-((g.xCm[i] - 0.05 * UM) ** 2) / (2 * (0.02 * UM) ** 2));
      p[i] = 1e17 * Math.exp(-g.xCm[i] / (0.3 * UM));
    }
    const qb = gridDose(b, g);
    const qp = gridDose(p, g);
    const d = (base: number) => (t: number, n: number) => base * (1 + n / 1e19) * Math.exp((t - 1000) / 50);
    diffuseCoupled(
      [
        { c: b, sign: -1, surface: { kind: 'closed' }, diffusivity: d(1e-14) },
        { c: p, sign: 1, surface: { kind: 'closed' }, diffusivity: d(3e-14) },
      ],
      1e15,
      g,
      [{ t0C: 900, t1C: 1000, durationS: 600, steps: 10 }, { t0C: 1000, t1C: 1000, durationS: 1800, steps: 40 }],
      () => 7e18,
      ws,
    );
    expect(Math.abs(gridDose(b, g) / qb - 1)).toBeLessThan(1e-6);
    expect(Math.abs(gridDose(p, g) / qp - 1)).toBeLessThan(1e-6);
  });
});

describe('numerical path through computeRecipe', () => {
  it('conserves the implanted dose through anneals to 1e-6', () => {
    const doc = parse({
      schemaVersion: 1,
      substrate: { type: 'n', background: { concentration: 1e15 } },
      options: { method: 'numerical' },
      steps: [
        { id: 'i', kind: 'implant', dopant: 'B', doseCm2: 1e15, rpUm: 0.1, dRpUm: 0.03 },
        { id: 'a', kind: 'anneal', tempC: 1000, timeMin: 30, loadTempC: 800 },
        { id: 'b', kind: 'anneal', tempC: 1100, timeMin: 60, loadTempC: 800 },
      ],
    });
    const r = computeRecipe(doc);
    for (const s of r.steps) expect(Math.abs((s.retainedDoseCm2.B ?? 0) / 1e15 - 1)).toBeLessThan(1e-6);
  });

  it('junction depth of a predeposition scales as √t at fixed temperature', () => {
    const xj = (timeMin: number) =>
      computeRecipe(
        parse({
          schemaVersion: 1,
          substrate: { type: 'p', background: { concentration: 1e16 } },
          options: { method: 'numerical' },
          steps: [{ id: 'p', kind: 'predeposition', dopant: 'P', tempC: 1000, timeMin, surface: { mode: 'fixed', concentration: 1e20 } }],
        }),
      ).final.junctionDepthsUm[0];
    const base = xj(10);
    for (const k of [4, 9, 16]) expect(xj(10 * k) / (base * Math.sqrt(k))).toBeCloseTo(1, 2);
  });

  it('the default resolution has the ten-step recipe junctions converged to 0.5 %', () => {
    const doc = parse(tenStepRecipe('numerical'));
    const coarse = computeRecipe(doc).final.junctionDepthsUm;
    const fine = computeRecipe(doc, { gridNodes: 1600, timeSteps: 400 }).final.junctionDepthsUm;
    expect(coarse.length).toBe(fine.length);
    coarse.forEach((x, i) => expect(Math.abs(x / fine[i] - 1)).toBeLessThan(0.005));
  });
});
