import { EngineInputError } from './errors';

const TWO_OVER_SQRT_PI = 1.1283791670955126; // 2/√π
const SQRT_PI = 1.7724538509055159;
/** Below this the power series is used; above it the continued fraction. */
const SERIES_LIMIT = 2;

function checkX(x: number, path: string): void {
  if (typeof x !== 'number' || Number.isNaN(x)) throw new EngineInputError(`${path} must be a number (got ${String(x)})`, path);
}

/**
 * exp(−x²) without the rounding error of forming x² (x = hi + lo with hi exact in 1/16ths),
 * as in W. J. Cody's erfc (ACM TOMS 19, 1993): keeps the relative error of the tail near 1e-16.
 */
function expMinusSquare(x: number): number {
  const hi = Math.trunc(x * 16) / 16;
  const lo = x - hi;
  return Math.exp(-hi * hi) * Math.exp(-lo * (x + hi));
}

/**
 * erf(x)·exp(x²)·√π/(2x) = Σ (2x²)^n / (1·3·…·(2n+1)) — all terms positive, no cancellation
 * (A&S 7.1.6). Used for 0 ≤ x < 2.
 */
function erfSeriesSum(x: number): number {
  const t = 2 * x * x;
  let term = 1;
  let sum = 1;
  for (let n = 1; n < 200; n++) {
    term *= t / (2 * n + 1);
    sum += term;
    if (term < sum * 1e-17) break;
  }
  return sum;
}

/**
 * Scaled complementary error function for x ≥ 2: e^{x²}·erfc(x) from the even contraction of
 * the Laplace continued fraction (A&S 7.1.14),
 * erfc x = (2x e^{−x²}/√π) / (2x²+1 − 1·2/(2x²+5 − 3·4/(2x²+9 − …))), evaluated by modified Lentz.
 */
function erfcxContinuedFraction(x: number): number {
  const tiny = 1e-300;
  const z = 2 * x * x;
  let f = z + 1;
  let c = f;
  let d = 0;
  for (let n = 1; n < 500; n++) {
    const a = -(2 * n - 1) * (2 * n);
    const b = z + 4 * n + 1;
    d = b + a * d;
    if (Math.abs(d) < tiny) d = tiny;
    c = b + a / c;
    if (Math.abs(c) < tiny) c = tiny;
    d = 1 / d;
    const delta = c * d;
    f *= delta;
    if (Math.abs(delta - 1) < 1e-16) break;
  }
  return (2 * x) / (SQRT_PI * f);
}

/**
 * Scaled complementary error function erfcx(x) = e^{x²}·erfc(x), for x ≥ 0 (never under- or overflows there).
 * @param x dimensionless, ≥ 0
 */
export function erfcx(x: number): number {
  checkX(x, 'x');
  if (x < 0) throw new EngineInputError(`erfcx is provided for x ≥ 0 (got ${x})`, 'x');
  if (x === Infinity) return 0;
  if (x >= SERIES_LIMIT) return erfcxContinuedFraction(x);
  // e^{x²}(1 − erf x); for x < 2 e^{x²} ≤ e^4, so no overflow.
  return Math.exp(x * x) - TWO_OVER_SQRT_PI * x * erfSeriesSum(x);
}

function erfcNonNegative(x: number): number {
  if (x < SERIES_LIMIT) return 1 - TWO_OVER_SQRT_PI * x * expMinusSquare(x) * erfSeriesSum(x);
  if (x > 27.3) return 0; // erfc(27.3) < 5e-326: below the smallest double
  return expMinusSquare(x) * erfcxContinuedFraction(x);
}

/**
 * Error function erf(x) = (2/√π)∫₀ˣ e^{−t²} dt (A&S 7.1.1).
 * Series A&S 7.1.6 for |x| < 2, continued fraction A&S 7.1.14 beyond; relative error ≲ 1e-15.
 * @param x dimensionless
 * @throws EngineInputError for NaN
 */
export function erf(x: number): number {
  checkX(x, 'x');
  if (x < 0) return -erf(-x);
  if (x < SERIES_LIMIT) return TWO_OVER_SQRT_PI * x * expMinusSquare(x) * erfSeriesSum(x);
  return 1 - erfcNonNegative(x);
}

/**
 * Complementary error function erfc(x) = 1 − erf(x), accurate to ~1e-14 relative out to the
 * underflow limit (x ≈ 27), which the deep tails of diffusion profiles need; 0 beyond, 2 at −∞.
 * @param x dimensionless
 * @throws EngineInputError for NaN
 */
export function erfc(x: number): number {
  checkX(x, 'x');
  if (x < 0) return 2 - erfcNonNegative(-x);
  return erfcNonNegative(x);
}

/** ln erfc(x) for x ≥ 0 without underflow. */
function logErfc(x: number): number {
  if (x < SERIES_LIMIT) return Math.log(erfcNonNegative(x));
  return -x * x + Math.log(erfcxContinuedFraction(x));
}

/**
 * Inverse complementary error function: the x with erfc(x) = y.
 * Newton iteration on ln erfc (no underflow, so y down to the smallest double works).
 * @param y in the open interval (0, 2)
 * @returns x, dimensionless
 * @throws EngineInputError for y outside (0, 2) or NaN
 */
export function inverseErfc(y: number): number {
  checkX(y, 'y');
  if (!(y > 0 && y < 2)) throw new EngineInputError(`inverseErfc needs 0 < y < 2 (got ${y})`, 'y');
  if (y === 1) return 0;
  if (y > 1) return -inverseErfc(2 - y);
  const target = Math.log(y);
  // Start from the asymptotic form erfc x ≈ e^{−x²}/(x√π).
  const L = -target;
  let x = L > 1 ? Math.sqrt(Math.max(L - 0.5 * Math.log(Math.PI * L), 0.25)) : 0.5 * (1 - y) * SQRT_PI;
  for (let i = 0; i < 100; i++) {
    const g = logErfc(x) - target;
    // d/dx ln erfc(x) = −(2/√π)·e^{−x²}/erfc(x) = −(2/√π)/erfcx(x)
    const slope = -TWO_OVER_SQRT_PI / erfcx(x);
    let next = x - g / slope;
    if (next < 0) next = x / 2;
    const step = Math.abs(next - x);
    x = next;
    if (step <= 1e-15 * Math.max(1, x)) break;
  }
  return x;
}
