/** Building CheckResult records: percent of limit oriented so that higher is always worse. */
import type { CheckResult, CheckStatus } from '../../shared/types/rating.js';
import { PERCENT_CAP, safeNumber } from './units.js';

/**
 * Percent of limit: 'max' checks 100·value/limit; 'min' checks 100·limit/value (so a value at half
 * the minimum is 200 %). Capped at PERCENT_CAP (999) so it stays finite, e.g. for a zero value.
 */
export function percentOfLimit(value: number, limit: number, sense: 'max' | 'min'): number {
  let p: number;
  if (sense === 'max') {
    p = limit > 0 ? (100 * value) / limit : value > 0 ? PERCENT_CAP : 0;
  } else if (value > 0) {
    p = limit > 0 ? (100 * limit) / value : 0;
  } else {
    p = limit > 0 || value < 0 ? PERCENT_CAP : 0;
  }
  if (!(p < PERCENT_CAP)) return PERCENT_CAP;
  return p > 0 ? p : 0;
}

export function statusOf(percent: number, nearPercent: number): CheckStatus {
  return percent >= 100 ? 'over' : percent >= nearPercent ? 'near' : 'ok';
}

export function makeCheck(
  value: number,
  unit: string,
  limit: number,
  sense: 'max' | 'min',
  method: string,
  nearPercent: number,
): CheckResult {
  const v = safeNumber(value);
  const pct = percentOfLimit(v, limit, sense);
  return { value: v, unit, limit, sense, percentOfLimit: pct, status: statusOf(pct, nearPercent), method };
}

/** The check does not apply to this tray: status 'na', 0 % of limit (it never controls); value kept for reference. */
export function notApplicable(c: CheckResult): CheckResult {
  c.status = 'na';
  c.percentOfLimit = 0;
  return c;
}
