// What a measured profile or a set of four-point-probe readings says, in the
// same terms as the prediction. Pure functions: the server stores the result
// with the upload; the browser can show the same numbers.
import type { ProfilePoints, ProfileSummary, SheetPoints, SheetSummary } from '../schemas/measurements';

const UM_TO_CM = 1e-4;

/**
 * Depths (µm) where a measured dopant profile crosses the substrate
 * background: the metallurgical junctions, interpolated linearly in
 * log(concentration) between the two points that bracket each crossing.
 */
export function measuredJunctionsUm(points: ProfilePoints, backgroundCm3: number): number[] {
  const { depthUm: x, concentrationCm3: c } = points;
  const out: number[] = [];
  for (let i = 1; i < x.length; i++) {
    const a = c[i - 1] - backgroundCm3;
    const b = c[i] - backgroundCm3;
    if (a === 0 && i === 1) continue;
    if ((a > 0 && b <= 0) || (a < 0 && b >= 0)) {
      if (b === 0) {
        out.push(x[i]);
        continue;
      }
      const la = Math.log(Math.max(c[i - 1], 1));
      const lb = Math.log(Math.max(c[i], 1));
      const lt = Math.log(backgroundCm3);
      const f = la === lb ? 0.5 : (lt - la) / (lb - la);
      out.push(x[i - 1] + f * (x[i] - x[i - 1]));
    }
  }
  return out;
}

/** Junctions, surface and peak concentration and the trapezoidal dose of a measured profile. */
export function summarizeProfile(points: ProfilePoints, backgroundCm3: number): ProfileSummary {
  const { depthUm: x, concentrationCm3: c } = points;
  let dose = 0;
  for (let i = 1; i < x.length; i++) dose += 0.5 * (c[i] + c[i - 1]) * (x[i] - x[i - 1]) * UM_TO_CM;
  return {
    junctionDepthsUm: measuredJunctionsUm(points, backgroundCm3),
    surfaceConcentrationCm3: c[0],
    peakConcentrationCm3: Math.max(...c),
    doseCm2: dose,
    points: x.length,
    maxDepthUm: x[x.length - 1],
  };
}

/** Mean, spread and the usual (max − min)/(2·mean) non-uniformity of four-point-probe readings. */
export function summarizeSheet(points: SheetPoints): SheetSummary {
  const r = points.ohmSq;
  const mean = r.reduce((s, v) => s + v, 0) / r.length;
  const variance = r.length > 1 ? r.reduce((s, v) => s + (v - mean) ** 2, 0) / (r.length - 1) : 0;
  const min = Math.min(...r);
  const max = Math.max(...r);
  return {
    meanOhmSq: mean,
    stdDevOhmSq: Math.sqrt(variance),
    minOhmSq: min,
    maxOhmSq: max,
    nonUniformityPct: mean > 0 ? ((max - min) / (2 * mean)) * 100 : 0,
    sites: r.length,
  };
}
