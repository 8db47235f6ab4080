import f723 from '../../reference/resistivity-astm-f723.json';
import { ELEMENTARY_CHARGE_C } from './constants';
import { EngineInputError } from './errors';
import { MASETTI_ELECTRONS_P, MASETTI_HOLES_B, masettiMobility } from './mobility';

const BORON = f723.boron;
const PHOS = f723.phosphorus;

/** Lowest and highest dopant density the conversion accepts, cm^-3. */
export const RESISTIVITY_DOMAIN_N: readonly [number, number] = Object.freeze([1e10, 5e22] as const);

/** Density range over which the ASTM F723 equations are used, cm^-3. */
export function astmF723ValidityN(type: 'n' | 'p'): [number, number] {
  const v = type === 'n' ? PHOS.validityN : BORON.validityN;
  return [v[0], v[1]];
}

function checkType(type: string): void {
  if (type !== 'n' && type !== 'p') throw new EngineInputError(`type must be 'n' or 'p' (got ${JSON.stringify(type)})`, 'type');
}

function rational(a: number[], b: number[], x: number): number {
  const num = a[0] + x * (a[1] + x * (a[2] + x * a[3]));
  const den = 1 + x * (b[0] + x * (b[1] + x * b[2]));
  return num / den;
}

/** ASTM F723 boron equation: rho(N), ohm cm. */
function f723BoronRho(n: number): number {
  const c = BORON.rhoFromN;
  return c.a / n + c.b / (n * (1 + Math.pow(c.c * n, c.d)));
}

/** ASTM F723 phosphorus equation: rho(N), ohm cm. */
function f723PhosRho(n: number): number {
  const c = PHOS.rhoFromN;
  return (c.prefactor / n) * Math.pow(10, rational(c.A, c.B, Math.log10(n) - 16));
}

function masettiRho(n: number, type: 'n' | 'p'): number {
  const mu = masettiMobility(n, type === 'n' ? MASETTI_ELECTRONS_P : MASETTI_HOLES_B);
  return 1 / (ELEMENTARY_CHARGE_C * mu * n);
}

/**
 * ASTM F723 density-from-resistivity equations as published (the standard's second fit,
 * independent of the rho(N) fit). Exposed for cross-checks; dopingFromResistivity() inverts
 * resistivityFromDoping() instead so the pair round-trips exactly.
 * @param rho resistivity, ohm cm
 * @returns N, cm^-3
 */
export function astmF723DensityFromResistivity(rho: number, type: 'n' | 'p'): number {
  checkType(type);
  if (typeof rho !== 'number' || !Number.isFinite(rho) || rho <= 0) {
    throw new EngineInputError(`rho must be a finite number > 0 ohm cm (got ${String(rho)})`, 'rho');
  }
  if (type === 'p') {
    const c = BORON.nFromRho;
    return c.a / rho + c.b / (rho * (1 + Math.pow(c.c * rho, c.d)));
  }
  const c = PHOS.nFromRho;
  return (c.prefactor / rho) * Math.pow(10, rational(c.A, c.B, Math.log10(rho)));
}

// Outside the F723 range, 1/(q mu N) with Masetti mobility, scaled to meet F723 at the range end
// so the relation stays continuous and monotonic.
const SCALE = {
  n: {
    low: f723PhosRho(PHOS.validityN[0]) / masettiRho(PHOS.validityN[0], 'n'),
    high: f723PhosRho(PHOS.validityN[1]) / masettiRho(PHOS.validityN[1], 'n'),
  },
  p: {
    low: f723BoronRho(BORON.validityN[0]) / masettiRho(BORON.validityN[0], 'p'),
    high: f723BoronRho(BORON.validityN[1]) / masettiRho(BORON.validityN[1], 'p'),
  },
};

function rhoUnchecked(n: number, type: 'n' | 'p'): number {
  const [lo, hi] = type === 'n' ? PHOS.validityN : BORON.validityN;
  if (n < lo) return masettiRho(n, type) * SCALE[type].low;
  if (n > hi) return masettiRho(n, type) * SCALE[type].high;
  return type === 'n' ? f723PhosRho(n) : f723BoronRho(n);
}

/**
 * Resistivity of uniformly doped silicon at 23 °C from its dopant density:
 * ASTM F723 equations (Thurber et al., NBS SP 400-64, 1981) — phosphorus for n-type,
 * boron for p-type; outside the equations' range, Masetti-mobility 1/(q·mu·N) joined continuously.
 *
 * @param conc dopant density, cm^-3 (1e10 … 5e22)
 * @param type 'n' | 'p'
 * @returns resistivity, ohm cm
 */
export function resistivityFromDoping(conc: number, type: 'n' | 'p'): number {
  checkType(type);
  if (typeof conc !== 'number' || !(conc >= RESISTIVITY_DOMAIN_N[0]) || !(conc <= RESISTIVITY_DOMAIN_N[1])) {
    throw new EngineInputError(
      `conc must be between ${RESISTIVITY_DOMAIN_N[0]} and ${RESISTIVITY_DOMAIN_N[1]} cm^-3 (got ${String(conc)})`,
      'conc',
    );
  }
  return rhoUnchecked(conc, type);
}

/**
 * Dopant density of uniformly doped silicon from its resistivity at 23 °C: the numerical
 * inverse (bisection in log N) of resistivityFromDoping(), so the two round-trip exactly.
 * Agrees with the standard's own N(rho) fit within its stated few per cent (tested).
 *
 * @param rho resistivity, ohm cm
 * @param type 'n' | 'p'
 * @returns dopant density, cm^-3
 * @throws EngineInputError when rho is outside what doping between 1e10 and 5e22 cm^-3 can give
 */
export function dopingFromResistivity(rho: number, type: 'n' | 'p'): number {
  checkType(type);
  if (typeof rho !== 'number' || !Number.isFinite(rho) || rho <= 0) {
    throw new EngineInputError(`rho must be a finite number > 0 ohm cm (got ${String(rho)})`, 'rho');
  }
  let lo = Math.log10(RESISTIVITY_DOMAIN_N[0]);
  let hi = Math.log10(RESISTIVITY_DOMAIN_N[1]);
  const rhoMax = rhoUnchecked(RESISTIVITY_DOMAIN_N[0], type);
  const rhoMin = rhoUnchecked(RESISTIVITY_DOMAIN_N[1], type);
  if (rho > rhoMax || rho < rhoMin) {
    throw new EngineInputError(
      `rho must be between ${rhoMin.toPrecision(3)} and ${rhoMax.toPrecision(3)} ohm cm for ${type}-type silicon (got ${rho})`,
      'rho',
    );
  }
  const target = Math.log(rho);
  for (let i = 0; i < 80 && hi - lo > 1e-13; i++) {
    const mid = 0.5 * (lo + hi);
    if (Math.log(rhoUnchecked(Math.pow(10, mid), type)) > target) lo = mid;
    else hi = mid;
  }
  return Math.pow(10, 0.5 * (lo + hi));
}
