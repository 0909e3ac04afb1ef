/**
 * Exact boundary of the feasible region on the grid lines. Along each grid line (one duty varied, the
 * others held at grid values), between two neighbouring nodes where feasibility changes, each constraint
 * that changes side is solved for the duty where it reaches its limit with the engine's Brent solver
 * (server/engine/solve.ts, tolerance 1e-12 of the step); the boundary point is the first such duty seen
 * from the feasible node, named by its tray and constraint. Dry-out and the margin constraint are linear
 * in the duties, so the solver lands on them in one or two steps. As in the single study, a constraint
 * that goes over and back within one grid step is not seen: the grid is the resolution of the search.
 */
import { brent } from '../solve.js';
import type { GridRatings } from './grid.js';
import { CONSTRAINTS_PER_TRAY, constraintResidual, marginResidual, shiftAt, statesAt } from './model.js';
import { dryResidual } from './traffic.js';

export interface LineFlip {
  /** the feasible node and the infeasible node of the interval */
  inside: number;
  outside: number;
  axis: number;
  duties_kW: number[];
  /** index into the model's trays */
  k: number;
  /** constraint number (model.ts), or −1 for the margin constraint */
  c: number;
}

const T_TOL = 1e-12;
/** two roots closer than this (fraction of a step) are the same point: name it by dry-out first */
const TIE = 1e-9;

export class BoundarySolver {
  private readonly roots = new Map<number, number>();
  /** trays (indices) watched whose traffic depends on each axis */
  readonly traysOfAxis: number[][];

  constructor(readonly ratings: GridRatings) {
    const m = ratings.model;
    this.traysOfAxis = m.pumpArounds.map((_, ax) => m.watched.filter((k) => m.roles[k]!.dependsOn.includes(ax)));
  }

  private dutiesAt(a: number, b: number, axis: number, t: number): number[] {
    const { grid } = this.ratings;
    const da = grid.axes.map((_, i) => grid.axes[i]![Math.floor(a / grid.strides[i]!) % grid.sizes[i]!]!);
    const qa = da[axis]!;
    const qb = grid.axes[axis]![Math.floor(b / grid.strides[axis]!) % grid.sizes[axis]!]!;
    da[axis] = t >= 1 ? qb : qa + t * (qb - qa);
    return da;
  }

  /** residual of constraint (k, c) at fraction t of the way from node a to node b; c = −1: margin */
  private residual(a: number, b: number, axis: number, k: number, c: number, margin: number, t: number): number {
    const duties = this.dutiesAt(a, b, axis, t);
    const m = this.ratings.model;
    if (c < 0) return marginResidual(m, k, duties, margin);
    const shifted = shiftAt(m, k, statesAt(m, duties));
    return c === 0 ? dryResidual(shifted) : constraintResidual(shifted, m.rate(k, shifted), c);
  }

  private root(a: number, b: number, axis: number, k: number, c: number, margin: number): number {
    // a is the node inside (residual ≤ 0), b outside (> 0); F roots do not depend on the margin: keep them
    const up = b > a ? 1 : 0;
    const key = c >= 0 ? (((a * 4 + axis) * 2 + up) * this.ratings.model.trays.length + k) * CONSTRAINTS_PER_TRAY + c : -1;
    const known = key >= 0 ? this.roots.get(key) : undefined;
    if (known !== undefined) return known;
    const f = (t: number): number => {
      const r = this.residual(a, b, axis, k, c, margin, t);
      return Number.isNaN(r) ? -1 : r;
    };
    const s = brent(f, 0, 1, { xTol: T_TOL });
    const t = s.converged ? s.root : 1;
    if (key >= 0) this.roots.set(key, t);
    return t;
  }

  /**
   * The boundary point between a feasible node and an infeasible neighbour along an axis.
   * @param over constraints over at the outside node: [k, c] pairs (c = −1: margin)
   */
  solve(inside: number, outside: number, axis: number, over: readonly (readonly [number, number])[], margin: number): LineFlip {
    let best: { t: number; k: number; c: number } | null = null;
    for (const [k, c] of over) {
      const t = this.root(inside, outside, axis, k, c, margin);
      const rank = (x: number): number => (x === 0 ? 0 : x < 0 ? 1 : 2 + x);
      if (!best || t < best.t - TIE || (t <= best.t + TIE && rank(c) < rank(best.c))) best = { t, k, c };
    }
    const b = best ?? { t: 1, k: -1, c: 0 };
    return { inside, outside, axis, duties_kW: this.dutiesAt(inside, outside, axis, b.t), k: b.k, c: b.c };
  }
}
