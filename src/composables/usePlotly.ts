import { onBeforeUnmount, shallowRef, type Ref } from 'vue';

import type { PlotData, PlotLayout } from 'plotly.js-dist-min';
import { palette } from '../../shared/palette';

type PlotlyModule = typeof import('plotly.js-dist-min');
export type { PlotData, PlotLayout };
let loading: Promise<PlotlyModule> | null = null;

/** Plotly, loaded once on first use through a dynamic import so that it is its own chunk. */
export function loadPlotly(): Promise<PlotlyModule> {
  loading ??= import('plotly.js-dist-min').then((m) => (m as { default?: PlotlyModule }).default ?? m);
  return loading;
}

/** Draw into an element ref; redraw with `render(data, layout)`; purged on unmount. */
export function usePlotly(el: Ref<HTMLElement | null>) {
  const plotly = shallowRef<PlotlyModule | null>(null);
  const failed = shallowRef<string | null>(null);
  async function render(data: PlotData[], layout: PlotLayout): Promise<void> {
    try {
      const P = (plotly.value ??= await loadPlotly());
      if (!el.value) return;
      await P.react(
        el.value,
        data,
        { ...BASE_LAYOUT, ...layout },
        { displaylogo: false, responsive: true, modeBarButtonsToRemove: ['lasso2d', 'select2d'] },
      );
    } catch (e) {
      failed.value = e instanceof Error ? e.message : String(e);
    }
  }
  onBeforeUnmount(() => {
    if (plotly.value && el.value) plotly.value.purge(el.value);
  });
  return { render, failed };
}

const BASE_LAYOUT = {
  font: { family: 'Noto Sans, system-ui, sans-serif', size: 12, color: palette.dark },
  paper_bgcolor: 'rgba(0,0,0,0)',
  plot_bgcolor: palette.paper,
  margin: { l: 60, r: 20, t: 30, b: 50 },
  legend: { orientation: 'h', y: -0.2 },
};
