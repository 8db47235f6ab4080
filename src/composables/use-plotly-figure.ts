// Draws a Plotly figure into an element, loading Plotly (~1.4 MB gzip) on first
// use so it stays its own chunk. The figure is rebuilt from `build` whenever
// `source` or the theme changes, in the next animation frame.
import { onBeforeUnmount, onMounted, ref, shallowRef, watch, type Ref, type WatchSource } from 'vue';
import { useThemeMode } from './use-theme-mode';

type PlotlyModule = typeof import('plotly.js-dist-min');
type Trace = Record<string, unknown>;

export interface ThemeColours {
  textColour: string;
  gridColour: string;
  /** The theme's accent (PrimeVue primary), lighter in the dark theme. */
  accentColour: string;
}

export interface Figure {
  data: Trace[];
  layout: Trace;
}

function themeColours(): ThemeColours {
  const style = getComputedStyle(document.documentElement);
  return {
    textColour: style.getPropertyValue('--p-text-color').trim() || '#1b2026',
    gridColour: style.getPropertyValue('--p-content-border-color').trim() || '#dce1e6',
    accentColour: style.getPropertyValue('--p-primary-color').trim() || '#156b7a',
  };
}

export function usePlotlyFigure(el: Ref<HTMLElement | null>, source: WatchSource, build: (theme: ThemeColours) => Figure | null) {
  const plotly = shallowRef<PlotlyModule | null>(null);
  const loadError = ref('');
  const { dark } = useThemeMode();
  let frame = 0;

  function draw(): void {
    cancelAnimationFrame(frame);
    frame = requestAnimationFrame(() => {
      if (!plotly.value || !el.value) return;
      const figure = build(themeColours());
      if (!figure) return;
      void plotly.value.react(el.value, figure.data, figure.layout, { displaylogo: false, responsive: true, modeBarButtonsToRemove: ['select2d', 'lasso2d'] });
    });
  }

  onMounted(async () => {
    try {
      const mod = (await import('plotly.js-dist-min')) as PlotlyModule & { default?: PlotlyModule };
      plotly.value = mod.default ?? mod;
      draw();
    } catch {
      loadError.value = 'The plot could not be loaded; the numbers in the tables are unaffected.';
    }
  });

  watch([source, dark], draw);

  onBeforeUnmount(() => {
    cancelAnimationFrame(frame);
    if (plotly.value && el.value) plotly.value.purge(el.value);
  });

  return { plotly, loadError };
}
