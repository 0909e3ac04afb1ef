/**
 * Invented column for the field-evidence tests (demo-style numbers, not from any source): three sections
 * of 16 trays, numbering chosen per test, and synthetic scans of known froth heights from our own model.
 */
import type { StudySection } from '../../../shared/types/pumpAround.js';
import type { TrayLoad } from '../../../shared/types/rating.js';
import type { GammaScanInput } from '../../../shared/types/fieldEvidence.js';
import {
  frothHeightsFromRating,
  syntheticGammaScan,
  trayDeckElevations,
  type SyntheticScanSpec,
  type SyntheticTrayState,
} from '../../../server/engine/fieldEvidence/index.js';

const geometry = {
  trayType: 'sieve',
  passes: 1,
  columnDiameter_m: 4.2,
  activeArea_m2: 10.53,
  downcomerTopArea_m2: 1.66,
  downcomerBottomArea_m2: 1.66,
  outletWeirLength_m: 3.2,
  weirHeight_mm: 40,
  downcomerClearance_mm: 38,
  holeArea_m2: 0.6,
  holeDiameter_mm: 12.7,
  deckThickness_mm: 3,
  systemFactor: 0.9,
  foaming: 'moderate',
} as const;

export function sections(numbering: 'top-down' | 'bottom-up' = 'top-down'): StudySection[] {
  // top-down: trays 1–6 and 7–9 at 686 mm, 10–16 at 610 mm; bottom-up numbers the same trays 17 − n
  const n = (t: number): number => (numbering === 'top-down' ? t : 17 - t);
  return [
    { ...geometry, name: 'Upper', fromTray: n(1), toTray: n(6), traySpacing_mm: 686 },
    { ...geometry, name: 'Middle', fromTray: n(7), toTray: n(9), traySpacing_mm: 686 },
    { ...geometry, name: 'Lower', fromTray: n(10), toTray: n(16), traySpacing_mm: 610 },
  ];
}

/** Loads of an invented load case, trays 1–16 top-down. */
export function loads(): TrayLoad[] {
  return Array.from({ length: 16 }, (_, i) => ({
    tray: i + 1,
    vapourMassFlow_kg_h: 100000 + 1500 * i,
    liquidMassFlow_kg_h: 45000 + 1500 * i,
    vapourDensity_kg_m3: 3.6,
    liquidDensity_kg_m3: 690,
    surfaceTension_mN_m: 18.5,
    temperature_C: 118 + 6 * i,
    pressure_kPa: 245 + 0.8 * i,
  }));
}

export const RHO_V = 3.6;
export const RHO_L = 690;
export const RHO_FROTH = 0.35 * RHO_L;
export const DATUM = { tray: 16, elevation_m: 5 };

/** A scan of trays 3–14 (top-down numbering), 25 mm step, with the given froth heights. */
export function scanSpec(
  frothHeights: { tray: number; frothHeight_mm: number }[],
  extra: Partial<SyntheticScanSpec> = {},
): SyntheticScanSpec {
  const decks = trayDeckElevations(sections(), 'top-down', DATUM);
  const deck = (t: number): number => decks.find((d) => d.tray === t)!.deckElevation_m;
  return {
    decks,
    frothHeights,
    defaultFrothHeight_mm: 180,
    vapourDensity_kg_m3: RHO_V,
    liquidDensity_kg_m3: RHO_L,
    frothDensity_kg_m3: RHO_FROTH,
    from_m: deck(14) - 0.1,
    to_m: deck(3) + 0.686 + 0.1,
    step_m: 0.025,
    noise_kg_m3: 12,
    seed: 42,
    ...extra,
  };
}

export function gammaInput(spec: SyntheticScanSpec, withLoads = false): GammaScanInput {
  const input: GammaScanInput = {
    sections: sections(),
    numbering: 'top-down',
    datum: DATUM,
    liquidDensity_kg_m3: RHO_L,
    vapourDensity_kg_m3: RHO_V,
    scan: syntheticGammaScan(spec),
  };
  if (spec.countRates) input.calibration = spec.countRates;
  if (withLoads) input.trays = loads();
  return input;
}

/** Froth heights of the model: the prediction for every tray, times a factor, flooded or missing per listed tray. */
export function frothFromPrediction(states: Record<number, SyntheticTrayState>): { tray: number; frothHeight_mm: number }[] {
  return frothHeightsFromRating(sections(), loads(), states);
}
