import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { rateTray } from '../../../server/engine/index.js';
import {
  dryOutDuty,
  runStudy,
  runStudyWith,
  sectionForTray,
  validateStudyInput,
} from '../../../server/engine/pumpAround/index.js';
import { slimPoint } from '../../../server/services/studies/studyResult.js';
import type { StudyInput, StudyResult } from '../../../shared/types/pumpAround.js';
import type { CheckName, TrayLoad } from '../../../shared/types/rating.js';

function example(): StudyInput {
  const v = validateStudyInput(JSON.parse(readFileSync('examples/pump-around-study.json', 'utf8')));
  if (!v.ok) throw new Error(JSON.stringify(v.errors));
  return v.value;
}

/** percent of limit of one check of one tray at a duty, rated on its own (not through the study) */
function percentAt(input: StudyInput, tray: number, check: CheckName, duty: number): number {
  const one = { ...input, sweep: { fromDuty_kW: duty, toDuty_kW: duty, steps: 1 } };
  const p = runStudy(one).points[0]!.trays.find((t) => t.tray === tray)!;
  return p.rating.checks[check].percentOfLimit;
}

function allFinite(x: unknown): boolean {
  if (typeof x === 'number') return Number.isFinite(x);
  if (Array.isArray(x)) return x.every(allFinite);
  if (x && typeof x === 'object') return Object.values(x).every(allFinite);
  return true;
}

describe('runStudy on the invented example column', () => {
  const input = example();
  const r: StudyResult = runStudy(input);
  const Q0 = input.pumpAround.baseDuty_kW;

  it('condenser duty change = −(Q − Q0) and heat recovered = Q − Q0 at every point', () => {
    expect(r.points).toHaveLength(input.sweep.steps + 1);
    for (const p of r.points) {
      expect(p.condenserDutyChange_kW).toBeCloseTo(-(p.duty_kW - Q0), 9);
      expect(p.heatRecovered_kW).toBeCloseTo(p.duty_kW - Q0, 9);
    }
  });

  it('below the draw tray traffic and rating are those of the base case at every duty', () => {
    const below = input.trays.filter((t) => t.tray > input.pumpAround.drawTray);
    expect(below.length).toBeGreaterThan(0);
    for (const p of r.points) {
      for (const b of below) {
        const t = p.trays.find((x) => x.tray === b.tray)!;
        expect([t.vapourMassFlow_kg_h, t.liquidMassFlow_kg_h]).toEqual([b.vapourMassFlow_kg_h, b.liquidMassFlow_kg_h]);
        expect(t.rating).toEqual(rateTray(sectionForTray(input.sections, b.tray)!, b, input.methods));
      }
    }
  });

  it('mapping each point as it is rated (the stored form) gives the same study as mapping afterwards', () => {
    const slim = runStudyWith(input, slimPoint);
    const { points, ...rest } = r;
    expect(slim).toEqual({ ...rest, points: points.map(slimPoint) });
  });

  it('reflux falls by Δm = (Q − Q0)/λ', () => {
    const top = input.trays[0]!.liquidMassFlow_kg_h;
    for (const p of r.points.filter((x) => x.dryTrays.length === 0))
      expect(p.reflux_kg_h).toBeCloseTo(top - ((p.duty_kW - Q0) * 3600) / input.latentHeat_kJ_kg, 6);
  });

  it('dry-out duty = Q0 + λ × lowest liquid above the zone (tray 6, 54 000 kg/h)', () => {
    // 5200 + 285 × 54 000 / 3600 = 9475 kW
    expect(r.dryOutTray).toBe(6);
    expect(r.dryOutDuty_kW).toBeCloseTo(9475, 9);
    expect(r.dryOutDuty_kW).toBeCloseTo(dryOutDuty(input.trays, input.pumpAround, input.latentHeat_kJ_kg)!.duty_kW, 12);
  });

  it('the minimum-liquid duty is solved exactly: the check is at its limit there', () => {
    const q = r.minimumLiquidDuty_kW!;
    expect(q).toBeGreaterThan(Q0);
    expect(q).toBeLessThan(r.dryOutDuty_kW!);
    expect(percentAt(input, r.minimumLiquidTray!, r.minimumLiquidCheck!, q)).toBeCloseTo(100, 4);
    expect(percentAt(input, r.minimumLiquidTray!, r.minimumLiquidCheck!, q - 1)).toBeLessThan(100);
    expect(percentAt(input, r.minimumLiquidTray!, r.minimumLiquidCheck!, q + 1)).toBeGreaterThan(100);
  });

  it('the zone-overload duty is solved exactly on a zone tray', () => {
    const q = r.zoneOverloadDuty_kW!;
    const t = r.zoneOverloadTray!;
    expect(t).toBeGreaterThanOrEqual(input.pumpAround.returnTray);
    expect(t).toBeLessThanOrEqual(input.pumpAround.drawTray);
    expect(['jetFlood', 'downcomerBackup', 'downcomerInletVelocity', 'weirLoading']).toContain(r.zoneOverloadCheck);
    expect(percentAt(input, t, r.zoneOverloadCheck!, q)).toBeCloseTo(100, 4);
  });

  it('the solved duties do not depend on the sweep grid', () => {
    const other = runStudy({ ...input, sweep: { fromDuty_kW: 3100, toDuty_kW: 8000, steps: 7 } });
    expect(other.minimumLiquidDuty_kW).toBeCloseTo(r.minimumLiquidDuty_kW!, 3);
    expect(other.zoneOverloadDuty_kW).toBeCloseTo(r.zoneOverloadDuty_kW!, 3);
    expect(other.dryOutDuty_kW).toBe(r.dryOutDuty_kW);
  });

  it('limiting duty is the lowest of the three; recommended = min(margin × dry-out, limiting)', () => {
    const lowest = Math.min(r.dryOutDuty_kW!, r.minimumLiquidDuty_kW!, r.zoneOverloadDuty_kW!);
    expect(r.limitingDuty_kW).toBe(lowest);
    expect(r.limitingTray).toBe(r.minimumLiquidTray);
    expect(r.limitingCheck).toBe(r.minimumLiquidCheck);
    expect(r.margin).toBe(0.7);
    expect(r.recommendedDuty_kW).toBeCloseTo(Math.min(0.7 * r.dryOutDuty_kW!, lowest), 9);
    const tight = runStudy({ ...input, margin: 0.95 });
    expect(tight.recommendedDuty_kW).toBeCloseTo(r.limitingDuty_kW!, 9);
  });

  it('says that properties are held at base-case values; no NaN or Infinity anywhere', () => {
    expect(r.notes.join(' ')).toMatch(/properties held at base-case values/);
    expect(allFinite(r)).toBe(true);
    expect(JSON.stringify(r)).not.toMatch(/NaN|Infinity/);
  });

  it('past the dry-out duty the dry tray is reported and its liquid is zero, not negative', () => {
    const p = runStudy({ ...input, sweep: { fromDuty_kW: 9600, toDuty_kW: 12000, steps: 2 } });
    for (const pt of p.points) {
      expect(pt.dryTrays).toContain(6);
      expect(pt.trays.every((t) => t.liquidMassFlow_kg_h >= 0 && t.vapourMassFlow_kg_h >= 0)).toBe(true);
      expect(pt.liquidToVapourAboveZone).toBe(0);
    }
    expect(allFinite(p)).toBe(true);
  });

  it('a limit that is never reached before dry-out is null', () => {
    const loose = runStudy({
      ...input,
      methods: {
        ...input.methods,
        limits: { downcomerBackup: 500, jetFlood: 500, downcomerInletVelocity: 50, weirLoading: 5000 },
      },
    });
    expect(loose.zoneOverloadDuty_kW).toBeNull();
    expect(loose.zoneOverloadTray).toBeNull();
    expect(loose.zoneOverloadCheck).toBeNull();
  });

  it('a zone check over at low duty that clears as the duty rises is reported, not taken as the limit', () => {
    // from zero duty the zone vapour is high: tray 7 floods at low duty and clears further up
    const low = runStudy({ ...input, sweep: { ...input.sweep, fromDuty_kW: 0 } });
    expect(low.notes.some((n) => /^Tray 7: Jet flood is over its limit below \d+ kW and clears above it/.test(n))).toBe(true);
    expect(low.zoneOverloadDuty_kW).toBeCloseTo(r.zoneOverloadDuty_kW!, 3);
    expect(low.recommendedDuty_kW).toBeCloseTo(r.recommendedDuty_kW!, 6);
  });

  it('a margin duty below the base duty and the sweep start is searched from there up: a limit in between is found', () => {
    // the sweep starts at the base duty; margin 0.1 puts the margin duty far below it, where tray 7 floods
    const low = runStudy({ ...input, margin: 0.1, sweep: { ...input.sweep, fromDuty_kW: Q0 } });
    expect(low.notes.join(' ')).toContain(`Limits searched from ${Math.round(0.1 * r.dryOutDuty_kW!)} kW`);
    expect(low.notes.some((n) => /^Tray 7: Jet flood is over its limit below \d+ kW and clears above it/.test(n))).toBe(true);
    expect(low.recommendedDuty_kW).toBeNull();
    expect(low.notes.join(' ')).toMatch(/no duty meets both the margin and the limits/);
    // margin 0.2 puts it above that flood: the suggestion stands, and tray 7 is within its flood limit there
    const ok = runStudy({ ...input, margin: 0.2, sweep: { ...input.sweep, fromDuty_kW: Q0 } });
    expect(ok.recommendedDuty_kW).toBeCloseTo(0.2 * r.dryOutDuty_kW!, 6);
    expect(percentAt(input, 7, 'jetFlood', ok.recommendedDuty_kW!)).toBeLessThanOrEqual(100);
  });

  it('a circulation too large for the zone at every duty: overload at the start, no recommended duty', () => {
    const { returnTemperatureDrop_K: _, ...pa } = input.pumpAround;
    const big = runStudy({ ...input, pumpAround: { ...pa, circulation_kg_h: 400000 } });
    expect(big.zoneOverloadDuty_kW).toBe(3000);
    expect(big.limitingDuty_kW).toBe(3000);
    expect(big.recommendedDuty_kW).toBeNull();
    expect(big.notes.join(' ')).toMatch(/over its limit over the whole range searched/);
  });

  it('fixed circulation: circulation constant, ΔT = Q/(m c_p)', () => {
    const { returnTemperatureDrop_K: _, ...pa } = input.pumpAround;
    const fixed = runStudy({ ...input, pumpAround: { ...pa, circulation_kg_h: 150000 } });
    for (const p of fixed.points) {
      expect(p.circulation_kg_h).toBe(150000);
      expect(p.returnTemperatureDrop_K).toBeCloseTo((p.duty_kW * 3600) / (150000 * 2.55), 9);
    }
  });

  it('a bottom-up column gives the same duties, reported in its own numbering', () => {
    const n = 17; // trays 1..16 → 16..1
    const flip = (t: number): number => n - t;
    const up: StudyInput = {
      ...input,
      numbering: 'bottom-up',
      sections: input.sections.map((s) => ({ ...s, fromTray: flip(s.fromTray), toTray: flip(s.toTray) })),
      trays: input.trays.map((t) => ({ ...t, tray: flip(t.tray) })),
      pumpAround: {
        ...input.pumpAround,
        drawTray: flip(input.pumpAround.drawTray),
        returnTray: flip(input.pumpAround.returnTray),
      },
    };
    const u = runStudy(up);
    expect(u.dryOutDuty_kW).toBe(r.dryOutDuty_kW);
    expect(u.dryOutTray).toBe(flip(r.dryOutTray!));
    expect(u.minimumLiquidDuty_kW).toBeCloseTo(r.minimumLiquidDuty_kW!, 6);
    expect(u.minimumLiquidTray).toBe(flip(r.minimumLiquidTray!));
    expect(u.zoneOverloadTray).toBe(flip(r.zoneOverloadTray!));
    expect(u.points[5]!.reflux_kg_h).toBeCloseTo(r.points[5]!.reflux_kg_h, 9);
  });
});

describe('hand-worked minimum crest duty (our own numbers)', () => {
  /*
   * One section, weir length 3.2 m; liquid density 700 kg/m³; weeping switched off (limit 0) so that
   * the crest check decides. Minimum crest 6 mm (liquidLoad default limit). Francis crest, Perry form
   * h_ow = 664 (q/L_w)^(2/3) mm (tray-methods.md §5.3: 6 mm ⇔ q/L_w = 3.09 m³/(h·m) [D]):
   *   q/L_w = (6/664)^1.5 m³/(s·m) = 8.5896e-4 → × 3600 = 3.09227 m³/(h·m)
   *   q = 3.09227 × 3.2 = 9.89526 m³/h → L_min = 9.89526 × 700 = 6926.68 kg/h
   * Tray 2 (above the zone) has the least liquid, 20 000 kg/h; λ = 300 kJ/kg, Q0 = 2000 kW:
   *   minimum-liquid duty = 2000 + 300 × (20 000 − 6926.68)/3600 = 2000 + 1089.44 = 3089.44 kW
   *   dry-out duty        = 2000 + 300 × 20 000/3600 = 3666.67 kW
   */
  const section = {
    name: 'S',
    fromTray: 1,
    toTray: 6,
    trayType: 'sieve' as const,
    passes: 1 as const,
    columnDiameter_m: 4.2,
    traySpacing_mm: 610,
    activeArea_m2: 10.5,
    downcomerTopArea_m2: 1.66,
    downcomerBottomArea_m2: 1.66,
    outletWeirLength_m: 3.2,
    weirHeight_mm: 50,
    downcomerClearance_mm: 50,
    holeArea_m2: 1.0,
    holeDiameter_mm: 12.7,
    deckThickness_mm: 3,
  };
  const load = (tray: number, v: number, l: number): TrayLoad => ({
    tray,
    vapourMassFlow_kg_h: v,
    liquidMassFlow_kg_h: l,
    vapourDensity_kg_m3: 3.5,
    liquidDensity_kg_m3: 700,
    surfaceTension_mN_m: 18,
  });
  const input: StudyInput = {
    sections: [section],
    trays: [load(1, 60000, 24000), load(2, 56000, 20000), load(3, 60000, 30000), load(4, 64000, 34000), load(5, 66000, 36000)],
    pumpAround: {
      name: 'PA-H',
      drawTray: 4,
      returnTray: 3,
      baseDuty_kW: 2000,
      liquidHeatCapacity_kJ_kgK: 2.5,
      returnTemperatureDrop_K: 60,
    },
    latentHeat_kJ_kg: 300,
    sweep: { fromDuty_kW: 2000, toDuty_kW: 3000, steps: 4 },
    methods: { limits: { weeping: 0 } },
  };

  it('finds the hand-worked duties', () => {
    const v = validateStudyInput(input);
    expect(v.ok).toBe(true);
    const r = runStudy(input);
    expect(r.minimumLiquidCheck).toBe('liquidLoad');
    expect(r.minimumLiquidTray).toBe(2);
    expect(r.minimumLiquidDuty_kW).toBeCloseTo(3089.44, 1);
    expect(r.dryOutDuty_kW).toBeCloseTo(3666.67, 1);
    // recommended = min(0.7 × 3666.67 = 2566.67, 3089.44) = 2566.67 kW
    expect(r.recommendedDuty_kW).toBeCloseTo(2566.67, 1);
  });
});
