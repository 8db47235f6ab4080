// The diffused layer between the surface and the first junction: sheet resistance,
// average resistivity. Mobility from the published model in ./mobility (total ionised
// doping, majority carrier of the layer); full ionisation assumed.
import { ELEMENTARY_CHARGE_C } from './constants';
import { mobility } from './mobility';

/** Net and total ionised doping at one depth, cm⁻³ (a reused scratch object, not stored). */
export interface DopingAt {
  /** N_D − N_A including the background (positive: n-type). */
  net: number;
  /** N_D + N_A including the background. */
  total: number;
}

/** What layer calculations need from a profile: net and total ionised doping at x (cm). */
export interface LayerProfile {
  /** N_D − N_A including the background, cm⁻³ (positive: n-type). */
  netAt(xCm: number): number;
  /** Both at once, written into out (avoids evaluating the profile twice). */
  dopingAt(xCm: number, out: DopingAt): DopingAt;
}

// 4-point Gauss–Legendre on [-1, 1] (Abramowitz & Stegun 25.4.30).
const GL_X = [-0.8611363115940526, -0.3399810435848563, 0.3399810435848563, 0.8611363115940526];
const GL_W = [0.3478548451374538, 0.6521451548625461, 0.6521451548625461, 0.3478548451374538];
/** Panels across the layer; finer near the surface where erfc and implant layers peak. */
const PANELS = 16;
const scratch: DopingAt = { net: 0, total: 0 };

/**
 * Sheet conductance ∫₀^xj q·μ(N_total)·|N_net| dx of the layer (S), composite Gauss–Legendre
 * on panels graded toward the surface.
 */
export function sheetConductanceS(profile: LayerProfile, junctionCm: number, carrier: 'n' | 'p'): number {
  if (!(junctionCm > 0)) return 0;
  let sum = 0;
  let x0 = 0;
  for (let p = 1; p <= PANELS; p++) {
    const u = p / PANELS;
    const x1 = junctionCm * u * (0.4 + 0.6 * u);
    const mid = 0.5 * (x0 + x1);
    const half = 0.5 * (x1 - x0);
    let s = 0;
    for (let k = 0; k < 4; k++) {
      const x = mid + half * GL_X[k];
      const at = profile.dopingAt(x, scratch);
      const net = Math.abs(at.net);
      if (net > 0) s += GL_W[k] * mobility(at.total, carrier) * net;
    }
    sum += half * s;
    x0 = x1;
  }
  return ELEMENTARY_CHARGE_C * sum;
}

/**
 * Sheet resistance Rs = 1 / ∫₀^xj q·μ(N)·|N_net| dx of the layer above the first junction, Ω/□.
 * Source: Sze, impurity doping chapter (Irvin's curves integrate the same expression);
 * mobility model and parameters as cited in reference/mobility.json.
 * @returns Ω/□, or null when there is no junction (the layer is the whole wafer)
 */
export function sheetResistance(profile: LayerProfile, junctionCm: number | undefined, carrier: 'n' | 'p'): number | null {
  if (junctionCm === undefined) return null;
  const g = sheetConductanceS(profile, junctionCm, carrier);
  return g > 0 ? 1 / g : null;
}

/** Average resistivity of the layer ρ = Rs·xj, Ω·cm. */
export function averageResistivity(sheetOhmSq: number | null, junctionCm: number | undefined): number | null {
  if (sheetOhmSq === null || junctionCm === undefined) return null;
  return sheetOhmSq * junctionCm;
}
