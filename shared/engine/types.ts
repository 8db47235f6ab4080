// The result document: plain JSON (no classes, no NaN/Infinity), units spelled in
// every numeric field name. The browser preview, the API and the command line all
// return exactly this shape.
import type { Dopant } from './dopants';

/** Bumped whenever the numbers for the same recipe may change. */
export const ENGINE_VERSION = '1.0.0';

export type SolverMethod = 'analytic' | 'numerical';
export type CarrierType = 'n' | 'p';

export type WarningCode =
  | 'temperature-outside-validity'
  | 'solubility-outside-range'
  | 'two-step-invalid'
  | 'analytic-not-valid'
  | 'implant-near-surface'
  | 'oxidation-approximation'
  | 'no-junction'
  | 'concentration-above-solubility'
  | 'profile-truncated';

export interface EngineWarning {
  code: WarningCode;
  message: string;
  stepId?: string;
  /** Field path in the recipe document the warning is about, e.g. 'steps.2.tempC'. */
  path?: string;
}

/** Thermal budget of one dopant in one step. */
export interface DopantStepBudget {
  dopant: Dopant;
  /** True once the dopant is in the wafer (introduced by this or an earlier step). */
  present: boolean;
  /** Intrinsic D at the setpoint × the oxidation-enhancement and calibration factors, cm²/s. */
  diffusivityCm2s: number;
  /** Oxidation-enhanced diffusion factor applied in this step (1 in inert ambient). */
  oedFactor: number;
  /** The step's tube calibration factor applied to D (1 when none applies). */
  calibrationFactor: number;
  /** ∫D(T(t))dt over the step, ramps included, cm². */
  dtCm2: number;
  /** √(Dt), µm. */
  sqrtDtUm: number;
  /** Diffusion length 2√(Dt), µm. */
  diffusionLengthUm: number;
  /** Sum of Dt since the dopant entered the wafer, this step included, cm² (0 before). */
  cumulativeDtCm2: number;
  /** Time at the setpoint giving the same Dt as the whole step (ramps included), min. */
  equivalentTimeMin: number;
}

export interface OxideState {
  /** Oxide grown in this step, µm. */
  grownUm: number;
  /** Total oxide on the wafer after the step, µm. */
  totalUm: number;
  /** Silicon consumed by this step, µm (the surface moves down by this much). */
  siliconConsumedUm: number;
  /** Deal–Grove B (µm²/h) and B/A (µm/h) at the setpoint. */
  parabolicRateUm2h: number;
  linearRateUmh: number;
  /** Segregation at the moving interface, per dopant in the wafer (oxidation-effect.ts). */
  segregation: SegregationEffect[];
}

export interface SegregationEffect {
  dopant: Dopant;
  /** Segregation coefficient m = C_Si / C_SiO2 used. */
  coefficient: number;
  /** Fraction of the dopant in the consumed silicon that stayed in the silicon (0..1). */
  keptFraction: number;
  /** Dose taken up by the oxide in this step, cm⁻². */
  doseToOxideCm2: number;
}

/** One row of the step table: setpoint, thermal budget and the layer AFTER the step. */
export interface StepResult {
  stepId: string;
  index: number;
  kind: 'predeposition' | 'implant' | 'anneal' | 'oxidation';
  label: string | null;
  /** Setpoint, °C (null for an implant). */
  tempC: number | null;
  /** Time at setpoint, min (null for an implant). */
  timeMin: number | null;
  rampUpMin: number;
  rampDownMin: number;
  /** Setpoint time plus both ramps, min. */
  totalTimeMin: number;
  method: SolverMethod;
  methodReason: string;
  /** One entry per dopant used anywhere in the recipe, in DOPANTS order. */
  dopants: DopantStepBudget[];
  /** Surface concentration used by a predeposition, cm⁻³ (null otherwise). */
  predepSurfaceCm3: number | null;
  oxide: OxideState | null;
  junctionDepthsUm: number[];
  sheetResistanceOhmSq: number | null;
  /** |net doping| at the surface, cm⁻³, and its type. */
  surfaceNetCm3: number;
  surfaceType: CarrierType;
  /** Dose in the silicon per dopant after the step, cm⁻². */
  retainedDoseCm2: Partial<Record<Dopant, number>>;
}

export interface JunctionResult {
  depthUm: number;
  /** Type above (shallower than) and below the junction. */
  above: CarrierType;
  below: CarrierType;
}

export interface DopantSummary {
  dopant: Dopant;
  type: CarrierType;
  retainedDoseCm2: number;
  surfaceConcentrationCm3: number;
  peakConcentrationCm3: number;
  peakDepthUm: number;
  totalDtCm2: number;
}

export interface LayerResult {
  junctions: JunctionResult[];
  junctionDepthsUm: number[];
  surfaceType: CarrierType;
  surfaceNetCm3: number;
  /** 1/∫qμ|Nnet|dx from the surface to the first junction, Ω/□ (null without a junction). */
  sheetResistanceOhmSq: number | null;
  /** Sheet resistance × first junction depth, Ω·cm (null without a junction). */
  averageResistivityOhmCm: number | null;
  dopants: DopantSummary[];
}

export interface ProfileResult {
  /** Depth below the current silicon surface, µm, ascending from 0. */
  depthUm: number[];
  /** Concentration of each dopant (electrically active assumed), cm⁻³. */
  dopants: { dopant: Dopant; type: CarrierType; concentrationCm3: number[] }[];
  /** Signed net doping including the background, cm⁻³: positive n-type, negative p-type. */
  netCm3: number[];
  backgroundCm3: number;
}

export interface RecipeResult {
  engineVersion: string;
  schemaVersion: 1;
  parameterSetId: string;
  parameterSetLabel: string;
  parameterSetCitation: string;
  substrate: { type: CarrierType; backgroundCm3: number; resistivityOhmCm: number; orientation: '100' | '111' };
  /** 'mixed' when the analytic path ran first and the solver took over. */
  method: SolverMethod | 'mixed';
  /** Implant surface treatment used (see recipe options). */
  implantSurface: 'reflect' | 'lose';
  concentrationDependent: boolean;
  /** Tube calibration: whether the recipe opted in, and the factors applied to its steps' tubes. */
  calibration: { optedIn: boolean; factors: { tubeId: number; factor: number }[] };
  steps: StepResult[];
  final: LayerResult & { oxideThicknessUm: number; siliconConsumedUm: number };
  profile: ProfileResult;
  warnings: EngineWarning[];
}
