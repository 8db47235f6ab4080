// Per-tube calibration: one diffusivity factor f that multiplies D in every
// step run in that tube, fitted by least squares on ln(junction depth) over
// the tube's lots. A factor rather than a temperature offset because Dt, and
// so √(Dt) and the junction depth, scale with it directly at every
// temperature; an offset δT is the same as f = exp(Ea·δT/kT²) only at one
// temperature and one dopant's Ea. The logarithm weighs a 5 % miss on a
// shallow junction like a 5 % miss on a deep one.

export interface FitCase {
  /** Predicted junction depth (µm) of this lot's recipe with the tube's D multiplied by `factor`. */
  predict(factor: number): number | null;
  measuredUm: number;
}

export interface FitResult {
  factor: number;
  /** Standard error of ln(factor) from the residuals (Gauss–Newton estimate). */
  lnFactorStdErr: number;
  rmsLogErrorBefore: number;
  rmsLogErrorAfter: number;
  predictedUm: number[];
  correctedUm: number[];
}

const LN_MIN = Math.log(0.2);
const LN_MAX = Math.log(5);
const GOLDEN = (Math.sqrt(5) - 1) / 2;

export class CalibrationFitError extends Error {}

function rmsLog(cases: FitCase[], xj: number[]): number {
  const s = cases.reduce((acc, c, i) => acc + Math.log(c.measuredUm / xj[i]) ** 2, 0);
  return Math.sqrt(s / cases.length);
}

function predictAll(cases: FitCase[], factor: number): number[] {
  return cases.map((c, i) => {
    const xj = c.predict(factor);
    if (xj === null || !(xj > 0) || !Number.isFinite(xj)) throw new CalibrationFitError(`Case ${i + 1} has no predicted junction at factor ${factor.toPrecision(3)}`);
    return xj;
  });
}

/**
 * Least-squares diffusivity factor over ≥ 2 cases, by golden-section search
 * on ln f in [ln 0.2, ln 5] (the sum of squares is unimodal there because
 * the predicted depth grows with f).
 */
export function fitDiffusivityFactor(cases: FitCase[], tolerance = 1e-4): FitResult {
  if (cases.length < 2) throw new CalibrationFitError('A calibration needs measured junction depths from at least 2 lots');
  if (cases.some((c) => !(c.measuredUm > 0))) throw new CalibrationFitError('Measured junction depths must be positive');
  const sse = (lnF: number) => {
    const xj = predictAll(cases, Math.exp(lnF));
    return cases.reduce((acc, c, i) => acc + Math.log(c.measuredUm / xj[i]) ** 2, 0);
  };
  let a = LN_MIN;
  let b = LN_MAX;
  let x1 = b - GOLDEN * (b - a);
  let x2 = a + GOLDEN * (b - a);
  let f1 = sse(x1);
  let f2 = sse(x2);
  while (b - a > tolerance) {
    if (f1 < f2) {
      b = x2;
      x2 = x1;
      f2 = f1;
      x1 = b - GOLDEN * (b - a);
      f1 = sse(x1);
    } else {
      a = x1;
      x1 = x2;
      f1 = f2;
      x2 = a + GOLDEN * (b - a);
      f2 = sse(x2);
    }
  }
  const lnF = (a + b) / 2;
  const factor = Math.exp(lnF);
  const before = predictAll(cases, 1);
  const after = predictAll(cases, factor);
  // Sensitivities d ln xj / d ln f by a central difference, for the standard error.
  const h = 1e-3;
  const up = predictAll(cases, Math.exp(lnF + h));
  const down = predictAll(cases, Math.exp(lnF - h));
  const jj = cases.reduce((acc, _c, i) => acc + ((Math.log(up[i]) - Math.log(down[i])) / (2 * h)) ** 2, 0);
  const residual = cases.reduce((acc, c, i) => acc + Math.log(c.measuredUm / after[i]) ** 2, 0);
  const sigma2 = residual / (cases.length - 1);
  const lnFactorStdErr = jj > 0 ? Math.sqrt(sigma2 / jj) : 0;
  if (lnF - LN_MIN < 10 * tolerance || LN_MAX - lnF < 10 * tolerance) {
    throw new CalibrationFitError(`The best factor lies at the edge of 0.2–5 (${factor.toPrecision(3)}): the measurements do not fit this tube's recipes`);
  }
  return {
    factor,
    lnFactorStdErr,
    rmsLogErrorBefore: rmsLog(cases, before),
    rmsLogErrorAfter: rmsLog(cases, after),
    predictedUm: before,
    correctedUm: after,
  };
}
