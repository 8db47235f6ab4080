// First pass over a recipe: everything about each step that does not depend on the
// profile (temperature program, Dt per dopant with ramps and oxidation enhancement,
// predeposition surface concentration, oxide growth) plus the warnings that go with it.
import type { FurnaceStep, RecipeDocument, RecipeStep } from '../schemas/recipe';
import { DOPANTS, DOPANT_INFO, type Dopant } from './dopants';
import { diffusivity } from './diffusivity';
import { getParameterSet } from './parameter-sets';
import { solidSolubility, solidSolubilityRangeC } from './solid-solubility';
import { EngineInputError } from './errors';
import { oedFactor, oxideThickness } from './oxidation';
import { rampDurationsMin, stepDt, type StepDt, type TemperatureProgram } from './thermal-budget';
import type { EngineWarning } from './types';

export type Ambient = 'inert' | 'dry-o2' | 'wet-o2';

export interface DopantDt extends StepDt {
  oedFactor: number;
  /** The tube's fitted diffusivity factor applied in this step (1 when none). */
  calibrationFactor: number;
}

export interface OxideGrowth {
  grownUm: number;
  totalUm: number;
  siliconConsumedUm: number;
  parabolicRateUm2h: number;
  linearRateUmh: number;
}

export interface StepPlan {
  index: number;
  step: RecipeStep;
  program: TemperatureProgram | null;
  ambient: Ambient;
  rampUpMin: number;
  rampDownMin: number;
  /** Dt of every recipe dopant in this step (zero for an implant). */
  dt: Record<Dopant, DopantDt>;
  predepSurfaceCm3: number | null;
  oxide: OxideGrowth | null;
}

const ZERO_DT: DopantDt = {
  holdCm2: 0, rampUpCm2: 0, rampDownCm2: 0, totalCm2: 0, setpointCm2s: 0, equivalentTimeMin: 0, oedFactor: 1, calibrationFactor: 1,
};

/** Fitted diffusivity factor per tube id (calibration from measured lots). */
export type TubeFactors = Record<number, number>;

/** The factor for a step's tube, when the recipe opts into tube calibration. */
export function calibrationFactor(doc: RecipeDocument, tubeId: number | null, tubeFactors: TubeFactors): number {
  if (!doc.options.useTubeCalibration || tubeId === null) return 1;
  const f = tubeFactors[tubeId];
  if (f === undefined) return 1;
  if (!(f > 0) || !Number.isFinite(f)) throw new EngineInputError(`Calibration factor of tube ${tubeId} must be a positive number`, 'options.useTubeCalibration');
  return f;
}

/** The dopants a recipe uses, in DOPANTS order. */
export function recipeDopants(doc: RecipeDocument): Dopant[] {
  const used = new Set<Dopant>();
  for (const s of doc.steps) if (s.kind === 'predeposition' || s.kind === 'implant') used.add(s.dopant);
  return DOPANTS.filter((d) => used.has(d));
}

function programOf(step: FurnaceStep): TemperatureProgram {
  return {
    tempC: step.tempC,
    timeMin: step.timeMin,
    loadTempC: step.loadTempC ?? step.tempC,
    rampUpCPerMin: step.rampUpCPerMin,
    rampDownCPerMin: step.rampDownCPerMin,
  };
}

function fmt(x: number): string {
  return x.toPrecision(3);
}

/** Plans every step; pushes parameter-range warnings into `warnings`. */
export function planSteps(doc: RecipeDocument, warnings: EngineWarning[], tubeFactors: TubeFactors = {}): StepPlan[] {
  const setId = doc.parameterSet;
  const set = getParameterSet(setId);
  const dopants = recipeDopants(doc);
  let oxideUm = 0;
  return doc.steps.map((step, index) => {
    const dt = {} as Record<Dopant, DopantDt>;
    for (const d of DOPANTS) dt[d] = ZERO_DT;
    if (step.kind === 'implant') {
      return { index, step, program: null, ambient: 'inert', rampUpMin: 0, rampDownMin: 0, dt, predepSurfaceCm3: null, oxide: null };
    }
    const program = programOf(step);
    const ambient: Ambient = step.kind === 'predeposition' ? 'inert' : step.ambient;
    const { upMin, downMin } = rampDurationsMin(program);
    const [lo, hi] = set.validityC;
    if (step.tempC < lo || step.tempC > hi) {
      warnings.push({
        code: 'temperature-outside-validity',
        message: `${step.tempC} °C is outside the ${lo}–${hi} °C range stated for the parameter set "${set.label}"`,
        stepId: step.id,
        path: `steps.${index}.tempC`,
      });
    }
    for (const d of dopants) {
      const oed = ambient === 'inert' ? 1 : oedFactor(ambient, d, step.tempC);
      const cal = calibrationFactor(doc, step.tubeId, tubeFactors);
      const k = oed * cal;
      const budget = stepDt((t) => diffusivity(d, t, setId), program);
      dt[d] = {
        oedFactor: oed,
        calibrationFactor: cal,
        holdCm2: budget.holdCm2 * k,
        rampUpCm2: budget.rampUpCm2 * k,
        rampDownCm2: budget.rampDownCm2 * k,
        totalCm2: budget.totalCm2 * k,
        setpointCm2s: budget.setpointCm2s * k,
        equivalentTimeMin: budget.equivalentTimeMin,
      };
    }
    let predepSurfaceCm3: number | null = null;
    if (step.kind === 'predeposition') {
      const limit = solidSolubility(step.dopant, step.tempC);
      if (step.surface.mode === 'solubility') {
        predepSurfaceCm3 = limit;
        const [sLo, sHi] = solidSolubilityRangeC(step.dopant);
        if (step.tempC < sLo || step.tempC > sHi) {
          warnings.push({
            code: 'solubility-outside-range',
            message: `The solid-solubility table for ${DOPANT_INFO[step.dopant].name} covers ${sLo}–${sHi} °C; at ${step.tempC} °C its end value ${fmt(limit)} cm⁻³ is used`,
            stepId: step.id,
            path: `steps.${index}.tempC`,
          });
        }
      } else {
        predepSurfaceCm3 = step.surface.concentration;
        if (predepSurfaceCm3 > limit * 1.0001) {
          warnings.push({
            code: 'concentration-above-solubility',
            message: `Surface concentration ${fmt(predepSurfaceCm3)} cm⁻³ is above the solid solubility of ${DOPANT_INFO[step.dopant].name} at ${step.tempC} °C (${fmt(limit)} cm⁻³)`,
            stepId: step.id,
            path: `steps.${index}.surface.concentration`,
          });
        }
      }
    }
    let oxide: OxideGrowth | null = null;
    if (ambient !== 'inert') {
      // Deal–Grove at the setpoint for the time at setpoint; growth during the ramps is neglected.
      const ox = oxideThickness({
        ambient,
        orientation: doc.substrate.orientation,
        tempC: step.tempC,
        timeMin: step.timeMin,
        initialOxideUm: oxideUm,
      });
      const grownUm = Math.max(0, ox.thicknessUm - oxideUm);
      oxideUm = ox.thicknessUm;
      oxide = {
        grownUm,
        totalUm: oxideUm,
        siliconConsumedUm: ox.siliconConsumedUm,
        parabolicRateUm2h: ox.B,
        linearRateUmh: ox.BoverA,
      };
    }
    return { index, step, program, ambient, rampUpMin: upMin, rampDownMin: downMin, dt, predepSurfaceCm3, oxide };
  });
}
