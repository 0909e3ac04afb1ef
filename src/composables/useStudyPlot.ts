/** Plot traces of a stored pump-around study (issue 5), drawn with usePlotly; values held in SI, shown in the user's units. */
import type { PlotData } from './usePlotly';
import type { SlimStudyPoint, SlimStudyResult } from '../../shared/types/studies';
import type { QuantityId } from '../../shared/units';
import { palette } from '../../shared/palette';

export interface UnitsLike {
  show: (q: QuantityId, si: number) => number;
  label: (q: QuantityId) => string;
}

/** Liquid and vapour per tray at one duty (x flow, y tray). */
export function trafficTraces(
  p: SlimStudyPoint | undefined,
  name: string,
  units: UnitsLike & { fmt: (q: QuantityId, si: number) => string },
  style: { dash: string; liquid: string; vapour: string; bold?: boolean },
): PlotData[] {
  if (!p) return [];
  const y = p.trays.map((t) => t.tray);
  const flow = units.label('massFlow');
  const at = `${units.fmt('duty', p.duty_kW)} ${units.label('duty')}`;
  const trace = (what: 'liquid' | 'vapour'): PlotData => ({
    type: 'scatter',
    mode: 'lines+markers',
    name: `${what === 'liquid' ? 'Liquid' : 'Vapour'}, ${name} (${at})`,
    x: p.trays.map((t) => units.show('massFlow', what === 'liquid' ? t.liquidMassFlow_kg_h : t.vapourMassFlow_kg_h)),
    y,
    line: { color: style[what], dash: style.dash, width: style.bold ? 3 : 1.5 },
    marker: { size: style.bold ? 5 : 3 },
    hovertemplate: `tray %{y}: %{x:.0f} ${flow}<extra>${what}, ${name}</extra>`,
  });
  return [trace('liquid'), trace('vapour')];
}

/** Tray range [first, last] around the pump-around: the trays above it, the zone and `below` trays under the draw. */
export function trayWindow(p: SlimStudyPoint, below = 6): [number, number] {
  const idx = p.trays.map((t, i) => (t.region !== 'below' ? i : -1)).filter((i) => i >= 0);
  const first = p.trays[Math.min(...idx)]!.tray;
  const last = p.trays[Math.min(p.trays.length - 1, Math.max(...idx) + below)]!.tray;
  return [Math.min(first, last) - 0.5, Math.max(first, last) + 0.5];
}

/** A band over the pump-around zone (return to draw tray) and a red mark on trays gone dry. */
export function zoneShapes(r: SlimStudyResult, p: SlimStudyPoint): Record<string, unknown>[] {
  const zone = p.trays.filter((t) => t.region === 'zone').map((t) => t.tray);
  const shapes: Record<string, unknown>[] = [];
  if (zone.length)
    shapes.push({
      type: 'rect',
      xref: 'paper',
      x0: 0,
      x1: 1,
      y0: Math.min(...zone) - 0.5,
      y1: Math.max(...zone) + 0.5,
      fillcolor: 'rgba(217,130,43,0.12)',
      line: { width: 0 },
      layer: 'below',
      label: {
        text: 'pump-around zone',
        textposition: 'middle right',
        xanchor: 'right',
        font: { size: 11, color: palette.rust },
      },
    });
  for (const t of p.dryTrays)
    shapes.push({
      type: 'line',
      xref: 'paper',
      x0: 0,
      x1: 1,
      y0: t,
      y1: t,
      line: { color: palette.negative, width: 2, dash: 'dot' },
    });
  return shapes;
}

/**
 * Vertical marker lines at duties, labelled above the plot in plain horizontal text (rotated labels inside the plot
 * were cut at its edge): labels in duty order take turns on three rows, so neighbouring duties do not overlap.
 */
export function dutyLines(
  lines: readonly { duty: number | null; text: string; color: string; solid?: boolean }[],
  units: UnitsLike,
): { shapes: Record<string, unknown>[]; annotations: Record<string, unknown>[] } {
  const shown = lines
    .filter((l): l is typeof l & { duty: number } => l.duty !== null)
    .map((l) => ({ ...l, x: units.show('duty', l.duty) }))
    .sort((a, b) => a.x - b.x);
  return {
    shapes: shown.map((l) => ({
      type: 'line',
      yref: 'paper',
      y0: 0,
      y1: 1,
      x0: l.x,
      x1: l.x,
      line: { color: l.color, width: 1.5, dash: l.solid ? 'solid' : 'dash' },
      name: `duty: ${l.text}`,
    })),
    annotations: shown.map((l, i) => ({
      x: l.x,
      xref: 'x',
      y: 1,
      yref: 'paper',
      yanchor: 'bottom',
      yshift: 2 + 14 * (i % 3),
      text: l.text,
      showarrow: false,
      font: { size: 10, color: l.color },
    })),
  };
}

/** Lowest liquid over the trays above the zone at each sweep point. */
export function lowestLiquidAbove(r: SlimStudyResult): { duty: number[]; liquid: number[]; tray: number[] } {
  const out = { duty: [] as number[], liquid: [] as number[], tray: [] as number[] };
  for (const p of r.points) {
    const above = p.trays.filter((t) => t.region === 'above');
    if (!above.length) continue;
    const low = above.reduce((a, t) => (t.liquidMassFlow_kg_h < a.liquidMassFlow_kg_h ? t : a));
    out.duty.push(p.duty_kW);
    out.liquid.push(low.liquidMassFlow_kg_h);
    out.tray.push(low.tray);
  }
  return out;
}

/** Highest percent of limit on each tray at each duty, and the check that gives it. */
export function percentGrid(
  r: SlimStudyResult,
  check: number | null,
): { trays: number[]; duties: number[]; z: number[][]; text: string[][] } {
  const trays = r.points[0]?.trays.map((t) => t.tray) ?? [];
  const duties = r.points.map((p) => p.duty_kW);
  const z: number[][] = trays.map(() => []);
  const text: string[][] = trays.map(() => []);
  r.points.forEach((p) =>
    p.trays.forEach((t, i) => {
      const k = check ?? t.percent.reduce((best, v, j) => (v > (t.percent[best] ?? -Infinity) ? j : best), 0);
      z[i]!.push(t.percent[k] ?? 0);
      text[i]!.push(r.checkNames[k] ?? '');
    }),
  );
  return { trays, duties, z, text };
}
