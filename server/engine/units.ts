/**
 * Physical constants and reporting caps used by the engine (SI inside). Unit conversion factors have one
 * home, shared/units.ts (NIST SP 811), for the engine, the server and the client alike.
 */

/** standard gravity [m/s²] */
export const G = 9.81;
/** seconds per hour */
export const S_PER_H = 3600;
/** Largest magnitude reported for quantities that are unbounded in the limit (e.g. residence time at zero liquid). */
export const REPORT_CAP = 1e6;
/** Percent-of-limit values are capped here so that they stay finite (a zero value of a 'min' check); users read "≥ 999". */
export { PERCENT_CAP } from '../../shared/labels.js';

/** Replace a non-finite or out-of-cap number by the cap (keeps sign); used only on reported values. */
export function finiteOrCap(x: number, cap: number = REPORT_CAP): number {
  if (Number.isNaN(x)) return cap;
  if (x > cap) return cap;
  if (x < -cap) return -cap;
  return x;
}

/** Safety net for reported numbers: finite values pass unchanged; ±Infinity and NaN become ±REPORT_CAP (NaN → +cap, the worst case). */
export function safeNumber(x: number): number {
  if (Number.isFinite(x)) return x;
  return x < 0 ? -REPORT_CAP : REPORT_CAP;
}
