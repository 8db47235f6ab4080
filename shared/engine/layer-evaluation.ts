// Junctions, surface net doping and sheet resistance of whatever profile the wafer
// holds (closed forms or the solver's interpolant): one code path for both.
import { bracketSamples, signChanges } from './junctions';
import { averageResistivity, sheetResistance, type DopingAt, type LayerProfile } from './layer';

/** Bracketing samples for closed-form profiles (quadratic spacing). */
const ANALYTIC_SAMPLES = 64;

export interface LayerInput {
  /** True when any dopant is in the wafer. */
  hasDopants: boolean;
  /** Net and total doping, background included, at x (cm). */
  dopingAt: (xCm: number, out: DopingAt) => DopingAt;
  /** Solver nodes to bracket on, or null to sample [0, extentCm]. */
  samplesCm: ArrayLike<number> | null;
  extentCm: number;
}

export interface LayerEvaluation {
  junctionsCm: number[];
  surfaceNetCm3: number;
  sheetResistanceOhmSq: number | null;
  averageResistivityOhmCm: number | null;
}

export function evaluateLayer(input: LayerInput): LayerEvaluation {
  const scratch: DopingAt = { net: 0, total: 0 };
  const netAt = (x: number) => input.dopingAt(x, scratch).net;
  const profile: LayerProfile = { netAt, dopingAt: input.dopingAt };
  const surfaceNetCm3 = netAt(0);
  if (!input.hasDopants || !(input.extentCm > 0)) {
    return { junctionsCm: [], surfaceNetCm3, sheetResistanceOhmSq: null, averageResistivityOhmCm: null };
  }
  const samples = input.samplesCm ?? bracketSamples(input.extentCm * 1.05, ANALYTIC_SAMPLES);
  const junctionsCm = signChanges(netAt, samples).filter((x) => x > 0);
  const first = junctionsCm[0];
  const carrier = surfaceNetCm3 >= 0 ? 'n' : 'p';
  const sheet = sheetResistance(profile, first, carrier);
  return { junctionsCm, surfaceNetCm3, sheetResistanceOhmSq: sheet, averageResistivityOhmCm: averageResistivity(sheet, first) };
}
