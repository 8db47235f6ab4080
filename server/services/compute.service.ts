// The server's authoritative computation: the same engine the browser runs,
// with engine input errors turned into API errors that name the field.
import { computeRecipe } from '../../shared/engine/index';
import { EngineInputError } from '../../shared/engine/errors';
import type { RecipeResult } from '../../shared/engine/types';
import type { TubeFactors } from '../../shared/engine/step-plan';
import type { RecipeDocument } from '../../shared/schemas/recipe';
import type { VersionSummary } from '../../shared/schemas/recipes-api';
import { HttpError } from '../http-error';

/** The engine with the tubes' calibration in force (applied only if the recipe opts in). */
export function computeAuthoritative(doc: RecipeDocument, tubeFactors: TubeFactors, pathPrefix = ''): RecipeResult {
  try {
    return computeRecipe(doc, { tubeFactors });
  } catch (e) {
    if (e instanceof EngineInputError) {
      throw new HttpError(422, 'engine_input', e.message, [{ path: pathPrefix + e.path, message: e.message }]);
    }
    throw e;
  }
}

export function summarize(result: RecipeResult): VersionSummary {
  return {
    junctionDepthsUm: result.final.junctionDepthsUm,
    sheetResistanceOhmSq: result.final.sheetResistanceOhmSq,
    surfaceNetCm3: result.final.surfaceNetCm3,
    surfaceType: result.final.surfaceType,
    dopants: result.final.dopants.map((d) => d.dopant),
    warnings: result.warnings.length,
  };
}
