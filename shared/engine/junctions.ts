// Junctions: depths where the net doping (donors − acceptors, background included)
// changes sign. Each sign change between two samples is refined by Brent's method on
// the function itself (the closed form or the solver's interpolant), never snapped to
// a sample.

/** Relative precision of a junction depth. */
const ROOT_REL_TOL = 1e-10;

/**
 * Brent's root finder (inverse quadratic interpolation with bisection fallback;
 * Brent, Algorithms for Minimization without Derivatives, 1973, ch. 4) on [a, b]
 * where f(a) and f(b) differ in sign.
 */
export function brentRoot(f: (x: number) => number, a: number, b: number, fa = f(a), fb = f(b)): number {
  if (fa === 0) return a;
  if (fb === 0) return b;
  let c = a;
  let fc = fa;
  let d = b - a;
  let e = d;
  for (let iter = 0; iter < 100; iter++) {
    if (Math.sign(fb) === Math.sign(fc)) {
      c = a;
      fc = fa;
      d = b - a;
      e = d;
    }
    if (Math.abs(fc) < Math.abs(fb)) {
      a = b; b = c; c = a;
      fa = fb; fb = fc; fc = fa;
    }
    const tol = 2 * Number.EPSILON * Math.abs(b) + 0.5 * ROOT_REL_TOL * Math.abs(b);
    const m = 0.5 * (c - b);
    if (Math.abs(m) <= tol || fb === 0) return b;
    if (Math.abs(e) >= tol && Math.abs(fa) > Math.abs(fb)) {
      let p: number;
      let q: number;
      const s = fb / fa;
      if (a === c) {
        p = 2 * m * s;
        q = 1 - s;
      } else {
        const qq = fa / fc;
        const r = fb / fc;
        p = s * (2 * m * qq * (qq - r) - (b - a) * (r - 1));
        q = (qq - 1) * (r - 1) * (s - 1);
      }
      if (p > 0) q = -q;
      else p = -p;
      if (2 * p < Math.min(3 * m * q - Math.abs(tol * q), Math.abs(e * q))) {
        e = d;
        d = p / q;
      } else {
        d = m;
        e = d;
      }
    } else {
      d = m;
      e = d;
    }
    a = b;
    fa = fb;
    b += Math.abs(d) > tol ? d : m > 0 ? tol : -tol;
    fb = f(b);
  }
  return b;
}

/**
 * Every sign change of f between successive sample depths, each root-found by Brent.
 * Samples must be ascending. A sample where f is exactly 0 counts as a root when the
 * sign differs on either side.
 * @returns depths in the unit of the samples, ascending
 */
export function signChanges(f: (x: number) => number, samples: ArrayLike<number>): number[] {
  const roots: number[] = [];
  if (samples.length < 2) return roots;
  let xPrev = samples[0];
  let fPrev = f(xPrev);
  for (let i = 1; i < samples.length; i++) {
    const x = samples[i];
    const fx = f(x);
    if (fPrev !== 0 && fx !== 0 && (fPrev < 0) !== (fx < 0)) {
      roots.push(brentRoot(f, xPrev, x, fPrev, fx));
    } else if (fx === 0 && i + 1 < samples.length) {
      const fNext = f(samples[i + 1]);
      if (fPrev !== 0 && fNext !== 0 && (fPrev < 0) !== (fNext < 0)) roots.push(x);
    }
    if (fx !== 0) {
      xPrev = x;
      fPrev = fx;
    }
  }
  return roots;
}

/**
 * Sample depths for bracketing on [0, depth]: quadratic spacing, dense near the
 * surface where shallow implants and erfc layers put their junctions.
 */
export function bracketSamples(depth: number, count: number): Float64Array {
  const out = new Float64Array(count + 1);
  for (let i = 0; i <= count; i++) {
    const u = i / count;
    out[i] = depth * u * (0.35 + 0.65 * u);
  }
  return out;
}
