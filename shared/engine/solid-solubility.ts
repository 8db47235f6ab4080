import table from '../../reference/solid-solubility.json';
import { KELVIN_OFFSET } from './constants';
import { DOPANTS, type Dopant } from './dopants';
import { EngineInputError } from './errors';

interface PackedCurve {
  tempC: Float64Array;
  log10C: Float64Array;
}

const CURVES = {} as Record<Dopant, PackedCurve>;
for (const d of DOPANTS) {
  const points = (table.dopants as Record<Dopant, number[][]>)[d];
  CURVES[d] = {
    tempC: Float64Array.from(points.map((p) => p[0])),
    log10C: Float64Array.from(points.map((p) => Math.log10(p[1]))),
  };
}

function curveFor(dopant: Dopant): PackedCurve {
  const c = CURVES[dopant];
  if (c === undefined) {
    throw new EngineInputError(`unknown dopant ${JSON.stringify(dopant)}; expected one of ${DOPANTS.join(', ')}`, 'dopant');
  }
  return c;
}

/**
 * Temperature range covered by the solubility table, °C. Outside it solidSolubility()
 * holds the end value; callers should warn.
 */
export function solidSolubilityRangeC(dopant: Dopant): [number, number] {
  const c = curveFor(dopant);
  return [c.tempC[0], c.tempC[c.tempC.length - 1]];
}

/**
 * Maximum solid solubility of a dopant in silicon at a temperature.
 * Source: Trumbore, Bell Syst. Tech. J. 39, 205 (1960) — points read from the curves
 * (reference/solid-solubility.json, from memory, ±30 %); log10 C interpolated linearly in T.
 *
 * @param dopant 'B' | 'P' | 'As' | 'Sb'
 * @param tempC temperature, °C
 * @returns concentration, cm^-3
 * @throws EngineInputError for an unknown dopant or a temperature that is not finite / below absolute zero
 */
export function solidSolubility(dopant: Dopant, tempC: number): number {
  const c = curveFor(dopant);
  if (typeof tempC !== 'number' || !Number.isFinite(tempC) || tempC + KELVIN_OFFSET <= 0) {
    throw new EngineInputError(`tempC must be a finite temperature above absolute zero (got ${String(tempC)})`, 'tempC');
  }
  const t = c.tempC;
  const last = t.length - 1;
  if (tempC <= t[0]) return Math.pow(10, c.log10C[0]);
  if (tempC >= t[last]) return Math.pow(10, c.log10C[last]);
  let i = 0;
  while (tempC > t[i + 1]) i++;
  const f = (tempC - t[i]) / (t[i + 1] - t[i]);
  return Math.pow(10, c.log10C[i] + f * (c.log10C[i + 1] - c.log10C[i]));
}
