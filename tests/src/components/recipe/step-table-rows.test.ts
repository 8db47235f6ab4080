import { describe, expect, it } from 'vitest';
import { computeRecipe } from '../../../../shared/engine';
import { parseRecipeDocument } from '../../../../shared/schemas/recipe';
import { stepTableRows } from '../../../../src/components/recipe/step-table-rows';

describe('stepTableRows', () => {
  it('gives one row per dopant in the wafer, spanning the step cells, and one row before any dopant', () => {
    const parsed = parseRecipeDocument({
      schemaVersion: 1,
      substrate: { type: 'p', background: { concentration: 1e15 } },
      steps: [
        { id: 'ox', kind: 'oxidation', tempC: 1000, timeMin: 20, ambient: 'dry-o2', tubeId: 4 },
        { id: 'b', kind: 'implant', dopant: 'B', doseCm2: 1e13, energyKeV: 40, rpUm: 0.13, dRpUm: 0.045 },
        { id: 'as', kind: 'implant', dopant: 'As', doseCm2: 5e15, energyKeV: 50, rpUm: 0.033, dRpUm: 0.012 },
        { id: 'a', kind: 'anneal', tempC: 1000, timeMin: 30, tubeId: 3 },
      ],
    });
    if (!parsed.ok) throw new Error(JSON.stringify(parsed.issues));
    const rows = stepTableRows(computeRecipe(parsed.doc));
    expect(rows.map((r) => [r.step.stepId, r.budget?.dopant ?? null, r.first, r.span])).toEqual([
      ['ox', null, true, 1],
      ['b', 'B', true, 1],
      ['as', 'B', true, 2],
      ['as', 'As', false, 2],
      ['a', 'B', true, 2],
      ['a', 'As', false, 2],
    ]);
    expect(new Set(rows.map((r) => r.key)).size).toBe(rows.length);
  });
});
