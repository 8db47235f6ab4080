// Recipe document → result document. Steps run in order on one wafer state:
// closed forms while they are valid (the "why" goes into each step row), the
// finite-difference solver from the first step that needs it onwards.
import type { RecipeDocument } from '../schemas/recipe';
import {
  analyticConcentration,
  compileWafer,
  compiledDopingAt,
  analyticExtentCm,
  analyticSeries,
  consumeSiliconAnalytic,
  driveAnalytic,
  emptyAnalyticWafer,
  hasDopant,
  implantAnalytic,
  predepositAnalytic,
  type AnalyticWafer,
} from './analytic-wafer';
import { fermiDiffusivity } from './diffusivity';
import { DOPANTS, DOPANT_INFO, type Dopant } from './dopants';
import { EngineInputError } from './errors';
import { intrinsicCarrierConcentration } from './intrinsic-carriers';
import { evaluateLayer, type LayerEvaluation } from './layer-evaluation';
import {
  consumeSiliconNumerical,
  createNumericalWafer,
  diffuseNumerical,
  implantNumerical,
  loadProfile,
  numericalConcentration,
  numericalDose,
  numericalDopingAt,
  type NumericalWafer,
} from './numerical-wafer';
import { keptFractions } from './oxidation-effect';
import { SEGREGATION } from './oxidation';
import { getParameterSet } from './parameter-sets';
import { TWO_STEP_MIN_RATIO } from './profiles-analytic';
import { dopingFromResistivity, resistivityFromDoping } from './resistivity';
import { assertFiniteResult } from './result-guard';
import { DEFAULT_GRID_NODES, DEFAULT_TIME_STEPS, type TemperatureSegment } from './solver-fd';
import { calibrationFactor, planSteps, recipeDopants, type StepPlan, type TubeFactors } from './step-plan';
import {
  ENGINE_VERSION,
  type DopantStepBudget,
  type EngineWarning,
  type OxideState,
  type ProfileResult,
  type RecipeResult,
  type SolverMethod,
  type StepResult,
} from './types';

const UM = 1e-4; // cm per µm
/** Sub-steps of each ramp in the concentration-dependent solver. */
const RAMP_STEPS = 10;
/** Cap on the assumed enhancement of √(Dt) by concentration-dependent D when sizing the grid. */
const MAX_REACH_ENHANCEMENT = 4;

/** Resolution of the numerical path; the defaults converge junction depths to < 0.5 %. */
export interface SolverTuning {
  gridNodes?: number;
  timeSteps?: number;
  /** Fitted diffusivity factor per tube id; applied only when the recipe opts in. */
  tubeFactors?: TubeFactors;
}

/** The factors that actually multiplied D: one per tube that has a furnace step and a factor. */
function appliedCalibration(doc: RecipeDocument, tubeFactors: TubeFactors): RecipeResult['calibration'] {
  const factors = new Map<number, number>();
  for (const s of doc.steps) {
    if (s.kind === 'implant' || s.tubeId === null) continue;
    const f = calibrationFactor(doc, s.tubeId, tubeFactors);
    if (f !== 1 || tubeFactors[s.tubeId] !== undefined) factors.set(s.tubeId, f);
  }
  return {
    optedIn: doc.options.useTubeCalibration,
    factors: doc.options.useTubeCalibration ? [...factors].map(([tubeId, factor]) => ({ tubeId, factor })) : [],
  };
}

const sci = (x: number) => x.toExponential(2).replace('e+', 'e');

function resolveSubstrate(doc: RecipeDocument): { backgroundCm3: number; resistivityOhmCm: number } {
  const { type, background } = doc.substrate;
  try {
    if ('concentration' in background) {
      return { backgroundCm3: background.concentration, resistivityOhmCm: resistivityFromDoping(background.concentration, type) };
    }
    return { backgroundCm3: dopingFromResistivity(background.resistivity, type), resistivityOhmCm: background.resistivity };
  } catch (e) {
    if (e instanceof EngineInputError) {
      const field = 'concentration' in background ? 'concentration' : 'resistivity';
      throw new EngineInputError(`Substrate background: ${e.message}`, `substrate.background.${field}`);
    }
    throw e;
  }
}

const signOf = (d: Dopant): 1 | -1 => (DOPANT_INFO[d].type === 'n' ? 1 : -1);

/** Depth the solver grid must cover: every dopant's reach after the whole recipe, cm. */
function solverDepthCm(doc: RecipeDocument, plans: StepPlan[], dopants: Dopant[], backgroundCm3: number): number {
  let reach = 0.02 * UM;
  let consumed = 0;
  for (const d of dopants) {
    let introduced = false;
    let dtSum = 0;
    let implantReach = 0;
    let peak = 0;
    let enhancement = 1;
    for (const p of plans) {
      const s = p.step;
      if ((s.kind === 'implant' || s.kind === 'predeposition') && s.dopant === d) introduced = true;
      if (s.kind === 'implant' && s.dopant === d) {
        implantReach = Math.max(implantReach, (s.rpUm + 7 * s.dRpUm) * UM);
        peak = Math.max(peak, s.doseCm2 / (2.5 * s.dRpUm * UM));
      }
      if (s.kind === 'predeposition' && s.dopant === d) peak = Math.max(peak, p.predepSurfaceCm3 ?? 0);
      if (introduced) dtSum += p.dt[d].totalCm2;
      if (introduced && doc.options.concentrationDependent && p.program && peak > 0) {
        const t = p.program.tempC;
        const ratio = fermiDiffusivity(d, t, Math.max(peak, intrinsicCarrierConcentration(t)), doc.parameterSet) /
          fermiDiffusivity(d, t, intrinsicCarrierConcentration(t), doc.parameterSet);
        if (Number.isFinite(ratio)) enhancement = Math.max(enhancement, Math.min(MAX_REACH_ENHANCEMENT, Math.sqrt(ratio)));
      }
    }
    // 10·√(Dt) puts an erfc or Gaussian tail many decades below any background.
    const peakRatio = Math.max(10, peak / Math.max(backgroundCm3, 1));
    const tail = Math.sqrt(4 * Math.log(peakRatio) + 36) * Math.sqrt(dtSum) * enhancement;
    reach = Math.max(reach, implantReach + tail);
  }
  for (const p of plans) consumed += (p.oxide?.siliconConsumedUm ?? 0) * UM;
  return 1.1 * reach + consumed;
}

interface MethodChoice {
  method: SolverMethod;
  reason: string;
  warning?: EngineWarning;
}

function chooseMethod(
  doc: RecipeDocument,
  plan: StepPlan,
  analytic: AnalyticWafer,
  numericalFrom: number,
): MethodChoice {
  const step = plan.step;
  const forced = doc.options.method;
  if (numericalFrom >= 0) {
    return { method: 'numerical', reason: `continues from the solver's profile (numerical since step ${numericalFrom + 1})` };
  }
  if (forced === 'numerical') return { method: 'numerical', reason: 'numerical method chosen in the recipe options' };
  if (step.kind === 'predeposition' && hasDopant(analytic, step.dopant)) {
    const reason = `a predeposition of ${DOPANT_INFO[step.dopant].name} onto ${DOPANT_INFO[step.dopant].name} already in the wafer has no closed form`;
    return forced === 'analytic'
      ? { method: 'numerical', reason, warning: { code: 'analytic-not-valid', message: `Analytic method requested, but ${reason}; the solver was used`, stepId: step.id } }
      : { method: 'numerical', reason };
  }
  if (step.kind === 'implant') return { method: 'analytic', reason: 'implant Gaussian (Rp, ΔRp) — closed form' };

  let invalid: { reason: string; code: EngineWarning['code'] } | null = null;
  // Two-step shortcut: every predeposited layer that is being driven needs drive Dt ≫ predep Dt.
  for (const c of analytic.components) {
    if (c.kind !== 'erfc' || c.predepDtCm2 <= 0) continue;
    const drive = c.driveDtCm2 + plan.dt[c.dopant].totalCm2;
    const ratio = drive / c.predepDtCm2;
    if (drive > 0 && ratio < TWO_STEP_MIN_RATIO) {
      invalid = {
        code: 'two-step-invalid',
        reason: `two-step form not valid: the drive-in Dt of ${DOPANT_INFO[c.dopant].name} is ${ratio.toPrecision(2)}× its predeposition Dt (needs ≥ ${TWO_STEP_MIN_RATIO}×)`,
      };
      break;
    }
  }
  if (!invalid && doc.options.concentrationDependent && plan.program) {
    const ni = intrinsicCarrierConcentration(plan.program.tempC);
    for (const d of DOPANTS) {
      let peak = step.kind === 'predeposition' && step.dopant === d ? (plan.predepSurfaceCm3 ?? 0) : 0;
      for (const c of analytic.components) {
        if (c.dopant !== d) continue;
        const x = c.kind === 'gaussian' ? Math.max(0, c.rpCm - c.offsetCm) : 0;
        peak = Math.max(peak, analyticConcentration(analytic, d, x));
      }
      if (peak > ni) {
        invalid = {
          code: 'analytic-not-valid',
          reason: `concentration-dependent diffusion: ${DOPANT_INFO[d].name} reaches ${sci(peak)} cm⁻³, above nᵢ = ${sci(ni)} cm⁻³ at ${plan.program.tempC} °C`,
        };
        break;
      }
    }
  }
  if (!invalid) {
    const what = step.kind === 'predeposition' ? 'constant-source erfc' : 'closed-surface Gaussian / two-step forms';
    return { method: 'analytic', reason: `${what} valid (D independent of concentration)` };
  }
  if (forced === 'analytic') {
    return {
      method: 'analytic',
      reason: `analytic method chosen in the recipe options although ${invalid.reason}`,
      warning: { code: invalid.code, message: `Analytic method forced: ${invalid.reason}`, stepId: step.id },
    };
  }
  return { method: 'numerical', reason: invalid.reason };
}

function segmentsOf(plan: StepPlan, timeSteps: number): TemperatureSegment[] {
  const p = plan.program;
  if (!p) return [];
  return [
    { t0C: p.loadTempC, t1C: p.tempC, durationS: plan.rampUpMin * 60, steps: RAMP_STEPS },
    { t0C: p.tempC, t1C: p.tempC, durationS: p.timeMin * 60, steps: timeSteps },
    { t0C: p.tempC, t1C: p.loadTempC, durationS: plan.rampDownMin * 60, steps: RAMP_STEPS },
  ];
}

/**
 * Computes a recipe: thermal budget per step and dopant, profiles, junctions, sheet
 * resistance after every step and the final profile. Pure and deterministic.
 * @param doc a document parsed by parseRecipeDocument (numbers in canonical units)
 * @param tuning solver resolution (tests and benchmarks) and the tubes' calibration factors
 * @throws EngineInputError naming the field when an input cannot be computed with
 */
export function computeRecipe(doc: RecipeDocument, tuning: SolverTuning = {}): RecipeResult {
  const warnings: EngineWarning[] = [];
  const set = getParameterSet(doc.parameterSet);
  const { backgroundCm3, resistivityOhmCm } = resolveSubstrate(doc);
  const bgSigned = doc.substrate.type === 'n' ? backgroundCm3 : -backgroundCm3;
  const dopants = recipeDopants(doc);
  const plans = planSteps(doc, warnings, tuning.tubeFactors);
  const surfaceMode = doc.options.implantSurface;
  const nodes = tuning.gridNodes ?? DEFAULT_GRID_NODES;
  const timeSteps = tuning.timeSteps ?? DEFAULT_TIME_STEPS;

  const analytic = emptyAnalyticWafer();
  let numerical: NumericalWafer | null = null;
  let numericalFrom = -1;
  let usedAnalytic = false;
  const present = new Set<Dopant>();
  const cumulative: Partial<Record<Dopant, number>> = {};
  let oxideTotalUm = 0;
  let consumedTotalUm = 0;
  let oxidationWarned = false;
  let lastLayer: LayerEvaluation | null = null;

  const concentration = (d: Dopant, xCm: number) =>
    numerical ? numericalConcentration(numerical, d, xCm) : analyticConcentration(analytic, d, xCm);
  const doseOf = (d: Dopant) => (numerical ? numericalDose(numerical, d) : analytic.dose[d] ?? 0);
  const evaluate = (): LayerEvaluation => {
    const num = numerical;
    const compiled = num ? null : compileWafer(analytic, bgSigned);
    return evaluateLayer({
      hasDopants: present.size > 0,
      dopingAt: (x, out) => (num ? numericalDopingAt(num, bgSigned, x, out) : compiledDopingAt(compiled!, x, out)),
      samplesCm: numerical ? numerical.grid.xCm : null,
      extentCm: num ? num.grid.depthCm : analyticExtentCm(analytic, backgroundCm3 * 1e-3),
    });
  };

  const rows: StepResult[] = plans.map((plan) => {
    const step = plan.step;
    const choice = chooseMethod(doc, plan, analytic, numericalFrom);
    if (choice.warning) warnings.push(choice.warning);
    if (choice.method === 'numerical' && !numerical) {
      numerical = createNumericalWafer(solverDepthCm(doc, plans, dopants, backgroundCm3), nodes, timeSteps);
      numericalFrom = plan.index;
      for (const d of present) loadProfile(numerical, d, (x) => analyticConcentration(analytic, d, x), analytic.dose[d] ?? 0);
    }
    if (choice.method === 'analytic') usedAnalytic = true;
    const wafer = numerical;

    if (step.kind === 'implant') {
      if (wafer) implantNumerical(wafer, step.dopant, step.doseCm2, step.rpUm * UM, step.dRpUm * UM, surfaceMode);
      else implantAnalytic(analytic, step.dopant, step.doseCm2, step.rpUm * UM, step.dRpUm * UM, surfaceMode);
    } else {
      const fixed = step.kind === 'predeposition' ? { dopant: step.dopant, valueCm3: plan.predepSurfaceCm3 ?? 0 } : null;
      if (wafer) {
        const coupled = doc.options.concentrationDependent
          ? {
              segments: segmentsOf(plan, timeSteps),
              backgroundNetCm3: bgSigned,
              sign: signOf,
              diffusivity: (d: Dopant, t: number, n: number) => fermiDiffusivity(d, t, n, doc.parameterSet) * plan.dt[d].oedFactor * plan.dt[d].calibrationFactor,
              intrinsicCarriers: intrinsicCarrierConcentration,
            }
          : null;
        diffuseNumerical(wafer, plan.dt, fixed, coupled);
      } else {
        driveAnalytic(analytic, plan.dt);
        if (fixed) predepositAnalytic(analytic, fixed.dopant, fixed.valueCm3, plan.dt[fixed.dopant].totalCm2);
      }
    }
    if (step.kind === 'predeposition' || step.kind === 'implant') present.add(step.dopant);

    let oxide: OxideState | null = null;
    if (plan.oxide) {
      const kept = keptFractions(plan.oxide.grownUm, plan.oxide.siliconConsumedUm);
      const deltaCm = plan.oxide.siliconConsumedUm * UM;
      const lost = wafer ? consumeSiliconNumerical(wafer, deltaCm, kept) : consumeSiliconAnalytic(analytic, deltaCm, kept);
      oxideTotalUm = plan.oxide.totalUm;
      consumedTotalUm += plan.oxide.siliconConsumedUm;
      oxide = {
        grownUm: plan.oxide.grownUm,
        totalUm: plan.oxide.totalUm,
        siliconConsumedUm: plan.oxide.siliconConsumedUm,
        parabolicRateUm2h: plan.oxide.parabolicRateUm2h,
        linearRateUmh: plan.oxide.linearRateUmh,
        segregation: [...present].map((d) => ({
          dopant: d,
          coefficient: SEGREGATION[d].m,
          keptFraction: kept[d],
          doseToOxideCm2: Math.max(0, lost[d] ?? 0),
        })),
      };
      if (!oxidationWarned && present.size > 0) {
        oxidationWarned = true;
        warnings.push({
          code: 'oxidation-approximation',
          message:
            'Oxidising steps use a documented approximation: D × the oxidation-enhancement factor, the consumed silicon moves the surface, and segregation splits the consumed dopant between oxide and silicon',
          stepId: step.id,
        });
      }
    }

    const budgets: DopantStepBudget[] = dopants.map((d) => {
      const b = plan.dt[d];
      const isPresent = present.has(d);
      if (isPresent) cumulative[d] = (cumulative[d] ?? 0) + b.totalCm2;
      return {
        dopant: d,
        present: isPresent,
        diffusivityCm2s: b.setpointCm2s,
        oedFactor: b.oedFactor,
        calibrationFactor: b.calibrationFactor,
        dtCm2: b.totalCm2,
        sqrtDtUm: Math.sqrt(b.totalCm2) / UM,
        diffusionLengthUm: (2 * Math.sqrt(b.totalCm2)) / UM,
        cumulativeDtCm2: cumulative[d] ?? 0,
        equivalentTimeMin: b.equivalentTimeMin,
      };
    });

    const layer = evaluate();
    lastLayer = layer;
    const retained: Partial<Record<Dopant, number>> = {};
    for (const d of present) retained[d] = Math.max(0, doseOf(d));
    return {
      stepId: step.id,
      index: plan.index,
      kind: step.kind,
      label: step.label ?? null,
      tempC: plan.program ? plan.program.tempC : null,
      timeMin: plan.program ? plan.program.timeMin : null,
      rampUpMin: plan.rampUpMin,
      rampDownMin: plan.rampDownMin,
      totalTimeMin: plan.program ? plan.program.timeMin + plan.rampUpMin + plan.rampDownMin : 0,
      method: choice.method,
      methodReason: choice.reason,
      dopants: budgets,
      predepSurfaceCm3: plan.predepSurfaceCm3,
      oxide,
      junctionDepthsUm: layer.junctionsCm.map((x) => x / UM),
      sheetResistanceOhmSq: layer.sheetResistanceOhmSq,
      surfaceNetCm3: Math.abs(layer.surfaceNetCm3),
      surfaceType: layer.surfaceNetCm3 >= 0 ? 'n' : 'p',
      retainedDoseCm2: retained,
    };
  });

  implantWarnings(doc, warnings);
  const layer = lastLayer ?? evaluate();
  if (layer.junctionsCm.length === 0 && present.size > 0) {
    warnings.push({ code: 'no-junction', message: 'The net doping never changes sign: there is no junction against the background, so no sheet resistance is given' });
  }

  const profile = buildProfile(doc, layer, concentration, [...present], bgSigned, plans, numerical, analytic, backgroundCm3);
  const presentList = DOPANTS.filter((d) => present.has(d));
  const result: RecipeResult = {
    engineVersion: ENGINE_VERSION,
    schemaVersion: 1,
    parameterSetId: set.id,
    parameterSetLabel: set.label,
    parameterSetCitation: set.citation,
    substrate: { type: doc.substrate.type, backgroundCm3, resistivityOhmCm, orientation: doc.substrate.orientation },
    method: numericalFrom < 0 ? 'analytic' : usedAnalytic ? 'mixed' : 'numerical',
    implantSurface: surfaceMode,
    concentrationDependent: doc.options.concentrationDependent,
    calibration: appliedCalibration(doc, tuning.tubeFactors ?? {}),
    steps: rows,
    final: {
      junctions: layer.junctionsCm.map((x, i) => {
        // The type flips at every junction, starting from the surface type.
        const aboveIsN = (layer.surfaceNetCm3 >= 0) === (i % 2 === 0);
        return { depthUm: x / UM, above: aboveIsN ? 'n' : 'p', below: aboveIsN ? 'p' : 'n' };
      }),
      junctionDepthsUm: layer.junctionsCm.map((x) => x / UM),
      surfaceType: layer.surfaceNetCm3 >= 0 ? 'n' : 'p',
      surfaceNetCm3: Math.abs(layer.surfaceNetCm3),
      sheetResistanceOhmSq: layer.sheetResistanceOhmSq,
      averageResistivityOhmCm: layer.averageResistivityOhmCm,
      dopants: presentList.map((d) => {
        const series = profile.dopants.find((p) => p.dopant === d)?.concentrationCm3 ?? [];
        let peak = 0;
        let peakAt = 0;
        series.forEach((c, i) => {
          if (c > peak) {
            peak = c;
            peakAt = profile.depthUm[i];
          }
        });
        return {
          dopant: d,
          type: DOPANT_INFO[d].type,
          retainedDoseCm2: Math.max(0, doseOf(d)),
          surfaceConcentrationCm3: concentration(d, 0),
          peakConcentrationCm3: peak,
          peakDepthUm: peakAt,
          totalDtCm2: cumulative[d] ?? 0,
        };
      }),
      oxideThicknessUm: oxideTotalUm,
      siliconConsumedUm: consumedTotalUm,
    },
    profile,
    warnings,
  };
  assertFiniteResult(result);
  return result;
}

function implantWarnings(doc: RecipeDocument, warnings: EngineWarning[]): void {
  doc.steps.forEach((s, i) => {
    if (s.kind !== 'implant' || s.rpUm >= 2 * s.dRpUm) return;
    warnings.push({
      code: 'implant-near-surface',
      message: `Rp (${s.rpUm} µm) is less than 2 ΔRp (${s.dRpUm} µm): a noticeable part of the Gaussian lies above the surface, so the result depends on the implant surface treatment ("${doc.options.implantSurface}")`,
      stepId: s.id,
      path: `steps.${i}.rpUm`,
    });
  });
}

/** Profile depth: the recipe's depthUm, else ~6√(Dt) of the deepest dopant, implants' reach and 1.25× the deepest junction. */
function profileDepthCm(
  doc: RecipeDocument,
  layer: LayerEvaluation,
  plans: StepPlan[],
  present: Dopant[],
  numerical: NumericalWafer | null,
  analytic: AnalyticWafer,
  backgroundCm3: number,
): number {
  if (doc.options.depthUm !== null) return doc.options.depthUm * UM;
  let depth = 0.05 * UM;
  for (const d of present) {
    let dtSum = 0;
    let introduced = false;
    for (const p of plans) {
      const s = p.step;
      if ((s.kind === 'implant' || s.kind === 'predeposition') && s.dopant === d) introduced = true;
      if (introduced) dtSum += p.dt[d].totalCm2;
      if (s.kind === 'implant' && s.dopant === d) depth = Math.max(depth, (s.rpUm + 4 * s.dRpUm) * UM);
    }
    depth = Math.max(depth, 6 * Math.sqrt(dtSum));
  }
  const deepest = layer.junctionsCm[layer.junctionsCm.length - 1];
  if (deepest !== undefined) depth = Math.max(depth, 1.25 * deepest);
  // Cover the dopant down to a tenth of the background.
  if (!numerical) depth = Math.max(depth, Math.min(analyticExtentCm(analytic, backgroundCm3 * 0.1), 3 * depth));
  return depth;
}

function buildProfile(
  doc: RecipeDocument,
  layer: LayerEvaluation,
  concentration: (d: Dopant, xCm: number) => number,
  presentSet: Dopant[],
  bgSigned: number,
  plans: StepPlan[],
  numerical: NumericalWafer | null,
  analytic: AnalyticWafer,
  backgroundCm3: number,
): ProfileResult {
  const present = DOPANTS.filter((d) => presentSet.includes(d));
  const depthCm = profileDepthCm(doc, layer, plans, present, numerical, analytic, backgroundCm3);
  const n = doc.options.points;
  const depthUm = new Array<number>(n);
  const net = new Array<number>(n).fill(bgSigned);
  for (let i = 0; i < n; i++) depthUm[i] = ((depthCm * i) / (n - 1)) / UM;
  const xsCm = depthUm.map((x) => x * UM);
  const values = numerical
    ? present.map((d) => xsCm.map((x) => concentration(d, x)))
    : analyticSeries(compileWafer(analytic, bgSigned), present, xsCm);
  const series = present.map((d, k) => {
    const sign = signOf(d);
    const s = values[k];
    for (let i = 0; i < n; i++) net[i] += sign * s[i];
    return { dopant: d, type: DOPANT_INFO[d].type, concentrationCm3: s };
  });
  return { depthUm, dopants: series, netCm3: net, backgroundCm3: Math.abs(bgSigned) };
}
