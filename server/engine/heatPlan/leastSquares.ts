/**
 * Linear least squares for the few unknowns of a calibration (one per pump-around): minimise |X·u − y|²
 * through the normal equations (XᵀX + ε·I)·u = Xᵀy, solved by Gaussian elimination with partial pivoting.
 * ε = 1e-12 × trace(XᵀX) / n only steadies a system the data leave nearly singular (it then gives the
 * smallest-norm solution); with informative data its effect is far below the data's own precision.
 */

/** Accumulates rows of X and y. */
export class NormalEquations {
  readonly xtx: number[][];
  readonly xty: number[];
  rows = 0;

  constructor(readonly n: number) {
    this.xtx = Array.from({ length: n }, () => new Array<number>(n).fill(0));
    this.xty = new Array<number>(n).fill(0);
  }

  add(x: readonly number[], y: number): void {
    for (let i = 0; i < this.n; i++) {
      this.xty[i]! += x[i]! * y;
      for (let j = 0; j < this.n; j++) this.xtx[i]![j]! += x[i]! * x[j]!;
    }
    this.rows++;
  }

  /** the solution; NaN entries when there is no data at all */
  solve(): number[] {
    const n = this.n;
    let trace = 0;
    for (let i = 0; i < n; i++) trace += this.xtx[i]![i]!;
    if (!(trace > 0)) return new Array<number>(n).fill(Number.NaN);
    const eps = (1e-12 * trace) / n;
    const a = this.xtx.map((row, i) => [...row.map((v, j) => v + (i === j ? eps : 0)), this.xty[i]!]);
    for (let c = 0; c < n; c++) {
      let p = c;
      for (let r = c + 1; r < n; r++) if (Math.abs(a[r]![c]!) > Math.abs(a[p]![c]!)) p = r;
      [a[c], a[p]] = [a[p]!, a[c]!];
      for (let r = c + 1; r < n; r++) {
        const f = a[r]![c]! / a[c]![c]!;
        for (let k = c; k <= n; k++) a[r]![k]! -= f * a[c]![k]!;
      }
    }
    const u = new Array<number>(n).fill(0);
    for (let r = n - 1; r >= 0; r--) {
      let s = a[r]![n]!;
      for (let k = r + 1; k < n; k++) s -= a[r]![k]! * u[k]!;
      u[r] = s / a[r]![r]!;
    }
    return u;
  }
}
