import params from '../../reference/mobility.json';
import type { Dopant } from './dopants';
import { EngineInputError } from './errors';

/** Masetti, Severi & Solmi (1983) Table I parameters for one carrier/dopant pair. */
export interface MasettiParameters {
  muMin1: number;
  muMin2: number;
  mu1: number;
  muMax: number;
  Cr: number;
  Cs: number;
  alpha: number;
  beta: number;
  Pc: number;
}

const M = params['masetti-1983'];
/** Electrons in phosphorus-doped silicon. */
export const MASETTI_ELECTRONS_P: Readonly<MasettiParameters> = Object.freeze({ ...M.electronsP });
/** Electrons in arsenic-doped silicon. */
export const MASETTI_ELECTRONS_AS: Readonly<MasettiParameters> = Object.freeze({ ...M.electronsAs });
/** Holes in boron-doped silicon. */
export const MASETTI_HOLES_B: Readonly<MasettiParameters> = Object.freeze({ ...M.holesB });

const ARORA = params['arora-1982'];

/** Largest concentration accepted: the atomic density of silicon, 5.0e22 cm^-3. */
const MAX_CONC = 5e22;

function checkConc(n: number): void {
  if (typeof n !== 'number' || !(n >= 0) || n > MAX_CONC) {
    throw new EngineInputError(`totalDoping must be a number between 0 and ${MAX_CONC} cm^-3 (got ${String(n)})`, 'totalDoping');
  }
}

function checkCarrier(c: string): void {
  if (c !== 'n' && c !== 'p') throw new EngineInputError(`carrier must be 'n' or 'p' (got ${JSON.stringify(c)})`, 'carrier');
}

/**
 * Masetti et al. (1983) formula with a given parameter set; N = 0 returns the lattice limit.
 * @param n total ionised impurity concentration, cm^-3
 * @returns mobility, cm^2/(V s)
 */
export function masettiMobility(n: number, p: Readonly<MasettiParameters>): number {
  if (n <= 0) return (p.Pc > 0 ? 0 : p.muMin1) + p.muMax - p.muMin2;
  const first = p.Pc > 0 ? p.muMin1 * Math.exp(-p.Pc / n) : p.muMin1;
  return first + (p.muMax - p.muMin2) / (1 + Math.pow(n / p.Cr, p.alpha)) - p.mu1 / (1 + Math.pow(p.Cs / n, p.beta));
}

/**
 * Majority-carrier mobility in silicon at 300 K vs total doping, Masetti, Severi & Solmi,
 * IEEE Trans. Electron Devices 30, 764 (1983), Table I (reference/mobility.json).
 * Electrons use the phosphorus parameters unless `dopant` is 'As'; holes use the boron parameters.
 * Allocation-free; safe for the solver's inner loop.
 *
 * @param totalDoping N_D + N_A, cm^-3 (0 … 5e22)
 * @param carrier 'n' (electrons) or 'p' (holes)
 * @param dopant optional: 'As' selects Masetti's arsenic electron parameters
 * @returns mobility, cm^2/(V s)
 * @throws EngineInputError for a negative, non-finite or impossible concentration, or an unknown carrier
 */
export function mobility(totalDoping: number, carrier: 'n' | 'p', dopant?: Dopant): number {
  checkConc(totalDoping);
  if (carrier === 'n') return masettiMobility(totalDoping, dopant === 'As' ? MASETTI_ELECTRONS_AS : MASETTI_ELECTRONS_P);
  if (carrier === 'p') return masettiMobility(totalDoping, MASETTI_HOLES_B);
  checkCarrier(carrier);
  return 0; // unreachable: checkCarrier throws
}

/**
 * Alternative model: Arora, Hauser & Roulston, IEEE Trans. Electron Devices 29, 292 (1982), at 300 K,
 * mu = mu_min + mu_0/(1 + (N/Nref)^alpha) (reference/mobility.json).
 * @param totalDoping cm^-3
 * @param carrier 'n' | 'p'
 * @returns mobility, cm^2/(V s)
 */
export function aroraMobility(totalDoping: number, carrier: 'n' | 'p'): number {
  checkConc(totalDoping);
  checkCarrier(carrier);
  const p = carrier === 'n' ? ARORA.electrons : ARORA.holes;
  return p.muMin + p.mu0 / (1 + Math.pow(totalDoping / p.Nref, p.alpha));
}
