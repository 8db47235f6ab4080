import { describe, expect, it } from 'vitest';
import { ELEMENTARY_CHARGE_C } from '../../shared/engine/constants';
import { averageResistivity, sheetResistance, type LayerProfile } from '../../shared/engine/layer';
import { mobility } from '../../shared/engine/mobility';
import { resistivityFromDoping } from '../../shared/engine/resistivity';

const box = (n: number, bg: number, xj: number): LayerProfile => ({
  netAt: (x) => (x < xj ? n - bg : -bg),
  dopingAt: (x, out) => {
    out.net = x < xj ? n - bg : -bg;
    out.total = x < xj ? n + bg : bg;
    return out;
  },
});

describe('sheetResistance', () => {
  it('of a uniform layer is ρ/xj with ρ = 1/(q·μ·N)', () => {
    const xj = 1e-4;
    const rs = sheetResistance(box(1e18, 0, xj), xj, 'n');
    expect(rs).not.toBeNull();
    expect(rs! * ELEMENTARY_CHARGE_C * mobility(1e18, 'n') * 1e18 * xj).toBeCloseTo(1, 9);
    expect(averageResistivity(rs, xj)).toBeCloseTo(rs! * xj, 12);
  });

  it.each([
    [1e16, 'p'],
    [1e18, 'p'],
    [1e17, 'n'],
    [1e19, 'n'],
  ] as const)('of a uniform %s cm⁻³ %s layer agrees with the ASTM F723 resistivity within 15 percent', (n, type) => {
    // ASTM F723 (Thurber et al., NBS SP 400-64) vs the mobility model (Masetti et al. 1983): independent
    // fits that differ by ~10 % for holes near 1e18 cm⁻³.
    const xj = 2e-4;
    const rho = sheetResistance(box(n, 0, xj), xj, type)! * xj;
    expect(Math.abs(rho / resistivityFromDoping(n, type) - 1)).toBeLessThan(0.15);
  });

  it('is null without a junction', () => {
    expect(sheetResistance(box(1e18, 0, 1e-4), undefined, 'n')).toBeNull();
  });
});
