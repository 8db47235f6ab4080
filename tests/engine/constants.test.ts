import { describe, expect, it } from 'vitest';
import { BOLTZMANN_EV_PER_K, ELEMENTARY_CHARGE_C, KELVIN_OFFSET, kelvinFromCelsius, thermalEnergyEv } from '../../shared/engine/constants';
import { DOPANTS, DOPANT_INFO, isDopant, requireDopant } from '../../shared/engine/dopants';
import { EngineInputError } from '../../shared/engine/errors';

describe('constants (CODATA 2018, SI 2019)', () => {
  it('carries the exact SI values', () => {
    expect(BOLTZMANN_EV_PER_K).toBe(8.617333262e-5);
    expect(ELEMENTARY_CHARGE_C).toBe(1.602176634e-19);
    expect(KELVIN_OFFSET).toBe(273.15);
    // k in J/K divided by e gives k in eV/K (both exact since 2019).
    expect(1.380649e-23 / ELEMENTARY_CHARGE_C / BOLTZMANN_EV_PER_K).toBeCloseTo(1, 9);
  });

  it('gives kT = 25.852 meV at 300 K', () => {
    expect(thermalEnergyEv(300 - 273.15)).toBeCloseTo(0.025852, 6);
  });

  it.each([-273.15, -300, Number.NaN, Infinity])('refuses %f °C', (t) => {
    expect(() => kelvinFromCelsius(t)).toThrowError(expect.objectContaining({ path: 'tempC' }));
  });
});

describe('dopants', () => {
  it('lists B (p-type) and P, As, Sb (n-type) with their atomic numbers', () => {
    expect(DOPANTS).toEqual(['B', 'P', 'As', 'Sb']);
    expect(DOPANTS.map((d) => [DOPANT_INFO[d].type, DOPANT_INFO[d].atomicNumber])).toEqual([
      ['p', 5],
      ['n', 15],
      ['n', 33],
      ['n', 51],
    ]);
  });

  it('recognises dopant symbols and refuses others with an EngineInputError on path dopant', () => {
    expect(isDopant('As')).toBe(true);
    expect(isDopant('as')).toBe(false);
    expect(() => requireDopant('Ga')).toThrow(EngineInputError);
    expect(() => requireDopant(undefined, 'steps.0.dopant')).toThrowError(expect.objectContaining({ path: 'steps.0.dopant' }));
  });
});
