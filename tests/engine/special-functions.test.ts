import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { erf as mathjsErf } from 'mathjs';
import ref from '../../reference/erfc-abramowitz-stegun.json';
import { erf, erfc, erfcx, inverseErfc } from '../../shared/engine/special-functions';
import { EngineInputError } from '../../shared/engine/errors';

/** Asymptotic series erfc x ~ e^{-x²}/(x√π) Σ (−1)^n (2n−1)!!/(2x²)^n (A&S 7.1.23); exact enough for x ≥ 6. */
function asymptoticErfc(x: number): number {
  let term = 1;
  let sum = 1;
  for (let n = 1; n < 30; n++) {
    term *= -(2 * n - 1) / (2 * x * x);
    sum += term;
  }
  return (Math.exp(-x * x) / (x * Math.sqrt(Math.PI))) * sum;
}

describe('erf against Abramowitz & Stegun (1964) Table 7.1', () => {
  it.each(ref.erfTable.points)('erf(%f) = %f to the table’s 15 decimals', (x, value) => {
    expect(Math.abs(erf(x) - value)).toBeLessThanOrEqual(1e-15);
    expect(Math.abs(erfc(x) - (1 - value))).toBeLessThanOrEqual(1.5e-15);
  });
});

describe('erfc deep tail against mpmath 1.3.0 at 30 digits', () => {
  it.each(ref.erfcTail.points)('erfc(%f) = %e within 1e-13 relative', (x, value) => {
    expect(Math.abs(erfc(x) / value - 1)).toBeLessThan(1e-13);
  });
});

describe('erfc against the asymptotic series (A&S 7.1.23)', () => {
  it.each([6, 7, 8.5, 10, 12, 20, 26])('erfc(%f) agrees within 1e-13 relative', (x) => {
    expect(Math.abs(erfc(x) / asymptoticErfc(x) - 1)).toBeLessThan(1e-13);
  });
});

describe('erf against mathjs (general-purpose numeric library)', () => {
  it('agrees within 2e-15 absolute on a grid from −6 to 6', () => {
    let worst = 0;
    for (let i = -600; i <= 600; i++) {
      const x = i / 100;
      worst = Math.max(worst, Math.abs(erf(x) - (mathjsErf(x) as number)));
    }
    expect(worst).toBeLessThan(2e-15);
  });

  it('erfc equals 1 − erf(mathjs) within 1e-14 relative where that difference is well conditioned (x ≤ 0.5)', () => {
    for (let i = -300; i <= 50; i++) {
      const x = i / 100;
      const expected = 1 - (mathjsErf(x) as number);
      expect(Math.abs(erfc(x) / expected - 1)).toBeLessThan(1e-14);
    }
  });
});

describe('identities and limits', () => {
  it('erf is odd and erfc(−x) = 2 − erfc(x)', () => {
    fc.assert(
      fc.property(fc.double({ min: -30, max: 30, noNaN: true }), (x) => {
        expect(erf(-x)).toBe(-erf(x));
        expect(Math.abs(erfc(-x) - (2 - erfc(x)))).toBeLessThan(1e-15);
      }),
    );
  });

  it('returns the limits at ±Infinity and underflows to 0, never NaN, far in the tail', () => {
    expect(erf(Infinity)).toBe(1);
    expect(erf(-Infinity)).toBe(-1);
    expect(erfc(Infinity)).toBe(0);
    expect(erfc(-Infinity)).toBe(2);
    expect(erfc(40)).toBe(0);
    expect(erfcx(Infinity)).toBe(0);
  });

  it('erfcx(x) = e^{x²}·erfc(x) and behaves like 1/(x√π) for large x', () => {
    for (const x of [0, 0.5, 1, 1.99, 2, 3, 5]) {
      expect(Math.abs(erfcx(x) / (Math.exp(x * x) * erfc(x)) - 1)).toBeLessThan(1e-13);
    }
    expect(Math.abs(erfcx(1e4) * 1e4 * Math.sqrt(Math.PI) - 1)).toBeLessThan(1e-8);
  });

  it('is continuous across the switch from series to continued fraction at x = 2', () => {
    const below = erfc(2 - 1e-12);
    const above = erfc(2);
    expect(Math.abs(below / above - 1)).toBeLessThan(1e-11);
  });

  it('rejects NaN with an EngineInputError naming x', () => {
    expect(() => erf(Number.NaN)).toThrow(EngineInputError);
    expect(() => erfc(Number.NaN)).toThrowError(expect.objectContaining({ path: 'x' }));
  });
});

describe('inverseErfc', () => {
  it.each([
    [1, 0],
    [0.5, 0.4769362762044699], // erfc⁻¹(0.5), A&S 7.1 (erf 0.476936… = 0.5)
    [1.5, -0.4769362762044699],
  ])('inverseErfc(%f) = %f', (y, x) => {
    expect(Math.abs(inverseErfc(y) - x)).toBeLessThan(1e-14);
  });

  // erfc amplifies a one-ulp error in x by its condition number 2x²·e^{-x²}/(√π·erfc) ≈ 2x²,
  // so the round trip in y is allowed 1e-14·max(10, 2x²) relative.
  it('round-trips erfc(inverseErfc(y)) = y from 1e-300 to 1.999 within the conditioning of erfc', () => {
    fc.assert(
      fc.property(fc.double({ min: -300, max: Math.log10(1.999), noNaN: true }), (e) => {
        const y = Math.pow(10, e);
        const x = inverseErfc(y);
        expect(Math.abs(erfc(x) / y - 1)).toBeLessThan(1e-14 * Math.max(10, 2 * x * x));
      }),
    );
  });

  it('round-trips inverseErfc(erfc(x)) = x within 1e-14 relative for x from −1.5 to 26', () => {
    fc.assert(
      fc.property(fc.double({ min: -1.5, max: 26, noNaN: true }), (x) => {
        fc.pre(Math.abs(x) > 1e-3);
        expect(Math.abs(inverseErfc(erfc(x)) / x - 1)).toBeLessThan(1e-14 / Math.min(1, Math.abs(x)) + 1e-14);
      }),
    );
  });

  it.each([0, 2, -1, 3, Number.NaN])('rejects y = %f', (y) => {
    expect(() => inverseErfc(y)).toThrow(EngineInputError);
  });
});
