import table from '../../reference/implant-ranges.json';
import { DOPANTS, type Dopant } from './dopants';
import { EngineInputError } from './errors';

interface PackedRanges {
  energyKeV: [number, number];
  logE: Float64Array;
  logRp: Float64Array;
  logDRp: Float64Array;
}

const RANGES = {} as Record<Dopant, PackedRanges>;
for (const d of DOPANTS) {
  const rows = (table.dopants as Record<Dopant, number[][]>)[d];
  RANGES[d] = {
    energyKeV: [rows[0][0], rows[rows.length - 1][0]],
    logE: Float64Array.from(rows.map((r) => Math.log(r[0]))),
    logRp: Float64Array.from(rows.map((r) => Math.log(r[1]))),
    logDRp: Float64Array.from(rows.map((r) => Math.log(r[2]))),
  };
}

/** Energy range of the typical-range table for a dopant, keV. */
export function implantTableRangeKeV(dopant: Dopant): [number, number] {
  const r = RANGES[dopant];
  if (r === undefined) throw new EngineInputError(`unknown dopant ${JSON.stringify(dopant)}`, 'dopant');
  return [r.energyKeV[0], r.energyKeV[1]];
}

/**
 * Typical projected range and straggle of an implant into silicon, to prefill an implant step.
 * Log–log interpolation in the table of reference/implant-ranges.json (Gibbons, Johnson & Mylroie 1975
 * / Sze; values from memory, ±10 %).
 *
 * @param dopant 'B' | 'P' | 'As' | 'Sb'
 * @param energyKeV implant energy, keV (> 0)
 * @returns Rp and ΔRp in µm, or null outside the table (10–200 keV)
 * @throws EngineInputError for an unknown dopant or a non-positive / non-finite energy
 */
export function typicalImplant(dopant: Dopant, energyKeV: number): { rpUm: number; dRpUm: number } | null {
  const r = RANGES[dopant];
  if (r === undefined) {
    throw new EngineInputError(`unknown dopant ${JSON.stringify(dopant)}; expected one of ${DOPANTS.join(', ')}`, 'dopant');
  }
  if (typeof energyKeV !== 'number' || !Number.isFinite(energyKeV) || energyKeV <= 0) {
    throw new EngineInputError(`energyKeV must be a finite number > 0 (got ${String(energyKeV)})`, 'energyKeV');
  }
  if (energyKeV < r.energyKeV[0] || energyKeV > r.energyKeV[1]) return null;
  const le = Math.log(energyKeV);
  const last = r.logE.length - 1;
  let i = 0;
  while (i < last - 1 && le > r.logE[i + 1]) i++;
  const f = Math.min(1, Math.max(0, (le - r.logE[i]) / (r.logE[i + 1] - r.logE[i])));
  return {
    rpUm: Math.exp(r.logRp[i] + f * (r.logRp[i + 1] - r.logRp[i])),
    dRpUm: Math.exp(r.logDRp[i] + f * (r.logDRp[i + 1] - r.logDRp[i])),
  };
}
