// Measured against predicted junction depth for a tube's lots, before the
// correction (factor 1) and after it, against the y = x line where a perfect
// prediction would sit. Plain objects for Plotly.react.
import type { CalibrationPoint } from '../../../shared/schemas/measurements';
import { formatSig } from '../recipe/recipe-format';

type Trace = Record<string, unknown>;

export const BEFORE_COLOUR = '#7b8794';
export const AFTER_COLOUR = '#156b7a';

/** The axis span covering every point, with a 10 % margin, so y = x crosses the whole plot. */
export function span(points: CalibrationPoint[]): [number, number] {
  const all = points.flatMap((p) => [p.measuredUm, p.predictedUm, p.correctedUm]).filter((v) => Number.isFinite(v));
  if (!all.length) return [0, 1];
  const lo = Math.min(...all);
  const hi = Math.max(...all);
  const pad = Math.max((hi - lo) * 0.1, hi * 0.02, 1e-3);
  return [Math.max(0, lo - pad), hi + pad];
}

export function calibrationFigure(
  points: CalibrationPoint[],
  factor: number,
  theme: { textColour: string; gridColour: string; accentColour?: string },
): { data: Trace[]; layout: Trace } {
  const [lo, hi] = span(points);
  const hover = (what: string) => `%{text}<br>${what} %{x:.4f} µm<br>measured %{y:.4f} µm<extra></extra>`;
  const data: Trace[] = [
    { type: 'scatter', mode: 'lines', name: 'y = x (prediction right)', x: [lo, hi], y: [lo, hi], line: { color: theme.textColour, width: 1, dash: 'dash' }, hoverinfo: 'skip' },
    {
      type: 'scatter',
      mode: 'markers',
      name: 'before (× 1)',
      x: points.map((p) => p.predictedUm),
      y: points.map((p) => p.measuredUm),
      text: points.map((p) => p.lotCode),
      marker: { color: BEFORE_COLOUR, size: 9, symbol: 'circle-open', line: { width: 2 } },
      hovertemplate: hover('predicted'),
    },
    {
      type: 'scatter',
      mode: 'markers',
      name: `after (× ${formatSig(factor, 4)})`,
      x: points.map((p) => p.correctedUm),
      y: points.map((p) => p.measuredUm),
      text: points.map((p) => p.lotCode),
      marker: { color: theme.accentColour || AFTER_COLOUR, size: 9, symbol: 'circle' },
      hovertemplate: hover('corrected'),
    },
  ];
  const axis = { color: theme.textColour, gridcolor: theme.gridColour, zeroline: false, showline: true, linecolor: theme.gridColour, range: [lo, hi] };
  return {
    data,
    layout: {
      margin: { l: 64, r: 12, t: 8, b: 44 },
      height: 320,
      paper_bgcolor: 'rgba(0,0,0,0)',
      plot_bgcolor: 'rgba(0,0,0,0)',
      font: { family: "'IBM Plex Mono', ui-monospace, monospace", size: 12, color: theme.textColour },
      xaxis: { ...axis, title: { text: 'Predicted xj (µm)' } },
      yaxis: { ...axis, title: { text: 'Measured xj (µm)' } },
      legend: { orientation: 'h', x: 0, y: -0.22, font: { size: 11 } },
      hovermode: 'closest',
    },
  };
}
