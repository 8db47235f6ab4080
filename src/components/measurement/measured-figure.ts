// One plot of a lot's prediction with a measured profile laid over it: the
// predicted dopant curves solid and the background dashed (profileFigure's own
// traces, so colours match the workspace), the measured points as open markers,
// and the predicted and measured junctions as labelled vertical lines.
import type { RecipeResult } from '../../../shared/engine/types';
import type { Dopant } from '../../../shared/engine/dopants';
import type { ProfilePoints } from '../../../shared/schemas/measurements';
import { DOPANT_COLOURS, profileFigure, type FigureOptions } from '../profile/profile-figure';
import { formatSig } from '../recipe/recipe-format';

type Trace = Record<string, unknown>;

export interface MeasuredSeries {
  /** Legend text, e.g. 'measured · sims.csv (SIMS)'. */
  label: string;
  points: ProfilePoints;
  junctionsUm: number[];
  /** The measured dopant, when the file named it. */
  species?: Dopant;
}

/** Plotly stays quick with a few thousand markers; beyond that every n-th point carries the shape. */
export const MAX_MARKERS = 1500;

/** Every n-th point so at most `max` remain, keeping the first and the last. */
export function thin<T>(values: T[], max = MAX_MARKERS): T[] {
  if (values.length <= max) return values;
  const step = (values.length - 1) / (max - 1);
  return Array.from({ length: max }, (_, i) => values[Math.round(i * step)]);
}

/** Measured markers take the hue of the dopant the file names, else of the only predicted dopant, else the text colour. */
export function measuredColour(result: RecipeResult, textColour: string, species?: Dopant): string {
  if (species) return DOPANT_COLOURS[species];
  const dopants = result.profile.dopants;
  return dopants.length === 1 ? DOPANT_COLOURS[dopants[0].dopant] : textColour;
}

const prefixed = (t: Trace, prefix: string): Trace => {
  const name = String(t.name ?? '');
  const hover = typeof t.hovertemplate === 'string' ? t.hovertemplate.replace(name, `${prefix}${name}`) : t.hovertemplate;
  return { ...t, name: `${prefix}${name}`, hovertemplate: hover };
};

/** Data and layout for Plotly.react: the prediction, and the measured profile over it when given. */
export function overlayFigure(result: RecipeResult, measured: MeasuredSeries | null, options: FigureOptions): { data: Trace[]; layout: Trace } {
  const base = profileFigure([{ result, label: 'predicted' }], options);
  const data = base.data.map((t) => (String(t.name).startsWith('background') ? t : prefixed(t, 'predicted ')));
  const layout = base.layout as Trace & { shapes: Trace[]; annotations: Trace[]; yaxis: Trace & { range: [number, number] } };
  const annotations: Trace[] = layout.annotations.map((a) => ({ ...a, text: `predicted ${String(a.text)}` }));
  const shapes = [...layout.shapes];
  let range = layout.yaxis.range;
  if (measured) {
    const colour = measuredColour(result, options.textColour, measured.species);
    const floor = 10 ** range[0];
    const idx = thin(measured.points.depthUm.map((_, i) => i));
    data.push({
      type: 'scatter',
      mode: 'markers',
      name: measured.label,
      x: idx.map((i) => measured.points.depthUm[i]),
      y: idx.map((i) => (measured.points.concentrationCm3[i] >= floor ? measured.points.concentrationCm3[i] : null)),
      marker: { color: colour, size: 5, symbol: 'circle-open', line: { width: 1.2 } },
      hovertemplate: `${measured.label}<br>%{y:.3e} cm⁻³ at %{x:.4f} µm<extra></extra>`,
    });
    measured.junctionsUm.forEach((xj, j) => {
      shapes.push({ type: 'line', xref: 'x', yref: 'paper', x0: xj, x1: xj, y0: 0, y1: 1, line: { color: colour, width: 1.5, dash: 'dot' } });
      annotations.push({ x: xj, y: 0.86 - 0.07 * j, xref: 'x', yref: 'paper', text: `measured xj${j ? j + 1 : ''} ${formatSig(xj, 4)} µm`, showarrow: false, xanchor: 'left', xshift: 4, font: { size: 11, color: colour } });
    });
    const peak = Math.max(...measured.points.concentrationCm3);
    if (Number.isFinite(peak) && Math.log10(peak * 3) > range[1]) range = [range[0], Math.log10(peak * 3)];
  }
  return { data, layout: { ...layout, shapes, annotations, yaxis: { ...layout.yaxis, range } } };
}
