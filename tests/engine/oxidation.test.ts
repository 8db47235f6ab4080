import { describe, expect, it } from 'vitest';
import dg from '../../reference/oxidation-deal-grove.json';
import {
  SEGREGATION,
  dealGroveRates,
  interstitialSupersaturation,
  oedFactor,
  oxideThickness,
  type OxidationAmbient,
} from '../../shared/engine/oxidation';
import { DOPANTS } from '../../shared/engine/dopants';
import { EngineInputError } from '../../shared/engine/errors';

const base = { orientation: '100' as const, tempC: 1000, timeMin: 60, initialOxideUm: 0 };

describe('oxideThickness: textbook worked examples (Plummer, Deal & Griffin 2000 ch. 6 constants)', () => {
  it.each(dg.workedExamples.cases)('$ambient ($orientation) $tempC °C, $timeMin min on bare Si ≈ $thicknessUm µm', (c) => {
    const r = oxideThickness({
      ambient: c.ambient as OxidationAmbient,
      orientation: c.orientation as '100',
      tempC: c.tempC,
      timeMin: c.timeMin,
      initialOxideUm: c.initialOxideUm,
    });
    expect(Math.abs(r.thicknessUm - c.thicknessUm)).toBeLessThanOrEqual(c.toleranceUm);
  });

  it('consumes 0.44 µm of silicon per µm of oxide grown (Deal & Grove 1965)', () => {
    const r = oxideThickness({ ...base, ambient: 'wet-o2', initialOxideUm: 0.1 });
    expect(r.siliconConsumedUm / (r.thicknessUm - 0.1)).toBeCloseTo(0.44, 12);
  });
});

describe('rate constants against Deal & Grove (1965) Table I, (111) silicon', () => {
  // Table I's A and B were fitted at each temperature separately; the single Arrhenius forms of
  // Plummer's Table 6-2 reproduce B within 20 % and A within 35 % (worst: dry O2 at 1200 °C).
  it.each(
    (['dry-o2', 'wet-o2'] as const).flatMap((amb) => dg.tableI[amb].map(([t, A, B]) => [amb, t, A, B] as [OxidationAmbient, number, number, number])),
  )('%s at %i °C: A ≈ %f µm, B ≈ %f µm²/h', (ambient, t, A, B) => {
    const r = dealGroveRates(ambient, '111', t);
    expect(Math.abs(r.B / B - 1)).toBeLessThan(0.2);
    expect(Math.abs(r.B / r.BoverA / A - 1)).toBeLessThan(0.35);
  });

  it('(100) B/A is (111) B/A divided by 1.68 and B does not depend on orientation (Plummer et al. Table 6-2)', () => {
    const a = dealGroveRates('dry-o2', '100', 1050);
    const b = dealGroveRates('dry-o2', '111', 1050);
    expect(b.BoverA / a.BoverA).toBeCloseTo(1.68, 12);
    expect(a.B).toBe(b.B);
  });
});

describe('Deal–Grove closed-form properties', () => {
  it('is linear, x ≈ (B/A)·t, for short times and parabolic, x² ≈ B·t, for long times', () => {
    const short = oxideThickness({ ...base, ambient: 'dry-o2', timeMin: 0.06 });
    expect(short.thicknessUm / (short.BoverA * (0.06 / 60))).toBeCloseTo(1, 3);
    const long = oxideThickness({ ...base, ambient: 'wet-o2', timeMin: 60 * 1000 });
    expect(long.thicknessUm ** 2 / (long.B * 1000)).toBeCloseTo(1, 1);
  });

  it('two 30-minute steps (the second starting from the first’s oxide) equal one 60-minute step', () => {
    for (const ambient of ['dry-o2', 'wet-o2'] as const) {
      const first = oxideThickness({ ...base, ambient, timeMin: 30 });
      const second = oxideThickness({ ...base, ambient, timeMin: 30, initialOxideUm: first.thicknessUm });
      const once = oxideThickness({ ...base, ambient, timeMin: 60 });
      expect(second.thicknessUm).toBeCloseTo(once.thicknessUm, 12);
    }
  });

  it('grows (111) faster than (100) and wet faster than dry', () => {
    const d100 = oxideThickness({ ...base, ambient: 'dry-o2' }).thicknessUm;
    const d111 = oxideThickness({ ...base, ambient: 'dry-o2', orientation: '111' }).thicknessUm;
    const w100 = oxideThickness({ ...base, ambient: 'wet-o2' }).thicknessUm;
    expect(d111).toBeGreaterThan(d100);
    expect(w100).toBeGreaterThan(5 * d100);
  });

  it('with the optional dry initial regime starts from x_i = 25 nm (Deal & Grove τ convention)', () => {
    const zero = oxideThickness({ ...base, ambient: 'dry-o2', timeMin: 0, dryInitialRegime: true });
    expect(zero.thicknessUm).toBeCloseTo(0.025, 12);
    const hour = oxideThickness({ ...base, ambient: 'dry-o2', dryInitialRegime: true });
    expect(hour.thicknessUm).toBeGreaterThan(oxideThickness({ ...base, ambient: 'dry-o2' }).thicknessUm);
    expect(hour.tauHours).toBeGreaterThan(0);
  });

  it('grows nothing, without NaN, far below oxidation temperatures', () => {
    const r = oxideThickness({ ...base, ambient: 'dry-o2', tempC: -270, initialOxideUm: 0.002 });
    expect(r.thicknessUm).toBeCloseTo(0.002, 12);
    expect(Number.isNaN(r.siliconConsumedUm)).toBe(false);
  });

  it.each([
    ['ambient', { ambient: 'steam' }],
    ['orientation', { orientation: '110' }],
    ['tempC', { tempC: -300 }],
    ['tempC', { tempC: Number.NaN }],
    ['timeMin', { timeMin: -1 }],
    ['initialOxideUm', { initialOxideUm: -0.01 }],
  ])('refuses a bad %s with an EngineInputError naming it', (path, patch) => {
    const call = () => oxideThickness({ ...base, ambient: 'dry-o2', ...(patch as object) } as Parameters<typeof oxideThickness>[0]);
    expect(call).toThrow(EngineInputError);
    expect(call).toThrowError(expect.objectContaining({ path }));
  });
});

describe('segregation and oxidation-enhanced diffusion (documented approximation)', () => {
  it('has m < 1 for boron (taken up by the oxide) and m > 1 for P, As, Sb (Grove, Leistiko & Sah 1964)', () => {
    expect(SEGREGATION.B.m).toBeLessThan(1);
    for (const d of ['P', 'As', 'Sb'] as const) expect(SEGREGATION[d].m).toBeGreaterThan(1);
    for (const d of DOPANTS) expect(SEGREGATION[d].citation).toMatch(/1964/);
  });

  it('is exactly 1 in an inert ambient', () => {
    for (const d of DOPANTS) expect(oedFactor('inert', d, 1000)).toBe(1);
  });

  it('enhances B and P, barely moves As and retards Sb in dry O2 (Plummer et al. 2000 ch. 7)', () => {
    expect(oedFactor('dry-o2', 'B', 1000)).toBeGreaterThan(2);
    expect(oedFactor('dry-o2', 'P', 1000)).toBeGreaterThan(2);
    expect(oedFactor('dry-o2', 'Sb', 1000)).toBeLessThan(1);
    expect(oedFactor('dry-o2', 'As', 1000)).toBeLessThan(oedFactor('dry-o2', 'B', 1000));
  });

  it('weakens with rising temperature and is stronger in wet O2', () => {
    expect(oedFactor('dry-o2', 'B', 900)).toBeGreaterThan(oedFactor('dry-o2', 'B', 1100));
    expect(oedFactor('wet-o2', 'B', 1000)).toBeGreaterThan(oedFactor('dry-o2', 'B', 1000));
    expect(interstitialSupersaturation('dry-o2', 1400)).toBe(interstitialSupersaturation('dry-o2', 1200));
  });

  it.each([
    ['dopant', () => oedFactor('dry-o2', 'Ga' as 'B', 1000)],
    ['ambient', () => oedFactor('ozone' as 'inert', 'B', 1000)],
    ['tempC', () => oedFactor('dry-o2', 'B', Number.NaN)],
  ])('refuses a bad %s', (path, call) => {
    expect(call).toThrowError(expect.objectContaining({ path }));
  });
});
