/**
 * Engine benchmark: tray ratings per second for a 60-tray section on one core, all checks.
 * Run directly (`npx tsx bench/engine.ts`) or through bench/run.ts via benchEngine().
 * The section and loads are invented for the benchmark (no textbook or plant data).
 */
import { pathToFileURL } from 'node:url';
import { rateSection } from '../server/engine/index.js';
import type { RatingRequest, TrayLoad } from '../shared/types/rating.js';

/** Invented 60-tray sieve section, loads varying smoothly down the section. */
export function benchRequest(trays = 60): RatingRequest {
  const loads: TrayLoad[] = [];
  for (let i = 0; i < trays; i++) {
    const f = i / Math.max(1, trays - 1);
    loads.push({
      tray: i + 1,
      vapourMassFlow_kg_h: 52000 + 9000 * f,
      liquidMassFlow_kg_h: 61000 + 15000 * f,
      vapourDensity_kg_m3: 3.1 + 0.8 * f,
      liquidDensity_kg_m3: 705 - 40 * f,
      surfaceTension_mN_m: 17 - 4 * f,
      liquidViscosity_mPa_s: 0.3,
      pressure_kPa: 310 + 40 * f,
    });
  }
  return {
    section: {
      trayType: 'sieve',
      passes: 1,
      columnDiameter_m: 2.4,
      traySpacing_mm: 610,
      activeArea_m2: 3.45,
      downcomerTopArea_m2: 0.55,
      downcomerBottomArea_m2: 0.5,
      outletWeirLength_m: 1.78,
      weirHeight_mm: 50,
      downcomerClearance_mm: 40,
      holeArea_m2: 0.38,
      holeDiameter_mm: 12.7,
      deckThickness_mm: 2.7,
      systemFactor: 1,
      foaming: 'moderate',
    },
    trays: loads,
    methods: { jetFlood: 'fair' },
  };
}

/** Tray ratings per second the engine must keep on one core (the figure the project holds itself to). */
const TARGET_PER_SECOND = 300_000;

/** Runs the benchmark for about `seconds` and returns a one-line report. */
export function benchEngine(seconds = 2): string {
  const req = benchRequest(60);
  let sink = 0;
  for (let i = 0; i < 2000; i++) sink += rateSection(req).summary.turndown; // warm-up (JIT)
  const budget = seconds * 1000;
  const start = performance.now();
  let sections = 0;
  while (performance.now() - start < budget) {
    for (let i = 0; i < 100; i++) sink += rateSection(req).summary.turndown;
    sections += 100;
  }
  const elapsed = (performance.now() - start) / 1000;
  const perSecond = (sections * req.trays.length) / elapsed;
  if (!Number.isFinite(sink)) throw new Error('benchmark produced a non-finite result');
  const verdict = perSecond >= TARGET_PER_SECOND ? 'ok' : 'BELOW TARGET';
  return `engine: ${Math.round(perSecond).toLocaleString('en-US')} tray ratings/s (60-tray section, all checks, one core; target ≥ ${TARGET_PER_SECOND.toLocaleString('en-US')}: ${verdict})`;
}

if (process.argv[1] && import.meta.url === pathToFileURL(process.argv[1]).href) {
  console.log(benchEngine());
}
