// Plot data for one or more predicted profiles, as plain objects Plotly draws.
// Colours are ours: p-type dopants in copper tones, n-type in blue-violet
// tones (the same families as the dopant chips), the substrate background in
// grey dashes, |net| and junction lines in the text colour (so they read in
// both themes). A second series (Compare) is dashed.
import type { Dopant } from '../../../shared/engine/dopants';
import type { RecipeResult } from '../../../shared/engine/types';
import { formatSig } from '../recipe/recipe-format';

export const DOPANT_COLOURS: Record<Dopant, string> = {
  B: '#b0541c',
  P: '#4b4fc2',
  As: '#2f6fb3',
  Sb: '#7d44b5',
};
export const BACKGROUND_COLOUR = '#7b8794';
/** Near-black for overlays on the light theme (the workspace plot uses the theme's text colour). */
export const NET_COLOUR = '#2a3138';

export interface ProfileSeries {
  result: RecipeResult;
  /** Prefix of the legend entries when more than one series is drawn, e.g. 'v2'. */
  label: string;
}

export interface FigureOptions {
  showNet: boolean;
  /** Text and grid colours of the current theme. */
  textColour: string;
  gridColour: string;
}

type Trace = Record<string, unknown>;
const DASHES = ['solid', 'dash'] as const;

/** Values below the floor are left out: a log axis cannot show 0 and nothing below it matters here. */
function floorOf(series: ProfileSeries[]): number {
  const lowest = Math.min(...series.map((s) => s.result.profile.backgroundCm3));
  return Math.max(1e10, lowest / 100);
}

const clip = (values: number[], floor: number) => values.map((v) => (v >= floor ? v : null));

function traceName(s: ProfileSeries, many: boolean, what: string): string {
  return many ? `${s.label} · ${what}` : what;
}

function seriesTraces(s: ProfileSeries, dash: string, many: boolean, floor: number, options: FigureOptions, sameBackground: boolean): Trace[] {
  const { profile } = s.result;
  const hover = (name: string) => `${name}<br>%{y:.3e} cm⁻³ at %{x:.4f} µm<extra></extra>`;
  const traces: Trace[] = profile.dopants.map((d) => {
    const name = traceName(s, many, `${d.dopant} (${d.type}-type)`);
    return {
      type: 'scatter',
      mode: 'lines',
      name,
      x: profile.depthUm,
      y: clip(d.concentrationCm3, floor),
      line: { color: DOPANT_COLOURS[d.dopant], width: 2, dash },
      hovertemplate: hover(name),
    };
  });
  const depthEnd = profile.depthUm[profile.depthUm.length - 1] ?? 0;
  // A second series on the same substrate would only repeat the first one's background line.
  const bgName = sameBackground ? '' : traceName(s, many, `background (${s.result.substrate.type}-type)`);
  if (bgName) traces.push({
    type: 'scatter',
    mode: 'lines',
    name: bgName,
    x: [0, depthEnd],
    y: [profile.backgroundCm3, profile.backgroundCm3],
    line: { color: BACKGROUND_COLOUR, width: 1.5, dash: dash === 'solid' ? 'dash' : 'dot' },
    hovertemplate: hover(bgName),
  });
  if (options.showNet) {
    const netName = traceName(s, many, '|net|');
    traces.push({
      type: 'scatter',
      mode: 'lines',
      name: netName,
      x: profile.depthUm,
      y: clip(profile.netCm3.map(Math.abs), floor),
      line: { color: options.textColour, width: 1.2, dash: dash === 'solid' ? 'dot' : 'dashdot' },
      hovertemplate: hover(netName),
    });
  }
  return traces;
}

function junctionMarks(series: ProfileSeries[], many: boolean, colour: string) {
  const shapes: Trace[] = [];
  const annotations: Trace[] = [];
  series.forEach((s, k) => {
    s.result.final.junctionDepthsUm.forEach((xj, j) => {
      shapes.push({ type: 'line', xref: 'x', yref: 'paper', x0: xj, x1: xj, y0: 0, y1: 1, line: { color: colour, width: 1, dash: DASHES[k % 2] } });
      annotations.push({
        x: xj,
        y: 1 - 0.07 * (k + j),
        xref: 'x',
        yref: 'paper',
        text: `${many ? `${s.label} ` : ''}xj${j ? j + 1 : ''} ${formatSig(xj, 4)} µm`,
        showarrow: false,
        xanchor: 'left',
        xshift: 4,
        font: { size: 11 },
      });
    });
  });
  return { shapes, annotations };
}

/** Data and layout for Plotly.react. */
export function profileFigure(series: ProfileSeries[], options: FigureOptions): { data: Trace[]; layout: Trace } {
  const many = series.length > 1;
  const floor = floorOf(series);
  const first = series[0]?.result.substrate;
  const data = series.flatMap((s, k) => {
    const same = k > 0 && s.result.substrate.type === first?.type && s.result.profile.backgroundCm3 === series[0].result.profile.backgroundCm3;
    return seriesTraces(s, DASHES[k % 2], many, floor, options, same);
  });
  const peak = Math.max(floor * 10, ...series.flatMap((s) => s.result.profile.dopants.flatMap((d) => d.concentrationCm3)));
  const { shapes, annotations } = junctionMarks(series, many, options.textColour);
  const axis = { color: options.textColour, gridcolor: options.gridColour, zeroline: false, showline: true, linecolor: options.gridColour };
  return {
    data,
    layout: {
      margin: { l: 70, r: 16, t: 8, b: 48 },
      height: 360,
      paper_bgcolor: 'rgba(0,0,0,0)',
      plot_bgcolor: 'rgba(0,0,0,0)',
      font: { family: "'IBM Plex Mono', ui-monospace, monospace", size: 12, color: options.textColour },
      xaxis: { ...axis, title: { text: 'Depth (µm)' }, rangemode: 'tozero' },
      yaxis: {
        ...axis,
        type: 'log',
        title: { text: 'Concentration (cm⁻³)' },
        exponentformat: 'power',
        range: [Math.log10(floor), Math.log10(peak * 3)],
      },
      legend: { orientation: 'h', x: 0, y: -0.2, font: { size: 11 } },
      hovermode: 'closest',
      shapes,
      annotations,
    },
  };
}
