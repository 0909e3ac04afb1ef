import { describe, expect, it } from 'vitest';
import {
  readGammaScan,
  runGammaScan,
  scanToDensities,
  syntheticGammaScan,
  trayDeckElevations,
  THRESHOLD_FRACTION,
} from '../../../server/engine/fieldEvidence/index.js';
import { DATUM, RHO_FROTH, RHO_L, RHO_V, frothFromPrediction, gammaInput, scanSpec, sections } from './fixtures.js';

const known = [
  { tray: 5, frothHeight_mm: 686 },
  { tray: 6, frothHeight_mm: 686 },
  { tray: 7, frothHeight_mm: 686 }, // flooded region: trays 5–7
  { tray: 11, frothHeight_mm: 0 }, // missing tray
  { tray: 4, frothHeight_mm: 140 },
  { tray: 13, frothHeight_mm: 230 },
];

function read(seed: number, noise = 12) {
  const spec = scanSpec(known, { seed, noise_kg_m3: noise });
  const decks = trayDeckElevations(sections(), 'top-down', DATUM);
  const profile = scanToDensities(syntheticGammaScan(spec), RHO_V, RHO_L);
  return readGammaScan(profile, decks, { vapourDensity_kg_m3: RHO_V, liquidDensity_kg_m3: RHO_L });
}

describe('gamma-scan reader on synthetic scans of known froth heights', () => {
  it('reads the scanned span only: trays 3–14, top first', () => {
    expect(read(1).trays.map((t) => t.tray)).toEqual([3, 4, 5, 6, 7, 8, 9, 10, 11, 12, 13, 14]);
  });

  it.each([1, 2, 3, 42, 77])('seed %i: finds the flooded region 5–7 and the missing tray 11', (seed) => {
    const r = read(seed);
    const by = new Map(r.trays.map((t) => [t.tray, t]));
    expect(r.floodedRegions).toEqual([expect.objectContaining({ topTray: 5, bottomTray: 7 })]);
    expect(by.get(11)!.finding).toBe('missing-tray');
    for (const t of [3, 8, 9, 10, 12, 14]) expect(by.get(t)!.finding, `tray ${t}`).toBe('normal');
    expect(r.trays.filter((t) => t.finding === 'flooded').map((t) => t.tray)).toEqual([5, 6, 7]);
    // the flooded region spans from tray 7's deck to tray 4's deck (the top of tray 5's space)
    expect(r.floodedRegions[0]!.fromElevation_m).toBeCloseTo(by.get(7)!.deckElevation_m, 9);
    expect(r.floodedRegions[0]!.toElevation_m).toBeCloseTo(by.get(4)!.deckElevation_m, 9);
  });

  it('froth heights within two scan steps of the known heights (noise 12 kg/m³)', () => {
    const r = read(5);
    const by = new Map(r.trays.map((t) => [t.tray, t]));
    expect(by.get(4)!.frothHeight_mm).toBeGreaterThan(140 - 50);
    expect(by.get(4)!.frothHeight_mm).toBeLessThan(140 + 50);
    expect(by.get(13)!.frothHeight_mm).toBeGreaterThan(230 - 50);
    expect(by.get(13)!.frothHeight_mm).toBeLessThan(230 + 50);
    for (const t of [3, 8, 9, 10, 12, 14]) expect(Math.abs(by.get(t)!.frothHeight_mm - 180), `tray ${t}`).toBeLessThan(50);
    expect(by.get(6)!.clearVapourSpace_mm).toBe(0);
    expect(by.get(11)!.frothHeight_mm).toBe(0);
  });

  it('without noise the mid-way threshold reads the model heights to within interpolation', () => {
    const r = read(1, 0);
    const by = new Map(r.trays.map((t) => [t.tray, t]));
    expect(by.get(4)!.frothHeight_mm).toBeCloseTo(140, -1);
    expect(by.get(13)!.frothHeight_mm).toBeCloseTo(230, -1);
    expect(r.threshold.fraction).toBe(THRESHOLD_FRACTION);
    expect(r.threshold.frothReference_kg_m3).toBeCloseTo(RHO_FROTH, 6);
    expect(r.threshold.density_kg_m3).toBeCloseTo(RHO_V + 0.5 * (RHO_FROTH - RHO_V), 6);
    expect(r.threshold.resolution_mm).toBeCloseTo(25, 6);
  });

  it('low liquid and high froth against the scan median', () => {
    const spec = scanSpec([
      { tray: 8, frothHeight_mm: 50 },
      { tray: 12, frothHeight_mm: 420 },
    ]);
    const decks = trayDeckElevations(sections(), 'top-down', DATUM);
    const r = readGammaScan(scanToDensities(syntheticGammaScan(spec), RHO_V, RHO_L), decks, {
      vapourDensity_kg_m3: RHO_V,
      liquidDensity_kg_m3: RHO_L,
    });
    const by = new Map(r.trays.map((t) => [t.tray, t]));
    expect(by.get(8)!.finding).toBe('low-liquid');
    expect(by.get(8)!.reason).toMatch(/under half the scan median/);
    expect(by.get(12)!.finding).toBe('high-froth');
    expect(r.floodedRegions).toEqual([]);
  });

  it('a low tray over a rainy vapour space reads as weeping; the same tray over clear vapour as dry or weeping', () => {
    const decks = trayDeckElevations(sections(), 'top-down', DATUM);
    const readWith = (rain: number) =>
      readGammaScan(
        scanToDensities(
          syntheticGammaScan(
            scanSpec([{ tray: 8, frothHeight_mm: 60 }], {
              step_m: 0.01,
              vapourSpaceDensities: [{ tray: 9, density_kg_m3: rain }],
            }),
          ),
          RHO_V,
          RHO_L,
        ),
        decks,
        { vapourDensity_kg_m3: RHO_V, liquidDensity_kg_m3: RHO_L },
      ).trays.find((t) => t.tray === 8)!;
    const wet = readWith(95);
    expect(wet.finding).toBe('low-liquid');
    expect(wet.reason).toMatch(/vapour space below stays above the vapour baseline \(weeping or dumping\)/);
    const dry = readWith(RHO_V);
    expect(dry.finding).toBe('low-liquid');
    expect(dry.reason).toMatch(/\(dry or weeping tray\)/);
  });

  it('a tray-free stretch of scan: every deck in span read, none made up', () => {
    const r = read(9);
    for (const t of r.trays) {
      expect(t.reason.length).toBeGreaterThan(10);
      expect(t.frothHeight_mm + t.clearVapourSpace_mm).toBeCloseTo(t.traySpacing_mm, 6);
    }
  });
});

describe('gamma scan with loads: prediction beside the reading', () => {
  it('froth built from the prediction reads normal; flood, missing tray, high froth and low liquid found against it', () => {
    const froth = frothFromPrediction({ 5: 'flooded', 6: 'flooded', 7: 'flooded', 11: 0, 4: 2.5, 13: 0.4 });
    // a 10 mm step resolves the thin froth of the low-liquid tray (about 30 mm)
    const r = runGammaScan(gammaInput(scanSpec(froth, { seed: 11, step_m: 0.01 }), true));
    const by = new Map(r.trays.map((t) => [t.tray, t]));
    for (const t of r.trays) {
      expect(t.predictedFrothHeight_mm, `tray ${t.tray}`).toBeGreaterThan(0);
      expect(t.predictedDowncomerBackup_mm).toBeGreaterThan(0);
    }
    expect(r.floodedRegions.map((f) => [f.topTray, f.bottomTray])).toEqual([[5, 7]]);
    expect(by.get(11)!.finding).toBe('missing-tray');
    expect(by.get(6)!.reason).toMatch(/^Vapour space filled: .*; predicted \d+ % of jet flood, downcomer backup \d+ mm\.$/);
    expect(by.get(4)!.finding).toBe('high-froth');
    expect(by.get(4)!.reason).toMatch(/predicted/);
    expect(by.get(13)!.finding).toBe('low-liquid');
    for (const t of [3, 8, 9, 10, 12, 14]) expect(by.get(t)!.finding, `tray ${t}`).toBe('normal');
    expect(r.notes[0]).toMatch(/qualified people/);
  });
});
