// Engine speed: the analytic path (the live preview), the solver at its default
// (converged) resolution, and a burst of preview recomputations as on typing.
import { computeRecipe } from '../../shared/engine/index';
import { parseRecipeDocument, type RecipeDocument } from '../../shared/schemas/recipe';
import { tenStepRecipe } from '../engine/fixtures/ten-step-recipe';
import { medianMs, report } from './measure';

function parsed(method: 'auto' | 'analytic' | 'numerical', points?: number): RecipeDocument {
  const p = parseRecipeDocument(tenStepRecipe(method, points));
  if (!p.ok) throw new Error(p.issues.map((i) => `${i.path}: ${i.message}`).join('\n'));
  return p.doc;
}

export default async function engineBench(): Promise<void> {
  const analytic = parsed('analytic', 1000);
  report('10-step recipe, analytic, 1000-point profile + junctions + Rs', await medianMs(() => computeRecipe(analytic), 200, 20), 1);

  const numerical = parsed('numerical', 1000);
  report('10-step recipe, numerical solver (xj converged to 0.5 %)', await medianMs(() => computeRecipe(numerical), 30, 3), 30);

  const auto = parsed('auto');
  report('10-step recipe, auto method, default points (one preview)', await medianMs(() => computeRecipe(auto), 50, 5), 20);

  // The keystroke path: each recomputation sees a slightly different final-anneal temperature.
  const drafts = Array.from({ length: 1000 }, (_, i) => {
    const doc = structuredClone(auto);
    const step = doc.steps[8];
    if (step.kind === 'anneal') step.tempC = 930 + (i % 40);
    return doc;
  });
  report('1000 preview recomputations (auto, default points)', await medianMs(() => drafts.forEach((d) => computeRecipe(d)), 3, 1));
}
