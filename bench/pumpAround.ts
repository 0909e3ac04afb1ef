/**
 * Pump-around study benchmark: a 200-step duty sweep of a 60-tray column with a full rating of every
 * tray at every duty, plus the exact solving of the dry-out, minimum-liquid and zone-overload duties, as
 * the API runs it (runSlimStudy) and as the CLI runs it (runStudy). Target: under 50 ms (issue 5).
 * Run directly (`npx tsx bench/pumpAround.ts`) or through bench/run.ts via benchPumpAround().
 * The column and loads are invented for the benchmark (no textbook or plant data).
 */
import { pathToFileURL } from 'node:url';
import { runStudy } from '../server/engine/pumpAround/index.js';
import { runSlimStudy } from '../server/services/studies/studyResult.js';
import type { StudyInput, StudySection } from '../shared/types/pumpAround.js';
import type { TrayLoad } from '../shared/types/rating.js';

const TARGET_MS = 50;

function section(name: string, fromTray: number, toTray: number, over: Partial<StudySection> = {}): StudySection {
  return {
    name,
    fromTray,
    toTray,
    trayType: 'sieve',
    passes: 1,
    columnDiameter_m: 4.2,
    traySpacing_mm: 686,
    activeArea_m2: 10.53,
    downcomerTopArea_m2: 1.66,
    downcomerBottomArea_m2: 1.66,
    outletWeirLength_m: 3.2,
    weirHeight_mm: 40,
    downcomerClearance_mm: 38,
    holeArea_m2: 0.64,
    holeDiameter_mm: 12.7,
    deckThickness_mm: 3,
    systemFactor: 0.9,
    foaming: 'moderate',
    ...over,
  };
}

/** Invented 60-tray column: pump-around returning to tray 20 and drawn from tray 22, base duty 5200 kW. */
export function benchStudy(trays = 60, steps = 200): StudyInput {
  const loads: TrayLoad[] = [];
  for (let t = 1; t <= trays; t++) {
    const f = (t - 1) / (trays - 1);
    const above = t < 20;
    const liquid = above ? 78000 - 1300 * (t - 1) : t <= 22 ? 60000 + 4000 * (t - 20) : 96000 - 300 * (t - 23);
    loads.push({
      tray: t,
      vapourMassFlow_kg_h: liquid + (t <= 22 ? 50000 : 54000),
      liquidMassFlow_kg_h: liquid,
      vapourDensity_kg_m3: 3.6 + 1.6 * f,
      liquidDensity_kg_m3: 690 + 60 * f,
      surfaceTension_mN_m: 18.5 - 4 * f,
      liquidViscosity_mPa_s: 0.35,
      pressure_kPa: 245 + 0.7 * t,
    });
  }
  return {
    sections: [
      section('Top', 1, 19),
      section('Pump-around zone', 20, 22, {
        holeArea_m2: 0.62,
        downcomerTopArea_m2: 2.1,
        downcomerBottomArea_m2: 2.1,
        activeArea_m2: 9.6,
        outletWeirLength_m: 3.55,
        downcomerClearance_mm: 65,
      }),
      section('Below', 23, trays, { holeArea_m2: 0.8 }),
    ],
    trays: loads,
    pumpAround: {
      name: 'PA-bench',
      drawTray: 22,
      returnTray: 20,
      baseDuty_kW: 5200,
      liquidHeatCapacity_kJ_kgK: 2.55,
      returnTemperatureDrop_K: 65,
    },
    latentHeat_kJ_kg: 285,
    margin: 0.7,
    sweep: { fromDuty_kW: 3000, toDuty_kW: 9000, steps },
    methods: { jetFlood: 'fair' },
  };
}

/** Median and minimum time of `fn` over `runs` calls, after three warm-up calls (JIT). */
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

/**
 * Times the 60-tray, 200-step study as the API runs it (every tray of every point fully rated, each point
 * kept in its stored form as soon as it is rated, plus the key points and lines of the stored result), and
 * as the CLI runs it (every full rating object kept to the end); returns a one-line report.
 */
export function benchPumpAround(runs = 15): string {
  const input = benchStudy(60, 200);
  const api = timeIt(runs, () => {
    const r = runSlimStudy(input);
    return r.points.length + (r.limitingDuty_kW ?? 0);
  });
  const cli = timeIt(runs, () => {
    const r = runStudy(input);
    return r.points.length + (r.limitingDuty_kW ?? 0);
  });
  const verdict = api.median < TARGET_MS ? 'ok' : 'OVER TARGET';
  return `pump-around: ${api.median.toFixed(1)} ms median (min ${api.min.toFixed(1)}) for a 200-step sweep of a 60-tray column, ${201 * 60} full tray ratings plus exact limit duties, as the API stores it (target < ${TARGET_MS} ms: ${verdict}); keeping every full rating object, as the CLI prints them: ${cli.median.toFixed(1)} ms median`;
}

if (process.argv[1] && import.meta.url === pathToFileURL(process.argv[1]).href) {
  console.log(benchPumpAround());
}
