/**
 * Per-node status of the grid: which watched constraints are over, and which are over at a given margin.
 * Computed once per node from the shared ratings (grid.ts).
 */
import type { GridRatings } from './grid.js';
import { nodeDuties } from './grid.js';
import { CONSTRAINTS_PER_TRAY, marginResidual, overConstraints, shiftAt, statesAt, type PlanModel } from './model.js';

/** [tray index, constraint] pairs; constraint −1 is the margin constraint */
export type ConstraintRef = readonly [number, number];

/** Constraints over at a rated node (each tray: dry-out alone when dry, else its checks over). */
export function overAtNode(r: GridRatings, node: number): ConstraintRef[] {
  const out: ConstraintRef[] = [];
  for (const k of r.model.watched) {
    const mask = r.mask(node, k);
    if (mask === 0) continue;
    if (mask & 1) out.push([k, 0]);
    else for (let c = 1; c < CONSTRAINTS_PER_TRAY; c++) if (mask & (1 << c)) out.push([k, c]);
  }
  return out;
}

/** Every constraint of the given trays with a positive residual at a rated node (for solving a crossing). */
export function positiveAtNode(r: GridRatings, node: number, trays: readonly number[]): ConstraintRef[] {
  const out: ConstraintRef[] = [];
  for (const k of trays) {
    const mask = r.mask(node, k);
    for (let c = 0; c < CONSTRAINTS_PER_TRAY; c++) if (mask & (1 << c)) out.push([k, c]);
  }
  return out;
}

/** Trays whose margin constraint is over at a node. */
export function marginOverAtNode(r: GridRatings, node: number, trays: readonly number[], margin: number): ConstraintRef[] {
  const duties = nodeDuties(r.grid, node);
  return trays.filter((k) => marginResidual(r.model, k, duties, margin) > 0).map((k) => [k, -1] as const);
}

/** Constraints over at any duties (every watched tray shifted and rated afresh; no grid). */
export function overAtDuties(m: PlanModel, duties_kW: readonly number[]): ConstraintRef[] {
  const states = statesAt(m, duties_kW);
  const out: ConstraintRef[] = [];
  for (const k of m.watched) {
    const shifted = shiftAt(m, k, states);
    for (const c of overConstraints(shifted, m.rate(k, shifted))) out.push([k, c]);
  }
  return out;
}
