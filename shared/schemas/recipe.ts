// The recipe document: the contract between the Recipe workspace, the API, the
// database (stored as JSON) and the engine. Versioned by `schemaVersion`; field
// by field in recipe-document.md. Inputs take numbers in the canonical unit or
// strings with units; the parsed document holds plain numbers only.
import { z } from 'zod';
import { DOPANTS, type Dopant } from '../engine/dopants';
import { typicalImplant } from '../engine/implant-table';
import { DEFAULT_PARAMETER_SET, PARAMETER_SETS } from '../engine/parameter-sets';
import { quantityField } from './quantity';

export const RECIPE_SCHEMA_VERSION = 1 as const;

export const STEP_KINDS = ['predeposition', 'implant', 'anneal', 'oxidation'] as const;
export type StepKind = (typeof STEP_KINDS)[number];

export const ANNEAL_AMBIENTS = ['inert', 'dry-o2', 'wet-o2'] as const;
export const OXIDATION_AMBIENTS = ['dry-o2', 'wet-o2'] as const;
export const SOLVER_METHODS = ['auto', 'analytic', 'numerical'] as const;
export const IMPLANT_SURFACE_TREATMENTS = ['reflect', 'lose'] as const;

/** Limits of the form fields (not of the physics: parameter-set validity is a warning). */
export const RECIPE_LIMITS = {
  tempC: [500, 1300],
  loadTempC: [20, 1300],
  timeMin: [0, 10000],
  rampCPerMin: [0.1, 100],
  doseCm2: [1e8, 1e18],
  energyKeV: [0.1, 5000],
  rpUm: [0, 20],
  dRpUm: [0.0001, 10],
  surfaceConcentrationCm3: [1e14, 1e22],
  backgroundCm3: [1e11, 1e20],
  resistivityOhmCm: [1e-4, 1e5],
  points: [20, 5000],
  depthUm: [0.01, 500],
  steps: 50,
} as const;

const L = RECIPE_LIMITS;
const label = z.string().trim().max(120, 'Label must be at most 120 characters').optional();
const stepId = z
  .string({ error: 'Each step needs an id (text)' })
  .trim()
  .min(1, 'Each step needs an id')
  .max(64, 'Step id must be at most 64 characters');
const tubeId = z
  .number({ error: 'Tube must be a tube id or null' })
  .int('Tube must be a tube id or null')
  .positive('Tube must be a tube id or null')
  .nullable()
  .default(null);
const dopant = z.enum(DOPANTS as readonly [Dopant, ...Dopant[]], {
  error: `Dopant must be one of ${DOPANTS.join(', ')}`,
});
const tempC = quantityField('temperature', { label: 'Temperature', min: L.tempC[0], max: L.tempC[1] });
const timeMin = quantityField('time', { label: 'Time at setpoint', min: L.timeMin[0], max: L.timeMin[1] });

/** Ramp fields shared by every furnace step; all three optional (no ramp when omitted). */
const rampFields = {
  loadTempC: quantityField('temperature', { label: 'Load temperature', min: L.loadTempC[0], max: L.loadTempC[1] }).optional(),
  rampUpCPerMin: quantityField('rampRate', { label: 'Ramp-up rate', min: L.rampCPerMin[0], max: L.rampCPerMin[1] }).default(10),
  rampDownCPerMin: quantityField('rampRate', { label: 'Ramp-down rate', min: L.rampCPerMin[0], max: L.rampCPerMin[1] }).default(5),
};

const common = { id: stepId, label, tubeId };

const surfaceSchema = z.discriminatedUnion(
  'mode',
  [
    z.object({ mode: z.literal('solubility') }),
    z.object({
      mode: z.literal('fixed'),
      concentration: quantityField('concentration', {
        label: 'Surface concentration',
        min: L.surfaceConcentrationCm3[0],
        max: L.surfaceConcentrationCm3[1],
      }),
    }),
  ],
  { error: 'Surface must be {"mode":"solubility"} or {"mode":"fixed","concentration":…}' },
);

const predepositionStep = z.object({
  ...common,
  kind: z.literal('predeposition'),
  dopant,
  tempC,
  timeMin,
  surface: surfaceSchema.default({ mode: 'solubility' }),
  ...rampFields,
});

const implantStep = z.object({
  ...common,
  kind: z.literal('implant'),
  dopant,
  doseCm2: quantityField('dose', { label: 'Dose', min: L.doseCm2[0], max: L.doseCm2[1] }),
  energyKeV: quantityField('energy', { label: 'Energy', min: L.energyKeV[0], max: L.energyKeV[1] }).optional(),
  rpUm: quantityField('length', { label: 'Projected range Rp', min: L.rpUm[0], max: L.rpUm[1] }),
  dRpUm: quantityField('length', { label: 'Straggle ΔRp', min: L.dRpUm[0], max: L.dRpUm[1] }),
});

const annealStep = z.object({
  ...common,
  kind: z.literal('anneal'),
  tempC,
  timeMin,
  ambient: z.enum(ANNEAL_AMBIENTS, { error: 'Ambient must be inert, dry-o2 or wet-o2' }).default('inert'),
  ...rampFields,
});

const oxidationStep = z.object({
  ...common,
  kind: z.literal('oxidation'),
  tempC,
  timeMin,
  ambient: z.enum(OXIDATION_AMBIENTS, { error: 'Ambient must be dry-o2 or wet-o2' }),
  ...rampFields,
});

const KIND_MESSAGE = `Step kind must be one of ${STEP_KINDS.join(', ')}`;

const stepSchema = z
  .discriminatedUnion('kind', [predepositionStep, implantStep, annealStep, oxidationStep], { error: KIND_MESSAGE })
  .transform((step, ctx) => {
    if (step.kind === 'implant') return step;
    // No load temperature given: the wafer goes in at setpoint, no ramps.
    const loadTempC = step.loadTempC ?? step.tempC;
    if (loadTempC > step.tempC) {
      ctx.addIssue({ code: 'custom', path: ['loadTempC'], message: 'Load temperature must not be above the setpoint' });
      return z.NEVER;
    }
    return { ...step, loadTempC };
  });

const backgroundSchema = z
  .object(
    {
      concentration: quantityField('concentration', {
        label: 'Background concentration',
        min: L.backgroundCm3[0],
        max: L.backgroundCm3[1],
      }).optional(),
      resistivity: quantityField('resistivity', {
        label: 'Resistivity',
        min: L.resistivityOhmCm[0],
        max: L.resistivityOhmCm[1],
      }).optional(),
    },
    { error: 'Background must be {"concentration": …} or {"resistivity": …}' },
  )
  .strict()
  .transform((b, ctx): { concentration: number } | { resistivity: number } => {
    if (b.concentration !== undefined && b.resistivity !== undefined) {
      ctx.addIssue({ code: 'custom', message: 'Give the background as a concentration or a resistivity, not both' });
      return z.NEVER;
    }
    if (b.concentration !== undefined) return { concentration: b.concentration };
    if (b.resistivity !== undefined) return { resistivity: b.resistivity };
    ctx.addIssue({ code: 'custom', message: 'Give the background as a concentration or a resistivity' });
    return z.NEVER;
  });

const substrateSchema = z.object({
  type: z.enum(['n', 'p'], { error: 'Substrate type must be n or p' }),
  background: backgroundSchema,
  orientation: z.enum(['100', '111'], { error: 'Orientation must be 100 or 111' }).default('100'),
});

const optionsSchema = z
  .object({
    method: z.enum(SOLVER_METHODS, { error: 'Method must be auto, analytic or numerical' }).default('auto'),
    /**
     * 'reflect' (default): the whole implanted dose stays in the silicon; the part of the
     * Gaussian that would lie above the surface is mirrored back (image source). It keeps
     * the dose the implanter counted, matches the flux-free surface the solver uses in
     * anneals, and differs from 'lose' by < 0.2 % of the dose when Rp ≥ 3 ΔRp.
     * 'lose': the part above the surface never enters the silicon (truncated Gaussian).
     */
    implantSurface: z.enum(IMPLANT_SURFACE_TREATMENTS, { error: 'Implant surface must be reflect or lose' }).default('reflect'),
    concentrationDependent: z.boolean({ error: 'Concentration-dependent diffusion must be true or false' }).default(false),
    /** Apply each tube's fitted diffusivity factor (calibration from measured lots) to the steps run in it. */
    useTubeCalibration: z.boolean({ error: 'Use of tube calibration must be true or false' }).default(false),
    points: z
      .number({ error: 'Profile points must be a whole number' })
      .int('Profile points must be a whole number')
      .min(L.points[0], `Profile points must be between ${L.points[0]} and ${L.points[1]}`)
      .max(L.points[1], `Profile points must be between ${L.points[0]} and ${L.points[1]}`)
      .default(400),
    /** Profile depth; null picks ~6 diffusion lengths (and past the deepest junction). */
    depthUm: quantityField('length', { label: 'Profile depth', min: L.depthUm[0], max: L.depthUm[1] })
      .nullable()
      .default(null),
  })
  .default({ method: 'auto', implantSurface: 'reflect', concentrationDependent: false, useTubeCalibration: false, points: 400, depthUm: null });

const parameterSetIds = () => PARAMETER_SETS.map((p) => p.id);

export const recipeDocumentSchema = z
  .object({
    schemaVersion: z.literal(RECIPE_SCHEMA_VERSION, { error: `schemaVersion must be ${RECIPE_SCHEMA_VERSION}` }),
    substrate: substrateSchema,
    parameterSet: z
      .string({ error: 'Parameter set must be the id of a published parameter set' })
      .default(DEFAULT_PARAMETER_SET)
      .refine((id) => parameterSetIds().includes(id), {
        error: (iss) => `Unknown parameter set "${String(iss.input)}"; choose one of ${parameterSetIds().join(', ')}`,
      }),
    options: optionsSchema,
    steps: z
      .array(stepSchema, { error: 'Steps must be a list' })
      .max(L.steps, `A recipe has at most ${L.steps} steps`),
  })
  .superRefine((doc, ctx) => {
    const seen = new Set<string>();
    doc.steps.forEach((s, i) => {
      if (seen.has(s.id)) ctx.addIssue({ code: 'custom', path: ['steps', i, 'id'], message: `Step id "${s.id}" is used twice` });
      seen.add(s.id);
    });
  });

/** The parsed, normalised document: every quantity a number in its canonical unit. */
export type RecipeDocument = z.output<typeof recipeDocumentSchema>;
/** What a client may send: quantities as numbers or strings with units, defaults optional. */
export type RecipeDocumentInput = z.input<typeof recipeDocumentSchema>;
export type RecipeStep = RecipeDocument['steps'][number];
export type PredepositionStep = Extract<RecipeStep, { kind: 'predeposition' }>;
export type ImplantStep = Extract<RecipeStep, { kind: 'implant' }>;
export type AnnealStep = Extract<RecipeStep, { kind: 'anneal' }>;
export type OxidationStep = Extract<RecipeStep, { kind: 'oxidation' }>;
export type FurnaceStep = PredepositionStep | AnnealStep | OxidationStep;
export type RecipeOptions = RecipeDocument['options'];
export type Substrate = RecipeDocument['substrate'];

export interface RecipeIssue {
  path: string;
  message: string;
}

export type ParseRecipeResult = { ok: true; doc: RecipeDocument } | { ok: false; issues: RecipeIssue[] };

/** Flattens zod issues to `{ path, message }`, pointing a bad step kind at `steps.N.kind`. */
function toRecipeIssues(error: z.ZodError, input: unknown): RecipeIssue[] {
  return error.issues.map((issue) => {
    const path = issue.path.map(String);
    if (issue.message === KIND_MESSAGE && path[0] === 'steps' && path.length === 2) path.push('kind');
    if (issue.code === 'unrecognized_keys') {
      return { path: path.join('.'), message: `Unknown field${issue.keys.length > 1 ? 's' : ''}: ${issue.keys.join(', ')}` };
    }
    if (path.length === 0 && (input === null || typeof input !== 'object')) {
      return { path: '', message: 'A recipe document must be a JSON object' };
    }
    return { path: path.join('.'), message: issue.message };
  });
}

/** Validates and normalises a recipe document; never throws. */
export function parseRecipeDocument(input: unknown): ParseRecipeResult {
  const parsed = recipeDocumentSchema.safeParse(input);
  if (parsed.success) return { ok: true, doc: parsed.data };
  return { ok: false, issues: toRecipeIssues(parsed.error, input) };
}

let stepCounter = 0;
/** A fresh id for a new step (unique within a document in practice). */
export function newStepId(): string {
  stepCounter += 1;
  return `s${Date.now().toString(36)}${stepCounter.toString(36)}`;
}

/**
 * Defaults for a new step in the form: typical values a process engineer starts from
 * (common practice, not a recommendation): load at 800 °C, 10 °C/min up, 5 °C/min down.
 */
export function newStepOfKind(kind: StepKind, id: string = newStepId()): RecipeStep {
  const ramps = { loadTempC: 800, rampUpCPerMin: 10, rampDownCPerMin: 5 };
  switch (kind) {
    case 'predeposition':
      return { id, tubeId: null, kind, dopant: 'B', tempC: 950, timeMin: 30, surface: { mode: 'solubility' }, ...ramps };
    case 'implant': {
      // Rp and ΔRp of 40 keV boron from the cited range table (shared/engine/implant-table.ts).
      const range = typicalImplant('B', 40) ?? { rpUm: 0.13, dRpUm: 0.044 };
      return { id, tubeId: null, kind, dopant: 'B', doseCm2: 1e15, energyKeV: 40, rpUm: range.rpUm, dRpUm: range.dRpUm };
    }
    case 'anneal':
      return { id, tubeId: null, kind, tempC: 1100, timeMin: 60, ambient: 'inert', ...ramps };
    case 'oxidation':
      return { id, tubeId: null, kind, tempC: 1000, timeMin: 60, ambient: 'dry-o2', ...ramps };
  }
}

/** A minimal valid document (p-type 1e15 cm⁻³ (100), default parameter set, no steps). */
export function newRecipeDocument(): RecipeDocument {
  return {
    schemaVersion: RECIPE_SCHEMA_VERSION,
    substrate: { type: 'p', background: { concentration: 1e15 }, orientation: '100' },
    parameterSet: DEFAULT_PARAMETER_SET,
    options: { method: 'auto', implantSurface: 'reflect', concentrationDependent: false, useTubeCalibration: false, points: 400, depthUm: null },
    steps: [],
  };
}
