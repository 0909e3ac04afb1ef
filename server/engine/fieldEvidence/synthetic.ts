/**
 * Deterministic synthetic gamma scans from our own simple model (for tests and the demo data; never a
 * real scan). Along the chord: froth of one density from each deck up to its froth height, its top fading
 * linearly over ±15 % of the height (so the mid-way density sits at the stated height), vapour above; a
 * froth height at or above the tray spacing fills the space to the deck above (flood); zero leaves the
 * space empty (a missing or dry tray). Below `liquidLevel_m` the column is liquid-full (the sump). A tray's
 * clear space may carry a density of its own (`vapourSpaceDensities`: liquid raining from a weeping tray above).
 * Tray decks themselves, walls and downcomers are not modelled. Gaussian noise from a seeded generator
 * (mulberry32 with Box–Muller) is added to the density, before conversion to count rates when asked.
 */
import type { ScanPoint, TrayElevation } from '../../../shared/types/fieldEvidence.js';
import type { StudySection } from '../../../shared/types/pumpAround.js';
import type { MethodOptions, TrayLoad } from '../../../shared/types/rating.js';
import { countRateFromDensityBeerLambert } from './scanDensity.js';
import { predictTrays } from './prediction.js';

export interface SyntheticScanSpec {
  decks: readonly TrayElevation[];
  /** froth height of each listed tray [mm]; trays not listed get `defaultFrothHeight_mm` */
  frothHeights?: readonly { tray: number; frothHeight_mm: number }[];
  defaultFrothHeight_mm: number;
  vapourDensity_kg_m3: number;
  liquidDensity_kg_m3: number;
  frothDensity_kg_m3: number;
  /** scanned span and step [m] */
  from_m: number;
  to_m: number;
  step_m: number;
  /** standard deviation of the density noise [kg/m³] (0: none) */
  noise_kg_m3?: number;
  seed?: number;
  liquidLevel_m?: number;
  /** density in the clear space above a tray's froth [kg/m³]: liquid raining from a weeping tray above */
  vapourSpaceDensities?: readonly { tray: number; density_kg_m3: number }[];
  /** give count rates on this calibrated chord instead of densities */
  countRates?: { vapourCountRate: number; liquidCountRate: number };
}

/** mulberry32: a small, well-known 32-bit seeded generator; uniform in [0, 1). */
export function seededUniform(seed: number): () => number {
  let a = seed >>> 0;
  return () => {
    a = (a + 0x6d2b79f5) >>> 0;
    let t = a;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
}

/** Standard normal deviates from a seeded uniform generator (Box–Muller). */
export function seededNormal(seed: number): () => number {
  const u = seededUniform(seed);
  return () => Math.sqrt(-2 * Math.log(1 - u())) * Math.cos(2 * Math.PI * u());
}

const FADE = 0.15;

/** The model's noise-free density at elevation z [kg/m³]. */
export function syntheticDensity(spec: SyntheticScanSpec, z: number): number {
  const rf = spec.frothDensity_kg_m3;
  if (spec.liquidLevel_m !== undefined && z <= spec.liquidLevel_m) return spec.liquidDensity_kg_m3;
  const deck = spec.decks.find((d) => z >= d.deckElevation_m && z < d.deckElevation_m + d.traySpacing_mm / 1000);
  if (!deck) return spec.vapourDensity_kg_m3;
  const hf = (spec.frothHeights?.find((f) => f.tray === deck.tray)?.frothHeight_mm ?? spec.defaultFrothHeight_mm) / 1000;
  const y = z - deck.deckElevation_m;
  if (hf >= deck.traySpacing_mm / 1000) return rf;
  const rv = spec.vapourSpaceDensities?.find((v) => v.tray === deck.tray)?.density_kg_m3 ?? spec.vapourDensity_kg_m3;
  if (hf <= 0) return rv;
  const lo = hf * (1 - FADE);
  const hi = hf * (1 + FADE);
  if (y <= lo) return rf;
  if (y >= hi) return rv;
  return rf + ((rv - rf) * (y - lo)) / (hi - lo);
}

/** The scan: points from `from_m` to `to_m` every `step_m`, densities or count rates. */
export function syntheticGammaScan(spec: SyntheticScanSpec): ScanPoint[] {
  const normal = seededNormal(spec.seed ?? 1);
  const sd = spec.noise_kg_m3 ?? 0;
  const n = Math.floor((spec.to_m - spec.from_m) / spec.step_m + 1e-9);
  const points: ScanPoint[] = [];
  for (let i = 0; i <= n; i++) {
    const z = Math.round((spec.from_m + i * spec.step_m) * 1e6) / 1e6;
    const rho = syntheticDensity(spec, z) + sd * normal();
    if (spec.countRates)
      points.push({
        elevation_m: z,
        countRate: countRateFromDensityBeerLambert(rho, {
          ...spec.countRates,
          vapourDensity_kg_m3: spec.vapourDensity_kg_m3,
          liquidDensity_kg_m3: spec.liquidDensity_kg_m3,
        }),
      });
    else points.push({ elevation_m: z, density_kg_m3: rho });
  }
  return points;
}

/** A tray's state in a synthetic scan: a factor on the predicted froth height, 'flooded' or 'missing'. */
export type SyntheticTrayState = number | 'flooded' | 'missing';

/**
 * Froth heights for a synthetic scan made from the rating: the predicted froth height of every loaded tray
 * (same load case), times a factor, or flooded (froth to the deck above) or missing (no froth), per tray.
 * Example: { 6: 'flooded', 7: 'flooded', 12: 'missing', 4: 2 } floods trays 6–7, removes tray 12 and doubles
 * tray 4's froth.
 */
export function frothHeightsFromRating(
  sections: readonly StudySection[],
  loads: readonly TrayLoad[],
  states: Readonly<Record<number, SyntheticTrayState>> = {},
  methods?: MethodOptions,
): { tray: number; frothHeight_mm: number }[] {
  const tallest = Math.max(...sections.map((s) => s.traySpacing_mm));
  return [...predictTrays(sections, loads, methods).values()].map((p) => {
    const st = states[p.tray] ?? 1;
    const h = st === 'flooded' ? 2 * tallest : st === 'missing' ? 0 : p.frothHeight_mm * st;
    return { tray: p.tray, frothHeight_mm: h };
  });
}
