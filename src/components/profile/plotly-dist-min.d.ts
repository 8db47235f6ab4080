// The few Plotly calls the profile plot makes (the package ships no types).
declare module 'plotly.js-dist-min' {
  export type PlotData = Record<string, unknown>;
  export type PlotLayout = Record<string, unknown>;
  export function react(el: HTMLElement, data: PlotData[], layout: PlotLayout, config?: Record<string, unknown>): Promise<unknown>;
  export function purge(el: HTMLElement): void;
  export function downloadImage(el: HTMLElement, options: { format: 'png' | 'svg'; filename: string; width?: number; height?: number }): Promise<string>;
  const Plotly: { react: typeof react; purge: typeof purge; downloadImage: typeof downloadImage };
  export default Plotly;
}
