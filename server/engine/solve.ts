/**
 * One shared bracketing root solver for the engine (operating-window curves, Fair weep point) and for
 * other studies (the pump-around study reuses it). Brent's method: inverse quadratic interpolation and
 * secant steps safeguarded by bisection (Brent, Algorithms for Minimization without Derivatives, 1973, ch. 4).
 */

export interface SolveOptions {
  /** absolute tolerance on x (default 1e-10 × |x| + 1e-12) */
  xTol?: number;
  /** maximum iterations (default 100) */
  maxIter?: number;
}

export interface SolveResult {
  root: number;
  iterations: number;
  converged: boolean;
}

/**
 * Root of f on [a, b]; f(a) and f(b) must have opposite signs (or one of them be zero).
 * Returns converged = false, root = NaN, when the interval does not bracket a root.
 */
export function brent(f: (x: number) => number, a: number, b: number, options: SolveOptions = {}): SolveResult {
  const maxIter = options.maxIter ?? 100;
  let fa = f(a);
  let fb = f(b);
  if (fa === 0) return { root: a, iterations: 0, converged: true };
  if (fb === 0) return { root: b, iterations: 0, converged: true };
  if (!(fa * fb < 0)) return { root: Number.NaN, iterations: 0, converged: false };
  let c = a;
  let fc = fa;
  let d = b - a;
  let e = d;
  for (let i = 1; i <= maxIter; i++) {
    if (fb * fc > 0) {
      c = a;
      fc = fa;
      d = b - a;
      e = d;
    }
    if (Math.abs(fc) < Math.abs(fb)) {
      a = b;
      b = c;
      c = a;
      fa = fb;
      fb = fc;
      fc = fa;
    }
    const tol = options.xTol ?? 2e-16 * Math.abs(b) + 1e-10 * Math.abs(b) + 1e-12;
    const m = 0.5 * (c - b);
    if (Math.abs(m) <= tol || fb === 0) return { root: b, iterations: i, converged: true };
    if (Math.abs(e) >= tol && Math.abs(fa) > Math.abs(fb)) {
      const s = fb / fa;
      let p: number;
      let q: number;
      if (a === c) {
        p = 2 * m * s;
        q = 1 - s;
      } else {
        const qq = fa / fc;
        const r = fb / fc;
        p = s * (2 * m * qq * (qq - r) - (b - a) * (r - 1));
        q = (qq - 1) * (r - 1) * (s - 1);
      }
      if (p > 0) q = -q;
      else p = -p;
      if (2 * p < Math.min(3 * m * q - Math.abs(tol * q), Math.abs(e * q))) {
        e = d;
        d = p / q;
      } else {
        d = m;
        e = m;
      }
    } else {
      d = m;
      e = m;
    }
    a = b;
    fa = fb;
    b += Math.abs(d) > tol ? d : m > 0 ? tol : -tol;
    fb = f(b);
  }
  return { root: b, iterations: maxIter, converged: false };
}

/**
 * Root of an increasing function f on x ≥ lo ≥ 0 with f(lo) < 0: the upper end starts at hi and doubles
 * (at most maxDoublings times) until f(hi) ≥ 0, then Brent. Returns converged = false when no sign change
 * is found; returns lo when f(lo) ≥ 0 already.
 */
export function solveIncreasing(
  f: (x: number) => number,
  lo: number,
  hi: number,
  options: SolveOptions & { maxDoublings?: number } = {},
): SolveResult {
  const maxDoublings = options.maxDoublings ?? 80;
  if (f(lo) >= 0) return { root: lo, iterations: 0, converged: true };
  let upper = hi > lo ? hi : lo > 0 ? 2 * lo : 1;
  for (let i = 0; i < maxDoublings; i++) {
    if (f(upper) >= 0) return brent(f, lo, upper, options);
    lo = upper;
    upper *= 2;
  }
  return { root: Number.NaN, iterations: maxDoublings, converged: false };
}
