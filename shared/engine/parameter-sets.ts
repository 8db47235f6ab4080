import intrinsic from '../../reference/diffusivity-intrinsic.json';
import type { Dopant } from './dopants';
import { EngineInputError } from './errors';

/** Identifier of a published diffusivity parameter set (see reference/diffusivity-intrinsic.json). */
export type ParameterSetId = string;

/** What a recipe, a result and a printed traveller show about the chosen parameter set. */
export interface ParameterSetInfo {
  id: string;
  label: string;
  /** Author, title, year, table. */
  citation: string;
  /** Temperature range the set is stated for, °C; outside it the result carries a warning. */
  validityC: [number, number];
  dopants: Dopant[];
  /** Where values come from memory and need verifying, and other caveats. */
  note: string;
}

const DOPANT_ORDER: Dopant[] = ['B', 'P', 'As', 'Sb'];

/** All published diffusivity parameter sets, in the order the UI offers them. */
export const PARAMETER_SETS: ParameterSetInfo[] = intrinsic.sets.map((s) => ({
  id: s.id,
  label: s.label,
  citation: s.citation,
  validityC: [s.validityC[0], s.validityC[1]] as [number, number],
  dopants: [...DOPANT_ORDER],
  note: s.note,
}));

/** The set a new recipe starts with: Fair (1981), which also carries the charged components. */
export const DEFAULT_PARAMETER_SET: ParameterSetId = intrinsic.defaultSet;

/**
 * Looks up a parameter set by id.
 * @throws EngineInputError (path 'parameterSet') for an unknown id
 */
export function getParameterSet(id: string): ParameterSetInfo {
  const found = PARAMETER_SETS.find((s) => s.id === id);
  if (!found) {
    throw new EngineInputError(
      `unknown parameter set ${JSON.stringify(id)}; expected one of ${PARAMETER_SETS.map((s) => s.id).join(', ')}`,
      'parameterSet',
    );
  }
  return found;
}

/** True when tempC lies inside the set's stated validity range (inclusive). */
export function isWithinValidity(id: string, tempC: number): boolean {
  const [lo, hi] = getParameterSet(id).validityC;
  return tempC >= lo && tempC <= hi;
}
