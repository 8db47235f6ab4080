// What the caution on a lot names: the hottest furnace setpoint and the dopant
// sources and chemicals its steps use. Sources follow the usual choice per
// dopant (shared/rules, common practice); the site's own sources may differ.
import { DEFAULT_PREDEP_SOURCE } from '../../../shared/rules/acceptance-windows';
import type { RecipeStep } from '../../../shared/schemas/recipe';

export interface LotHazard {
  key: string;
  /** What is used, e.g. 'POCl3 liquid source'. */
  what: string;
  /** Why it needs care, in a few words. */
  why: string;
  /** 1-based step numbers that use it. */
  steps: number[];
}

const SOURCE_WHY: Record<keyof typeof DEFAULT_PREDEP_SOURCE, string> = {
  B: 'corrosive, toxic liquid; fumes (HBr) with moist air',
  P: 'corrosive, toxic liquid; fumes (HCl) with moist air',
  As: 'extremely toxic, flammable gas',
  Sb: 'toxic antimony oxide residues',
};

function add(list: Map<string, LotHazard>, key: string, what: string, why: string, step: number) {
  const found = list.get(key);
  if (found) found.steps.push(step);
  else list.set(key, { key, what, why, steps: [step] });
}

/** The hazards of a recipe's steps, in step order of first use. */
export function lotHazards(steps: readonly RecipeStep[]): LotHazard[] {
  const list = new Map<string, LotHazard>();
  steps.forEach((step, i) => {
    const n = i + 1;
    if (step.kind === 'predeposition') {
      add(list, `source-${step.dopant}`, DEFAULT_PREDEP_SOURCE[step.dopant], SOURCE_WHY[step.dopant], n);
      add(list, 'hf', 'HF deglaze after predeposition', 'penetrates skin; burns may show hours later', n);
    } else if (step.kind === 'implant') {
      add(list, 'implanter', `${step.dopant} ion implant`, 'high voltage, X-rays, toxic source gases at the implanter', n);
    } else if (step.ambient === 'wet-o2') {
      add(list, 'steam', 'Pyrogenic steam (H₂ torch)', 'flammable hydrogen, nearly invisible flame', n);
    }
  });
  return [...list.values()];
}

/** The hottest furnace setpoint of the run, °C (null when no step heats the wafers in a tube). */
export function maxFurnaceTempC(steps: readonly RecipeStep[]): number | null {
  const temps = steps.flatMap((s) => (s.kind === 'implant' ? [] : [s.tempC]));
  return temps.length ? Math.max(...temps) : null;
}
