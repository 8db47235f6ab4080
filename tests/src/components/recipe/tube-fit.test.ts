import { describe, expect, it } from 'vitest';
import { checkTubes } from '../../../../shared/rules/tube-check';
import { newRecipeDocument, type RecipeStep } from '../../../../shared/schemas/recipe';
import { TUBE_DEDICATIONS, type Tube } from '../../../../shared/schemas/tubes';
import { suitableDedications } from '../../../../src/components/recipe/tube-fit';

const tubes: Tube[] = TUBE_DEDICATIONS.map((dedication, i) => ({
  id: i + 1,
  name: `T${i + 1}`,
  dedication,
  minTempC: 500,
  maxTempC: 1300,
  ambients: ['inert', 'dry-o2', 'wet-o2'],
  notes: '',
  createdAt: '',
  updatedAt: '',
}));

const predep = (dopant: 'B' | 'P'): RecipeStep => ({ id: `p${dopant}`, kind: 'predeposition', dopant, tempC: 950, timeMin: 30, surface: { mode: 'solubility' }, tubeId: null, loadTempC: 950, rampUpCPerMin: 10, rampDownCPerMin: 5 });
const implant = (dopant: 'As' | 'B'): RecipeStep => ({ id: `i${dopant}`, kind: 'implant', dopant, doseCm2: 1e15, rpUm: 0.1, dRpUm: 0.03, tubeId: null });
const anneal: RecipeStep = { id: 'a', kind: 'anneal', tempC: 1000, timeMin: 30, ambient: 'inert', tubeId: null, loadTempC: 1000, rampUpCPerMin: 10, rampDownCPerMin: 5 };

describe('suitableDedications', () => {
  it.each([
    [[predep('B')], 0, ['p-type']],
    [[predep('P')], 0, ['n-type']],
    [[anneal], 0, ['undoped']],
    [[implant('As'), anneal], 1, ['undoped', 'n-type']],
    [[predep('B'), anneal], 1, ['undoped', 'p-type']],
    [[implant('As'), predep('B'), anneal], 2, ['undoped']],
    [[implant('B')], 0, []],
  ])('step %#: suits %j', (steps, index, fits) => {
    expect(suitableDedications(steps, index).fits).toEqual(fits);
  });

  // The hint must never recommend a tube the shared rule check would flag.
  it.each([
    [[predep('B'), anneal]],
    [[implant('As'), anneal]],
    [[implant('As'), predep('B'), anneal]],
    [[predep('P'), anneal]],
  ])('agrees with checkTubes: every suggested tube passes the dedication rule (%#)', (steps) => {
    steps.forEach((_, index) => {
      for (const dedication of suitableDedications(steps, index).fits) {
        const tube = tubes.find((t) => t.dedication === dedication)!;
        const doc = { ...newRecipeDocument(), steps: steps.map((s, i) => (i === index ? { ...s, tubeId: tube.id } : s)) };
        const issues = checkTubes(doc, tubes).filter((i) => i.path === `steps.${index}.tubeId`);
        expect(issues, `${dedication} for step ${index}`).toEqual([]);
      }
    });
  });
});
