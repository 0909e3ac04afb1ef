/**
 * npm run bench: speed targets are checked here, never in timed tests.
 * Each bench prints one line with its figure and the target.
 */
import { benchEngine } from './engine.js';
import { benches as extraBenches } from './extra.js';
import { benchHeatPlan } from './heatPlan.js';
import { benchPumpAround } from './pumpAround.js';

const benches: { name: string; run: () => Promise<string> }[] = [
  { name: 'engine', run: () => Promise.resolve(benchEngine()) },
  { name: 'pump-around', run: () => Promise.resolve(benchPumpAround()) },
  { name: 'heat plan', run: () => Promise.resolve(benchHeatPlan()) },
];

// Benches that need the database or the HTTP server (API under load, import preview).
benches.push(...extraBenches);

for (const b of benches) {
  try {
    console.log(await b.run());
  } catch (err) {
    console.log(`${b.name}: FAILED — ${(err as Error).message}`);
    process.exitCode = 1;
  }
}
