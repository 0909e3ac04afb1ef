/**
 * Where a check goes over its limit as the duty rises. Given a residual r (positive = over) evaluated on
 * an ascending grid, find the first upward crossing (r goes from ≤ 0 to > 0) and refine it with the
 * engine's shared Brent solver (server/engine/solve.ts). A check already over at the first grid point
 * either clears further up (its clearing duty is solved too, and the search for an upward crossing goes
 * on from there) or never clears, and then it limits at the first grid point.
 * A crossing that starts and ends inside one grid interval can be missed; the grid is chosen fine enough
 * for the smooth, mostly monotone checks of the study.
 */
import { brent } from '../solve.js';

export interface Crossing {
  /** lowest duty of an upward crossing (or the first grid point when over there and never clearing) */
  x: number | null;
  /** over at the first grid point */
  overAtStart: boolean;
  /** where a check over at the first grid point clears; null if it does not, or was not over */
  clearedAt: number | null;
}

const finite = (v: number): number => (Number.isNaN(v) ? -1 : v === Infinity ? 1e9 : v);

/**
 * @param xs grid points, ascending; @param rs residual at each grid point (NaN counts as not over)
 * @param r the residual, for refining; @param tol absolute tolerance on x
 * @param cap do not refine an upward crossing whose bracket starts at or above cap (a lower one is known)
 */
export function firstCrossing(
  xs: readonly number[],
  rs: readonly number[],
  r: (x: number) => number,
  tol: number,
  cap = Infinity,
): Crossing {
  const f = (x: number): number => finite(r(x));
  const solve = (g: (x: number) => number, lo: number, hi: number): number => {
    const s = brent(g, lo, hi, { xTol: tol });
    return s.converged ? s.root : hi;
  };
  const over = (i: number): boolean => rs[i]! > 0;
  let start = 0;
  let clearedAt: number | null = null;
  const overAtStart = over(0);
  if (overAtStart) {
    start = rs.findIndex((_, i) => !over(i));
    if (start < 0) return { x: xs[0]!, overAtStart, clearedAt: null };
    clearedAt = solve((x) => -f(x), xs[start - 1]!, xs[start]!);
  }
  for (let i = start + 1; i < xs.length; i++) {
    if (!over(i) || over(i - 1)) continue;
    if (xs[i - 1]! >= cap) break;
    return { x: solve(f, xs[i - 1]!, xs[i]!), overAtStart, clearedAt };
  }
  return { x: null, overAtStart, clearedAt };
}
