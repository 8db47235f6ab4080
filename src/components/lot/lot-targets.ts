// The predicted targets a lot is measured against, with the acceptance
// windows the run traveller prints (common practice; see shared/rules).
import type { RecipeResult } from '../../../shared/engine/types';
import { ACCEPTANCE_WINDOWS } from '../../../shared/rules/acceptance-windows';

export interface LotTarget {
  key: string;
  label: string;
  predicted: number;
  unit: string;
  /** Half-width of the acceptance window, % of the predicted value. */
  windowPct: number;
  low: number;
  high: number;
  /** 'sci' for concentrations (mantissa × 10ⁿ), 'sig' for plain decimals. */
  style: 'sig' | 'sci';
}

function target(key: string, label: string, predicted: number, unit: string, windowPct: number, style: LotTarget['style']): LotTarget {
  const half = Math.abs(predicted) * (windowPct / 100);
  return { key, label, predicted, unit, windowPct, low: predicted - half, high: predicted + half, style };
}

/** Targets from a stored result: each junction depth, sheet resistance, surface concentration, oxide when grown. */
export function lotTargets(result: RecipeResult): LotTarget[] {
  const w = ACCEPTANCE_WINDOWS;
  const f = result.final;
  const several = f.junctionDepthsUm.length > 1;
  const out = f.junctionDepthsUm.map((xj, i) => target(`xj-${i}`, several ? `Junction depth ${i + 1}` : 'Junction depth', xj, 'µm', w.junctionDepthPct, 'sig'));
  if (f.sheetResistanceOhmSq !== null) out.push(target('rs', 'Sheet resistance (four-point probe)', f.sheetResistanceOhmSq, 'Ω/□', w.sheetResistancePct, 'sig'));
  out.push(target('cs', `Surface concentration (${f.surfaceType}-type)`, f.surfaceNetCm3, 'cm⁻³', w.surfaceConcentrationPct, 'sci'));
  if (f.oxideThicknessUm > 0) out.push(target('tox', 'Oxide thickness', f.oxideThicknessUm * 1000, 'nm', w.oxideThicknessPct, 'sig'));
  return out;
}
