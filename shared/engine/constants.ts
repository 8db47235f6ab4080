import constants from '../../reference/constants.json';
import { EngineInputError, requireFinite } from './errors';

/** Boltzmann constant, eV/K (CODATA 2018, exact in the 2019 SI). */
export const BOLTZMANN_EV_PER_K: number = constants.values.boltzmannEvPerK.value;
/** Offset between the Celsius and Kelvin scales, K (SI brochure 2019). */
export const KELVIN_OFFSET: number = constants.values.kelvinOffset.value;
/** Elementary charge, C (CODATA 2018, exact in the 2019 SI). */
export const ELEMENTARY_CHARGE_C: number = constants.values.elementaryChargeC.value;

/**
 * Celsius → kelvin, refusing temperatures at or below absolute zero.
 * @param tempC temperature, °C
 * @param path field name reported in the error
 * @returns absolute temperature, K (> 0)
 */
export function kelvinFromCelsius(tempC: number, path = 'tempC'): number {
  requireFinite(tempC, path);
  const t = tempC + KELVIN_OFFSET;
  if (t <= 0) throw new EngineInputError(`${path} must be above absolute zero (−273.15 °C), got ${tempC} °C`, path);
  return t;
}

/**
 * Thermal energy kT at a Celsius temperature.
 * @param tempC temperature, °C
 * @returns kT, eV
 */
export function thermalEnergyEv(tempC: number, path = 'tempC'): number {
  return BOLTZMANN_EV_PER_K * kelvinFromCelsius(tempC, path);
}
