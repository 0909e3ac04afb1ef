import { describe, expect, it } from 'vitest';
import type { TrayLoad } from '../../../shared/types/rating.js';
import type { PumpAroundSpec } from '../../../shared/types/pumpAround.js';
import {
  condensedVapour,
  dryOutDuty,
  estimateLatentHeat,
  pumpAroundCirculation,
  shiftLoads,
  shiftTraffic,
} from '../../../server/engine/pumpAround/traffic.js';

/** Ten trays, top-down; liquid falls going down above the zone (sensible heat vaporises reflux). */
function column(): TrayLoad[] {
  const L = [52000, 50000, 47000, 43000, 41000, 90000, 95000, 98000, 101000, 104000];
  const V = [74000, 72000, 69000, 65000, 63000, 70000, 120000, 123000, 126000, 129000];
  return L.map((l, i) => ({
    tray: i + 1,
    vapourMassFlow_kg_h: V[i]!,
    liquidMassFlow_kg_h: l,
    vapourDensity_kg_m3: 3.1,
    liquidDensity_kg_m3: 690,
    surfaceTension_mN_m: 17,
  }));
}
const pa: PumpAroundSpec = {
  name: 'PA-1',
  drawTray: 8,
  returnTray: 6,
  baseDuty_kW: 4000,
  liquidHeatCapacity_kJ_kgK: 2.5,
  returnTemperatureDrop_K: 60,
};
const lambda = 240;
const byTray = (loads: TrayLoad[], t: number): TrayLoad => loads.find((l) => l.tray === t)!;

describe('pump-around traffic identities', () => {
  const base = column();
  // all below the dry-out duty, 6733 kW
  for (const Q of [0, 2500, 4000, 6100, 6700]) {
    const shifted = shiftLoads(base, pa, Q, lambda);
    const dm = condensedVapour(Q, pa.baseDuty_kW, lambda);

    it(`Q=${Q}: below the draw tray the traffic is unchanged`, () => {
      for (const t of [9, 10]) expect(byTray(shifted, t)).toEqual(byTray(base, t));
    });

    it(`Q=${Q}: above the zone vapour − liquid on each tray is unchanged and both fall by Δm`, () => {
      for (const t of [1, 2, 3, 4, 5]) {
        const b = byTray(base, t);
        const s = byTray(shifted, t);
        expect(s.vapourMassFlow_kg_h - s.liquidMassFlow_kg_h).toBeCloseTo(b.vapourMassFlow_kg_h - b.liquidMassFlow_kg_h, 6);
        expect(b.vapourMassFlow_kg_h - s.vapourMassFlow_kg_h).toBeCloseTo(dm, 6);
      }
    });

    it(`Q=${Q}: in the zone the net liquid shift equals the vapour shift and the circulation is added`, () => {
      const m = pumpAroundCirculation(pa, Q).circulation_kg_h;
      for (const t of [6, 7, 8]) {
        const b = byTray(base, t);
        const s = byTray(shifted, t);
        expect(s.vapourMassFlow_kg_h - (s.liquidMassFlow_kg_h - m)).toBeCloseTo(b.vapourMassFlow_kg_h - b.liquidMassFlow_kg_h, 6);
      }
    });

    it(`Q=${Q}: properties are the base case's`, () => {
      for (const t of base.map((l) => l.tray)) {
        const { vapourDensity_kg_m3, liquidDensity_kg_m3, surfaceTension_mN_m } = byTray(shifted, t);
        expect({ vapourDensity_kg_m3, liquidDensity_kg_m3, surfaceTension_mN_m }).toEqual({
          vapourDensity_kg_m3: 3.1,
          liquidDensity_kg_m3: 690,
          surfaceTension_mN_m: 17,
        });
      }
    });
  }

  it('bottom-up numbering mirrors the top-down result tray for tray', () => {
    const n = 10;
    const mirrored = base.map((l) => ({ ...l, tray: n + 1 - l.tray }));
    const paUp = { ...pa, drawTray: n + 1 - pa.drawTray, returnTray: n + 1 - pa.returnTray };
    const down = shiftLoads(base, pa, 6000, lambda);
    const up = shiftLoads(mirrored, paUp, 6000, lambda, 'bottom-up');
    for (const t of down) expect(byTray(up, n + 1 - t.tray)).toEqual({ ...t, tray: n + 1 - t.tray });
  });

  it('dry-out duty = Q0 + λ × (lowest liquid above the zone), and that tray is exactly dry there', () => {
    const d = dryOutDuty(base, pa, lambda)!;
    // lowest liquid above tray 6 is tray 5, 41 000 kg/h: 4000 + 240 × 41000/3600 = 6733.33 kW
    expect(d.tray).toBe(5);
    expect(d.duty_kW).toBeCloseTo(4000 + (240 * 41000) / 3600, 9);
    const at = shiftTraffic(base, pa, d.duty_kW, lambda);
    expect(byTray(at.trays, 5).liquidMassFlow_kg_h).toBe(0);
    expect(at.trays.find((t) => t.tray === 5)!.dry).toBe(true);
    const below = shiftTraffic(base, pa, d.duty_kW - 1, lambda);
    expect(below.trays.every((t) => !t.dry)).toBe(true);
  });

  it('liquid never goes negative: past dry-out it is clipped at zero and the tray reported dry', () => {
    const s = shiftTraffic(base, pa, 9000, lambda);
    for (const t of s.trays) {
      expect(t.liquidMassFlow_kg_h).toBeGreaterThanOrEqual(0);
      expect(t.vapourMassFlow_kg_h).toBeGreaterThanOrEqual(0);
    }
    expect(s.trays.filter((t) => t.dry).map((t) => t.tray)).toEqual([1, 2, 3, 4, 5]);
  });
});

describe('hand-worked case (our own numbers)', () => {
  /*
   * Five trays, top-down; return on tray 3, draw on tray 4, so the zone has k = 2 trays.
   * Base duty Q0 = 1000 kW, λ = 200 kJ/kg, c_p = 2.0 kJ/(kg·K), ΔT = 50 K. New duty Q = 1500 kW.
   *   Δm = (1500 − 1000) × 3600 / 200 = 9000 kg/h
   *   circulation m = 1500 × 3600 / (2.0 × 50) = 54 000 kg/h
   * shift fraction s: trays 1–2 (above) 1; tray 3 (return, j = 0) (k−1−0)/k = 1/2; tray 4 (draw) 0; tray 5 0.
   *   tray 1: V 40 000 − 9000 = 31 000; L 30 000 − 9000 = 21 000
   *   tray 2: V 42 000 − 9000 = 33 000; L 28 000 − 9000 = 19 000
   *   tray 3: V 45 000 − 4500 = 40 500; L 31 000 − 4500 + 54 000 = 80 500
   *   tray 4: V 50 000;                  L 36 000 + 54 000 = 90 000
   *   tray 5: V 52 000; L 38 000 (unchanged)
   * condenser duty change −500 kW; reflux (liquid leaving tray 1) 21 000 kg/h.
   * Dry-out: lowest liquid above the zone is tray 2, 28 000 kg/h → Q = 1000 + 200 × 28 000/3600 = 2555.56 kW.
   */
  const base: TrayLoad[] = [
    [1, 40000, 30000],
    [2, 42000, 28000],
    [3, 45000, 31000],
    [4, 50000, 36000],
    [5, 52000, 38000],
  ].map(([tray, v, l]) => ({
    tray: tray!,
    vapourMassFlow_kg_h: v!,
    liquidMassFlow_kg_h: l!,
    vapourDensity_kg_m3: 4,
    liquidDensity_kg_m3: 650,
    surfaceTension_mN_m: 15,
  }));
  const spec: PumpAroundSpec = {
    name: 'PA-H',
    drawTray: 4,
    returnTray: 3,
    baseDuty_kW: 1000,
    liquidHeatCapacity_kJ_kgK: 2,
    returnTemperatureDrop_K: 50,
  };

  it('gives the hand-worked traffic', () => {
    const s = shiftTraffic(base, spec, 1500, 200);
    expect(s.condensed_kg_h).toBeCloseTo(9000, 9);
    expect(s.circulation_kg_h).toBeCloseTo(54000, 9);
    const got = s.trays.map((t) => [t.tray, t.vapourMassFlow_kg_h, t.liquidMassFlow_kg_h, t.region]);
    expect(got).toEqual([
      [1, 31000, 21000, 'above'],
      [2, 33000, 19000, 'above'],
      [3, 40500, 80500, 'zone'],
      [4, 50000, 90000, 'zone'],
      [5, 52000, 38000, 'below'],
    ]);
  });

  it('gives the hand-worked dry-out duty', () => {
    const d = dryOutDuty(base, spec, 200)!;
    expect(d.tray).toBe(2);
    expect(d.duty_kW).toBeCloseTo(2555.5556, 3);
  });

  it('fixed circulation: ΔT follows the duty (1500 kW, 54 000 kg/h, c_p 2 → 50 K)', () => {
    const { circulation_kg_h: _, returnTemperatureDrop_K: __, ...rest } = spec;
    const c = pumpAroundCirculation({ ...rest, circulation_kg_h: 54000 }, 1500);
    expect(c.returnTemperatureDrop_K).toBeCloseTo(50, 9);
    expect(c.circulation_kg_h).toBe(54000);
  });
});

describe('estimateLatentHeat', () => {
  it('λ ≈ Q_c / V_overhead (9000 kW, 120 000 kg/h → 270 kJ/kg)', () => {
    expect(estimateLatentHeat(9000, 120000)).toBeCloseTo(270, 9);
    expect(estimateLatentHeat(0, 120000)).toBeNull();
  });
});
