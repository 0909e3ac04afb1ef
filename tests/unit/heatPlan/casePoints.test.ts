/**
 * A plan run with simulation cases: grid points at a case's duties are rated on that case's loads, points on
 * the line between two cases on loads interpolated between them, every other point on the model; each point
 * says which. Cases are invented: the example's own model moved by a ±3 % wobble tray by tray, so a point on
 * simulated loads differs from the model's and the tests can tell which was used.
 */
import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import type { HeatPlanInput, SimulationCase } from '../../../shared/types/heatPlan.js';
import {
  heatPlanPointAt,
  runHeatPlan,
  shiftPlanTraffic,
  trayRoles,
  validateHeatPlanInput,
} from '../../../server/engine/heatPlan/index.js';
import { pumpAroundCirculation } from '../../../server/engine/pumpAround/traffic.js';

/** The invented example column C-520 (examples/heat-plan.json): duties 2500…8500 and 3000…10000 kW, 500 kW steps. */
function example(): HeatPlanInput {
  const v = validateHeatPlanInput(JSON.parse(readFileSync('examples/heat-plan.json', 'utf8')));
  if (!v.ok) throw new Error(JSON.stringify(v.errors));
  return v.value;
}

/** A case at these duties: the model's traffic (zone liquid net of the circulation) with a wobble (invented). */
function wobbled(input: HeatPlanInput, duties: number[], name: string): SimulationCase {
  const roles = trayRoles(input.trays, input.pumpArounds, 'top-down');
  const r = shiftPlanTraffic(input.trays, input.pumpArounds, duties, input.latentHeat_kJ_kg);
  const trays = r.trays.map((t, k) => {
    const { rawLiquid_kg_h: raw, rawVapour_kg_h: _v, dry: _d, ...load } = t;
    const zone = roles[k]!.zone;
    const w = 1 + 0.03 * Math.sin(5 * t.tray + duties[1]! / 700);
    return {
      ...load,
      vapourMassFlow_kg_h: load.vapourMassFlow_kg_h * w,
      liquidMassFlow_kg_h: (zone >= 0 ? raw - r.states[zone]!.circulation_kg_h : raw) * w,
    };
  });
  return { name, duties_kW: duties, trays };
}

describe('a plan rated with simulation cases', () => {
  const input = example();
  const cases = [wobbled(input, [3500, 6000], 'A'), wobbled(input, [5500, 8000], 'B'), wobbled(input, [4500, 5000], 'C')];
  // case C runs tray 3 dry in the "simulation" (no liquid), where the model keeps it wet
  cases[2]!.trays.find((t) => t.tray === 3)!.liquidMassFlow_kg_h = 0;
  const plain = runHeatPlan(input);
  const withCases = runHeatPlan(input, { cases });
  const at = (duties: number[]) => withCases.points.find((p) => p.duties_kW[0] === duties[0] && p.duties_kW[1] === duties[1])!;
  const modelAt = (duties: number[]) => plain.points.find((p) => p.duties_kW[0] === duties[0] && p.duties_kW[1] === duties[1])!;
  const zoneOf = trayRoles(input.trays, input.pumpArounds, 'top-down').map((r) => r.zone);

  it('a grid point at a case’s duties is rated on that case’s loads, circulation added on the zone trays', () => {
    const p = at([5500, 8000]);
    expect(p.loads).toEqual({ source: 'case', cases: ['B'], fraction: null });
    const b = cases[1]!;
    p.trays.forEach((t, k) => {
      const sim = b.trays.find((x) => x.tray === t.tray)!;
      const zone = zoneOf[k]!;
      const circulation = zone >= 0 ? pumpAroundCirculation(input.pumpArounds[zone]!, p.duties_kW[zone]!).circulation_kg_h : 0;
      expect(t.vapourMassFlow_kg_h).toBeCloseTo(sim.vapourMassFlow_kg_h, 6);
      expect(t.liquidMassFlow_kg_h).toBeCloseTo(sim.liquidMassFlow_kg_h + circulation, 6);
    });
    // and not on the model's traffic (the wobble moves tray 2 by more than 1 %)
    const model = modelAt([5500, 8000]).trays[1]!.vapourMassFlow_kg_h;
    expect(Math.abs(p.trays[1]!.vapourMassFlow_kg_h / model - 1)).toBeGreaterThan(0.01);
    // the rating is that of the simulated loads: vapour up, jet flood up with it on an unchanged tray geometry
    const up = p.trays.findIndex((t, k) => t.vapourMassFlow_kg_h > modelAt([5500, 8000]).trays[k]!.vapourMassFlow_kg_h * 1.01);
    expect(up).toBeGreaterThanOrEqual(0);
    expect(p.trays[up]!.rating.checks.jetFlood.percentOfLimit).toBeGreaterThan(
      modelAt([5500, 8000]).trays[up]!.rating.checks.jetFlood.percentOfLimit,
    );
  }, 30_000);

  it('feasibility at a case’s point follows the simulated loads', () => {
    const p = at([4500, 5000]);
    expect(p.loads?.cases).toEqual(['C']);
    expect(modelAt([4500, 5000]).violations).not.toContainEqual({ tray: 3, check: 'dry-out' });
    expect(p.feasible).toBe(false);
    expect(p.violations).toContainEqual({ tray: 3, check: 'dry-out' });
    expect(p.trays.find((t) => t.tray === 3)!.dry).toBe(true);
  }, 30_000);

  it('a grid point on the line between two cases is rated on loads interpolated between them', () => {
    const p = at([4500, 7000]);
    expect(p.loads).toEqual({ source: 'interpolated', cases: ['A', 'B'], fraction: 0.5 });
    const k = input.trays.findIndex((t) => t.tray === 12); // between the zones: no circulation
    expect(p.trays[k]!.vapourMassFlow_kg_h).toBeCloseTo(
      (cases[0]!.trays[k]!.vapourMassFlow_kg_h + cases[1]!.trays[k]!.vapourMassFlow_kg_h) / 2,
      6,
    );
  }, 30_000);

  it('every other point is the model’s, unchanged, and says so; limit lines and suggestion stay on the model', () => {
    const sources = withCases.points.map((p) => p.loads?.source);
    expect(sources.filter((s) => s === 'case')).toHaveLength(3);
    expect(sources.filter((s) => s === 'interpolated').length).toBeGreaterThanOrEqual(1);
    // (compared field by field: a JSON of every full rating is slow on a busy machine)
    const brief = (p: (typeof plain.points)[number]) => [
      p.duties_kW,
      p.feasible,
      p.withinMargin,
      p.violations,
      p.fractionation,
      p.trays.map((t) => [t.vapourMassFlow_kg_h, t.liquidMassFlow_kg_h, t.dry, t.rating.controllingCheck]),
    ];
    withCases.points.forEach((p, i) => {
      if (p.loads?.source === 'model') expect(brief(p)).toEqual(brief(plain.points[i]!));
    });
    expect(plain.points.every((p) => p.loads === undefined)).toBe(true);
    expect(withCases.boundary).toEqual(plain.boundary);
    expect(withCases.suggestion).toEqual(plain.suggestion);
    expect(withCases.notes.join(' ')).toMatch(/rated on that case's loads/);
    // the heat balance holds at every point whatever the loads: condenser change = −Σ(duty changes)
    for (const p of withCases.points)
      expect(p.condenserDutyChange_kW).toBeCloseTo(-(p.duties_kW[0]! - 4400) - (p.duties_kW[1]! - 6400), 9);
  }, 30_000);

  it('a point at any duties uses a case the same way (the report’s key points)', () => {
    expect(heatPlanPointAt(input, [5500.3, 8000], cases).loads?.cases).toEqual(['B']);
    expect(heatPlanPointAt(input, [6100, 4300], cases).loads?.source).toBe('model');
    expect(heatPlanPointAt(input, [6100, 4300]).loads).toBeUndefined();
  }, 30_000);
});
