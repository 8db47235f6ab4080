// What each step kind asks for in its card: field path inside the step,
// label, unit (shown as the input's suffix) and input type. Also the list
// operations on steps (add, duplicate, move, delete), pure over the array.
import { computed, type MaybeRefOrGetter, toValue } from 'vue';
import { newStepId, newStepOfKind, type StepKind } from '../../shared/schemas/recipe';
import { AMBIENT_TEXT, DOPANT_OPTIONS, SURFACE_MODE_OPTIONS } from '../components/recipe/recipe-labels';

export interface QuantityFieldDef {
  input: 'quantity';
  key: string;
  label: string;
  unit: string;
  /** Empty input means "not given" (undefined) instead of an error. */
  optional?: boolean;
  hint?: string;
}

export interface SelectFieldDef {
  input: 'select';
  key: string;
  label: string;
  options: { value: string; label: string }[];
}

export type StepFieldDef = QuantityFieldDef | SelectFieldDef;

/** A step as the form holds it: quantities may be numbers or the text being typed. */
export interface EditableStep {
  id: string;
  kind: StepKind;
  label?: string;
  tubeId: number | null;
  [field: string]: unknown;
}

const q = (key: string, label: string, unit: string, extra: Partial<QuantityFieldDef> = {}): QuantityFieldDef => ({
  input: 'quantity',
  key,
  label,
  unit,
  ...extra,
});
const select = (key: string, label: string, options: { value: string; label: string }[]): SelectFieldDef => ({
  input: 'select',
  key,
  label,
  options,
});

const ambientOptions = (values: string[]) => values.map((value) => ({ value, label: AMBIENT_TEXT[value] }));

const RAMPS: StepFieldDef[] = [
  q('loadTempC', 'Load temperature', '°C', { optional: true, hint: 'Empty: loaded at setpoint, no ramps.' }),
  q('rampUpCPerMin', 'Ramp-up', '°C/min'),
  q('rampDownCPerMin', 'Ramp-down', '°C/min'),
];

/** Field definitions per step kind, in the order the card shows them. */
export const STEP_FIELDS: Record<StepKind, StepFieldDef[]> = {
  predeposition: [
    select('dopant', 'Dopant', DOPANT_OPTIONS),
    q('tempC', 'Temperature', '°C'),
    q('timeMin', 'Time at setpoint', 'min'),
    select('surface.mode', 'Surface concentration', SURFACE_MODE_OPTIONS),
    ...RAMPS,
  ],
  implant: [
    select('dopant', 'Dopant', DOPANT_OPTIONS),
    q('doseCm2', 'Dose', 'cm⁻²'),
    q('energyKeV', 'Energy', 'keV', { optional: true }),
    q('rpUm', 'Projected range Rp', 'µm'),
    q('dRpUm', 'Straggle ΔRp', 'µm'),
  ],
  anneal: [
    q('tempC', 'Temperature', '°C'),
    q('timeMin', 'Time at setpoint', 'min'),
    select('ambient', 'Ambient', ambientOptions(['inert', 'dry-o2', 'wet-o2'])),
    ...RAMPS,
  ],
  oxidation: [
    q('tempC', 'Temperature', '°C'),
    q('timeMin', 'Time at setpoint', 'min'),
    select('ambient', 'Ambient', ambientOptions(['dry-o2', 'wet-o2'])),
    ...RAMPS,
  ],
};

/** The fixed-surface concentration field, shown only in 'fixed' mode. */
export const SURFACE_CONCENTRATION_FIELD = q('surface.concentration', 'Surface concentration', 'cm⁻³');

/** Reads a dotted path ('surface.mode') from a step. */
export function readField(step: EditableStep, key: string): unknown {
  return key.split('.').reduce<unknown>((v, k) => (v !== null && typeof v === 'object' ? (v as Record<string, unknown>)[k] : undefined), step);
}

/** Writes a dotted path in place; `undefined` removes the field. */
export function writeField(step: EditableStep, key: string, value: unknown): void {
  const parts = key.split('.');
  let target = step as Record<string, unknown>;
  for (const part of parts.slice(0, -1)) {
    if (target[part] === null || typeof target[part] !== 'object') target[part] = {};
    target = target[part] as Record<string, unknown>;
  }
  const last = parts[parts.length - 1];
  if (value === undefined) delete target[last];
  else target[last] = value;
}

/** Fields of one step, including the surface concentration when its mode asks for it. */
export function fieldsOfStep(step: EditableStep): StepFieldDef[] {
  const fields = STEP_FIELDS[step.kind] ?? [];
  if (step.kind !== 'predeposition' || readField(step, 'surface.mode') !== 'fixed') return fields;
  const at = fields.findIndex((f) => f.key === 'surface.mode') + 1;
  return [...fields.slice(0, at), SURFACE_CONCENTRATION_FIELD, ...fields.slice(at)];
}

export function addStep(steps: EditableStep[], kind: StepKind): EditableStep[] {
  return [...steps, newStepOfKind(kind) as EditableStep];
}

/** A copy placed right after the original, with a new id. */
export function duplicateStep(steps: EditableStep[], index: number): EditableStep[] {
  const copy = { ...plainCopy(steps[index]), id: newStepId() };
  return [...steps.slice(0, index + 1), copy, ...steps.slice(index + 1)];
}

export function moveStep(steps: EditableStep[], index: number, by: -1 | 1): EditableStep[] {
  const to = index + by;
  if (to < 0 || to >= steps.length) return steps;
  const next = [...steps];
  [next[index], next[to]] = [next[to], next[index]];
  return next;
}

export function removeStep(steps: EditableStep[], index: number): EditableStep[] {
  return steps.filter((_, i) => i !== index);
}

/** The field list of a step, reactive to its kind and surface mode. */
export function useStepFields(step: MaybeRefOrGetter<EditableStep>) {
  return computed(() => fieldsOfStep(toValue(step)));
}

function plainCopy<T>(value: T): T {
  // structuredClone cannot copy Vue proxies; a JSON round trip of plain form data can.
  return JSON.parse(JSON.stringify(value)) as T;
}
