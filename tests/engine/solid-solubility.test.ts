import { describe, expect, it } from 'vitest';
import table from '../../reference/solid-solubility.json';
import { solidSolubility, solidSolubilityRangeC } from '../../shared/engine/solid-solubility';
import { DOPANTS, type Dopant } from '../../shared/engine/dopants';
import { EngineInputError } from '../../shared/engine/errors';

const rows = DOPANTS.flatMap((d) => (table.dopants as Record<Dopant, number[][]>)[d].map(([t, c]) => [d, t, c] as [Dopant, number, number]));

describe('solidSolubility against the Trumbore (1960) curve readings in reference/solid-solubility.json', () => {
  it.each(rows)('%s at %i °C returns the tabulated %e cm⁻³', (d, t, c) => {
    expect(solidSolubility(d, t) / c).toBeCloseTo(1, 12);
  });

  it('interpolates log C linearly: phosphorus at 1050 °C is the geometric mean of 1000 and 1100 °C', () => {
    expect(solidSolubility('P', 1050) / Math.sqrt(1.0e21 * 1.2e21)).toBeCloseTo(1, 12);
  });

  it('keeps Trumbore’s order at 1000 °C: As > P > B > Sb, with maxima near 2e21, 1.3e21, 5e20 and 7e19 cm⁻³', () => {
    const at = (d: Dopant) => solidSolubility(d, 1000);
    expect(at('As')).toBeGreaterThan(at('P'));
    expect(at('P')).toBeGreaterThan(at('B'));
    expect(at('B')).toBeGreaterThan(at('Sb'));
    const max = (d: Dopant) => Math.max(...Array.from({ length: 51 }, (_, i) => solidSolubility(d, 800 + 10 * i)));
    expect(max('As')).toBeCloseTo(2e21, -20);
    expect(max('P')).toBeCloseTo(1.3e21, -20);
    expect(max('B') / 5e20).toBeCloseTo(1, 1);
    expect(max('Sb') / 7e19).toBeCloseTo(1, 1);
  });

  it('states the table range and holds the end values outside it', () => {
    const [lo, hi] = solidSolubilityRangeC('B');
    expect([lo, hi]).toEqual([800, 1300]);
    expect(solidSolubility('B', 600)).toBe(solidSolubility('B', lo));
    expect(solidSolubility('B', 1400)).toBe(solidSolubility('B', hi));
  });

  it.each([
    ['tempC', () => solidSolubility('B', Number.NaN)],
    ['tempC', () => solidSolubility('B', -400)],
    ['dopant', () => solidSolubility('Ga' as Dopant, 1000)],
    ['dopant', () => solidSolubilityRangeC('Ga' as Dopant)],
  ])('refuses bad input with an EngineInputError on path %s', (path, call) => {
    expect(call).toThrow(EngineInputError);
    expect(call).toThrowError(expect.objectContaining({ path }));
  });
});
