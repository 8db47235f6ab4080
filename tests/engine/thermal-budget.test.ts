import { describe, expect, it } from 'vitest';
import { arrheniusFor, diffusivity } from '../../shared/engine/diffusivity';
import { BOLTZMANN_EV_PER_K, KELVIN_OFFSET } from '../../shared/engine/constants';
import { integrateOverTemperature, rampDurationsMin, stepDt, temperatureAt } from '../../shared/engine/thermal-budget';

/**
 * Exponential integral E1(z) for z > 1 by its continued fraction (Abramowitz & Stegun 5.1.22),
 * evaluated with the modified Lentz method: an implementation independent of the engine.
 */
function expint1(z: number): number {
  const tiny = 1e-300;
  let b = z + 1;
  let c = 1 / tiny;
  let d = 1 / b;
  let h = d;
  for (let i = 1; i < 200; i++) {
    const an = -i * i;
    b += 2;
    d = 1 / (an * d + b);
    c = b + an / c;
    const del = c * d;
    h *= del;
    if (Math.abs(del - 1) < 1e-16) break;
  }
  return h * Math.exp(-z);
}

/** Closed form ∫ D0·exp(−Ea/kT) dT (T in K) = D0·[T·e^(−a/T) − a·E1(a/T)], a = Ea/k. */
function arrheniusAntiderivative(D0: number, Ea: number, tK: number): number {
  const a = Ea / BOLTZMANN_EV_PER_K;
  return D0 * (tK * Math.exp(-a / tK) - a * expint1(a / tK));
}

/** Adaptive Simpson reference quadrature (a second, independent numerical method). */
function adaptiveSimpson(f: (x: number) => number, a: number, b: number, tol: number): number {
  const simpson = (fa: number, fm: number, fb: number, h: number) => (h / 6) * (fa + 4 * fm + fb);
  const rec = (a0: number, b0: number, fa: number, fm: number, fb: number, whole: number, depth: number): number => {
    const m = (a0 + b0) / 2;
    const lm = (a0 + m) / 2;
    const rm = (m + b0) / 2;
    const flm = f(lm);
    const frm = f(rm);
    const left = simpson(fa, flm, fm, m - a0);
    const right = simpson(fm, frm, fb, b0 - m);
    if (depth > 40 || Math.abs(left + right - whole) <= 15 * tol * Math.abs(left + right)) return left + right + (left + right - whole) / 15;
    return rec(a0, m, fa, flm, fm, left, depth + 1) + rec(m, b0, fm, frm, fb, right, depth + 1);
  };
  const fa = f(a);
  const fb = f(b);
  const fm = f((a + b) / 2);
  return rec(a, b, fa, fm, fb, simpson(fa, fm, fb, b - a), 0);
}

describe('ramp integral ∫D(T(t))dt', () => {
  const set = 'fuller-jaeger'; // one Arrhenius pair per dopant, so the closed form applies exactly
  it.each([
    ['B', 800, 1100],
    ['P', 700, 1000],
    ['As', 850, 1200],
    ['Sb', 900, 1250],
  ] as const)('%s from %d to %d °C matches the exponential-integral closed form to 1e-8', (dopant, lo, hi) => {
    const { D0, Ea } = arrheniusFor(dopant, set);
    const exact = arrheniusAntiderivative(D0, Ea, hi + KELVIN_OFFSET) - arrheniusAntiderivative(D0, Ea, lo + KELVIN_OFFSET);
    const ours = integrateOverTemperature((t) => diffusivity(dopant, t, set), lo, hi);
    expect(Math.abs(ours / exact - 1)).toBeLessThan(1e-8);
  });

  it('matches adaptive Simpson for the component-sum set (fair-1981) to 1e-8', () => {
    const f = (t: number) => diffusivity('B', t, 'fair-1981');
    const ref = adaptiveSimpson(f, 700, 1150, 1e-12);
    expect(Math.abs(integrateOverTemperature(f, 700, 1150) / ref - 1)).toBeLessThan(1e-8);
  });

  it('approaches the classic ramp equivalent time kT²/(Ea·rate) when the ramp starts far below the setpoint', () => {
    // Closed form in the limit Ea/kT ≫ 1: ∫ D dt over a ramp ≈ D(Ts)·kTs²/(Ea·r); the next term is ~2kT/Ea.
    const { D0, Ea } = arrheniusFor('B', 'fuller-jaeger');
    const d = (t: number) => D0 * Math.exp(-Ea / (BOLTZMANN_EV_PER_K * (t + KELVIN_OFFSET)));
    const ts = 1100;
    const tK = ts + KELVIN_OFFSET;
    const rate = 10; // °C/min
    const r = stepDt(d, { tempC: ts, timeMin: 0, loadTempC: 600, rampUpCPerMin: rate, rampDownCPerMin: rate });
    const limit = (d(ts) * BOLTZMANN_EV_PER_K * tK * tK) / (Ea * (rate / 60));
    const nextTerm = (2 * BOLTZMANN_EV_PER_K * tK) / Ea;
    expect(r.rampUpCm2 / limit - 1).toBeLessThan(0);
    expect(Math.abs(r.rampUpCm2 / limit - 1)).toBeLessThan(1.5 * nextTerm);
  });
});

describe('stepDt', () => {
  const d = (t: number) => diffusivity('P', t, 'fair-1981');

  it('is D·t at the setpoint when the wafer is loaded at the setpoint', () => {
    const r = stepDt(d, { tempC: 1000, timeMin: 30, loadTempC: 1000, rampUpCPerMin: 10, rampDownCPerMin: 5 });
    expect(r.totalCm2).toBeCloseTo(d(1000) * 1800, 25);
    expect(r.rampUpCm2 + r.rampDownCm2).toBe(0);
    expect(r.equivalentTimeMin).toBeCloseTo(30, 10);
  });

  it('adds ramps in inverse proportion to their rates, and reports the equivalent time at setpoint', () => {
    const r = stepDt(d, { tempC: 1100, timeMin: 60, loadTempC: 800, rampUpCPerMin: 10, rampDownCPerMin: 5 });
    expect(r.rampDownCm2 / r.rampUpCm2).toBeCloseTo(2, 12);
    expect(r.equivalentTimeMin).toBeGreaterThan(60);
    expect(r.equivalentTimeMin * 60 * r.setpointCm2s).toBeCloseTo(r.totalCm2, 20);
  });

  it('gives ramp durations and the temperature history of the program', () => {
    const p = { tempC: 1000, timeMin: 30, loadTempC: 800, rampUpCPerMin: 10, rampDownCPerMin: 5 };
    expect(rampDurationsMin(p)).toEqual({ upMin: 20, downMin: 40 });
    expect(temperatureAt(p, 10)).toBe(900);
    expect(temperatureAt(p, 35)).toBe(1000);
    expect(temperatureAt(p, 70)).toBe(900);
  });
});
