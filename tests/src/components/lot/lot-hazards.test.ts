import { describe, expect, it } from 'vitest';
import type { RecipeStep } from '../../../../shared/schemas/recipe';
import { lotHazards, maxFurnaceTempC } from '../../../../src/components/lot/lot-hazards';

const ramps = { loadTempC: 800, rampUpCPerMin: 10, rampDownCPerMin: 5 };
const steps: RecipeStep[] = [
  { id: 'a', tubeId: 1, kind: 'predeposition', dopant: 'P', tempC: 900, timeMin: 20, surface: { mode: 'solubility' }, ...ramps },
  { id: 'b', tubeId: null, kind: 'implant', dopant: 'As', doseCm2: 5e15, energyKeV: 40, rpUm: 0.03, dRpUm: 0.01 },
  { id: 'c', tubeId: 2, kind: 'oxidation', tempC: 1000, timeMin: 60, ambient: 'wet-o2', ...ramps },
  { id: 'd', tubeId: 1, kind: 'predeposition', dopant: 'P', tempC: 950, timeMin: 10, surface: { mode: 'solubility' }, ...ramps },
  { id: 'e', tubeId: 3, kind: 'anneal', tempC: 1100, timeMin: 30, ambient: 'inert', ...ramps },
] as RecipeStep[];

describe('what the caution on a lot names', () => {
  it('lists each source and chemical once, with every step that uses it', () => {
    expect(lotHazards(steps).map((h) => [h.what, h.steps])).toEqual([
      ['POCl3', [1, 4]],
      ['HF deglaze after predeposition', [1, 4]],
      ['As ion implant', [2]],
      ['Pyrogenic steam (H₂ torch)', [3]],
    ]);
  });

  it('takes the hottest furnace setpoint and ignores implants', () => {
    expect(maxFurnaceTempC(steps)).toBe(1100);
    expect(maxFurnaceTempC([steps[1]])).toBeNull();
  });
});
