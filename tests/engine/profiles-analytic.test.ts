import { describe, expect, it } from 'vitest';
import { diffusivity } from '../../shared/engine/diffusivity';
import { signChanges } from '../../shared/engine/junctions';
import {
  constantSourceDose,
  constantSourceProfile,
  implantProfile,
  implantRetainedDose,
  limitedSourceProfile,
  TWO_STEP_MIN_RATIO,
} from '../../shared/engine/profiles-analytic';
import { computeRecipe } from '../../shared/engine/compute-recipe';
import { parseRecipeDocument, type RecipeDocumentInput } from '../../shared/schemas/recipe';

const UM = 1e-4;
const depthWhere = (f: (x: number) => number, level: number, maxCm: number) =>
  signChanges((x) => f(x) - level, Array.from({ length: 2001 }, (_, i) => (i * maxCm) / 2000))[0];

/** ∫₀^L f dx by composite Simpson on 4000 panels. */
function integrate(f: (x: number) => number, L: number): number {
  const n = 4000;
  const h = L / n;
  let s = f(0) + f(L);
  for (let i = 1; i < n; i++) s += (i % 2 ? 4 : 2) * f(i * h);
  return (s * h) / 3;
}

describe('textbook worked examples', () => {
  // Sze, Semiconductor Devices: Physics and Technology, 2nd ed., impurity-doping chapter, Example 1
  // (from memory; verify): boron, 1000 °C, Cs = 1e19 cm⁻³, 1 h, D ≈ 2e-14 cm²/s read from the
  // book's figure. Published: √(Dt) = 8.48e-6 cm, Q = 9.57e13 cm⁻², and the depth where
  // C = 1e15 cm⁻³ is 4.66e-5 cm (0.466 µm).
  const Cs = 1e19;
  const dt = 2e-14 * 3600;

  it('predeposition dose Q = 2·Cs·√(Dt/π) = 9.57e13 cm⁻²', () => {
    expect(Math.abs(Math.sqrt(dt) / 8.48e-6 - 1)).toBeLessThan(1e-3);
    expect(constantSourceDose(Cs, dt) / 9.57e13).toBeCloseTo(1, 2);
  });

  it('the erfc profile reaches 1e15 cm⁻³ at 0.466 µm', () => {
    const x = depthWhere((x) => constantSourceProfile(Cs, dt, x), 1e15, 2e-4);
    expect(x / 4.66e-5).toBeCloseTo(1, 2);
  });

  it('our boron D at 1000 °C lies within the 2× spread of published sets around the book value 2e-14 cm²/s', () => {
    for (const set of ['fair-1981', 'fuller-jaeger']) {
      const d = diffusivity('B', 1000, set);
      expect(d).toBeGreaterThan(1e-14);
      expect(d).toBeLessThan(4e-14);
    }
  });

  // Drive-in junction depth, textbook closed form (Sze; Jaeger ch. 4; Plummer et al. ch. 7):
  // xj = 2√(Dt·ln(Q / (C_B·√(πDt)))). The Example 1 dose driven in with Dt = 1e-8 cm² into
  // C_B = 1e15 cm⁻³: xj = 2·1e-4·√(ln(9.57e13 / (1e15·√π·1e-4))) = 2·1e-4·√6.29 = 5.02 µm
  // (hand calculation, not a published number).
  it('drive-in Gaussian junction depth equals the textbook closed form (5.02 µm)', () => {
    const Q = 9.57e13;
    const dDrive = 1e-8;
    const closed = 2 * Math.sqrt(dDrive * Math.log(Q / (1e15 * Math.sqrt(Math.PI * dDrive))));
    expect(closed / UM).toBeCloseTo(5.02, 2);
    const x = depthWhere((x) => limitedSourceProfile(Q, dDrive, x), 1e15, 10e-4);
    expect(x / closed).toBeCloseTo(1, 6);
  });

  // Sze, 2nd ed., ion-implantation chapter, Example (from memory; verify): 100 keV boron, dose
  // 5e14 cm⁻², Rp ≈ 0.31 µm, ΔRp ≈ 0.07 µm from the range figure; published peak
  // n_p = S/(√(2π)·ΔRp) = 2.85e19 cm⁻³.
  it('implant peak 2.85e19 cm⁻³, and after an anneal σ² = ΔRp² + 2Dt lowers it by ΔRp/σ', () => {
    const S = 5e14;
    const rp = 0.31 * UM;
    const drp = 0.07 * UM;
    expect(implantProfile(S, rp, drp, 0, 'lose', rp) / 2.85e19).toBeCloseTo(1, 2);
    const dt = 2.5e-11; // e.g. 30 min near 1000 °C
    const sigma = Math.sqrt(drp * drp + 2 * dt);
    const annealedPeak = implantProfile(S, rp, drp, dt, 'reflect', rp);
    // The image term adds exp(−2Rp²/σ²)-small amounts at the peak; allow 0.5 %.
    expect(annealedPeak / (S / (Math.sqrt(2 * Math.PI) * sigma))).toBeCloseTo(1, 2);
  });
});

describe('implant surface treatments', () => {
  const S = 1e15;
  const rp = 0.02 * UM;
  const drp = 0.02 * UM;

  it.each([0, 1e-12, 1e-10])('reflect keeps the whole dose after Dt = %d cm²', (dt) => {
    const q = integrate((x) => implantProfile(S, rp, drp, dt, 'reflect', x), 2 * UM);
    expect(q / S).toBeCloseTo(1, 5);
  });

  it.each([0, 1e-12, 1e-10])('lose keeps the as-implanted part below the surface, and anneals conserve it (Dt = %d cm²)', (dt) => {
    const kept = implantRetainedDose(S, rp, drp, 'lose');
    expect(kept / S).toBeCloseTo(0.8413, 3); // Φ(1), A&S Table 26.1
    const q = integrate((x) => implantProfile(S, rp, drp, dt, 'lose', x), 2 * UM);
    expect(q / kept).toBeCloseTo(1, 4);
  });
});

describe('two-step shortcut against the solver', () => {
  const doc = (bg: number, ratio: number, method: 'analytic' | 'numerical'): RecipeDocumentInput => ({
    schemaVersion: 1,
    substrate: { type: 'n', background: { concentration: bg } },
    options: { method },
    steps: [
      { id: 'pre', kind: 'predeposition', dopant: 'B', tempC: 1000, timeMin: 20 },
      { id: 'drive', kind: 'anneal', tempC: 1000, timeMin: 20 * ratio },
    ],
  });
  const xj = (input: RecipeDocumentInput, tuning = {}) => {
    const p = parseRecipeDocument(input);
    if (!p.ok) throw new Error(JSON.stringify(p.issues));
    return computeRecipe(p.doc, tuning).final.junctionDepthsUm[0];
  };

  it.each([1e14, 1e15, 1e16, 1e17])(
    `at the accepted ratio (drive Dt = ${TWO_STEP_MIN_RATIO}× predep Dt) the junction depth is within 1 percent of the solver, background %s cm⁻³`,
    (bg) => {
      const a = xj(doc(bg, TWO_STEP_MIN_RATIO, 'analytic'));
      const n = xj(doc(bg, TWO_STEP_MIN_RATIO, 'numerical'), { gridNodes: 1200, timeSteps: 300 });
      expect(Math.abs(a / n - 1)).toBeLessThan(0.01);
    },
  );

  it('below the accepted ratio the auto method uses the solver and says why', () => {
    const p = parseRecipeDocument({ ...doc(1e15, 1, 'analytic'), options: { method: 'auto' } });
    if (!p.ok) throw new Error();
    const r = computeRecipe(p.doc);
    expect(r.steps[1].method).toBe('numerical');
    expect(r.steps[1].methodReason).toContain('two-step form not valid');
    expect(r.method).toBe('mixed');
  });
});
