// Words the recipe screens use for the document's enumerations.
import { DOPANTS, DOPANT_INFO, type Dopant } from '../../../shared/engine/dopants';
import type { SolverMethod } from '../../../shared/engine/types';
import type { StepKind } from '../../../shared/schemas/recipe';
import type { VersionState } from '../../../shared/schemas/recipes-api';

export const STEP_KIND_LABELS: Record<StepKind, string> = {
  predeposition: 'Predeposition',
  implant: 'Implant',
  anneal: 'Anneal / drive-in',
  oxidation: 'Oxidation',
};

export const STEP_KIND_ICONS: Record<StepKind, string> = {
  predeposition: 'pi pi-cloud-download',
  implant: 'pi pi-bolt',
  anneal: 'pi pi-sun',
  oxidation: 'pi pi-circle',
};

/** PrimeVue Tag severities for the version states. */
export const STATE_SEVERITY: Record<VersionState, 'secondary' | 'warn' | 'success' | 'contrast'> = {
  draft: 'secondary',
  in_review: 'warn',
  released: 'success',
  retired: 'contrast',
};

export const DOPANT_OPTIONS = DOPANTS.map((d) => ({
  value: d,
  label: `${d} · ${DOPANT_INFO[d].name} (${DOPANT_INFO[d].type}-type)`,
}));

export const dopantType = (d: Dopant) => DOPANT_INFO[d].type;

export const AMBIENT_TEXT: Record<string, string> = {
  inert: 'Inert (N₂ / Ar)',
  'dry-o2': 'Dry O₂',
  'wet-o2': 'Wet O₂ (steam)',
};

export const METHOD_OPTIONS = [
  { value: 'auto', label: 'Automatic', hint: 'Closed forms while they hold, the numerical solver from the first step that needs it.' },
  { value: 'analytic', label: 'Closed forms', hint: 'Analytic profiles only; the engine warns where they do not hold.' },
  { value: 'numerical', label: 'Numerical solver', hint: 'Finite differences for every step.' },
];

export const METHOD_TEXT: Record<SolverMethod | 'mixed', string> = {
  analytic: 'closed forms',
  numerical: 'numerical solver',
  mixed: 'closed forms, then the numerical solver',
};

export const IMPLANT_SURFACE_OPTIONS = [
  {
    value: 'reflect',
    label: 'Keep the whole dose',
    hint:
      'The part of the implanted Gaussian that would lie above the surface is mirrored back into the silicon, so the dose the implanter counted stays in the wafer. Differs from the truncated form by under 0.2 % of the dose when Rp ≥ 3 ΔRp.',
  },
  {
    value: 'lose',
    label: 'Truncate at the surface',
    hint: 'The part of the Gaussian above the surface never enters the silicon; the retained dose is less than the implanted dose for shallow implants.',
  },
];

export const SURFACE_MODE_OPTIONS = [
  { value: 'solubility', label: 'Solid solubility' },
  { value: 'fixed', label: 'Fixed value' },
];
