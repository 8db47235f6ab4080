// Rows of the per-step table: one per dopant in the wafer during the step
// (setpoint, junction and sheet-resistance cells span them), one plain row
// for a step before any dopant is in.
import type { DopantStepBudget, RecipeResult, StepResult } from '../../../shared/engine/types';

export interface StepTableRow {
  key: string;
  step: StepResult;
  budget: DopantStepBudget | null;
  /** First row of its step: carries the spanning cells. */
  first: boolean;
  /** Rows of this step (rowspan of the spanning cells). */
  span: number;
}

export function stepTableRows(result: RecipeResult): StepTableRow[] {
  return result.steps.flatMap((step): StepTableRow[] => {
    const present = step.dopants.filter((d) => d.present);
    if (present.length === 0) return [{ key: step.stepId, step, budget: null, first: true, span: 1 }];
    return present.map((budget, i) => ({ key: `${step.stepId}-${budget.dopant}`, step, budget, first: i === 0, span: present.length }));
  });
}
