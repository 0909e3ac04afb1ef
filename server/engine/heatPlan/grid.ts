/**
 * The duty grid of a plan: each pump-around's sweep (steps + 1 duties) and every combination of them,
 * lexicographic with the first pump-around varying slowest. Each watched tray is rated once per
 * combination of the duties it depends on (TrayRole.dependsOn): below the lowest draw once, between two
 * zones once per duty of the pump-arounds below. A tray's traffic never reads the other duties
 * (shiftPlanTray), so the shared rating is the one a fresh rating at that point would give; `reuse: false`
 * rates every tray at every point (tests compare the two).
 */
import type { TrayResult } from '../../../shared/types/rating.js';
import { sweepDuties } from '../pumpAround/points.js';
import { statesAt, shiftAt, type PlanModel } from './model.js';
import type { DutyState, PlanShiftedTray } from './traffic.js';

export interface DutyGrid {
  axes: number[][];
  sizes: number[];
  /** node index = Σ idx_i · strides[i] */
  strides: number[];
  count: number;
}

export function dutyGrid(m: PlanModel): DutyGrid {
  const axes = m.pumpArounds.map((pa) => sweepDuties({ sweep: pa.sweep }));
  const sizes = axes.map((a) => a.length);
  const strides = sizes.map((_, i) => sizes.slice(i + 1).reduce((p, n) => p * n, 1));
  return { axes, sizes, strides, count: sizes.reduce((p, n) => p * n, 1) };
}

export function nodeIndices(g: DutyGrid, node: number): number[] {
  return g.strides.map((s, i) => Math.floor(node / s) % g.sizes[i]!);
}

export function nodeDuties(g: DutyGrid, node: number): number[] {
  return nodeIndices(g, node).map((j, i) => g.axes[i]![j]!);
}

export interface RatedTray {
  shifted: PlanShiftedTray;
  rating: TrayResult;
}

/**
 * Shifted traffic and rating of every tray at every grid node, each computed once per combination of the
 * duties the tray depends on (or at every node when reuse is false).
 */
export class GridRatings {
  private readonly cache: (RatedTray | undefined)[][];
  private readonly keyStrides: number[][];
  private readonly states: (DutyState[] | undefined)[];

  constructor(
    readonly model: PlanModel,
    readonly grid: DutyGrid,
    readonly reuse = true,
  ) {
    // per tray: strides over the sizes of the pump-arounds it depends on (all of them without reuse)
    this.keyStrides = model.roles.map((role) => {
      const on = reuse ? role.dependsOn : grid.sizes.map((_, i) => i);
      const strides = grid.sizes.map(() => 0);
      let s = 1;
      for (let j = on.length - 1; j >= 0; j--) {
        strides[on[j]!] = s;
        s *= grid.sizes[on[j]!]!;
      }
      return strides;
    });
    // dense arrays, filled up front (arrays written at scattered indices fall back to slow dictionaries)
    this.cache = this.keyStrides.map((ks) => {
      const size = ks.reduce((n, s, i) => (s > 0 ? Math.max(n, s * grid.sizes[i]!) : n), 1);
      return new Array<RatedTray | undefined>(size).fill(undefined);
    });
    this.states = new Array<DutyState[] | undefined>(grid.count).fill(undefined);
  }

  /** duty states of every pump-around at a node (kept: they are reused by every tray) */
  statesOf(node: number): DutyState[] {
    let s = this.states[node];
    if (!s) this.states[node] = s = statesAt(this.model, nodeDuties(this.grid, node));
    return s;
  }

  /** tray k at a node; idx = nodeIndices(grid, node), passed in by loops that already have it */
  at(node: number, k: number, idx: readonly number[] = nodeIndices(this.grid, node)): RatedTray {
    const ks = this.keyStrides[k]!;
    let key = 0;
    for (let i = 0; i < idx.length; i++) key += idx[i]! * ks[i]!;
    const row = this.cache[k]!;
    let r = row[key];
    if (!r) {
      const shifted = shiftAt(this.model, k, this.statesOf(node));
      row[key] = r = { shifted, rating: this.model.rate(k, shifted) };
    }
    return r;
  }
}
