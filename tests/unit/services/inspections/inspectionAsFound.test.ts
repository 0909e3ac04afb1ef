import { describe, expect, it } from 'vitest';
import { asFoundSectionGeometry, trayStates } from '../../../../server/services/inspections/inspectionAsFound.js';
import type { SectionGeometry } from '../../../../shared/types/rating.js';
import type { TrayFindings, TrayMeasurements } from '../../../../shared/types/inspections.js';

// invented geometry (our own numbers)
const valveTray: SectionGeometry = {
  trayType: 'moving-valve',
  passes: 1,
  columnDiameter_m: 2,
  traySpacing_mm: 610,
  activeArea_m2: 2.5,
  downcomerTopArea_m2: 0.3,
  downcomerBottomArea_m2: 0.3,
  outletWeirLength_m: 1.45,
  weirHeight_mm: 50,
  downcomerClearance_mm: 40,
  holeArea_m2: 0.3,
  holeDiameter_mm: 39,
  deckThickness_mm: 2.7,
  valves: {
    count: 200,
    orificeDiameter_mm: 39,
    valveThickness_mm: 1.5,
    materialDensity_kg_m3: 8000,
    legFactor: 1.2,
    orificeShape: 'flat',
  },
};
const f = (p: Partial<TrayFindings>): TrayFindings => ({
  fouling: false,
  blockedPercent: 0,
  corrosion: false,
  damage: 'none',
  valvesMissing: 0,
  valvesStuck: 0,
  looseFasteners: false,
  manwayInstalled: true,
  closureWitnessed: true,
  debris: false,
  notes: '',
  ...p,
});
const m = (w: number[], c: number[]): TrayMeasurements => ({
  weirHeight_mm: w,
  downcomerClearance_mm: c,
  levelness_mm: null,
  traySpacing_mm: null,
});
const none = m([], []);

describe('as-found geometry from inspection records', () => {
  const records = [
    { tray: 4, findings: f({ blockedPercent: 10, valvesMissing: 6 }), asFound: m([52, 54], [36]), asLeft: none },
    { tray: 5, findings: f({ blockedPercent: 30, valvesStuck: 4 }), asFound: m([50], [38, 40]), asLeft: none },
  ];

  it('averages points and trays; removes plugged, missing and stuck valves from the count and the open area', () => {
    const { geometry, blocked } = asFoundSectionGeometry(valveTray, trayStates(records, 'asFound'), 'average');
    expect(geometry.weirHeight_mm).toBeCloseTo((53 + 50) / 2, 9);
    expect(geometry.downcomerClearance_mm).toBeCloseTo((36 + 39) / 2, 9);
    expect(blocked).toBe(20);
    // 200 × 0.8 − mean(6, 4) = 155 valves; open area in proportion
    expect(geometry.valves?.count).toBe(155);
    expect(geometry.holeArea_m2).toBeCloseTo((0.3 * 155) / 200, 9);
  });

  it("'worst' takes the highest weir, the lowest clearance and the most plugging", () => {
    const { geometry, blocked } = asFoundSectionGeometry(valveTray, trayStates(records, 'asFound'), 'worst');
    expect(geometry.weirHeight_mm).toBe(53);
    expect(geometry.downcomerClearance_mm).toBe(36);
    expect(blocked).toBe(30);
    expect(geometry.valves?.count).toBe(200 * 0.7 - 6);
  });

  it('keeps the design values where nothing was measured (as-left empty here)', () => {
    const { geometry } = asFoundSectionGeometry(valveTray, trayStates(records, 'asLeft'), 'average');
    expect(geometry.weirHeight_mm).toBe(50);
    expect(geometry.downcomerClearance_mm).toBe(40);
  });
});
