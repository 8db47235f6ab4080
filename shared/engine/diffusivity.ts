import intrinsic from '../../reference/diffusivity-intrinsic.json';
import charged from '../../reference/diffusivity-charged.json';
import { BOLTZMANN_EV_PER_K, KELVIN_OFFSET } from './constants';
import type { Dopant } from './dopants';
import { DOPANTS } from './dopants';
import { EngineInputError } from './errors';
import { intrinsicCarrierConcentration } from './intrinsic-carriers';
import { getParameterSet, type ParameterSetId } from './parameter-sets';

/** Charge state of a diffusing point-defect pair, as labelled in Plummer et al. Table 7-5. */
export type ChargeState = '0' | '+' | '-' | '=';

/** One Arrhenius component D0·exp(−Ea/kT) and its charge state. */
export interface DiffusivityComponent {
  charge: ChargeState;
  /** Pre-exponential factor, cm^2/s. */
  D0: number;
  /** Activation energy, eV. */
  Ea: number;
}

/**
 * Power of n/n_i that multiplies each component:
 * D = D0 + D−(n/n_i) + D=(n/n_i)^2 + D+(p/n_i), p/n_i = (n/n_i)^−1.
 */
const CHARGE_POWER: Record<ChargeState, number> = { '0': 0, '-': 1, '=': 2, '+': -1 };

/** Flat, allocation-free storage of one dopant's components within a set. */
interface PackedDopant {
  count: number;
  d0: Float64Array;
  ea: Float64Array;
  power: Int8Array;
}

interface PackedSet {
  /** Intrinsic components (for Arrhenius sets a single neutral-like term). */
  intrinsic: Record<Dopant, PackedDopant>;
  /** True when the set has its own charged components; otherwise Fermi dependence borrows fair-1981's ratios. */
  hasCharged: boolean;
  effective: Record<Dopant, { D0: number; Ea: number }>;
  validityC: [number, number];
}

function pack(components: DiffusivityComponent[]): PackedDopant {
  return {
    count: components.length,
    d0: Float64Array.from(components.map((c) => c.D0)),
    ea: Float64Array.from(components.map((c) => c.Ea)),
    power: Int8Array.from(components.map((c) => CHARGE_POWER[c.charge])),
  };
}

const CHARGED_COMPONENTS = charged.components as Record<Dopant, DiffusivityComponent[]>;
const CHARGED_PACKED = {} as Record<Dopant, PackedDopant>;
for (const d of DOPANTS) CHARGED_PACKED[d] = pack(CHARGED_COMPONENTS[d]);

function sumComponents(p: PackedDopant, kT: number): number {
  let s = 0;
  for (let i = 0; i < p.count; i++) s += p.d0[i] * Math.exp(-p.ea[i] / kT);
  return s;
}

function sumComponentsFermi(p: PackedDopant, kT: number, r: number): number {
  let s = 0;
  for (let i = 0; i < p.count; i++) {
    const pw = p.power[i];
    const factor = pw === 0 ? 1 : pw === 1 ? r : pw === 2 ? r * r : 1 / r;
    s += p.d0[i] * Math.exp(-p.ea[i] / kT) * factor;
  }
  return s;
}

/**
 * Least-squares Arrhenius fit of ln D against 1/kT over the validity range:
 * the single (D0, Ea) pair that best represents a sum of components (for display and for
 * closed-form estimates; diffusivity() itself always sums the components exactly).
 */
function fitArrhenius(p: PackedDopant, [loC, hiC]: [number, number]): { D0: number; Ea: number } {
  if (p.count === 1) return { D0: p.d0[0], Ea: p.ea[0] };
  const n = 61;
  let sx = 0, sy = 0, sxx = 0, sxy = 0;
  for (let i = 0; i < n; i++) {
    const tK = loC + ((hiC - loC) * i) / (n - 1) + KELVIN_OFFSET;
    const x = 1 / (BOLTZMANN_EV_PER_K * tK);
    const y = Math.log(sumComponents(p, 1 / x));
    sx += x; sy += y; sxx += x * x; sxy += x * y;
  }
  const slope = (n * sxy - sx * sy) / (n * sxx - sx * sx);
  const intercept = (sy - slope * sx) / n;
  return { D0: Math.exp(intercept), Ea: -slope };
}

const SETS = new Map<string, PackedSet>();
for (const s of intrinsic.sets) {
  const validityC: [number, number] = [s.validityC[0], s.validityC[1]];
  const intr = {} as Record<Dopant, PackedDopant>;
  const effective = {} as Record<Dopant, { D0: number; Ea: number }>;
  const hasCharged = s.form === 'components';
  for (const d of DOPANTS) {
    if (hasCharged) {
      intr[d] = CHARGED_PACKED[d];
    } else {
      const pair = (s as { dopants: Record<Dopant, { D0: number; Ea: number }> }).dopants[d];
      intr[d] = pack([{ charge: '0', D0: pair.D0, Ea: pair.Ea }]);
    }
    effective[d] = Object.freeze(fitArrhenius(intr[d], validityC));
  }
  SETS.set(s.id, { intrinsic: intr, hasCharged, effective, validityC });
}

function packedSet(setId: ParameterSetId): PackedSet {
  const s = SETS.get(setId);
  if (s === undefined) getParameterSet(setId); // throws the uniform EngineInputError
  return s as PackedSet;
}

function packedDopant(set: PackedSet, dopant: Dopant): PackedDopant {
  const p = set.intrinsic[dopant];
  if (p === undefined) {
    throw new EngineInputError(`unknown dopant ${JSON.stringify(dopant)}; expected one of ${DOPANTS.join(', ')}`, 'dopant');
  }
  return p;
}

function kTFromC(tempC: number): number {
  if (typeof tempC !== 'number' || !Number.isFinite(tempC)) {
    throw new EngineInputError(`tempC must be a finite number (got ${String(tempC)})`, 'tempC');
  }
  const tK = tempC + KELVIN_OFFSET;
  if (tK <= 0) throw new EngineInputError(`tempC must be above absolute zero, got ${tempC} °C`, 'tempC');
  return BOLTZMANN_EV_PER_K * tK;
}

/**
 * Intrinsic diffusivity D(T) of a dopant in silicon (n = p = n_i).
 * For sets with charged components (fair-1981) this is the exact sum of all components;
 * for single-pair sets (fuller-jaeger) it is D0·exp(−Ea/kT).
 * Sources: reference/diffusivity-intrinsic.json, reference/diffusivity-charged.json.
 * Allocation-free; safe for the solver's inner loop. Tends to 0 (never NaN) at low temperature.
 *
 * @param dopant 'B' | 'P' | 'As' | 'Sb'
 * @param tempC temperature, °C
 * @param setId parameter set id
 * @returns D, cm^2/s
 * @throws EngineInputError for an unknown set ('parameterSet'), dopant ('dopant') or a bad temperature ('tempC')
 */
export function diffusivity(dopant: Dopant, tempC: number, setId: ParameterSetId): number {
  const set = packedSet(setId);
  const p = packedDopant(set, dopant);
  return sumComponents(p, kTFromC(tempC));
}

/**
 * Effective Arrhenius pair of the set's intrinsic diffusivity. Exact for single-pair sets;
 * for component sets a least-squares fit of ln D vs 1/kT over the set's validity range
 * (within 8 % of diffusivity() there; As is the worst case because its components differ by 0.6 eV).
 * @returns D0 in cm^2/s, Ea in eV
 */
export function arrheniusFor(dopant: Dopant, setId: ParameterSetId): { D0: number; Ea: number } {
  const set = packedSet(setId);
  packedDopant(set, dopant);
  const e = set.effective[dopant];
  return { D0: e.D0, Ea: e.Ea };
}

/**
 * The published charged components (Plummer et al. 2000 Table 7-5, after Fair 1981) for a dopant.
 * @returns copies of D0 (cm^2/s), Ea (eV) and charge state for each component
 */
export function diffusivityComponents(dopant: Dopant): DiffusivityComponent[] {
  const list = CHARGED_COMPONENTS[dopant];
  if (list === undefined) {
    throw new EngineInputError(`unknown dopant ${JSON.stringify(dopant)}; expected one of ${DOPANTS.join(', ')}`, 'dopant');
  }
  return list.map((c) => ({ charge: c.charge, D0: c.D0, Ea: c.Ea }));
}

/**
 * Fermi-level-dependent diffusivity
 * D = D0 + D−(n/n_i) + D=(n/n_i)^2 + D+(p/n_i), p = n_i^2/n (Plummer, Deal & Griffin 2000, ch. 7; Fair 1981).
 * Equals diffusivity() when n = n_i. For a set without its own components (fuller-jaeger) the set's
 * intrinsic D is apportioned with the fair-1981 component ratios at the same temperature
 * (documented approximation).
 *
 * @param dopant 'B' | 'P' | 'As' | 'Sb'
 * @param tempC temperature, °C
 * @param electronConc local electron concentration n, cm^-3 (> 0)
 * @param setId parameter set id
 * @returns D, cm^2/s
 * @throws EngineInputError for bad arguments, or when n/n_i cannot be formed (n_i underflows)
 */
export function fermiDiffusivity(dopant: Dopant, tempC: number, electronConc: number, setId: ParameterSetId): number {
  const set = packedSet(setId);
  const p = packedDopant(set, dopant);
  const kT = kTFromC(tempC);
  if (typeof electronConc !== 'number' || !Number.isFinite(electronConc) || electronConc <= 0) {
    throw new EngineInputError(`electronConc must be a finite number > 0 cm^-3 (got ${String(electronConc)})`, 'electronConc');
  }
  const r = electronConc / intrinsicCarrierConcentration(tempC);
  if (!Number.isFinite(r)) {
    throw new EngineInputError(`n/n_i is not representable at ${tempC} °C`, 'tempC');
  }
  let d: number;
  if (set.hasCharged) {
    d = sumComponentsFermi(p, kT, r);
  } else {
    const c = CHARGED_PACKED[dopant];
    const intrinsicFair = sumComponents(c, kT);
    d = intrinsicFair > 0 ? sumComponents(p, kT) * (sumComponentsFermi(c, kT, r) / intrinsicFair) : 0;
  }
  if (!Number.isFinite(d)) {
    throw new EngineInputError(`diffusivity overflows for n = ${electronConc} cm^-3 at ${tempC} °C`, 'electronConc');
  }
  return d;
}

/**
 * Electron concentration from net donor doping, assuming full ionisation and charge neutrality:
 * n = N/2 + sqrt(N^2/4 + n_i^2), N = N_D − N_A (negative for p-type). Cancellation-free for N ≪ 0.
 * @param netDonor N_D − N_A, cm^-3
 * @param tempC temperature, °C
 * @returns n, cm^-3
 */
export function electronConcentration(netDonor: number, tempC: number): number {
  if (typeof netDonor !== 'number' || !Number.isFinite(netDonor)) {
    throw new EngineInputError(`netDonor must be a finite number (got ${String(netDonor)})`, 'netDonor');
  }
  const ni = intrinsicCarrierConcentration(tempC);
  const half = netDonor / 2;
  const root = Math.hypot(half, ni);
  // For p-type (half < 0) use n = n_i^2 / p to avoid subtracting nearly equal numbers.
  return half >= 0 ? half + root : (ni * ni) / (root - half);
}
