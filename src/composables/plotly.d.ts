/** The few Plotly calls the client uses (plotly.js-dist-min ships no types). */
declare module 'plotly.js-dist-min' {
  export type PlotData = Record<string, unknown>;
  export type PlotLayout = Record<string, unknown>;
  export function react(
    el: HTMLElement,
    data: PlotData[],
    layout?: PlotLayout,
    config?: Record<string, unknown>,
  ): Promise<unknown>;
  export function purge(el: HTMLElement): void;
}
