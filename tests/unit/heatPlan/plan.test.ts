import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import type { HeatPlanInput } from '../../../shared/types/heatPlan.js';
import { heatPlanPointAt, planPointStatus, runHeatPlan, validateHeatPlanInput } from '../../../server/engine/heatPlan/index.js';

/** The invented example column C-520 (examples/heat-plan.json) on a coarser grid. */
function example(stepsA = 6, stepsB = 7): HeatPlanInput {
  const v = validateHeatPlanInput(JSON.parse(readFileSync('examples/heat-plan.json', 'utf8')));
  if (!v.ok) throw new Error(JSON.stringify(v.errors));
  v.value.pumpArounds[0]!.sweep.steps = stepsA;
  v.value.pumpArounds[1]!.sweep.steps = stepsB;
  return v.value;
}

describe('heat-recovery plan over the duty grid', () => {
  const input = example();
  const plan = runHeatPlan(input);

  it('one point per duty pair, the first pump-around varying slowest', () => {
    expect(plan.points).toHaveLength(7 * 8);
    expect(plan.points[0]!.duties_kW).toEqual([2500, 3000]);
    expect(plan.points[1]!.duties_kW).toEqual([2500, 4000]);
    expect(plan.points[8]!.duties_kW).toEqual([3500, 3000]);
    expect(plan.points[0]!.trays).toHaveLength(input.trays.length);
    expect(plan.points[0]!.trays[0]!.rating.checks.jetFlood.percentOfLimit).toBeGreaterThan(0);
  });

  it('sharing ratings between points gives exactly what rating every tray at every point gives', () => {
    const fresh = runHeatPlan(input, { reuseRatings: false });
    expect(JSON.stringify(fresh.points)).toBe(JSON.stringify(plan.points));
    expect(fresh.boundary).toEqual(plan.boundary);
    expect(fresh.suggestion).toEqual(plan.suggestion);
  });

  it('grid points agree with a fresh evaluation at their duties', () => {
    for (const p of plan.points)
      expect(planPointStatus(input, p.duties_kW)).toEqual({ feasible: p.feasible, violations: p.violations });
  });

  it('a point at any duties is the grid point where the duties are a node', () => {
    for (const n of [0, 13, 55])
      expect(JSON.stringify(heatPlanPointAt(input, plan.points[n]!.duties_kW))).toBe(JSON.stringify(plan.points[n]));
    const between = heatPlanPointAt(input, [4400, 6400]);
    expect(between.condenserDutyChange_kW).toBe(0);
    between.trays.forEach((t, i) => expect(t.vapourMassFlow_kg_h).toBeCloseTo(input.trays[i]!.vapourMassFlow_kg_h, 6));
  });

  it('has feasible and infeasible points, and boundary points between them', () => {
    expect(plan.points.some((p) => p.feasible)).toBe(true);
    expect(plan.points.some((p) => !p.feasible)).toBe(true);
    expect(plan.boundary.length).toBeGreaterThan(0);
  });

  it('each boundary point is on the boundary: feasible just inside, its named limit over just outside', () => {
    for (const b of plan.boundary) {
      const sweep = input.pumpArounds[b.along]!.sweep;
      const eps = 1e-6 * (sweep.toDuty_kW - sweep.fromDuty_kW);
      const nudged = (d: number) => b.duties_kW.map((q, i) => (i === b.along ? q + d : q));
      const inside = planPointStatus(input, nudged(b.feasibleBelow ? -eps : eps));
      const outside = planPointStatus(input, nudged(b.feasibleBelow ? eps : -eps));
      expect(inside.feasible, JSON.stringify(b)).toBe(true);
      expect(outside.violations, JSON.stringify(b)).toContainEqual({ tray: b.tray, check: b.check });
    }
  });

  it('the suggestion recovers at least as much useful heat as any grid point that keeps the margin', () => {
    const s = plan.suggestion!;
    expect(s).not.toBeNull();
    for (const p of plan.points)
      if (p.feasible && p.withinMargin)
        expect(s.recoveredAboveTemperature_kW).toBeGreaterThanOrEqual(p.recoveredAboveTemperature_kW - 1e-9);
    // on the edge at most its own limit is reached; a hair towards the base it is feasible
    const status = planPointStatus(input, s.duties_kW);
    for (const v of status.violations) expect(v).toEqual({ tray: s.limitedBy?.tray, check: s.limitedBy?.check });
    expect(s.condenserDutyChange_kW).toBeCloseTo(-(s.duties_kW[0]! - 4400 + s.duties_kW[1]! - 6400), 9);
  });

  it('a looser margin never suggests less useful heat', () => {
    const found = plan.marginSensitivity.filter((m) => m.suggestion);
    expect(plan.marginSensitivity.map((m) => m.margin)).toContain(0.7);
    for (let i = 1; i < found.length; i++)
      expect(found[i]!.suggestion!.recoveredAboveTemperature_kW).toBeGreaterThanOrEqual(
        found[i - 1]!.suggestion!.recoveredAboveTemperature_kW,
      );
  });
});

describe('heat-recovery plan with property drift', () => {
  const input = example(4, 5);
  const drift = input.trays
    .filter((t) => t.tray <= 18)
    .map((t) => ({
      tray: t.tray,
      vapourDensity_kg_m3_per_kW: [3e-5, 2e-5],
      liquidDensity_kg_m3_per_kW: [-2e-3, 1e-3],
      surfaceTension_mN_m_per_kW: [0, 0],
    }));
  const withDrift = { ...input, propertyDrift: drift };

  it('is accepted, moves the ratings, and shared ratings still equal fresh ones', () => {
    expect(validateHeatPlanInput(withDrift).ok).toBe(true);
    const a = runHeatPlan(withDrift);
    const b = runHeatPlan(withDrift, { reuseRatings: false });
    expect(JSON.stringify(a.points)).toBe(JSON.stringify(b.points));
    const plain = runHeatPlan(input);
    const last = a.points.length - 1;
    expect(a.points[last]!.trays[0]!.rating.checks.jetFlood.percentOfLimit).not.toBe(
      plain.points[last]!.trays[0]!.rating.checks.jetFlood.percentOfLimit,
    );
  });

  it('refuses drift that would take a property to zero within the sweeps, naming the field', () => {
    const bad = structuredClone(withDrift);
    bad.propertyDrift[2]!.vapourDensity_kg_m3_per_kW = [-1e-2, 0];
    bad.propertyDrift[3]!.liquidDensity_kg_m3_per_kW = [1e-3];
    const v = validateHeatPlanInput(bad);
    expect(v.ok).toBe(false);
    if (v.ok) return;
    expect(v.errors).toContainEqual({
      path: '/propertyDrift/2/vapourDensity_kg_m3_per_kW',
      message: 'vapourDensity_kg_m3_per_kW: tray 3, the property would fall to zero or below within the sweeps',
    });
    expect(v.errors).toContainEqual(expect.objectContaining({ path: '/propertyDrift/3/liquidDensity_kg_m3_per_kW' }));
  });
});
