import { describe, expect, it } from 'vitest';
import {
  countRateFromDensityBeerLambert,
  densityFromCountRateBeerLambert,
  runGammaScan,
  syntheticGammaScan,
} from '../../../server/engine/fieldEvidence/index.js';
import { RHO_L, RHO_V, frothFromPrediction, gammaInput, scanSpec } from './fixtures.js';

const cal = { vapourCountRate: 12000, liquidCountRate: 900, vapourDensity_kg_m3: 20, liquidDensity_kg_m3: 700 };

describe('count rate to density (two-point attenuation calibration)', () => {
  it('docblock example: the geometric mean of the two count rates reads mid-way', () => {
    const c = { vapourCountRate: 10000, liquidCountRate: 1000, vapourDensity_kg_m3: 20, liquidDensity_kg_m3: 700 };
    expect(densityFromCountRateBeerLambert(Math.sqrt(1e7), c)).toBeCloseTo(360, 9);
  });

  it('the calibration readings give the calibration densities', () => {
    expect(densityFromCountRateBeerLambert(12000, cal)).toBeCloseTo(20, 9);
    expect(densityFromCountRateBeerLambert(900, cal)).toBeCloseTo(700, 9);
  });

  it('round trip density → count rate → density over and beyond the calibrated range', () => {
    for (const rho of [-30, 0, 20, 150.5, 333, 699, 700, 850]) {
      const i = countRateFromDensityBeerLambert(rho, cal);
      expect(densityFromCountRateBeerLambert(i, cal)).toBeCloseTo(rho, 8);
    }
    // more liquid on the chord, fewer counts
    expect(countRateFromDensityBeerLambert(300, cal)).toBeLessThan(countRateFromDensityBeerLambert(100, cal));
  });

  it('a count-rate scan reads the same trays as the density scan it came from', () => {
    const froth = frothFromPrediction({ 6: 'flooded', 7: 'flooded', 10: 0 });
    const byDensity = runGammaScan(gammaInput(scanSpec(froth, { seed: 3 }), true));
    const byCounts = runGammaScan(
      gammaInput(scanSpec(froth, { seed: 3, countRates: { vapourCountRate: 50000, liquidCountRate: 2500 } }), true),
    );
    expect(
      syntheticGammaScan(scanSpec(froth, { countRates: { vapourCountRate: 5e4, liquidCountRate: 2500 } }))[0],
    ).toHaveProperty('countRate');
    expect(byCounts.trays.map((t) => t.finding)).toEqual(byDensity.trays.map((t) => t.finding));
    byCounts.trays.forEach((t, i) => expect(t.frothHeight_mm).toBeCloseTo(byDensity.trays[i]!.frothHeight_mm, 6));
    expect(byCounts.profile[10]!.density_kg_m3).toBeCloseTo(byDensity.profile[10]!.density_kg_m3, 6);
    expect(byCounts.floodedRegions).toEqual([expect.objectContaining({ topTray: 6, bottomTray: 7 })]);
    expect(byCounts.notes.join(' ')).toMatch(/two calibration readings/);
    expect(RHO_L).toBeGreaterThan(RHO_V);
  });
});
