import { describe, expect, it } from 'vitest';
import { CalibrationFitError, fitDiffusivityFactor, type FitCase } from '../../../shared/analysis/calibration-fit';

/** A seeded PRNG (mulberry32) so the noise is the same on every run. */
function rng(seed: number) {
  return () => {
    seed |= 0;
    seed = (seed + 0x6d2b79f5) | 0;
    let t = Math.imul(seed ^ (seed >>> 15), 1 | seed);
    t = (t + Math.imul(t ^ (t >>> 7), 61 | t)) ^ t;
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
}

/** Synthetic lots: xj = 2·√(f·Dt)·k, the shape of an erfc junction at fixed Cs/Cb. */
function synthetic(trueFactor: number, noisePct: number, n: number): FitCase[] {
  const rand = rng(42);
  return Array.from({ length: n }, (_, i) => {
    const dt = 1e-9 * (1 + i);
    const k = 1.8;
    const predict = (f: number) => 2 * Math.sqrt(f * dt) * k * 1e4;
    return { predict, measuredUm: predict(trueFactor) * (1 + ((rand() * 2 - 1) * noisePct) / 100) };
  });
}

describe('fitDiffusivityFactor', () => {
  it.each([0.6, 1, 1.3, 2.5])('recovers a known factor %s from noiseless synthetic lots', (f) => {
    const fit = fitDiffusivityFactor(synthetic(f, 0, 4));
    expect(fit.factor).toBeCloseTo(f, 3);
    expect(fit.rmsLogErrorAfter).toBeLessThan(1e-4);
  });

  it('recovers 1.3 within its standard error from lots with ±3 % noise', () => {
    const fit = fitDiffusivityFactor(synthetic(1.3, 3, 12));
    expect(Math.abs(Math.log(fit.factor / 1.3))).toBeLessThan(3 * fit.lnFactorStdErr + 0.01);
    expect(fit.lnFactorStdErr).toBeGreaterThan(0);
    expect(fit.rmsLogErrorAfter).toBeLessThan(fit.rmsLogErrorBefore);
  });

  it('refuses fewer than two lots and a factor outside 0.2–5', () => {
    expect(() => fitDiffusivityFactor(synthetic(1.3, 0, 1))).toThrow(CalibrationFitError);
    expect(() => fitDiffusivityFactor(synthetic(20, 0, 3))).toThrow(/edge/);
  });
});
