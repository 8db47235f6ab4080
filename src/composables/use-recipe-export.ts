// Exports of the Recipe workspace, generated in the browser: the recipe
// document as JSON (our versioned schema, importable again) and the
// predicted profile as CSV.
import type { RecipeResult } from '../../shared/engine/types';
import { exportFileName } from '../components/recipe/recipe-draft-rules';
import { profileCsv } from '../components/profile/profile-csv';
import { downloadText } from './use-download';

export function useRecipeExport(source: () => { recipeName: string; versionNo: number; document: unknown; result: RecipeResult | null } | null) {
  function exportJson(document?: unknown): void {
    const s = source();
    if (!s) return;
    downloadText(exportFileName(s.recipeName, s.versionNo, 'recipe'), `${JSON.stringify(document ?? s.document, null, 2)}\n`, 'application/json');
  }

  /** False when there is no profile to export yet. */
  function exportCsv(): boolean {
    const s = source();
    if (!s?.result) return false;
    downloadText(exportFileName(s.recipeName, s.versionNo, 'profile'), profileCsv(s.result.profile), 'text/csv');
    return true;
  }

  return { exportJson, exportCsv };
}
