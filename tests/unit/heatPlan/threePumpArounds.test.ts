/**
 * Three pump-arounds at once: the invented example column C-520 (examples/heat-plan.json) with a third,
 * bottom pump-around (invented: draw tray 22, return tray 20). The identities of the balance hold for each
 * pump-around and for all three together: the condenser duty changes by −(sum of the duty changes), nothing
 * changes below the lowest draw, and between two zones only the duties below matter.
 */
import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import type { HeatPlanInput } from '../../../shared/types/heatPlan.js';
import {
  planPointStatus,
  runHeatPlan,
  shiftPlanTraffic,
  trayRoles,
  validateHeatPlanInput,
} from '../../../server/engine/heatPlan/index.js';

/** three pump-arounds, a 4 × 4 × 3 grid */
function threePumpArounds(): HeatPlanInput {
  const json = JSON.parse(readFileSync('examples/heat-plan.json', 'utf8')) as HeatPlanInput;
  json.pumpArounds[0]!.sweep = { fromDuty_kW: 2500, toDuty_kW: 7000, steps: 3 };
  json.pumpArounds[1]!.sweep = { fromDuty_kW: 3000, toDuty_kW: 9000, steps: 3 };
  json.pumpArounds.push({
    name: 'BPA (invented)',
    drawTray: 22,
    returnTray: 20,
    baseDuty_kW: 3000,
    liquidHeatCapacity_kJ_kgK: 2.8,
    circulation_kg_h: 45000,
    drawTemperature_C: 276,
    sweep: { fromDuty_kW: 2000, toDuty_kW: 4000, steps: 2 },
  });
  const v = validateHeatPlanInput(json);
  if (!v.ok) throw new Error(JSON.stringify(v.errors));
  return v.value;
}

describe('three pump-arounds', () => {
  const input = threePumpArounds();
  const base = input.pumpArounds.map((pa) => pa.baseDuty_kW);
  const lambda = input.latentHeat_kJ_kg;
  const trayIndex = (tray: number) => input.trays.findIndex((t) => t.tray === tray);

  it('traffic: each duty alone and all three together shift the trays above their draws by ΔQ·3600/λ', () => {
    const at = (duties: number[]) => shiftPlanTraffic(input.trays, input.pumpArounds, duties, lambda);
    const top = trayIndex(1);
    const v0 = input.trays[top]!.vapourMassFlow_kg_h;
    const changes = [1200, -900, 1500];
    // one duty at a time: the top tray loses ΔQ·3600/λ of vapour, the condenser ΔQ of duty
    changes.forEach((dq, i) => {
      const duties = base.map((q, k) => (k === i ? q + dq : q));
      const r = at(duties);
      expect(r.condenserDutyChange_kW).toBeCloseTo(-dq, 9);
      expect(r.trays[top]!.vapourMassFlow_kg_h).toBeCloseTo(v0 - (dq * 3600) / lambda, 6);
    });
    // all three together: the shifts add
    const all = at(base.map((q, i) => q + changes[i]!));
    const sum = changes.reduce((s, x) => s + x, 0);
    expect(all.condenserDutyChange_kW).toBeCloseTo(-sum, 9);
    expect(all.trays[top]!.vapourMassFlow_kg_h).toBeCloseTo(v0 - (sum * 3600) / lambda, 6);
    // between the middle and the bottom zone (tray 19) only the bottom duty counts
    const t19 = trayIndex(19);
    expect(all.trays[t19]!.vapourMassFlow_kg_h).toBeCloseTo(
      input.trays[t19]!.vapourMassFlow_kg_h - (changes[2]! * 3600) / lambda,
      6,
    );
    expect(trayRoles(input.trays, input.pumpArounds, 'top-down')[t19]!.dependsOn).toEqual([2]);
    // below the lowest draw (trays 23, 24) nothing changes
    for (const tray of [23, 24]) {
      const k = trayIndex(tray);
      expect(all.trays[k]!.vapourMassFlow_kg_h).toBe(input.trays[k]!.vapourMassFlow_kg_h);
      expect(all.trays[k]!.liquidMassFlow_kg_h).toBe(input.trays[k]!.liquidMassFlow_kg_h);
    }
  }, 30_000);

  it('the grid: every duty triple, the first varying slowest, with the identities at each point', () => {
    const plan = runHeatPlan(input);
    expect(plan.pumpArounds).toHaveLength(3);
    expect(plan.points).toHaveLength(4 * 4 * 3);
    expect(plan.points[0]!.duties_kW).toEqual([2500, 3000, 2000]);
    expect(plan.points[1]!.duties_kW).toEqual([2500, 3000, 3000]);
    expect(plan.points[3]!.duties_kW).toEqual([2500, 5000, 2000]);
    expect(plan.points[12]!.duties_kW).toEqual([4000, 3000, 2000]);
    const below = [23, 24].map(trayIndex);
    for (const p of plan.points) {
      const dq = p.duties_kW.map((q, i) => q - base[i]!);
      expect(p.condenserDutyChange_kW).toBeCloseTo(-(dq[0]! + dq[1]! + dq[2]!), 9);
      expect(p.heat).toHaveLength(3);
      expect(p.recoveredHeat_kW).toBeCloseTo(p.duties_kW[0]! + p.duties_kW[1]! + p.duties_kW[2]!, 9);
      for (const k of below) {
        expect(p.trays[k]!.vapourMassFlow_kg_h).toBe(input.trays[k]!.vapourMassFlow_kg_h);
        expect(p.trays[k]!.liquidMassFlow_kg_h).toBe(input.trays[k]!.liquidMassFlow_kg_h);
      }
      expect(planPointStatus(input, p.duties_kW)).toEqual({ feasible: p.feasible, violations: p.violations });
    }
    // limit points carry three duties and lie on a grid line of the pump-around they were found along
    const axes = input.pumpArounds.map(({ sweep: s }) =>
      Array.from({ length: s.steps + 1 }, (_, i) => s.fromDuty_kW + ((s.toDuty_kW - s.fromDuty_kW) * i) / s.steps),
    );
    expect(plan.boundary.length).toBeGreaterThan(0);
    for (const b of plan.boundary) {
      expect(b.duties_kW).toHaveLength(3);
      b.duties_kW.forEach((q, i) => {
        if (i !== b.along) expect(axes[i]!.some((node) => Math.abs(node - q) < 1e-9)).toBe(true);
      });
    }
    if (plan.suggestion) {
      expect(plan.suggestion.duties_kW).toHaveLength(3);
      expect(planPointStatus(input, plan.suggestion.duties_kW).feasible).toBe(true);
    }
    expect(plan.marginSensitivity.length).toBeGreaterThan(1);
  }, 30_000);

  it('sharing ratings gives exactly what rating every tray at every point gives', () => {
    const shared = runHeatPlan(input);
    const fresh = runHeatPlan(input, { reuseRatings: false });
    expect(JSON.stringify(fresh.points)).toBe(JSON.stringify(shared.points));
    expect(fresh.boundary).toEqual(shared.boundary);
  }, 30_000);
});
