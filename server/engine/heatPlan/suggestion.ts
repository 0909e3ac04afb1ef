/**
 * Suggested split: of the duties that are feasible (no watched tray dry, no watched check over) and keep
 * the margin (the duties scaled together by 1/margin from zero leave no tray dry: in one pump-around,
 * Q ≤ margin × dry-out duty), the one recovering most heat above the useful temperature (ties: most heat
 * in total). The candidates are the grid nodes and the exact points where the grid lines cross the edge
 * of that set, so the suggestion is exact along the grid lines and the grid is its only resolution.
 */
import type { PlanSuggestion } from '../../../shared/types/heatPlan.js';
import type { BoundarySolver } from './boundary.js';
import { nodeDuties, nodeIndices, type GridRatings } from './grid.js';
import { recoveredHeat } from './heatLevel.js';
import { constraintName } from './model.js';
import { marginOverAtNode, positiveAtNode } from './nodes.js';

/** margins of the sensitivity table (the chosen margin is added) */
export const SENSITIVITY_MARGINS = [0.5, 0.6, 0.7, 0.8, 0.9, 1];
const REL = 1e-9;

export function suggestSplit(
  ratings: GridRatings,
  solver: BoundarySolver,
  feasible: readonly boolean[],
  margin: number,
  usefulAbove_C: number,
): PlanSuggestion | null {
  const { grid, model } = ratings;
  const ok = feasible.map((f, n) => f && marginOverAtNode(ratings, n, model.watched, margin).length === 0);
  let best: PlanSuggestion | null = null;
  const consider = (duties_kW: number[], limitedBy: PlanSuggestion['limitedBy']): void => {
    const h = recoveredHeat(model.pumpArounds, duties_kW, usefulAbove_C);
    const tol = REL * Math.max(1, h.recoveredHeat_kW);
    const better =
      !best ||
      h.recoveredAboveTemperature_kW > best.recoveredAboveTemperature_kW + tol ||
      (h.recoveredAboveTemperature_kW >= best.recoveredAboveTemperature_kW - tol &&
        h.recoveredHeat_kW > best.recoveredHeat_kW + tol);
    if (better) best = { duties_kW, ...h, margin, limitedBy };
  };
  for (let n = 0; n < grid.count; n++) {
    if (ok[n]) consider(nodeDuties(grid, n), null);
    const idx = nodeIndices(grid, n);
    for (let ax = 0; ax < grid.sizes.length; ax++) {
      if (idx[ax]! >= grid.sizes[ax]! - 1) continue;
      const b = n + grid.strides[ax]!;
      if (ok[n] === ok[b]) continue;
      const [inside, outside] = ok[n] ? [n, b] : [b, n];
      const trays = solver.traysOfAxis[ax]!;
      const over = [
        ...(feasible[outside] ? [] : positiveAtNode(ratings, outside, trays)),
        ...marginOverAtNode(ratings, outside, trays, margin),
      ];
      const flip = solver.solve(inside, outside, ax, over, margin);
      const limitedBy =
        flip.k < 0 ? null : { tray: model.trays[flip.k]!.tray, check: constraintName(Math.max(0, flip.c)), margin: flip.c < 0 };
      consider(flip.duties_kW, limitedBy);
    }
  }
  return best;
}
