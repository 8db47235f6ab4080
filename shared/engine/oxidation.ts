import dg from '../../reference/oxidation-deal-grove.json';
import seg from '../../reference/segregation-oed.json';
import { BOLTZMANN_EV_PER_K, KELVIN_OFFSET } from './constants';
import { DOPANTS, type Dopant } from './dopants';
import { EngineInputError } from './errors';

export type OxidationAmbient = 'dry-o2' | 'wet-o2';
export type SiliconOrientation = '100' | '111';
export type AnnealAmbient = 'inert' | OxidationAmbient;

export interface OxidationParams {
  ambient: OxidationAmbient;
  orientation: SiliconOrientation;
  /** Furnace temperature, °C. */
  tempC: number;
  /** Time at temperature, min (≥ 0). */
  timeMin: number;
  /** Oxide already on the wafer, µm (≥ 0). */
  initialOxideUm: number;
  /**
   * Dry O2 only: account for Deal & Grove's fast initial regime by starting from at least
   * x_i = 25 nm (Plummer et al. convention). Default false (plain model from initialOxideUm).
   */
  dryInitialRegime?: boolean;
}

export interface OxidationResult {
  /** Total oxide thickness after the step, µm. */
  thicknessUm: number;
  /** Parabolic rate constant B, µm²/h. */
  B: number;
  /** Linear rate constant B/A, µm/h (orientation applied). */
  BoverA: number;
  /** Silicon consumed by the oxide grown in this step, µm (0.44 × grown oxide). */
  siliconConsumedUm: number;
  /** Oxide grown in this step, µm. */
  grownUm: number;
  /** Deal–Grove A = B/(B/A), µm. */
  A: number;
  /** Time shift τ for the starting oxide, h. */
  tauHours: number;
}

const ORIENTATION_DIVISOR_100 = dg.orientationDivisor100;
const SI_CONSUMED_RATIO = dg.siliconConsumedRatio.value;
const DRY_XI_UM = dg.dryInitialRegime.xiUm;

/**
 * Deal–Grove rate constants (Deal & Grove 1965; Plummer, Deal & Griffin 2000 Table 6-2):
 * B = C1·exp(−E1/kT) µm²/h, B/A = C2·exp(−E2/kT) µm/h, with B/A(100) = B/A(111)/1.68.
 */
export function dealGroveRates(ambient: OxidationAmbient, orientation: SiliconOrientation, tempC: number): { B: number; BoverA: number } {
  const c = (dg.ambients as Record<string, { C1: number; E1: number; C2_111: number; E2: number } | undefined>)[ambient];
  if (c === undefined) throw new EngineInputError(`ambient must be 'dry-o2' or 'wet-o2' (got ${JSON.stringify(ambient)})`, 'ambient');
  if (orientation !== '100' && orientation !== '111') {
    throw new EngineInputError(`orientation must be '100' or '111' (got ${JSON.stringify(orientation)})`, 'orientation');
  }
  if (typeof tempC !== 'number' || !Number.isFinite(tempC) || tempC + KELVIN_OFFSET <= 0) {
    throw new EngineInputError(`tempC must be a finite temperature above absolute zero (got ${String(tempC)})`, 'tempC');
  }
  const kT = BOLTZMANN_EV_PER_K * (tempC + KELVIN_OFFSET);
  const B = c.C1 * Math.exp(-c.E1 / kT);
  const BoverA = (c.C2_111 / (orientation === '100' ? ORIENTATION_DIVISOR_100 : 1)) * Math.exp(-c.E2 / kT);
  return { B, BoverA };
}

/**
 * Oxide thickness after a thermal oxidation step, Deal–Grove linear–parabolic model
 * x² + A·x = B·(t + τ) (Deal & Grove, J. Appl. Phys. 36, 3770, 1965), rate constants from
 * Plummer, Deal & Griffin (2000) Table 6-2 (reference/oxidation-deal-grove.json).
 * Silicon consumed = 0.44 × grown oxide (Deal & Grove 1965; Jaeger 2002 ch. 3).
 *
 * @returns thickness and consumed silicon in µm, B in µm²/h, B/A in µm/h
 * @throws EngineInputError naming the bad field
 */
export function oxideThickness(params: OxidationParams): OxidationResult {
  if (params === null || typeof params !== 'object') throw new EngineInputError('oxidation parameters are missing', 'params');
  const { ambient, orientation, tempC, timeMin, initialOxideUm } = params;
  const { B, BoverA } = dealGroveRates(ambient, orientation, tempC);
  if (typeof timeMin !== 'number' || !Number.isFinite(timeMin) || timeMin < 0) {
    throw new EngineInputError(`timeMin must be a finite number ≥ 0 (got ${String(timeMin)})`, 'timeMin');
  }
  if (typeof initialOxideUm !== 'number' || !Number.isFinite(initialOxideUm) || initialOxideUm < 0) {
    throw new EngineInputError(`initialOxideUm must be a finite number ≥ 0 (got ${String(initialOxideUm)})`, 'initialOxideUm');
  }
  const xi = ambient === 'dry-o2' && params.dryInitialRegime === true ? Math.max(initialOxideUm, DRY_XI_UM) : initialOxideUm;
  if (!(B > 0) || !(BoverA > 0)) {
    // Far below oxidation temperatures the rates underflow to zero: nothing grows.
    return { thicknessUm: xi, B, BoverA, siliconConsumedUm: SI_CONSUMED_RATIO * (xi - initialOxideUm), grownUm: xi - initialOxideUm, A: 0, tauHours: 0 };
  }
  const A = B / BoverA;
  const tauHours = (xi * xi + A * xi) / B;
  const s = B * (timeMin / 60 + tauHours);
  // Root of x² + A x − s = 0 in the cancellation-free form 2s / (A + √(A² + 4s)).
  const x = (2 * s) / (A + Math.sqrt(A * A + 4 * s));
  const thicknessUm = Math.max(x, xi);
  const grownUm = thicknessUm - initialOxideUm;
  return { thicknessUm, B, BoverA, siliconConsumedUm: SI_CONSUMED_RATIO * grownUm, grownUm, A, tauHours };
}

/**
 * Equilibrium segregation coefficient m = C(Si)/C(SiO2) at the Si/SiO2 interface
 * (Grove, Leistiko & Sah, J. Appl. Phys. 35, 2695, 1964; Plummer et al. 2000 ch. 6).
 * m < 1: the oxide takes up dopant (B); m > 1: dopant piles up in silicon (P, As, Sb).
 */
export const SEGREGATION: Record<Dopant, { m: number; citation: string }> = Object.fromEntries(
  DOPANTS.map((d) => [d, { m: (seg.segregation.values as Record<Dopant, { m: number }>)[d].m, citation: seg.segregation.citation }]),
) as Record<Dopant, { m: number; citation: string }>;

const FI = seg.oed.fI as unknown as Record<Dopant, number>;
const SUPERSAT = seg.oed.supersaturation;
const DRY_T = Float64Array.from(SUPERSAT['dry-o2'].map((p) => p[0]));
const DRY_LN_EXCESS = Float64Array.from(SUPERSAT['dry-o2'].map((p) => Math.log(p[1] - 1)));
const WET_EXCESS_FACTOR = SUPERSAT.wetOverDryExcess;

/** Interstitial supersaturation s = C_I/C_I* at the oxidising surface (documented approximation). */
export function interstitialSupersaturation(ambient: AnnealAmbient, tempC: number): number {
  if (typeof tempC !== 'number' || !Number.isFinite(tempC) || tempC + KELVIN_OFFSET <= 0) {
    throw new EngineInputError(`tempC must be a finite temperature above absolute zero (got ${String(tempC)})`, 'tempC');
  }
  if (ambient === 'inert') return 1;
  if (ambient !== 'dry-o2' && ambient !== 'wet-o2') {
    throw new EngineInputError(`ambient must be 'inert', 'dry-o2' or 'wet-o2' (got ${JSON.stringify(ambient)})`, 'ambient');
  }
  const last = DRY_T.length - 1;
  let lnExcess: number;
  if (tempC <= DRY_T[0]) lnExcess = DRY_LN_EXCESS[0];
  else if (tempC >= DRY_T[last]) lnExcess = DRY_LN_EXCESS[last];
  else {
    let i = 0;
    while (tempC > DRY_T[i + 1]) i++;
    const f = (tempC - DRY_T[i]) / (DRY_T[i + 1] - DRY_T[i]);
    lnExcess = DRY_LN_EXCESS[i] + f * (DRY_LN_EXCESS[i + 1] - DRY_LN_EXCESS[i]);
  }
  const excess = Math.exp(lnExcess) * (ambient === 'wet-o2' ? WET_EXCESS_FACTOR : 1);
  return 1 + excess;
}

/**
 * Oxidation-enhanced (or, for Sb, -retarded) diffusion factor D_ox/D_inert — a DOCUMENTED
 * APPROXIMATION: the dual-mechanism form f_I·s + (1 − f_I)/s (Plummer, Deal & Griffin 2000 ch. 7)
 * with f_I per dopant from that chapter and a supersaturation s(T) chosen to reproduce the typical
 * enhancements it reviews (reference/segregation-oed.json). 1 for an inert ambient.
 *
 * @param ambient 'inert' | 'dry-o2' | 'wet-o2'
 * @param dopant 'B' | 'P' | 'As' | 'Sb'
 * @param tempC temperature, °C
 * @returns dimensionless factor multiplying the intrinsic diffusivity
 */
export function oedFactor(ambient: AnnealAmbient, dopant: Dopant, tempC: number): number {
  const fI = FI[dopant];
  if (typeof fI !== 'number' || !DOPANTS.includes(dopant)) {
    throw new EngineInputError(`unknown dopant ${JSON.stringify(dopant)}; expected one of ${DOPANTS.join(', ')}`, 'dopant');
  }
  const s = interstitialSupersaturation(ambient, tempC);
  return fI * s + (1 - fI) / s;
}
