import { describe, expect, it } from 'vitest';
import { intrinsicCarrierConcentration } from '../../shared/engine/intrinsic-carriers';
import { EngineInputError } from '../../shared/engine/errors';

describe('intrinsicCarrierConcentration', () => {
  it('gives 9.65e9 cm⁻³ at 300 K (Misiakos & Tsamakis, J. Appl. Phys. 74, 3293, 1993), within 1 %', () => {
    expect(Math.abs(intrinsicCarrierConcentration(300 - 273.15) / 9.65e9 - 1)).toBeLessThan(0.01);
  });

  it.each([
    // Plummer, Deal & Griffin (2000) ch. 7: n_i = 3.9e16 T^1.5 exp(−0.605/kT), evaluated by hand with k = 8.617e-5
    [900, 3.9e16 * Math.pow(1173, 1.5) * Math.exp(-0.605 / (8.617e-5 * 1173))],
    [1000, 7.14e18], // value quoted with the expression at 1000 °C (from memory of Plummer et al.)
    [1100, 3.9e16 * Math.pow(1373, 1.5) * Math.exp(-0.605 / (8.617e-5 * 1373))],
  ])('at %i °C matches the Plummer et al. expression (%e cm⁻³) within 1 %', (t, expected) => {
    expect(Math.abs(intrinsicCarrierConcentration(t) / expected - 1)).toBeLessThan(0.01);
  });

  it('rises monotonically from 78 K to 1400 °C', () => {
    let prev = 0;
    for (let tK = 78; tK <= 1673; tK += 0.5) {
      const v = intrinsicCarrierConcentration(tK - 273.15);
      expect(v).toBeGreaterThan(prev);
      prev = v;
    }
  });

  it.each([340, 873.15])('is continuous where the bridge meets a published fit (%f K)', (tK) => {
    const below = intrinsicCarrierConcentration(tK - 273.15 - 1e-9);
    const above = intrinsicCarrierConcentration(tK - 273.15 + 1e-9);
    expect(Math.abs(above / below - 1)).toBeLessThan(1e-6);
  });

  it.each([-200, -300, Number.NaN, Infinity])('refuses %f °C (outside 78 K … or not finite)', (t) => {
    expect(() => intrinsicCarrierConcentration(t)).toThrow(EngineInputError);
  });
});
