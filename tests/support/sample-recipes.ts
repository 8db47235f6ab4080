import type { RecipeDocumentInput } from '../../shared/schemas/recipe';

/** A boron predeposition and drive-in on n-type 1e15 cm⁻³ (test input, not demo data). */
export function boronTwoStep(tubes: { boron: number; anneal: number }): RecipeDocumentInput {
  return {
    schemaVersion: 1,
    substrate: { type: 'n', background: { concentration: 1e15 }, orientation: '100' },
    steps: [
      { id: 'predep', kind: 'predeposition', dopant: 'B', tempC: 950, timeMin: 30, surface: { mode: 'solubility' }, tubeId: tubes.boron },
      { id: 'drive', kind: 'anneal', tempC: 1100, timeMin: 60, ambient: 'inert', loadTempC: 800, tubeId: tubes.anneal },
    ],
  };
}
