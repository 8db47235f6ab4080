import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import f723 from '../../reference/resistivity-astm-f723.json';
import {
  astmF723DensityFromResistivity,
  dopingFromResistivity,
  resistivityFromDoping,
} from '../../shared/engine/resistivity';
import { EngineInputError } from '../../shared/engine/errors';

describe('resistivityFromDoping: ASTM F723 (Thurber et al., NBS SP 400-64, 1981), 23 °C', () => {
  // Check points: commonly quoted conversions after Sze's resistivity-vs-density figure (from memory; 10 %).
  it.each(f723.checkPoints.boron)('p-type (boron) N = %e cm⁻³ → %f Ω·cm within 10 percent', (n, rho) => {
    expect(Math.abs(resistivityFromDoping(n, 'p') / rho - 1)).toBeLessThan(0.1);
  });

  it.each(f723.checkPoints.phosphorus)('n-type (phosphorus) N = %e cm⁻³ → %f Ω·cm within 10 percent', (n, rho) => {
    expect(Math.abs(resistivityFromDoping(n, 'n') / rho - 1)).toBeLessThan(0.1);
  });

  it.each([
    // The classic substrate conversions: 1 Ω·cm p-type ≈ 1.5e16 cm⁻³, 1 Ω·cm n-type ≈ 4.9e15 cm⁻³ (ASTM F723 / Irvin 1962)
    [1, 'p', 1.5e16],
    [1, 'n', 4.9e15],
    [10, 'p', 1.35e15],
    [10, 'n', 4.4e14],
  ] as [number, 'n' | 'p', number][])('%f Ω·cm %s-type ≈ %e cm⁻³ within 5 percent', (rho, type, n) => {
    expect(Math.abs(dopingFromResistivity(rho, type) / n - 1)).toBeLessThan(0.05);
  });
});

describe('round trips', () => {
  // F723 publishes two separately fitted equations (rho from N, N from rho); they agree within a few per cent.
  it.each(
    [1e12, 1e13, 1e14, 1e15, 1e16, 1e17, 1e18, 1e19, 1e20, 3e20].flatMap((n) => [
      [n, 'n'],
      [n, 'p'],
    ]) as [number, 'n' | 'p'][],
  )('N = %e cm⁻³ (%s): the standard’s N(rho) equation recovers N within 5 percent', (n, type) => {
    const rho = resistivityFromDoping(n, type);
    expect(Math.abs(astmF723DensityFromResistivity(rho, type) / n - 1)).toBeLessThan(0.05);
  });

  it('dopingFromResistivity inverts resistivityFromDoping to 1e-9 over 1e10 … 5e22 cm⁻³', () => {
    fc.assert(
      fc.property(fc.double({ min: 10, max: Math.log10(5e22), noNaN: true }), fc.constantFrom('n' as const, 'p' as const), (e, type) => {
        const n = Math.pow(10, e);
        expect(Math.abs(dopingFromResistivity(resistivityFromDoping(n, type), type) / n - 1)).toBeLessThan(1e-9);
      }),
    );
  });

  it('resistivity falls monotonically with doping, including where F723 hands over to the Masetti fallback', () => {
    for (const type of ['n', 'p'] as const) {
      let prev = Infinity;
      for (let e = 10; e <= Math.log10(5e22); e += 0.01) {
        const rho = resistivityFromDoping(Math.pow(10, e), type);
        expect(rho).toBeLessThan(prev);
        prev = rho;
      }
    }
  });
});

describe('bad input', () => {
  it.each([
    ['conc', () => resistivityFromDoping(0, 'n')],
    ['conc', () => resistivityFromDoping(1e23, 'p')],
    ['conc', () => resistivityFromDoping(Number.NaN, 'p')],
    ['rho', () => dopingFromResistivity(-1, 'n')],
    ['rho', () => dopingFromResistivity(1e9, 'n')],
    ['rho', () => dopingFromResistivity(1e-7, 'p')],
    ['type', () => dopingFromResistivity(1, 'x' as 'n')],
    ['type', () => resistivityFromDoping(1e15, 'i' as 'n')],
  ])('throws EngineInputError on path %s', (path, call) => {
    expect(call).toThrow(EngineInputError);
    expect(call).toThrowError(expect.objectContaining({ path }));
  });
});
