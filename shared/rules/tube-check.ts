// Whether each step of a recipe may run in the tube it is assigned to. The
// rules are common practice of diffusion furnaces (no published source):
// a tube is dedicated to one dopant family and never mixed; a predeposition
// source needs a tube dedicated to its family; wafers already carrying a
// dopant only enter tubes of that family or undoped ones; setpoint and
// ambient within what the tube is qualified for; implants use no tube.
import { DOPANT_INFO, type Dopant } from '../engine/dopants';
import type { RecipeDocument } from '../schemas/recipe';
import type { TubeIssue } from '../schemas/recipes-api';
import type { Tube } from '../schemas/tubes';

const FAMILY: Record<'n' | 'p', Tube['dedication']> = { n: 'n-type', p: 'p-type' };

/** Tube rule breaches of a document, one per broken rule, each with its field path. */
export function checkTubes(doc: RecipeDocument, tubes: Pick<Tube, 'id' | 'name' | 'dedication' | 'minTempC' | 'maxTempC' | 'ambients'>[]): TubeIssue[] {
  const byId = new Map(tubes.map((t) => [t.id, t]));
  const issues: TubeIssue[] = [];
  const present = new Set<Dopant>();
  doc.steps.forEach((step, i) => {
    const at = (field: string, message: string) => issues.push({ stepId: step.id, path: `steps.${i}.${field}`, message });
    if (step.kind === 'implant') {
      if (step.tubeId !== null) at('tubeId', 'An implant runs on the implanter, not in a tube: clear the tube');
      present.add(step.dopant);
      return;
    }
    if (step.kind === 'predeposition') present.add(step.dopant);
    if (step.tubeId === null) {
      at('tubeId', 'Assign a tube to this step');
      return;
    }
    const tube = byId.get(step.tubeId);
    if (!tube) {
      at('tubeId', `Tube ${step.tubeId} does not exist`);
      return;
    }
    if (step.kind === 'predeposition') {
      const family = FAMILY[DOPANT_INFO[step.dopant].type];
      if (tube.dedication !== family) {
        at('tubeId', `${tube.name} is ${tube.dedication}; a ${step.dopant} predeposition needs a ${family} tube`);
      }
    } else if (tube.dedication !== 'undoped') {
      const foreign = [...present].filter((d) => FAMILY[DOPANT_INFO[d].type] !== tube.dedication);
      if (foreign.length > 0) {
        at('tubeId', `${tube.name} is ${tube.dedication}; wafers carrying ${foreign.join(', ')} would contaminate it`);
      }
    }
    if (step.tempC < tube.minTempC || step.tempC > tube.maxTempC) {
      at('tempC', `${step.tempC} °C is outside ${tube.name}'s qualified range ${tube.minTempC}–${tube.maxTempC} °C`);
    }
    const ambient = step.kind === 'predeposition' ? 'inert' : step.ambient;
    if (!tube.ambients.includes(ambient)) {
      at('ambient', `${tube.name} is not qualified for the ${ambient} ambient`);
    }
  });
  return issues;
}
