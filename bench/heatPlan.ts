/**
 * Heat-recovery plan benchmark: a 40 × 40 duty grid of two pump-arounds on a 60-tray column, every tray
 * fully rated at every point (trays whose traffic does not depend on a duty share their rating), the
 * boundary solved exactly on the grid lines, the suggestion and its margin table. Target: under 200 ms
 * (issue 17). Run directly (`npx tsx bench/heatPlan.ts`) or through bench/run.ts via benchHeatPlan().
 * The column and loads are invented for the benchmark (no textbook or plant data).
 */
import { pathToFileURL } from 'node:url';
import { runHeatPlan, runHeatPlanWith } from '../server/engine/heatPlan/index.js';
import type { HeatPlanInput } from '../shared/types/heatPlan.js';
import { benchStudy } from './pumpAround.js';

const TARGET_MS = 200;

/** The pump-around bench column (pump-around on trays 20–22) with a second pump-around on trays 40–42. */
export function benchPlan(steps = 39): HeatPlanInput {
  const study = benchStudy(60, 1);
  const { sweep: _s, pumpAround, ...rest } = study;
  return {
    ...rest,
    usefulAboveTemperature_C: 180,
    pumpArounds: [
      { ...pumpAround, drawTemperature_C: 205, sweep: { fromDuty_kW: 2500, toDuty_kW: 9000, steps } },
      {
        name: 'PA-bench-lower',
        returnTray: 40,
        drawTray: 42,
        baseDuty_kW: 6000,
        liquidHeatCapacity_kJ_kgK: 2.7,
        returnTemperatureDrop_K: 80,
        drawTemperature_C: 265,
        sweep: { fromDuty_kW: 3000, toDuty_kW: 12000, steps },
      },
    ],
  };
}

function timeIt(runs: number, fn: () => number): { median: number; min: number } {
  let sink = 0;
  for (let i = 0; i < 3; i++) sink += fn();
  const times: number[] = [];
  for (let i = 0; i < runs; i++) {
    const start = performance.now();
    sink += fn();
    times.push(performance.now() - start);
  }
  if (!Number.isFinite(sink)) throw new Error('benchmark produced a non-finite result');
  times.sort((a, b) => a - b);
  return { median: times[Math.floor(times.length / 2)]!, min: times[0]! };
}

export function benchHeatPlan(runs = 11): string {
  const input = benchPlan();
  // as a caller that keeps percent of limit per check (the stored form), and as the CLI (every full rating kept)
  const slim = timeIt(runs, () => {
    const r = runHeatPlanWith(input, (p) => p.trays.map((t) => t.rating.checks.jetFlood.percentOfLimit));
    return r.points.length + r.boundary.length;
  });
  const full = timeIt(runs, () => {
    const r = runHeatPlan(input);
    return r.points.length + r.boundary.length;
  });
  const verdict = slim.median < TARGET_MS ? 'ok' : 'OVER TARGET';
  return `heat plan: ${slim.median.toFixed(1)} ms median (min ${slim.min.toFixed(1)}) for a 40 × 40 duty grid of two pump-arounds on a 60-tray column, every tray fully rated at every point, exact boundary and suggestion (target < ${TARGET_MS} ms: ${verdict}); keeping every full point, as the CLI prints them: ${full.median.toFixed(1)} ms median`;
}

if (process.argv[1] && import.meta.url === pathToFileURL(process.argv[1]).href) {
  console.log(benchHeatPlan());
}
