/**
 * Heat-recovery plan (issue 17): rate the duty grid of one to three pump-arounds with full tray ratings,
 * solve the feasible region's boundary exactly on the grid lines, give the heat level of each point and
 * suggest the split that recovers most heat above the useful temperature while keeping the margin.
 * The input must have passed validateHeatPlanInput. See README.md for the model and its limits.
 */
import type {
  BoundaryPoint,
  HeatPlanInput,
  HeatPlanResult,
  PlanPoint,
  PlanViolation,
  PointLoadsSource,
  SimulationCase,
} from '../../../shared/types/heatPlan.js';
import { simulatedLoadsAt } from './calibratedLoads.js';
import { BoundarySolver } from './boundary.js';
import { sectionMembers } from './fractionation.js';
import { dutyGrid, GridRatings, nodeDuties, nodeIndices } from './grid.js';
import { constraintName, planModel } from './model.js';
import { planPoint, pointAt, pointOnLoads } from './points.js';
import type { SectionMembers } from './fractionation.js';
import type { PlanModel } from './model.js';
import { overAtDuties, overAtNode, positiveAtNode } from './nodes.js';
import { SENSITIVITY_MARGINS, suggestSplit } from './suggestion.js';

export type HeatPlanResultOf<P> = Omit<HeatPlanResult, 'points'> & { points: P[] };

export interface HeatPlanOptions {
  /** share the rating of a tray between points whose duties it does not depend on (default true) */
  reuseRatings?: boolean;
  /**
   * simulation cases (validated, net zone liquid; normally those the input was calibrated against): a grid
   * point at a case's duties is rated on that case's loads, one on the line between two cases on loads
   * interpolated between them (calibratedLoads.ts); every point then says which loads it used (`loads`).
   * The boundary and the suggestion stay on the model.
   */
  cases?: readonly SimulationCase[];
}

const MODEL_LOADS: PointLoadsSource = { source: 'model', cases: [], fraction: null };

/** The model's point, or the point rated on the simulated loads at these duties when the cases give them. */
function pointWithCases(
  m: PlanModel,
  duties: number[],
  model: () => PlanPoint,
  sections: readonly SectionMembers[],
  cases: readonly SimulationCase[] | undefined,
): PlanPoint {
  if (!cases) return model();
  const sim = simulatedLoadsAt(cases, duties);
  if (!sim) return { ...model(), loads: MODEL_LOADS };
  const { trays, ...source } = sim;
  return { ...pointOnLoads(m, duties, trays, sections), loads: source };
}

export const PLAN_NOTES = [
  "Screening estimate: a change of pump-around duties goes through management-of-change review and the site's procedures; confirm with the internals vendor and licensed engineers before acting on it.",
  'Traffic by a heat balance on each pump-around zone (after Lieberman, A Working Guide to Process Equipment), the pump-arounds added together: constant latent heat per zone, sensible heats neglected, properties held at base-case values.',
  'Margin: the duties scaled together by 1/margin must leave every tray with liquid (for one pump-around, at most margin × its dry-out duty); the default of 70 % is common practice, not a published rule.',
  'Boundary points are solved exactly along the grid lines; a limit crossed and recrossed within one grid step is not seen.',
];

/** The full plan: every grid point with the full rating of every tray (the CLI prints this). */
export function runHeatPlan(input: HeatPlanInput, options: HeatPlanOptions = {}): HeatPlanResult {
  return runHeatPlanWith(input, (p) => p, options);
}

/** The plan with each grid point passed through `mapPoint` as soon as it is rated (callers keeping less). */
export function runHeatPlanWith<P>(
  input: HeatPlanInput,
  mapPoint: (p: PlanPoint) => P,
  options: HeatPlanOptions = {},
): HeatPlanResultOf<P> {
  const m = planModel(input);
  const grid = dutyGrid(m);
  const ratings = new GridRatings(m, grid, options.reuseRatings ?? true);
  const solver = new BoundarySolver(ratings);
  const useful = input.usefulAboveTemperature_C;
  const sections = sectionMembers(input.sections, m.trays, m.roles);
  const feasible: boolean[] = [];
  const points: P[] = [];
  for (let n = 0; n < grid.count; n++) {
    const idx = nodeIndices(grid, n);
    const duties = nodeDuties(grid, n);
    const trays = ratings.rateNode(n, idx);
    const over = overAtNode(ratings, n);
    feasible.push(over.length === 0);
    points.push(mapPoint(pointWithCases(m, duties, () => planPoint(m, duties, trays, over, sections), sections, options.cases)));
  }

  const boundary: BoundaryPoint[] = [];
  for (let n = 0; n < grid.count; n++) {
    const idx = nodeIndices(grid, n);
    for (let ax = 0; ax < grid.sizes.length; ax++) {
      if (idx[ax]! >= grid.sizes[ax]! - 1) continue;
      const b = n + grid.strides[ax]!;
      if (feasible[n] === feasible[b]) continue;
      const [inside, outside] = feasible[n] ? [n, b] : [b, n];
      const flip = solver.solve(inside, outside, ax, positiveAtNode(ratings, outside, solver.traysOfAxis[ax]!), m.margin);
      if (flip.k < 0) continue;
      boundary.push({
        duties_kW: flip.duties_kW,
        tray: m.trays[flip.k]!.tray,
        check: constraintName(flip.c),
        along: ax,
        feasibleBelow: inside < outside,
      });
    }
  }

  const margins = [...new Set([...SENSITIVITY_MARGINS, m.margin])].sort((a, b) => a - b);
  const marginSensitivity = margins.map((mg) => ({
    margin: mg,
    suggestion: suggestSplit(ratings, solver, feasible, mg, useful),
  }));
  const suggestion = marginSensitivity.find((s) => s.margin === m.margin)!.suggestion;
  const notes = [...PLAN_NOTES];
  if (options.cases?.length)
    notes.push(
      "Grid points at a simulation case's duties are rated on that case's loads, points on the straight line between two cases on loads interpolated between them; all other points, the limit lines and the suggestion come from the model calibrated against the cases.",
    );
  if (!feasible.some(Boolean)) notes.push('No point of the duty grid is free of dry trays and watched limits: no suggestion.');
  else if (!suggestion) notes.push('No feasible point of the duty grid keeps the margin: no suggestion.');
  return {
    pumpArounds: m.pumpArounds.map((pa) => pa.name),
    baseDuties_kW: m.pumpArounds.map((pa) => pa.baseDuty_kW),
    margin: m.margin,
    usefulAboveTemperature_C: useful,
    points,
    boundary,
    suggestion,
    marginSensitivity,
    notes,
  };
}

/** A full point (every tray's traffic and rating, heat level, feasibility) at any duties, rated afresh. */
export function heatPlanPointAt(
  input: HeatPlanInput,
  duties_kW: readonly number[],
  cases?: readonly SimulationCase[],
): PlanPoint {
  const m = planModel(input);
  return pointWithCases(m, [...duties_kW], () => pointAt(m, duties_kW), sectionMembers(input.sections, m.trays, m.roles), cases);
}

/** Whether the plan's duties are feasible, and what is over: the model rated afresh at any duties. */
export function planPointStatus(
  input: HeatPlanInput,
  duties_kW: readonly number[],
): { feasible: boolean; violations: PlanViolation[] } {
  const m = planModel(input);
  const over = overAtDuties(m, duties_kW);
  return {
    feasible: over.length === 0,
    violations: over.map(([k, c]) => ({ tray: m.trays[k]!.tray, check: constraintName(c) })),
  };
}
