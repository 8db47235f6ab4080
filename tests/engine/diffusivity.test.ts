import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import {
  arrheniusFor,
  diffusivity,
  diffusivityComponents,
  electronConcentration,
  fermiDiffusivity,
} from '../../shared/engine/diffusivity';
import { DEFAULT_PARAMETER_SET, PARAMETER_SETS, getParameterSet, isWithinValidity } from '../../shared/engine/parameter-sets';
import { intrinsicCarrierConcentration } from '../../shared/engine/intrinsic-carriers';
import { DOPANTS, type Dopant } from '../../shared/engine/dopants';
import { EngineInputError } from '../../shared/engine/errors';

// Textbook arithmetic: k rounded to 8.617e-5 eV/K and T = °C + 273 as the books do; hence 1.5 % tolerance.
const kBook = 8.617e-5;
const bookD = (D0: number, Ea: number, tempC: number) => D0 * Math.exp(-Ea / (kBook * (tempC + 273)));

describe('parameter sets', () => {
  it('offers at least two published sets, each with a citation, a validity range and all four dopants', () => {
    expect(PARAMETER_SETS.length).toBeGreaterThanOrEqual(2);
    for (const s of PARAMETER_SETS) {
      expect(s.citation).toMatch(/\(?(19|20)\d\d\)?/);
      expect(s.validityC[0]).toBeLessThan(s.validityC[1]);
      expect([...s.dopants].sort()).toEqual([...DOPANTS].sort());
    }
    expect(getParameterSet(DEFAULT_PARAMETER_SET).id).toBe('fair-1981');
  });

  it('refuses an unknown set with an EngineInputError on path parameterSet', () => {
    expect(() => getParameterSet('made-up')).toThrowError(expect.objectContaining({ path: 'parameterSet' }));
    expect(() => diffusivity('B', 1000, 'made-up')).toThrowError(expect.objectContaining({ path: 'parameterSet' }));
  });

  it('reports whether a temperature lies in the set’s stated validity range', () => {
    const [lo, hi] = getParameterSet('fair-1981').validityC;
    expect(isWithinValidity('fair-1981', lo)).toBe(true);
    expect(isWithinValidity('fair-1981', hi + 1)).toBe(false);
  });
});

describe('intrinsic D(T): Jaeger (2002) Table 4.1, D0 and Ea as printed', () => {
  it.each([
    ['B', 10.5, 3.69],
    ['P', 10.5, 3.69],
    ['As', 0.32, 3.56],
    ['Sb', 5.6, 3.95],
  ] as [Dopant, number, number][])('%s: D0 = %f cm²/s, Ea = %f eV, checked at 950, 1050, 1150 °C', (dopant, D0, Ea) => {
    expect(arrheniusFor(dopant, 'fuller-jaeger')).toEqual({ D0, Ea });
    for (const t of [950, 1050, 1150]) {
      expect(diffusivity(dopant, t, 'fuller-jaeger') / bookD(D0, Ea, t)).toBeCloseTo(1, 1);
      expect(Math.abs(diffusivity(dopant, t, 'fuller-jaeger') / bookD(D0, Ea, t) - 1)).toBeLessThan(0.015);
    }
  });
});

describe('intrinsic D(T): Fair (1981) components as tabulated by Plummer, Deal & Griffin (2000) Table 7-5', () => {
  // Intrinsic D is the sum of the components (n = p = n_i).
  it.each([
    ['B', [[0.037, 3.46], [0.72, 3.46]]],
    ['P', [[3.85, 3.66], [4.44, 4.0], [44.2, 4.37]]],
    ['As', [[0.066, 3.44], [12.0, 4.05]]],
    ['Sb', [[0.214, 3.65], [15.0, 4.08]]],
  ] as [Dopant, [number, number][]][])('%s: sum of the printed components at 900, 1000, 1100 °C', (dopant, comps) => {
    expect(diffusivityComponents(dopant).map((c) => [c.D0, c.Ea])).toEqual(comps);
    for (const t of [900, 1000, 1100]) {
      const expected = comps.reduce((s, [D0, Ea]) => s + bookD(D0, Ea, t), 0);
      expect(Math.abs(diffusivity(dopant, t, 'fair-1981') / expected - 1)).toBeLessThan(0.015);
    }
  });

  it('gives boron at 1000 °C ≈ 1.5e-14 cm²/s (0.757·exp(−3.46 eV/kT), Plummer et al. Table 7-5)', () => {
    expect(diffusivity('B', 1000, 'fair-1981')).toBeGreaterThan(1.45e-14);
    expect(diffusivity('B', 1000, 'fair-1981')).toBeLessThan(1.6e-14);
  });
});

describe('the two published sets against each other', () => {
  // physics-sources: published sets disagree by up to ~2× for some dopants; we allow 2.5×.
  it.each(DOPANTS.map((d) => [d]))('%s: fair-1981 and fuller-jaeger agree within 2.5× over 900–1200 °C', (dopant) => {
    for (let t = 900; t <= 1200; t += 50) {
      const ratio = diffusivity(dopant, t, 'fair-1981') / diffusivity(dopant, t, 'fuller-jaeger');
      expect(ratio).toBeGreaterThan(1 / 2.5);
      expect(ratio).toBeLessThan(2.5);
    }
  });

  it('ranks the dopants as both books do at 1000 °C: B and P fast, As and Sb slow', () => {
    for (const set of ['fair-1981', 'fuller-jaeger']) {
      const slowest = Math.max(diffusivity('As', 1000, set), diffusivity('Sb', 1000, set));
      expect(Math.min(diffusivity('B', 1000, set), diffusivity('P', 1000, set))).toBeGreaterThan(3 * slowest);
    }
  });
});

describe('arrheniusFor (effective pair)', () => {
  it.each(DOPANTS.map((d) => [d]))('%s: the fitted fair-1981 pair stays within 8 percent of the component sum across the validity range', (dopant) => {
    const { D0, Ea } = arrheniusFor(dopant, 'fair-1981');
    const [lo, hi] = getParameterSet('fair-1981').validityC;
    for (let t = lo; t <= hi; t += 25) {
      const fit = D0 * Math.exp(-Ea / (8.617333262e-5 * (t + 273.15)));
      expect(Math.abs(fit / diffusivity(dopant, t, 'fair-1981') - 1)).toBeLessThan(0.08); // As is the worst case (≈ 7.6 %): its two components differ by 0.6 eV
    }
  });
});

describe('fermiDiffusivity (Plummer et al. 2000 ch. 7)', () => {
  it.each(PARAMETER_SETS.flatMap((s) => DOPANTS.map((d) => [s.id, d])))('%s %s: equals the intrinsic D when n = n_i', (setId, dopant) => {
    for (const t of [850, 1000, 1150]) {
      const ni = intrinsicCarrierConcentration(t);
      expect(fermiDiffusivity(dopant as Dopant, t, ni, setId) / diffusivity(dopant as Dopant, t, setId)).toBeCloseTo(1, 12);
    }
  });

  it('enhances donors in n-type and retards boron there (charged vacancy components)', () => {
    const t = 1000;
    const n = 20 * intrinsicCarrierConcentration(t);
    for (const d of ['P', 'As', 'Sb'] as Dopant[]) expect(fermiDiffusivity(d, t, n, 'fair-1981')).toBeGreaterThan(5 * diffusivity(d, t, 'fair-1981'));
    expect(fermiDiffusivity('B', t, n, 'fair-1981')).toBeLessThan(diffusivity('B', t, 'fair-1981'));
  });

  it('follows D0 + D−(n/n_i) + D=(n/n_i)² for phosphorus at n = 10 n_i, 1000 °C', () => {
    const r = 10;
    const expected = bookD(3.85, 3.66, 1000) + bookD(4.44, 4.0, 1000) * r + bookD(44.2, 4.37, 1000) * r * r;
    const got = fermiDiffusivity('P', 1000, r * intrinsicCarrierConcentration(1000), 'fair-1981');
    expect(Math.abs(got / expected - 1)).toBeLessThan(0.015);
  });

  it('never returns NaN or Infinity for valid inputs', () => {
    fc.assert(
      fc.property(
        fc.constantFrom(...DOPANTS),
        fc.constantFrom(...PARAMETER_SETS.map((s) => s.id)),
        fc.double({ min: 500, max: 1400, noNaN: true }),
        fc.double({ min: 1e10, max: 5e21, noNaN: true }),
        (d, s, t, n) => {
          const v = fermiDiffusivity(d, t, n, s);
          expect(Number.isFinite(v) && v > 0).toBe(true);
        },
      ),
    );
  });

  it.each([0, -1e18, Number.NaN, Infinity])('refuses electronConc = %f on path electronConc', (n) => {
    expect(() => fermiDiffusivity('P', 1000, n, 'fair-1981')).toThrowError(expect.objectContaining({ path: 'electronConc' }));
  });
});

describe('electronConcentration', () => {
  it('is n_i for intrinsic material, ≈ N for N ≫ n_i and n_i²/|N| for p-type', () => {
    const ni = intrinsicCarrierConcentration(1000);
    expect(electronConcentration(0, 1000)).toBeCloseTo(ni, -10);
    expect(electronConcentration(1e21, 1000) / 1e21).toBeCloseTo(1, 3);
    expect(electronConcentration(-1e21, 1000) / ((ni * ni) / 1e21)).toBeCloseTo(1, 3);
  });
});

describe('bad input', () => {
  it.each([
    [() => diffusivity('B', -300, 'fair-1981'), 'tempC'],
    [() => diffusivity('B', Number.NaN, 'fair-1981'), 'tempC'],
    [() => diffusivity('Ga' as Dopant, 1000, 'fair-1981'), 'dopant'],
    [() => arrheniusFor('In' as Dopant, 'fair-1981'), 'dopant'],
    [() => diffusivityComponents('Al' as Dopant), 'dopant'],
  ])('throws EngineInputError naming the field (%#)', (call, path) => {
    expect(call).toThrow(EngineInputError);
    expect(call).toThrowError(expect.objectContaining({ path }));
  });

  it('tends to zero, not NaN, far below diffusion temperatures', () => {
    expect(diffusivity('B', -270, 'fair-1981')).toBe(0);
    expect(diffusivity('P', 25, 'fuller-jaeger')).toBeGreaterThan(0);
  });
});
