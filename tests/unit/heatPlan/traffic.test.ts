import { describe, expect, it } from 'vitest';
import type { TrayLoad } from '../../../shared/types/rating.js';
import type { PlanPumpAround } from '../../../shared/types/heatPlan.js';
import {
  condenserDutyChange,
  heatAboveTemperature,
  linearDryResidual,
  linearTraffic,
  recoveredHeat,
  shiftPlanTraffic,
  trayRoles,
} from '../../../server/engine/heatPlan/index.js';
import { shiftTraffic } from '../../../server/engine/pumpAround/traffic.js';

/** Eight trays, top-down (invented numbers chosen for easy hand arithmetic). */
function column(): TrayLoad[] {
  const V = [60000, 62000, 64000, 66000, 68000, 70000, 72000, 74000];
  const L = [30000, 31000, 32000, 33000, 34000, 35000, 36000, 37000];
  return V.map((v, i) => ({
    tray: i + 1,
    vapourMassFlow_kg_h: v,
    liquidMassFlow_kg_h: L[i]!,
    vapourDensity_kg_m3: 3,
    liquidDensity_kg_m3: 700,
    surfaceTension_mN_m: 18,
  }));
}
const sweep = { fromDuty_kW: 0, toDuty_kW: 4000, steps: 4 };
/** upper pump-around: zone 2..3, fixed ΔT; lower: zone 5..7, fixed circulation */
const pas: PlanPumpAround[] = [
  {
    name: 'A',
    returnTray: 2,
    drawTray: 3,
    baseDuty_kW: 1000,
    liquidHeatCapacity_kJ_kgK: 2.5,
    returnTemperatureDrop_K: 50,
    drawTemperature_C: 200,
    sweep,
  },
  {
    name: 'B',
    returnTray: 5,
    drawTray: 7,
    baseDuty_kW: 2000,
    liquidHeatCapacity_kJ_kgK: 2.5,
    circulation_kg_h: 36000,
    drawTemperature_C: 260,
    sweep,
  },
];
const lambda = 250;
const at = (duties: number[]) => shiftPlanTraffic(column(), pas, duties, lambda);

describe('several pump-arounds: hand-worked case', () => {
  /*
   * λ 250 kJ/kg. A at 1500 kW: Δm_A = 500·3600/250 = 7200 kg/h; circulation 1500·3600/(2.5·50) = 43 200 kg/h.
   * B at 1250 kW: Δm_B = −750·3600/250 = −10 800 kg/h; circulation fixed 36 000 kg/h, ΔT = 1250·3600/(36000·2.5) = 50 K.
   * Fractions s: tray 1 (1, 1); tray 2 (½, 1); trays 3, 4 (0, 1); tray 5 (0, ⅔); tray 6 (0, ⅓); tray 7 (0, 0); tray 8 (0, 0).
   * Shift Σ s·Δm: −3600, −7200, −10800, −10800, −7200, −3600, 0, 0.
   * V = V0 − shift: 63600, 69200, 74800, 76800, 75200, 73600, 72000, 74000.
   * L = L0 − shift + circulation of its zone: 33600, 31000+7200+43200 = 81400, 32000+10800+43200 = 86000,
   *     43800, 34000+7200+36000 = 77200, 35000+3600+36000 = 74600, 36000+36000 = 72000, 37000.
   * Condenser duty change −(500 − 750) = +250 kW.
   * Heat level, useful above 170 °C: A 200 → 150 °C, 1500·30/50 = 900 kW; B 260 → 210 °C, all 1250 kW above.
   */
  const r = at([1500, 1250]);
  it('vapour and liquid of every tray', () => {
    const V = [63600, 69200, 74800, 76800, 75200, 73600, 72000, 74000];
    const L = [33600, 81400, 86000, 43800, 77200, 74600, 72000, 37000];
    r.trays.forEach((t, i) => {
      expect(t.vapourMassFlow_kg_h).toBeCloseTo(V[i]!, 6);
      expect(t.liquidMassFlow_kg_h).toBeCloseTo(L[i]!, 6);
    });
    expect(r.states[1]!.returnTemperatureDrop_K).toBeCloseTo(50, 9);
  });
  it('condenser duty change and heat level', () => {
    expect(r.condenserDutyChange_kW).toBeCloseTo(250, 9);
    const h = recoveredHeat(pas, [1500, 1250], 170);
    expect(h.recoveredHeat_kW).toBeCloseTo(2750, 9);
    expect(h.recoveredAboveTemperature_kW).toBeCloseTo(900 + 1250, 9);
    expect(h.condenserDutyChange_kW).toBeCloseTo(250, 9);
  });
});

describe('several pump-arounds: identities', () => {
  const base = column();
  const grid = [0, 700, 1000, 2600, 3900];
  for (const qa of grid)
    for (const qb of [0, 1500, 2000, 3300]) {
      const r = at([qa, qb]);
      const dmA = ((qa - 1000) * 3600) / lambda;
      const dmB = ((qb - 2000) * 3600) / lambda;
      it(`A ${qa} kW, B ${qb} kW`, () => {
        // both together: the top tray loses Σ Δm; the condenser duty changes by −Σ ΔQ
        expect(base[0]!.vapourMassFlow_kg_h - r.trays[0]!.rawVapour_kg_h).toBeCloseTo(dmA + dmB, 6);
        expect(r.condenserDutyChange_kW).toBeCloseTo(-(qa - 1000 + qb - 2000), 9);
        expect(condenserDutyChange(pas, [qa, qb])).toBe(r.condenserDutyChange_kW);
        // below the lowest draw: unchanged, exactly
        expect(r.trays[7]!.vapourMassFlow_kg_h).toBe(base[7]!.vapourMassFlow_kg_h);
        expect(r.trays[7]!.liquidMassFlow_kg_h).toBe(base[7]!.liquidMassFlow_kg_h);
        // the net upward flow across every cut (vapour minus net liquid, circulation taken out) is unchanged
        r.trays.forEach((t, i) => {
          const circ = i === 1 || i === 2 ? r.states[0]!.circulation_kg_h : i >= 4 && i <= 6 ? r.states[1]!.circulation_kg_h : 0;
          if (t.dry) return;
          expect(t.vapourMassFlow_kg_h - (t.liquidMassFlow_kg_h - circ)).toBeCloseTo(
            base[i]!.vapourMassFlow_kg_h - base[i]!.liquidMassFlow_kg_h,
            6,
          );
        });
        // each pump-around alone: the single study's traffic (the other at its base duty; its circulation
        // stays on its own zone, which the single study does not know)
        const aloneA = at([qa, 2000]);
        const singleA = shiftTraffic(base, pas[0]!, qa, lambda);
        aloneA.trays.forEach((t, i) => {
          expect(t.vapourMassFlow_kg_h).toBe(singleA.trays[i]!.vapourMassFlow_kg_h);
          if (i < 4 || i > 6) expect(t.liquidMassFlow_kg_h).toBe(singleA.trays[i]!.liquidMassFlow_kg_h);
        });
        const aloneB = at([1000, qb]);
        const singleB = shiftTraffic(base, pas[1]!, qb, lambda);
        aloneB.trays.forEach((t, i) => {
          expect(t.vapourMassFlow_kg_h).toBe(singleB.trays[i]!.vapourMassFlow_kg_h);
          if (i !== 1 && i !== 2) expect(t.liquidMassFlow_kg_h).toBe(singleB.trays[i]!.liquidMassFlow_kg_h);
        });
        // superposition: the shifts of the two add
        r.trays.forEach((t, i) => {
          const sum = aloneA.trays[i]!.vapourMassFlow_kg_h + aloneB.trays[i]!.vapourMassFlow_kg_h - base[i]!.vapourMassFlow_kg_h;
          if (!t.dry) expect(t.vapourMassFlow_kg_h).toBeCloseTo(sum, 6);
        });
      });
    }

  it('between the zones only the lower duty matters, bit for bit', () => {
    const a = at([0, 2500]).trays[3]!;
    const b = at([3900, 2500]).trays[3]!;
    expect(a).toEqual(b);
  });

  it('the linear form gives the same flows as the shift', () => {
    const roles = trayRoles(base, pas, 'top-down');
    const r = at([2600, 1500]);
    base.forEach((load, k) => {
      const lt = linearTraffic(load, roles[k]!, pas, lambda);
      expect(linearDryResidual(lt, [2600, 1500])).toBeCloseTo(
        -Math.min(r.trays[k]!.rawLiquid_kg_h, r.trays[k]!.rawVapour_kg_h),
        6,
      );
    });
  });
});

describe('heat above a temperature (linear cooling curve)', () => {
  it('docblock example: 6000 kW from 250 to 170 °C, above 200 °C → 3750 kW', () => {
    expect(heatAboveTemperature(6000, 250, 170, 200)).toBeCloseTo(3750, 9);
  });
  it('all of it when the return is above, none when the draw is below', () => {
    expect(heatAboveTemperature(6000, 250, 170, 160)).toBe(6000);
    expect(heatAboveTemperature(6000, 250, 170, 250)).toBe(0);
    expect(heatAboveTemperature(0, 250, 250, 200)).toBe(0);
  });
});
