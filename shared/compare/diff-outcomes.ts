// Differences between two stored results (B minus A): the headline numbers of
// the Compare screen. Missing numbers (no junction, no result) stay null so
// the screen can say so instead of showing a made-up zero.
import { DOPANTS, type Dopant } from '../engine/dopants';
import type { RecipeResult } from '../engine/types';

export interface NumberDelta {
  a: number | null;
  b: number | null;
  /** b − a, null unless both are known. */
  delta: number | null;
  /** (b − a) / a × 100, null unless both are known and a ≠ 0. */
  percent: number | null;
}

export interface OutcomeDelta {
  /** First (shallowest) junction depth, µm. */
  junctionDepthUm: NumberDelta;
  /** Sheet resistance, Ω/□. */
  sheetResistanceOhmSq: NumberDelta;
  /** Thermal budget: total Dt of each dopant present in either result, cm². */
  thermalBudget: { dopant: Dopant; dtCm2: NumberDelta }[];
}

export function numberDelta(a: number | null | undefined, b: number | null | undefined): NumberDelta {
  const av = a ?? null;
  const bv = b ?? null;
  const delta = av !== null && bv !== null ? bv - av : null;
  const percent = delta !== null && av !== 0 && av !== null ? (delta / av) * 100 : null;
  return { a: av, b: bv, delta, percent };
}

function totalDt(result: RecipeResult | null, dopant: Dopant): number | null {
  const found = result?.final.dopants.find((d) => d.dopant === dopant);
  return found ? found.totalDtCm2 : null;
}

/** Headline differences from result A to result B (either may be missing). */
export function diffOutcomes(a: RecipeResult | null, b: RecipeResult | null): OutcomeDelta {
  const present = new Set<Dopant>([...(a?.final.dopants ?? []), ...(b?.final.dopants ?? [])].map((d) => d.dopant));
  return {
    junctionDepthUm: numberDelta(a?.final.junctionDepthsUm[0], b?.final.junctionDepthsUm[0]),
    sheetResistanceOhmSq: numberDelta(a?.final.sheetResistanceOhmSq, b?.final.sheetResistanceOhmSq),
    thermalBudget: DOPANTS.filter((d) => present.has(d)).map((dopant) => ({
      dopant,
      dtCm2: numberDelta(totalDt(a, dopant), totalDt(b, dopant)),
    })),
  };
}
