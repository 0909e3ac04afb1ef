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
import { CONSTRAINTS_PER_TRAY, constraintResidual, statesAt, shiftAt, type PlanModel } from './model.js';
import type { PlanShiftedTray } from './traffic.js';

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
 * Shifted traffic and rating of every tray at every grid node, node by node (rateNode). A tray that
 * depends on fewer duties than the grid has is rated once per combination of those duties and its result
 * shared; a tray that depends on all of them is rated at each node and not kept (holding tens of
 * thousands of full ratings to the end of a run made garbage collection most of it). What later steps
 * need of each node is kept small: per watched tray, the bit mask of its constraints that are over
 * (bit c set when residual c > 0, model.ts numbering).
 */
export class GridRatings {
  private readonly cache: ((RatedTray | undefined)[] | null)[];
  private readonly keyStrides: number[][];
  private readonly masks: Uint16Array;
  /** position of each tray among the watched trays, −1 if not watched */
  private readonly watchedPos: number[];

  constructor(
    readonly model: PlanModel,
    readonly grid: DutyGrid,
    readonly reuse = true,
  ) {
    const axes = grid.sizes.length;
    // per tray: strides over the sizes of the pump-arounds it depends on
    this.keyStrides = model.roles.map((role) => {
      const strides = grid.sizes.map(() => 0);
      let s = 1;
      for (let j = role.dependsOn.length - 1; j >= 0; j--) {
        strides[role.dependsOn[j]!] = s;
        s *= grid.sizes[role.dependsOn[j]!]!;
      }
      return strides;
    });
    // dense arrays, filled up front (arrays written at scattered indices fall back to slow dictionaries)
    this.cache = model.roles.map((role) => {
      if (!reuse || role.dependsOn.length === axes) return null;
      const size = role.dependsOn.reduce((n, i) => n * grid.sizes[i]!, 1);
      return new Array<RatedTray | undefined>(size).fill(undefined);
    });
    this.watchedPos = model.trays.map(() => -1);
    model.watched.forEach((k, w) => (this.watchedPos[k] = w));
    this.masks = new Uint16Array(grid.count * model.watched.length);
  }

  /** Every tray at a node (idx = nodeIndices(grid, node)); records the masks of the watched trays. */
  rateNode(node: number, idx: readonly number[]): RatedTray[] {
    const m = this.model;
    const states = statesAt(m, nodeDuties(this.grid, node));
    const base = node * m.watched.length;
    return m.trays.map((_, k) => {
      const row = this.cache[k]!;
      let key = 0;
      if (row) {
        const ks = this.keyStrides[k]!;
        for (let i = 0; i < idx.length; i++) key += idx[i]! * ks[i]!;
      }
      let r = row?.[key];
      if (!r) {
        const shifted = shiftAt(m, k, states);
        r = { shifted, rating: m.rate(k, shifted) };
        if (row) row[key] = r;
      }
      const w = this.watchedPos[k]!;
      if (w >= 0) {
        let mask = 0;
        for (let c = 0; c < CONSTRAINTS_PER_TRAY; c++) if (constraintResidual(r.shifted, r.rating, c) > 0) mask |= 1 << c;
        this.masks[base + w] = mask;
      }
      return r;
    });
  }

  /** constraints over on watched tray k at a node already rated (bit c: constraint c) */
  mask(node: number, k: number): number {
    return this.masks[node * this.model.watched.length + this.watchedPos[k]!]!;
  }
}
