import ni from '../../reference/intrinsic-carriers.json';
import { BOLTZMANN_EV_PER_K, KELVIN_OFFSET } from './constants';
import { EngineInputError } from './errors';

const HIGH = ni.highTemperature;
const LOW = ni.lowTemperature;
const BLEND_FROM_K = ni.blend.fromK;
const BLEND_TO_K = ni.blend.toK;
const LOW_MIN_K = LOW.validityK[0];

/** Plummer, Deal & Griffin (2000) ch. 7: n_i = 3.9e16 T^1.5 exp(−0.605 eV / kT), cm^-3. */
function highTemperatureNi(tK: number): number {
  return HIGH.A * Math.pow(tK, 1.5) * Math.exp(-HIGH.Eg0half / (BOLTZMANN_EV_PER_K * tK));
}

/** Misiakos & Tsamakis (1993): n_i = 5.29e19 (T/300)^2.54 exp(−6726 / T), cm^-3, 78–340 K. */
function lowTemperatureNi(tK: number): number {
  return LOW.A * Math.pow(tK / 300, LOW.exponent) * Math.exp(-LOW.B / tK);
}

const LN_AT_BLEND_FROM = Math.log(lowTemperatureNi(BLEND_FROM_K));
const LN_AT_BLEND_TO = Math.log(highTemperatureNi(BLEND_TO_K));
const INV_FROM = 1 / BLEND_FROM_K;
const INV_SPAN = 1 / BLEND_TO_K - INV_FROM;

/**
 * Intrinsic carrier concentration of silicon.
 *
 * Above 600 °C: Plummer, Deal & Griffin, Silicon VLSI Technology (2000) ch. 7,
 * n_i = 3.9e16·T^1.5·exp(−0.605 eV/kT) — the expression used with the charged-diffusivity table.
 * 78–340 K: Misiakos & Tsamakis, J. Appl. Phys. 74, 3293 (1993).
 * In between, ln n_i is interpolated linearly in 1/T (our own bridge; see reference/intrinsic-carriers.json).
 *
 * @param tempC temperature, °C (≥ −195.15 °C, i.e. 78 K)
 * @returns n_i, cm^-3
 * @throws EngineInputError for non-finite input or below 78 K
 */
export function intrinsicCarrierConcentration(tempC: number): number {
  if (typeof tempC !== 'number' || !Number.isFinite(tempC)) {
    throw new EngineInputError(`tempC must be a finite number (got ${String(tempC)})`, 'tempC');
  }
  const tK = tempC + KELVIN_OFFSET;
  if (tK < LOW_MIN_K) {
    throw new EngineInputError(`n_i is modelled from ${LOW_MIN_K} K upward; got ${tempC} °C`, 'tempC');
  }
  if (tK <= BLEND_FROM_K) return lowTemperatureNi(tK);
  if (tK >= BLEND_TO_K) return highTemperatureNi(tK);
  const f = (1 / tK - INV_FROM) / INV_SPAN;
  return Math.exp(LN_AT_BLEND_FROM + f * (LN_AT_BLEND_TO - LN_AT_BLEND_FROM));
}
