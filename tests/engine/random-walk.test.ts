import { describe, expect, it } from 'vitest';
import { limitedSourceProfile } from '../../shared/engine/profiles-analytic';

/** Mulberry32: a tiny seeded PRNG (public-domain 32-bit generator), so the walks are repeatable. */
function mulberry32(seed: number): () => number {
  let a = seed >>> 0;
  return () => {
    a = (a + 0x6d2b79f5) >>> 0;
    let t = a;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
}

describe('random walks', () => {
  it('±1 walkers: mean ≈ 0 and variance ≈ t after t steps (common fact)', () => {
    const rand = mulberry32(20240601);
    const walkers = 20000;
    const t = 200;
    let sum = 0;
    let sumSq = 0;
    for (let w = 0; w < walkers; w++) {
      let x = 0;
      for (let s = 0; s < t; s++) x += rand() < 0.5 ? -1 : 1;
      sum += x;
      sumSq += x * x;
    }
    const mean = sum / walkers;
    const variance = sumSq / walkers - mean * mean;
    // Standard error of the mean √(t/N) = 0.1; of the variance ≈ t·√(2/N) = 2.
    expect(Math.abs(mean)).toBeLessThan(0.4);
    expect(Math.abs(variance / t - 1)).toBeLessThan(0.05);
  });

  it('a lattice walker (hop rate Γ, spacing a) from the surface reproduces the drive-in Gaussian with D = Γa²/2 (Einstein 1905)', () => {
    const rand = mulberry32(7);
    const a = 1e-7; // cm (1 nm)
    const gamma = 50; // hops per second
    const t = 8; // s → Γt = 400 hops
    const D = (gamma * a * a) / 2;
    const walkers = 20000;
    const hops = Math.round(gamma * t);
    // After an even number of hops only even sites are occupied: bin j ≥ 1 spans [(6j−5)a, (6j+1)a),
    // exactly three occupied sites, 6a wide.
    const bins = new Float64Array(8);
    let sumSq = 0;
    for (let w = 0; w < walkers; w++) {
      let x = 0;
      for (let s = 0; s < hops; s++) x += rand() < 0.5 ? -1 : 1;
      // A reflecting surface: the walk folded at x = 0 (the image method of the closed form).
      const site = Math.abs(x);
      sumSq += site * a * site * a;
      const j = Math.floor((site + 5) / 6);
      if (site > 0 && j < bins.length) bins[j] += 1;
    }
    expect((sumSq / walkers) / (2 * D * t)).toBeCloseTo(1, 1); // ⟨x²⟩ = σ² = 2Dt
    // Histogram against C(x) = Q/√(πDt)·exp(−x²/4Dt), Q = number of walkers, out to ~2.5√(Dt).
    for (let j = 1; j < bins.length - 1; j++) {
      const lo = (6 * j - 5) * a;
      const hi = (6 * j + 1) * a;
      let expected = 0;
      for (let k = 0; k < 60; k++) expected += limitedSourceProfile(walkers, D * t, lo + ((k + 0.5) * (hi - lo)) / 60) * ((hi - lo) / 60);
      expect(Math.abs(bins[j] / expected - 1)).toBeLessThan(0.08);
    }
  });
});
