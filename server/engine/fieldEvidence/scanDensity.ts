/**
 * Scan normalisation: a gamma-scan count rate to a density along the chord.
 *
 * Principle: narrow-beam attenuation (Beer–Lambert law), I = I₀ exp(−μ_m ρ x), with μ_m the mass
 * attenuation coefficient and x the chord length through the process fluid; the scanning method of
 * ISO 23159:2020 rests on it. The walls and internals on the chord attenuate the same at every elevation
 * (assumption), so ln I is linear in the mean density on the chord, and two calibration readings on the
 * same chord fix the line: I_V through vapour only (density ρ_V) and I_L through liquid-full column
 * (density ρ_L):
 *   ρ = ρ_V + (ρ_L − ρ_V) · ln(I/I_V) / ln(I_L/I_V)
 * Assumptions: same chord length at every elevation (a scan across the active area avoiding the
 * downcomers); build-up from scattered radiation and the source's decay during the scan neglected;
 * the liquid-full reading taken with liquid of the density ρ_L given. Densities outside [ρ_V, ρ_L]
 * (counting noise) are returned as computed, never clipped.
 */
import { method } from '../meta.js';

export interface CountCalibration {
  vapourCountRate: number;
  liquidCountRate: number;
  vapourDensity_kg_m3: number;
  liquidDensity_kg_m3: number;
}

/**
 * Density on the chord from a count rate [kg/m³], two-point Beer–Lambert calibration.
 * Example: I_V 10000, I_L 1000, ρ_V 20, ρ_L 700; I = 3162.3 (= √(I_V I_L)) → 360 kg/m³ (mid-way).
 */
export const densityFromCountRateBeerLambert = method(
  'densityFromCountRateBeerLambert',
  function densityFromCountRateBeerLambert(countRate: number, c: CountCalibration): number {
    const slope = Math.log(c.liquidCountRate / c.vapourCountRate);
    return (
      c.vapourDensity_kg_m3 + ((c.liquidDensity_kg_m3 - c.vapourDensity_kg_m3) * Math.log(countRate / c.vapourCountRate)) / slope
    );
  },
  {
    label: 'Count rate to density (two-point attenuation calibration)',
    source:
      'Beer–Lambert attenuation law for a narrow gamma beam; scanning method of ISO 23159:2020, Non-destructive testing — Gamma ray scanning method on process columns',
    equation: 'rho = rhoV + (rhoL - rhoV) ln(I/I_V) / ln(I_L/I_V)',
    provenance: 'derived',
    ranges: {},
    uncertainty:
      'Assumes the same chord length at every elevation and neglects scattered radiation; densities read from count rates are relative to the two calibration readings.',
  },
);

/** The inverse: the count rate a density gives on the calibrated chord (the synthetic scans use it). */
export function countRateFromDensityBeerLambert(density_kg_m3: number, c: CountCalibration): number {
  const f = (density_kg_m3 - c.vapourDensity_kg_m3) / (c.liquidDensity_kg_m3 - c.vapourDensity_kg_m3);
  return c.vapourCountRate * Math.pow(c.liquidCountRate / c.vapourCountRate, f);
}
