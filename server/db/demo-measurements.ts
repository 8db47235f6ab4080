// Invented measured data for the demo and the tests: a "SIMS" profile and
// four-point-probe readings made from the model itself, with D scaled by a
// chosen factor and multiplicative noise. Every file says it is invented.
import { computeRecipe } from '../../shared/engine/index';
import type { RecipeDocument } from '../../shared/schemas/recipe';

/** Seeded PRNG (mulberry32) so demo files are the same on every machine. */
export function seededRandom(seed: number): () => number {
  return () => {
    seed |= 0;
    seed = (seed + 0x6d2b79f5) | 0;
    let t = Math.imul(seed ^ (seed >>> 15), 1 | seed);
    t = (t + Math.imul(t ^ (t >>> 7), 61 | t)) ^ t;
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
}

export interface SyntheticOptions {
  /** The "true" diffusivity factor of the tube the files pretend to come from. */
  factor: number;
  tubeId: number;
  noisePct: number;
  seed: number;
}

function truth(doc: RecipeDocument, o: SyntheticOptions) {
  const opted = { ...doc, options: { ...doc.options, useTubeCalibration: true, points: 160 } };
  const tubeFactors = Object.fromEntries(doc.steps.filter((s) => s.tubeId !== null).map((s) => [s.tubeId!, s.tubeId === o.tubeId ? o.factor : 1]));
  return computeRecipe(opted, { tubeFactors });
}

/** A depth profile CSV of the recipe's first dopant, as a SIMS export might look. */
export function syntheticProfileCsv(doc: RecipeDocument, o: SyntheticOptions): string {
  const r = truth(doc, o);
  const rand = seededRandom(o.seed);
  const species = r.profile.dopants[0];
  const lines = ['# INVENTED DEMO DATA: generated from the model with noise, not a measurement', `# species: ${species.dopant}`, 'depth (um),concentration (cm^-3)'];
  r.profile.depthUm.forEach((x, i) => {
    const c = species.concentrationCm3[i] * (1 + ((rand() * 2 - 1) * o.noisePct) / 100);
    if (c > 1e13) lines.push(`${x.toFixed(4)},${c.toExponential(3)}`);
  });
  return lines.join('\n') + '\n';
}

/** Nine-site four-point-probe readings around the model's sheet resistance. */
export function syntheticSheetCsv(doc: RecipeDocument, o: SyntheticOptions): string {
  const r = truth(doc, o);
  const rand = seededRandom(o.seed + 1);
  const rs = r.final.sheetResistanceOhmSq ?? 100;
  const sites = ['C', 'N', 'NE', 'E', 'SE', 'S', 'SW', 'W', 'NW'];
  return [
    '# INVENTED DEMO DATA: generated from the model with noise, not a measurement',
    'site,sheet_resistance (ohm/sq)',
    ...sites.map((s) => `${s},${(rs * (1 + ((rand() * 2 - 1) * o.noisePct) / 100)).toFixed(2)}`),
  ].join('\n') + '\n';
}
