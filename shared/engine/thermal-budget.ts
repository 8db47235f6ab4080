// Thermal budget of a furnace step: the wafer is pushed at the load temperature,
// ramped linearly to the setpoint, held, and ramped back down. Dt = ∫D(T(t))dt is
// integrated numerically over both ramps (closed-form "equivalent time" shortcuts
// are approximations; see physics notes in recipe-document.md).

/** A furnace temperature program. All temperatures °C, times min, rates °C/min. */
export interface TemperatureProgram {
  tempC: number;
  timeMin: number;
  loadTempC: number;
  rampUpCPerMin: number;
  rampDownCPerMin: number;
}

/** Durations of the two ramps, min (0 when the wafer is loaded at the setpoint). */
export function rampDurationsMin(p: TemperatureProgram): { upMin: number; downMin: number } {
  const span = Math.max(0, p.tempC - p.loadTempC);
  return { upMin: span / p.rampUpCPerMin, downMin: span / p.rampDownCPerMin };
}

// 5-point Gauss–Legendre nodes and weights on [-1, 1] (Abramowitz & Stegun 25.4.30).
const GL_X = [0, -0.5384693101056831, 0.5384693101056831, -0.906179845938664, 0.906179845938664];
const GL_W = [0.5688888888888889, 0.4786286704993665, 0.4786286704993665, 0.2369268850576089, 0.2369268850576089];

/** Widest temperature panel of the ramp quadrature, °C: D changes by ≲ 10× across it. */
const PANEL_C = 80;

/**
 * ∫ f(T) dT from t0C to t1C by composite 5-point Gauss–Legendre on panels of at most 80 °C.
 * For an Arrhenius D the relative error is below 1e-9 (tested against adaptive Simpson).
 */
export function integrateOverTemperature(f: (tempC: number) => number, t0C: number, t1C: number): number {
  const span = t1C - t0C;
  if (!(span > 0)) return 0;
  const panels = Math.max(1, Math.ceil(span / PANEL_C));
  const h = span / panels;
  let sum = 0;
  for (let p = 0; p < panels; p++) {
    const mid = t0C + (p + 0.5) * h;
    let s = 0;
    for (let k = 0; k < 5; k++) s += GL_W[k] * f(mid + 0.5 * h * GL_X[k]);
    sum += 0.5 * h * s;
  }
  return sum;
}

export interface StepDt {
  /** D × time at setpoint, cm². */
  holdCm2: number;
  rampUpCm2: number;
  rampDownCm2: number;
  /** Whole step, cm². */
  totalCm2: number;
  /** D at the setpoint, cm²/s. */
  setpointCm2s: number;
  /** totalCm2 / setpoint D, min. */
  equivalentTimeMin: number;
}

/**
 * Dt of one furnace step for a diffusivity law d(T) (cm²/s, T in °C):
 * hold at setpoint plus ∫ d(T) dT / rate over each linear ramp.
 */
export function stepDt(d: (tempC: number) => number, p: TemperatureProgram): StepDt {
  const setpointCm2s = d(p.tempC);
  const holdCm2 = setpointCm2s * p.timeMin * 60;
  const ramp = p.tempC > p.loadTempC ? integrateOverTemperature(d, p.loadTempC, p.tempC) * 60 : 0;
  const rampUpCm2 = ramp / p.rampUpCPerMin;
  const rampDownCm2 = ramp / p.rampDownCPerMin;
  const totalCm2 = holdCm2 + rampUpCm2 + rampDownCm2;
  const equivalentTimeMin = setpointCm2s > 0 ? totalCm2 / setpointCm2s / 60 : 0;
  return { holdCm2, rampUpCm2, rampDownCm2, totalCm2, setpointCm2s, equivalentTimeMin };
}

/**
 * Temperature of the program at time tMin from the push (°C): ramp up, hold, ramp down.
 * Used by the solver when D depends on temperature through more than one law.
 */
export function temperatureAt(p: TemperatureProgram, tMin: number): number {
  const { upMin, downMin } = rampDurationsMin(p);
  if (tMin <= upMin) return p.loadTempC + p.rampUpCPerMin * tMin;
  if (tMin <= upMin + p.timeMin) return p.tempC;
  const intoDown = Math.min(tMin - upMin - p.timeMin, downMin);
  return p.tempC - p.rampDownCPerMin * intoDown;
}
