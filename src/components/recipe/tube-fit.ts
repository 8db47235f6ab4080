// Which tube dedications suit a step, for the hint beside the tube select.
// Mirrors the rules of shared/rules/tube-check.ts (common practice): a
// predeposition needs its dopant family's tube; other furnace steps may use an
// undoped tube, or a family tube when every dopant already in the wafer is of
// that family.
import { DOPANT_INFO, isDopant, type Dopant } from '../../../shared/engine/dopants';
import type { TubeDedication } from '../../../shared/schemas/tubes';

type StepLike = { kind: string; dopant?: unknown };
const FAMILY = { n: 'n-type', p: 'p-type' } as const;

/** Dopants in the wafer before step `index` runs (predepositions and implants before it). */
function dopantsBefore(steps: readonly StepLike[], index: number): Dopant[] {
  const found = steps.slice(0, index).flatMap((s) => (isDopant(s.dopant) ? [s.dopant] : []));
  return [...new Set(found)];
}

/** The dedications that suit step `index` and a sentence saying why. */
export function suitableDedications(steps: readonly StepLike[], index: number): { fits: TubeDedication[]; why: string } {
  const step = steps[index];
  if (step.kind === 'implant') return { fits: [], why: 'An implant runs on the implanter, not in a tube.' };
  if (step.kind === 'predeposition' && isDopant(step.dopant)) {
    const family = FAMILY[DOPANT_INFO[step.dopant].type];
    return { fits: [family], why: `A ${step.dopant} predeposition needs a ${family} tube.` };
  }
  const present = dopantsBefore(steps, index);
  const families = [...new Set(present.map((d) => FAMILY[DOPANT_INFO[d].type]))];
  if (present.length === 0) return { fits: ['undoped'], why: 'No dopant in the wafer yet: an undoped tube.' };
  if (families.length === 1) {
    return { fits: ['undoped', families[0]], why: `Wafers carrying ${present.join(', ')}: an undoped or ${families[0]} tube.` };
  }
  return { fits: ['undoped'], why: `Wafers carrying both families (${present.join(', ')}): an undoped tube only.` };
}
