/** Physical constants and unit conversions used by the engine (SI inside). */

/** standard gravity [m/s²] */
export const G = 9.81;
/** seconds per hour */
export const S_PER_H = 3600;
/** 1 in = 25.4 mm */
export const MM_PER_IN = 25.4;
/** 1 ft = 0.3048 m */
export const M_PER_FT = 0.3048;
/** 1 lb/ft³ = 16.0185 kg/m³ */
export const KG_M3_PER_LB_FT3 = 16.0185;
/** 1 US gpm = 6.30902e-5 m³/s */
export const M3_S_PER_GPM = 6.30902e-5;
/** 1 lb = 0.45359237 kg */
export const KG_PER_LB = 0.45359237;
/** 1 ft² = 0.09290304 m² */
export const M2_PER_FT2 = 0.09290304;

/** Largest magnitude reported for quantities that are unbounded in the limit (e.g. residence time at zero liquid). */
export const REPORT_CAP = 1e6;
/** Percent-of-limit values are capped here so that they stay finite (a zero value of a 'min' check). */
export const PERCENT_CAP = 999;

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
