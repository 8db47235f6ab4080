// The wafer as a sum of closed-form components per dopant (see profiles-analytic.ts).
import { DOPANT_INFO, type Dopant } from './dopants';
import { erfc } from './special-functions';
import type { DopingAt } from './layer';
import {
  componentConcentration,
  componentDose,
  componentExtentCm,
  TWO_STEP_MIN_RATIO,
  twoStepEffectiveDt,
  type AnalyticComponent,
  type ImplantSurface,
} from './profiles-analytic';

export interface AnalyticWafer {
  components: AnalyticComponent[];
  /** Dose in the silicon per dopant, cm⁻² (bookkeeping of what steps add and oxidation removes). */
  dose: Partial<Record<Dopant, number>>;
}

export function emptyAnalyticWafer(): AnalyticWafer {
  return { components: [], dose: {} };
}

function addDose(w: AnalyticWafer, d: Dopant, q: number): void {
  w.dose[d] = (w.dose[d] ?? 0) + q;
}

export function implantAnalytic(w: AnalyticWafer, d: Dopant, doseCm2: number, rpCm: number, dRpCm: number, surface: ImplantSurface): void {
  const c: AnalyticComponent = { kind: 'gaussian', dopant: d, doseCm2, rpCm, dRpCm, dtCm2: 0, surface, offsetCm: 0 };
  w.components.push(c);
  addDose(w, d, componentDose(c));
}

/** Closed-surface diffusion of every component by its dopant's Dt (cm²). */
export function driveAnalytic(w: AnalyticWafer, dt: Record<Dopant, { totalCm2: number }>): void {
  for (const c of w.components) {
    const x = dt[c.dopant].totalCm2;
    if (c.kind === 'erfc') c.driveDtCm2 += x;
    else c.dtCm2 += x;
  }
}

export function predepositAnalytic(w: AnalyticWafer, d: Dopant, surfaceCm3: number, dtCm2: number): void {
  const c: AnalyticComponent = { kind: 'erfc', dopant: d, surfaceCm3, predepDtCm2: dtCm2, driveDtCm2: 0, offsetCm: 0 };
  w.components.push(c);
  addDose(w, d, componentDose(c));
}

/** Smallest drive-in/predeposition Dt ratio among erfc layers that have been driven (Infinity if none). */
export function weakestTwoStepRatio(w: AnalyticWafer): { ratio: number; dopant: Dopant | null } {
  let ratio = Infinity;
  let dopant: Dopant | null = null;
  for (const c of w.components) {
    if (c.kind !== 'erfc' || c.driveDtCm2 <= 0 || c.predepDtCm2 <= 0) continue;
    const r = c.driveDtCm2 / c.predepDtCm2;
    if (r < ratio) {
      ratio = r;
      dopant = c.dopant;
    }
  }
  return { ratio, dopant };
}

export function twoStepValid(w: AnalyticWafer): boolean {
  return weakestTwoStepRatio(w).ratio >= TWO_STEP_MIN_RATIO;
}

export function analyticConcentration(w: AnalyticWafer, d: Dopant, xCm: number): number {
  let s = 0;
  for (const c of w.components) if (c.dopant === d) s += componentConcentration(c, xCm);
  return s;
}

export function hasDopant(w: AnalyticWafer, d: Dopant): boolean {
  return w.components.some((c) => c.dopant === d);
}

/** Depth beyond which every component is below floorCm3, cm. */
export function analyticExtentCm(w: AnalyticWafer, floorCm3: number): number {
  let e = 0;
  for (const c of w.components) e = Math.max(e, componentExtentCm(c, floorCm3));
  return e;
}

// 8-point Gauss–Legendre on [-1, 1] (Abramowitz & Stegun 25.4.30) for the thin consumed layer.
const GL8_X = [-0.9602898564975363, -0.7966664774136267, -0.5255324099163290, -0.1834346424956498, 0.1834346424956498, 0.5255324099163290, 0.7966664774136267, 0.9602898564975363];
const GL8_W = [0.1012285362903763, 0.2223810344533745, 0.3137066458778873, 0.3626837833783620, 0.3626837833783620, 0.3137066458778873, 0.2223810344533745, 0.1012285362903763];

/** ∫₀^δ C_d dx, cm⁻². */
export function analyticLayerDose(w: AnalyticWafer, d: Dopant, deltaCm: number): number {
  let s = 0;
  for (let k = 0; k < 8; k++) s += GL8_W[k] * analyticConcentration(w, d, 0.5 * deltaCm * (1 + GL8_X[k]));
  return 0.5 * deltaCm * s;
}

/**
 * Consumes δ of silicon (oxidation-effect.ts): every component moves up by δ; of the dose in
 * the consumed layer the kept fraction returns as a thin reflecting sheet (width δ) at the new surface.
 * @returns dose taken up by the oxide per dopant, cm⁻²
 */
export function consumeSiliconAnalytic(w: AnalyticWafer, deltaCm: number, kept: Record<Dopant, number>): Partial<Record<Dopant, number>> {
  const lost: Partial<Record<Dopant, number>> = {};
  if (!(deltaCm > 0)) return lost;
  const dopants = [...new Set(w.components.map((c) => c.dopant))];
  const layer = dopants.map((d) => analyticLayerDose(w, d, deltaCm));
  for (const c of w.components) c.offsetCm += deltaCm;
  dopants.forEach((d, i) => {
    const back = layer[i] * kept[d];
    if (back > 0) {
      w.components.push({ kind: 'gaussian', dopant: d, doseCm2: back, rpCm: 0, dRpCm: deltaCm, dtCm2: 0, surface: 'reflect', offsetCm: 0 });
    }
    lost[d] = layer[i] - back;
    addDose(w, d, -(layer[i] - back));
  });
  return lost;
}

/**
 * The wafer's components reduced to a few numbers each, for evaluating net and total
 * doping many times in one step (junction search, sheet resistance). Built per step.
 */
export interface CompiledWafer {
  count: number;
  backgroundSignedCm3: number;
  /** 0: undriven erfc, 1: Gaussian pair (reflect or drive-in), 2: general (slow path). */
  form: Int8Array;
  sign: Float64Array;
  /** Per component: amplitude, centre (cm), 1/(2σ²) or 1/(2√Dt), offset (cm). */
  amp: Float64Array;
  centre: Float64Array;
  inv: Float64Array;
  offset: Float64Array;
  components: AnalyticComponent[];
}

export function compileWafer(w: AnalyticWafer, backgroundSignedCm3: number): CompiledWafer {
  const n = w.components.length;
  const out: CompiledWafer = {
    count: n,
    backgroundSignedCm3,
    form: new Int8Array(n),
    sign: new Float64Array(n),
    amp: new Float64Array(n),
    centre: new Float64Array(n),
    inv: new Float64Array(n),
    offset: new Float64Array(n),
    components: w.components,
  };
  w.components.forEach((c, k) => {
    out.sign[k] = DOPANT_INFO[c.dopant].type === 'n' ? 1 : -1;
    out.offset[k] = c.offsetCm;
    if (c.kind === 'erfc' && c.driveDtCm2 <= 0 && c.predepDtCm2 > 0) {
      out.form[k] = 0;
      out.amp[k] = c.surfaceCm3;
      out.inv[k] = 1 / (2 * Math.sqrt(c.predepDtCm2));
    } else if (c.kind === 'erfc' && c.driveDtCm2 > 0) {
      // Two-step Gaussian: Q/√(πDt)·exp(−x²/4Dt) = pair of half-amplitude Gaussians at 0.
      const dt = twoStepEffectiveDt(c.predepDtCm2, c.driveDtCm2);
      out.form[k] = 1;
      out.amp[k] = componentDose(c) / Math.sqrt(Math.PI * dt) / 2;
      out.centre[k] = 0;
      out.inv[k] = 1 / (4 * dt);
    } else if (c.kind === 'gaussian' && c.surface === 'reflect' && c.dRpCm * c.dRpCm + 2 * c.dtCm2 > 0) {
      const v = c.dRpCm * c.dRpCm + 2 * c.dtCm2;
      out.form[k] = 1;
      out.amp[k] = c.doseCm2 / Math.sqrt(2 * Math.PI * v);
      out.centre[k] = c.rpCm;
      out.inv[k] = 1 / (2 * v);
    } else {
      out.form[k] = 2;
    }
  });
  return out;
}

/** Net (N_D − N_A) and total doping at x, background included, from a compiled wafer. */
export function compiledDopingAt(cw: CompiledWafer, xCm: number, out: DopingAt): DopingAt {
  let net = cw.backgroundSignedCm3;
  let total = Math.abs(net);
  for (let k = 0; k < cw.count; k++) {
    const x = xCm + cw.offset[k];
    let v: number;
    const form = cw.form[k];
    if (form === 1) {
      const a = x - cw.centre[k];
      const ea = a * a * cw.inv[k];
      if (ea >= 745) continue; // both terms underflow (|x + c| ≥ |x − c| for c, x ≥ 0)
      const b = x + cw.centre[k];
      v = cw.amp[k] * (Math.exp(-ea) + Math.exp(-b * b * cw.inv[k]));
    } else if (form === 0) {
      v = cw.amp[k] * erfc(x * cw.inv[k]);
    } else {
      v = componentConcentration(cw.components[k], xCm);
    }
    net += cw.sign[k] * v;
    total += v;
  }
  out.net = net;
  out.total = total;
  return out;
}

/** Concentration of each listed dopant at every depth (cm), from a compiled wafer. */
export function analyticSeries(cw: CompiledWafer, dopants: Dopant[], xsCm: ArrayLike<number>): number[][] {
  const out = dopants.map(() => new Array<number>(xsCm.length).fill(0));
  for (let k = 0; k < cw.count; k++) {
    const slot = dopants.indexOf(cw.components[k].dopant);
    if (slot < 0) continue;
    const series = out[slot];
    const form = cw.form[k];
    const amp = cw.amp[k];
    const inv = cw.inv[k];
    const centre = cw.centre[k];
    const offset = cw.offset[k];
    for (let i = 0; i < xsCm.length; i++) {
      const x = xsCm[i] + offset;
      if (form === 1) {
        const a = x - centre;
        const b = x + centre;
        const ea = a * a * inv;
        // exp(−745) underflows to 0: skip the calls far out in the tails.
        if (ea < 745) series[i] += amp * (Math.exp(-ea) + Math.exp(-b * b * inv));
      } else if (form === 0) {
        series[i] += amp * erfc(x * inv);
      } else {
        series[i] += componentConcentration(cw.components[k], xsCm[i]);
      }
    }
  }
  return out;
}
