// Measured against predicted for a lot, as table rows with the traveller's
// acceptance windows (common practice; shared/rules/acceptance-windows.ts).
import { ACCEPTANCE_WINDOWS } from '../../../shared/rules/acceptance-windows';
import type { LotComparison } from '../../../shared/schemas/measurements';

export type Verdict = 'in' | 'out' | null;

export interface ComparisonRow {
  key: 'xj' | 'rs';
  label: string;
  unit: string;
  predicted: number | null;
  measured: number | null;
  /** measured − predicted, in `unit`. */
  delta: number | null;
  deltaPct: number | null;
  windowPct: number;
  /** Whether the measured value lies within ± windowPct of the prediction; null when either is missing. */
  verdict: Verdict;
}

/** 'in' when |Δ %| ≤ the window (the window's edge counts as in), 'out' beyond, null without a difference. */
export function verdictOf(deltaPct: number | null, windowPct: number): Verdict {
  if (deltaPct === null || !Number.isFinite(deltaPct)) return null;
  return Math.abs(deltaPct) <= windowPct + 1e-9 ? 'in' : 'out';
}

export function comparisonRows(c: LotComparison): ComparisonRow[] {
  const w = ACCEPTANCE_WINDOWS;
  return [
    {
      key: 'xj',
      label: 'Junction depth',
      unit: 'µm',
      predicted: c.predicted.junctionDepthUm,
      measured: c.measured.junctionDepthUm,
      delta: c.delta.junctionDepthUm,
      deltaPct: c.delta.junctionDepthPct,
      windowPct: w.junctionDepthPct,
      verdict: verdictOf(c.delta.junctionDepthPct, w.junctionDepthPct),
    },
    {
      key: 'rs',
      label: 'Sheet resistance',
      unit: 'Ω/□',
      predicted: c.predicted.sheetResistanceOhmSq,
      measured: c.measured.sheetResistanceOhmSq,
      delta: c.delta.sheetResistanceOhmSq,
      deltaPct: c.delta.sheetResistancePct,
      windowPct: w.sheetResistancePct,
      verdict: verdictOf(c.delta.sheetResistancePct, w.sheetResistancePct),
    },
  ];
}
