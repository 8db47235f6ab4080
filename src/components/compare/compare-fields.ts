// Labels and display text of document fields on the Compare screen, from the
// same field definitions the workspace forms use.
import type { RecipeStep } from '../../../shared/schemas/recipe';
import { STEP_FIELDS, SURFACE_CONCENTRATION_FIELD, type StepFieldDef } from '../../composables/use-step-fields';
import { toFieldText } from '../recipe/recipe-format';
import { AMBIENT_TEXT, IMPLANT_SURFACE_OPTIONS, METHOD_OPTIONS, STEP_KIND_LABELS, SURFACE_MODE_OPTIONS } from '../recipe/recipe-labels';

const EXTRA_LABELS: Record<string, string> = {
  position: 'Position',
  kind: 'Kind',
  label: 'Label',
  tubeId: 'Tube',
  type: 'Type',
  orientation: 'Orientation',
  'background.concentration': 'Background (cm⁻³)',
  'background.resistivity': 'Resistivity (Ω·cm)',
  parameterSet: 'Parameter set',
  method: 'Method',
  implantSurface: 'Implant at the surface',
  concentrationDependent: 'Concentration-dependent D',
  useTubeCalibration: 'Tube calibration',
  points: 'Profile points',
  depthUm: 'Profile depth (µm)',
};

const OPTION_LISTS: Record<string, { value: string; label: string }[]> = {
  'surface.mode': SURFACE_MODE_OPTIONS,
  method: METHOD_OPTIONS,
  implantSurface: IMPLANT_SURFACE_OPTIONS,
  type: [
    { value: 'n', label: 'n-type' },
    { value: 'p', label: 'p-type' },
  ],
};

function definition(kind: string, key: string): StepFieldDef | undefined {
  if (key === SURFACE_CONCENTRATION_FIELD.key) return SURFACE_CONCENTRATION_FIELD;
  return (STEP_FIELDS as Record<string, StepFieldDef[]>)[kind]?.find((f) => f.key === key);
}

/** 'Temperature (°C)', 'Tube', … */
export function fieldLabel(key: string, kind = ''): string {
  const def = definition(kind, key);
  if (def) return def.input === 'quantity' ? `${def.label} (${def.unit})` : def.label;
  return EXTRA_LABELS[key] ?? key;
}

/** A value as the Compare screen prints it; tubes by name. */
export function fieldText(key: string, value: unknown, tubeNames: Map<number, string>): string {
  if (value === undefined || value === null || value === '') return '—';
  if (key === 'tubeId' && typeof value === 'number') return tubeNames.get(value) ?? `Tube #${value}`;
  if (key === 'kind') return STEP_KIND_LABELS[value as RecipeStep['kind']] ?? String(value);
  if (key === 'ambient') return AMBIENT_TEXT[String(value)] ?? String(value);
  const options = OPTION_LISTS[key];
  if (options) return options.find((o) => o.value === value)?.label ?? String(value);
  if (typeof value === 'boolean') return value ? 'on' : 'off';
  return toFieldText(value);
}

/** The keys a step shows in a compare cell, in form order. */
export function stepKeys(step: RecipeStep): string[] {
  const defs = STEP_FIELDS[step.kind] ?? [];
  const keys = defs.map((d) => d.key);
  if (step.kind === 'predeposition' && step.surface.mode === 'fixed') keys.splice(keys.indexOf('surface.mode') + 1, 0, 'surface.concentration');
  return step.kind === 'implant' ? keys : ['tubeId', ...keys];
}
