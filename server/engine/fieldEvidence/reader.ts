/**
 * Reading a gamma scan tray by tray.
 *
 * Interpretation follows the published scan-reading practice: a healthy tray shows a high-density (froth)
 * peak at its deck and the density returns to the vapour baseline in the clear space above it; in flood
 * the vapour spaces lose their clear-vapour readings and high density runs across several trays; a
 * damaged or missing tray shows a reduced or missing peak; a weeping or dumping tray holds little froth
 * (ISO 23159:2020; IAEA training material on gamma scanning of process columns; scanning-service case
 * studies). The numeric rules below are our own screening choices (common practice, no published source):
 * - threshold mid-way (fraction 0.5) between the vapour baseline and the froth reference density (the
 *   median of the trays' peak densities): the half-height of the froth edge, least sensitive to noise on
 *   either plateau; froth height = height above the deck where the (3-point median) profile falls below it;
 * - flooded: less clear vapour space than one scan step or 5 % of the tray spacing;
 * - missing tray: no point above the threshold in the lowest quarter of the tray space;
 * - low liquid: froth under half the reference height, high froth: over 1.5 times it, either by more than
 *   one scan step; the reference height is the predicted froth height where loads are given, otherwise the
 *   median froth height of the scan's trays;
 * - a vapour space (median of the upper half of the clear space) that stays a quarter of the way from the
 *   baseline to the froth reference is not clear: liquid rains through it (weeping or dumping above).
 */
import type {
  DensityPoint,
  FloodedRegion,
  ScanFinding,
  ScanThreshold,
  ScanTrayReading,
  TrayElevation,
} from '../../../shared/types/fieldEvidence.js';
import { median, medianStep, runningMedian3, sortedProfile } from './profile.js';

export const THRESHOLD_FRACTION = 0.5;
export const FLOODED_CLEAR_FRACTION = 0.05;
export const PEAK_ZONE_FRACTION = 0.25;
export const LOW_FROTH_RATIO = 0.5;
export const HIGH_FROTH_RATIO = 1.5;
export const HAZY_FRACTION = 0.25;
/** floor of the froth reference above the baseline, as a fraction of (ρL − ρV), when the scan shows no peaks */
const MIN_REFERENCE_FRACTION = 0.1;

export const THRESHOLD_BASIS =
  'Froth height read where the density falls below the mid-way density between the vapour baseline and the median froth peak of the scanned trays (half-height of the froth edge; a screening rule of common practice).';

export interface TrayPrediction {
  frothHeight_mm: number;
  downcomerAeratedBackup_mm: number;
  /** predicted percent of jet flood (the rating's chosen method), quoted beside a flooded reading */
  percentFlood?: number;
}

export interface ReadOptions {
  vapourDensity_kg_m3: number;
  liquidDensity_kg_m3: number;
  /** predicted froth height and downcomer backup by tray (same load case), where loads are given */
  predicted?: ReadonlyMap<number, TrayPrediction>;
}

export interface ScanReading {
  threshold: ScanThreshold;
  trays: ScanTrayReading[];
  floodedRegions: FloodedRegion[];
  notes: string[];
}

interface RawReading {
  deck: TrayElevation;
  froth_m: number;
  peak: number;
  vapourSpace: number | null;
}

const r0 = (x: number): string => String(Math.round(x));

/** Decks whose whole tray space lies inside the scanned span (within half a scan step), top first. */
export function decksInSpan(profile: readonly DensityPoint[], decks: readonly TrayElevation[]): TrayElevation[] {
  if (profile.length === 0) return [];
  const half = medianStep(profile) / 2;
  const lo = profile[0]!.elevation_m - half;
  const hi = profile[profile.length - 1]!.elevation_m + half;
  return decks.filter((d) => d.deckElevation_m >= lo && d.deckElevation_m + d.traySpacing_mm / 1000 <= hi);
}

function readTray(pts: readonly DensityPoint[], deck: TrayElevation, threshold: number, step: number): RawReading {
  const z0 = deck.deckElevation_m;
  const S = deck.traySpacing_mm / 1000;
  const idx: number[] = [];
  pts.forEach((p, i) => {
    if (p.elevation_m >= z0 && p.elevation_m < z0 + S) idx.push(i);
  });
  const inWindow = idx.map((i) => pts[i]!);
  const peak = Math.max(...inWindow.filter((p) => p.elevation_m < z0 + S / 2).map((p) => p.density_kg_m3));
  const start = idx.find((i) => pts[i]!.elevation_m <= z0 + PEAK_ZONE_FRACTION * S && pts[i]!.density_kg_m3 >= threshold);
  let froth = 0;
  if (start !== undefined) {
    let j = start;
    while (j + 1 < pts.length && pts[j + 1]!.elevation_m < z0 + S && pts[j + 1]!.density_kg_m3 >= threshold) j++;
    const a = pts[j]!;
    const b = pts[j + 1];
    if (!b || b.elevation_m >= z0 + S || z0 + S - a.elevation_m <= step / 2) froth = S;
    else
      froth = Math.min(
        S,
        a.elevation_m +
          ((a.density_kg_m3 - threshold) / (a.density_kg_m3 - b.density_kg_m3)) * (b.elevation_m - a.elevation_m) -
          z0,
      );
  }
  // the upper half of the clear space, clear of the froth's fading top
  const above = inWindow.filter((p) => p.elevation_m > z0 + froth + (S - froth) / 2).map((p) => p.density_kg_m3);
  return { deck, froth_m: froth, peak: Number.isFinite(peak) ? peak : NaN, vapourSpace: above.length ? median(above) : null };
}

/**
 * Read every tray whose space the scan covers. `decks` top of the column first (trayDeckElevations).
 * Example: see tests/unit/fieldEvidence/reader.test.ts (synthetic scans of known froth heights).
 */
export function readGammaScan(profile: readonly DensityPoint[], decks: readonly TrayElevation[], o: ReadOptions): ScanReading {
  const pts = runningMedian3(sortedProfile(profile));
  const step = medianStep(pts);
  const span = decksInSpan(pts, decks);
  const rhoV = o.vapourDensity_kg_m3;
  const rhoL = o.liquidDensity_kg_m3;
  const notes: string[] = [];
  // the froth reference: median of the peaks in the lower half of each tray space
  const peaks = span.map((d) =>
    Math.max(
      ...pts
        .filter((p) => p.elevation_m >= d.deckElevation_m && p.elevation_m < d.deckElevation_m + d.traySpacing_mm / 2000)
        .map((p) => p.density_kg_m3),
    ),
  );
  let reference = median(peaks.filter(Number.isFinite));
  const floor = rhoV + MIN_REFERENCE_FRACTION * (rhoL - rhoV);
  if (!(reference >= floor)) {
    reference = floor;
    notes.push(
      'The scan shows no clear froth peaks: the froth reference is set at 10 % of the way from vapour to liquid density.',
    );
  }
  const thr = rhoV + THRESHOLD_FRACTION * (reference - rhoV);
  const raw = span.map((d) => readTray(pts, d, thr, step));
  const sampleHeight = median(
    raw.filter((r) => r.froth_m > 0 && r.deck.traySpacing_mm / 1000 - r.froth_m > step).map((r) => r.froth_m * 1000),
  );
  const hazyAbove = rhoV + HAZY_FRACTION * (reference - rhoV);
  const trays = raw.map((r, i) => {
    const pred = o.predicted?.get(r.deck.tray);
    const refH = pred ? pred.frothHeight_mm : sampleHeight;
    const below = raw[i + 1]; // the tray below (top-first order): weeping liquid rains through its vapour space
    const c = classify(r, step * 1000, thr, refH, pred ? 'predicted' : 'scan median', hazyAbove, below);
    const finding = c.finding;
    // a flooded reading against a rating that predicts no jet flood points at fouling, foaming or the downcomers
    const reason =
      finding === 'flooded' && pred?.percentFlood !== undefined
        ? `${c.reason.slice(0, -1)}; predicted ${r0(pred.percentFlood)} % of jet flood, downcomer backup ${r0(pred.downcomerAeratedBackup_mm)} mm.`
        : c.reason;
    const S = r.deck.traySpacing_mm;
    const out: ScanTrayReading = {
      tray: r.deck.tray,
      deckElevation_m: r.deck.deckElevation_m,
      traySpacing_mm: S,
      frothHeight_mm: r.froth_m * 1000,
      clearVapourSpace_mm: S - r.froth_m * 1000,
      peakDensity_kg_m3: r.peak,
      vapourSpaceDensity_kg_m3: r.vapourSpace,
      finding,
      reason,
    };
    if (pred) {
      out.predictedFrothHeight_mm = pred.frothHeight_mm;
      out.predictedDowncomerBackup_mm = pred.downcomerAeratedBackup_mm;
    }
    return out;
  });
  return {
    threshold: {
      fraction: THRESHOLD_FRACTION,
      density_kg_m3: thr,
      vapourBaseline_kg_m3: rhoV,
      frothReference_kg_m3: reference,
      resolution_mm: Math.round(step * 1e9) / 1e6,
      basis: THRESHOLD_BASIS,
    },
    trays,
    floodedRegions: floodedRegions(trays),
    notes,
  };
}

function classify(
  r: RawReading,
  res_mm: number,
  thr: number,
  refH: number,
  refName: string,
  hazyAbove: number,
  below: RawReading | undefined,
): { finding: ScanFinding; reason: string } {
  const S = r.deck.traySpacing_mm;
  const h = r.froth_m * 1000;
  const clear = S - h;
  if (clear < Math.max(res_mm, FLOODED_CLEAR_FRACTION * S))
    return {
      finding: 'flooded',
      reason: `Vapour space filled: the density stays above ${r0(thr)} kg/m³ up to the deck above (${r0(S)} mm).`,
    };
  if (h === 0)
    return {
      finding: 'missing-tray',
      reason: `No liquid peak at the deck: the density stays below ${r0(thr)} kg/m³ in the lowest quarter of the tray space (tray missing, collapsed or dry).`,
    };
  const hasRef = Number.isFinite(refH) && refH > 0;
  if (hasRef && h < LOW_FROTH_RATIO * refH && refH - h > res_mm) {
    const rain = below?.vapourSpace != null && below.vapourSpace > hazyAbove;
    return {
      finding: 'low-liquid',
      reason: `Froth ${r0(h)} mm is under half the ${refName} ${r0(refH)} mm${rain ? '; the vapour space below stays above the vapour baseline (weeping or dumping)' : ' (dry or weeping tray)'}.`,
    };
  }
  if (hasRef && h > HIGH_FROTH_RATIO * refH && h - refH > res_mm)
    return {
      finding: 'high-froth',
      reason: `Froth ${r0(h)} mm is over 1.5 times the ${refName} ${r0(refH)} mm, ${r0(clear)} mm clear space left (excess froth or foaming).`,
    };
  return {
    finding: 'normal',
    reason: `Froth ${r0(h)} mm with ${r0(clear)} mm clear vapour space${hasRef ? ` (${refName} ${r0(refH)} mm)` : ''}.`,
  };
}

/** Runs of consecutive flooded trays (top first), each with the elevations it spans. */
export function floodedRegions(trays: readonly ScanTrayReading[]): FloodedRegion[] {
  const regions: FloodedRegion[] = [];
  let run: ScanTrayReading[] = [];
  const close = (): void => {
    if (run.length) {
      const top = run[0]!;
      const bottom = run[run.length - 1]!;
      regions.push({
        topTray: top.tray,
        bottomTray: bottom.tray,
        fromElevation_m: bottom.deckElevation_m,
        toElevation_m: top.deckElevation_m + top.traySpacing_mm / 1000,
      });
    }
    run = [];
  };
  for (const t of trays) {
    if (t.finding === 'flooded') run.push(t);
    else close();
  }
  close();
  return regions;
}
