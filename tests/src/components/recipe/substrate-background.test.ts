import { describe, expect, it } from 'vitest';
import { resistivityFromDoping } from '../../../../shared/engine';
import { backgroundMode, switchBackground } from '../../../../src/components/recipe/substrate-background';

describe('switchBackground', () => {
  it('converts a concentration to the resistivity of the same wafer and back (ASTM F723 model)', () => {
    const rho = switchBackground({ concentration: 1e15 }, 'n', 'resistivity');
    // ~4.4 Ω·cm for 1e15 cm⁻³ phosphorus-doped silicon (ASTM F723 curves; common reading of the chart).
    expect(rho.resistivity).toBeCloseTo(resistivityFromDoping(1e15, 'n'), 2);
    expect(rho.resistivity as number).toBeGreaterThan(4);
    expect(rho.resistivity as number).toBeLessThan(5);
    const back = switchBackground(rho, 'n', 'concentration');
    expect((back.concentration as number) / 1e15).toBeCloseTo(1, 2);
  });

  it('reads typed text with units', () => {
    expect(switchBackground({ resistivity: '10 ohm cm' }, 'p', 'concentration').concentration as number).toBeGreaterThan(1e15);
  });

  it('starts from a typical value when the current text does not read', () => {
    expect(switchBackground({ concentration: 'lots' }, 'p', 'resistivity')).toEqual({ resistivity: 10 });
    expect(switchBackground({ resistivity: '' }, 'p', 'concentration')).toEqual({ concentration: 1e15 });
  });

  it('leaves the background alone when it is already given that way', () => {
    const b = { concentration: 3e14 };
    expect(switchBackground(b, 'p', 'concentration')).toBe(b);
    expect(backgroundMode({ resistivity: 5 })).toBe('resistivity');
    expect(backgroundMode({ concentration: 5 })).toBe('concentration');
  });
});
