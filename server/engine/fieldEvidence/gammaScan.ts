/**
 * Gamma-scan reading against the rating (issue 16): deck elevations from the column and the datum, the
 * scan as densities, the prediction from the loads (when given) and the tray-by-tray reading.
 * The input must have passed validateGammaScanInput.
 */
import type { DensityPoint, GammaScanInput, GammaScanResult, ScanPoint } from '../../../shared/types/fieldEvidence.js';
import { trayDeckElevations } from './elevations.js';
import { predictTrays } from './prediction.js';
import { readGammaScan, type TrayPrediction } from './reader.js';
import { densityFromCountRateBeerLambert } from './scanDensity.js';
import { sortedProfile } from './profile.js';

export const SCAN_CAUTION =
  'A gamma scan is interpreted by qualified people, together with the process data; scanning uses sealed radioactive sources, handled only by licensed contractors under the site rules and licences. The readings and findings here are screening estimates.';

/** The scan as densities, sorted by elevation (count rates through the two-point calibration). */
export function scanToDensities(
  scan: readonly ScanPoint[],
  vapourDensity_kg_m3: number,
  liquidDensity_kg_m3: number,
  calibration?: GammaScanInput['calibration'],
): DensityPoint[] {
  return sortedProfile(
    scan.map((p) => ({
      elevation_m: p.elevation_m,
      density_kg_m3:
        p.density_kg_m3 ??
        densityFromCountRateBeerLambert(p.countRate!, { ...calibration!, vapourDensity_kg_m3, liquidDensity_kg_m3 }),
    })),
  );
}

export function runGammaScan(input: GammaScanInput): GammaScanResult {
  const numbering = input.numbering ?? 'top-down';
  const decks = trayDeckElevations(input.sections, numbering, input.datum);
  const profile = scanToDensities(input.scan, input.vapourDensity_kg_m3, input.liquidDensity_kg_m3, input.calibration);
  let predicted: Map<number, TrayPrediction> | undefined;
  if (input.trays) predicted = predictTrays(input.sections, input.trays, input.methods);
  const reading = readGammaScan(profile, decks, {
    vapourDensity_kg_m3: input.vapourDensity_kg_m3,
    liquidDensity_kg_m3: input.liquidDensity_kg_m3,
    predicted,
  });
  const notes = [SCAN_CAUTION, reading.threshold.basis, ...reading.notes];
  if (input.calibration && input.scan.some((p) => p.countRate !== undefined))
    notes.push(
      'Count rates converted to density by the attenuation law with the two calibration readings (vapour only, liquid-full); the chord length is taken as the same at every elevation.',
    );
  if (predicted)
    notes.push(
      'Predicted froth height: clear liquid height (Bennett, Agrawal & Cook, 1983) over their effective froth density; a froth-regime estimate.',
    );
  return { ...reading, notes, profile };
}
