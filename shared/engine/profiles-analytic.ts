// Closed-form dopant profiles (Crank 1975 ch. 2–3; Sze, impurity doping chapter;
// Plummer, Deal & Griffin 2000 ch. 7). Depths in cm, concentrations cm⁻³, Dt in cm².
// A dopant's profile is a sum of components; each component remembers how far the
// surface has moved (silicon consumed by oxidation) since it was created.
import { erfc } from './special-functions';
import type { Dopant } from './dopants';

const SQRT2 = Math.SQRT2;

/**
 * Constant-source (predeposition) profile C(x) = Cs·erfc(x / 2√(Dt)).
 * Source: Crank (1975) eq. 3.13; Sze, impurity doping chapter.
 */
export function constantSourceProfile(surfaceCm3: number, dtCm2: number, xCm: number): number {
  if (dtCm2 <= 0) return xCm <= 0 ? surfaceCm3 : 0;
  return surfaceCm3 * erfc(xCm / (2 * Math.sqrt(dtCm2)));
}

/** Dose of a constant-source profile Q = 2·Cs·√(Dt/π), cm⁻². Source: Sze, impurity doping chapter. */
export function constantSourceDose(surfaceCm3: number, dtCm2: number): number {
  return dtCm2 > 0 ? 2 * surfaceCm3 * Math.sqrt(dtCm2 / Math.PI) : 0;
}

/**
 * Limited-source (drive-in) Gaussian with a reflecting surface:
 * C(x) = Q/√(πDt)·exp(−x²/4Dt). Source: Crank (1975) eq. 2.7 with an image; Sze.
 */
export function limitedSourceProfile(doseCm2: number, dtCm2: number, xCm: number): number {
  if (dtCm2 <= 0) return 0;
  return (doseCm2 / Math.sqrt(Math.PI * dtCm2)) * Math.exp((-xCm * xCm) / (4 * dtCm2));
}

/** Which surface condition an implant Gaussian uses; see recipe options. */
export type ImplantSurface = 'reflect' | 'lose';

/** Standard normal density N(z) and upper tail Q(z) = ½erfc(z/√2). */
const normalPdf = (z: number) => Math.exp(-0.5 * z * z) / Math.sqrt(2 * Math.PI);
const upperTail = (z: number) => 0.5 * erfc(z / SQRT2);

/**
 * Implanted Gaussian after anneals, variance σ² = ΔRp² + 2ΣDt (variances add).
 * 'reflect': image source at −Rp, the whole dose stays in the silicon.
 * 'lose': the as-implanted Gaussian is truncated at the surface (the part above is
 * lost) and then diffuses with a reflecting surface; the closed form is the Gaussian
 * convolution of the truncated profile, exact for any Dt.
 * Source: Sze, ion implantation chapter; Plummer et al. ch. 8 (σ² = ΔRp² + 2Dt).
 */
export function implantProfile(
  doseCm2: number,
  rpCm: number,
  dRpCm: number,
  dtCm2: number,
  surface: ImplantSurface,
  xCm: number,
): number {
  const s0sq = dRpCm * dRpCm;
  const s1sq = 2 * dtCm2;
  const varSum = s0sq + s1sq;
  if (varSum <= 0) return 0;
  const sigma = Math.sqrt(varSum);
  const g1 = normalPdf((xCm - rpCm) / sigma) / sigma;
  const g2 = normalPdf((xCm + rpCm) / sigma) / sigma;
  if (surface === 'reflect') return doseCm2 * (g1 + g2);
  if (s0sq === 0) return doseCm2 * (g1 + g2) * 0.5; // a surface sheet: half lost, half reflected
  if (s1sq === 0) return xCm >= 0 ? doseCm2 * g1 : 0;
  // ∫₀^∞ N(x′; Rp, s0²)·[N(x − x′; s1²) + N(x + x′; s1²)] dx′
  const sStar = Math.sqrt((s0sq * s1sq) / varSum);
  const m1 = (rpCm * s1sq + xCm * s0sq) / varSum;
  const m2 = (rpCm * s1sq - xCm * s0sq) / varSum;
  return doseCm2 * (g1 * (1 - upperTail(m1 / sStar)) + g2 * (1 - upperTail(m2 / sStar)));
}

/** Dose an implant leaves in the silicon, cm⁻²: all of it ('reflect') or the part below the surface ('lose'). */
export function implantRetainedDose(doseCm2: number, rpCm: number, dRpCm: number, surface: ImplantSurface): number {
  if (surface === 'reflect') return doseCm2;
  return doseCm2 * (1 - upperTail(rpCm / dRpCm));
}

/**
 * Two-step shortcut check (Sze; Plummer et al. ch. 7): the Gaussian drive-in form
 * holds only when the drive-in Dt is much larger than the predeposition Dt.
 * Ratio at which the engine accepts it (checked against the solver to < 1 % on xj
 * for backgrounds 1e14–1e17 cm⁻³ in tests/engine/profiles-analytic.test.ts).
 */
export const TWO_STEP_MIN_RATIO = 5;

/** A predeposited erfc layer; after its source is off it is treated by the two-step form. */
export interface ErfcComponent {
  kind: 'erfc';
  dopant: Dopant;
  surfaceCm3: number;
  predepDtCm2: number;
  /** Dt with a closed surface after the source went off, cm². */
  driveDtCm2: number;
  /** Silicon consumed since the component was created, cm. */
  offsetCm: number;
}

/** An implanted (or surface-sheet, Rp = ΔRp = 0) Gaussian. */
export interface GaussianComponent {
  kind: 'gaussian';
  dopant: Dopant;
  doseCm2: number;
  rpCm: number;
  dRpCm: number;
  dtCm2: number;
  surface: ImplantSurface;
  offsetCm: number;
}

export type AnalyticComponent = ErfcComponent | GaussianComponent;

/**
 * Second moment-matched start of the drive-in Gaussian: an erfc layer with Dt = a has
 * ⟨x²⟩ = 4a/3 (Crank ch. 3 moments of erfc), a reflecting half-Gaussian ⟨x²⟩ = 2·Dt,
 * so the drive-in Gaussian starts from an effective Dt of 2a/3; the textbook form
 * (Dt = drive-in only) is the limit drive ≫ predep.
 */
export function twoStepEffectiveDt(predepDtCm2: number, driveDtCm2: number): number {
  return driveDtCm2 + (2 / 3) * predepDtCm2;
}

/** Concentration of one component at depth x below the current surface, cm⁻³. */
export function componentConcentration(c: AnalyticComponent, xCm: number): number {
  const x = xCm + c.offsetCm;
  if (c.kind === 'erfc') {
    if (c.driveDtCm2 <= 0) return constantSourceProfile(c.surfaceCm3, c.predepDtCm2, x);
    return limitedSourceProfile(
      constantSourceDose(c.surfaceCm3, c.predepDtCm2),
      twoStepEffectiveDt(c.predepDtCm2, c.driveDtCm2),
      x,
    );
  }
  return implantProfile(c.doseCm2, c.rpCm, c.dRpCm, c.dtCm2, c.surface, x);
}

/** Dose of a component below the original surface of the component (before any oxidation), cm⁻². */
export function componentDose(c: AnalyticComponent): number {
  if (c.kind === 'erfc') return constantSourceDose(c.surfaceCm3, c.predepDtCm2);
  return implantRetainedDose(c.doseCm2, c.rpCm, c.dRpCm, c.surface);
}

/**
 * Depth below the current surface beyond which the component is under floorCm3, cm
 * (a bound from the Gaussian tail; erfc(u) < exp(−u²)).
 */
export function componentExtentCm(c: AnalyticComponent, floorCm3: number): number {
  let peak: number;
  let centre: number;
  let width: number; // length scale L of exp(−(x−centre)²/L²)
  if (c.kind === 'erfc') {
    if (c.driveDtCm2 <= 0) {
      peak = c.surfaceCm3;
      centre = 0;
      width = 2 * Math.sqrt(c.predepDtCm2);
    } else {
      const dt = twoStepEffectiveDt(c.predepDtCm2, c.driveDtCm2);
      peak = limitedSourceProfile(componentDose(c), dt, 0);
      centre = 0;
      width = 2 * Math.sqrt(dt);
    }
  } else {
    const varSum = c.dRpCm * c.dRpCm + 2 * c.dtCm2;
    peak = (2 * c.doseCm2) / Math.sqrt(2 * Math.PI * varSum);
    centre = c.rpCm;
    width = Math.sqrt(2 * varSum);
  }
  const ratio = peak / Math.max(floorCm3, 1);
  const reach = ratio > 1 ? centre + width * Math.sqrt(Math.log(ratio)) : centre;
  return Math.max(0, reach - c.offsetCm);
}
