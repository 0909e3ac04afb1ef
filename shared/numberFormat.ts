/**
 * One number formatter for values people read (pages, charts, reports, exports): significant figures, not a
 * fixed count of decimals, so a converted value reads 499.4 lb/ft³, not 499.4237.
 *
 * Rules (common practice for engineering data, no published rule):
 * - `sig` significant figures (4 by default; 3 is enough for hydraulic results such as ΔP);
 * - digits left of the decimal point are never rounded away (12 345 kg/h stays 12,345, not 12,300);
 * - at most 6 decimals (values below 10⁻⁶ of their unit read as 0);
 * - thousands separators unless `grouping: false`; '–' for a missing or non-finite value.
 */

/** Decimals that give `v` its `sig` significant figures, between 0 and 6. */
export function decimalsFor(v: number, sig = 4): number {
  if (!Number.isFinite(v) || v === 0) return 0;
  const d = sig - 1 - Math.floor(Math.log10(Math.abs(v)));
  return Math.min(6, Math.max(0, d));
}

/** `v` rounded to `sig` significant figures (never past the units digit; at most 6 decimals). */
export function roundSig(v: number, sig = 4): number {
  if (!Number.isFinite(v)) return v;
  const d = decimalsFor(v, sig);
  // toFixed rounds the decimal string, avoiding 1.005 → 1.00 style binary surprises in most cases
  return Number(v.toFixed(d));
}

export interface SigOptions {
  /** significant figures, default 4 */
  sig?: number;
  /** never more decimals than this (a quantity's usual precision) */
  maxDecimals?: number;
  /** thousands separators, default true */
  grouping?: boolean;
}

/** `v` as text with `sig` significant figures ('–' when missing). */
export function formatSig(v: number | null | undefined, o: SigOptions = {}): string {
  if (v === null || v === undefined || !Number.isFinite(v)) return '–';
  const d = Math.min(decimalsFor(v, o.sig ?? 4), o.maxDecimals ?? 6);
  const r = Number(v.toFixed(d));
  return (Object.is(r, -0) ? 0 : r).toLocaleString('en-US', {
    minimumFractionDigits: d,
    maximumFractionDigits: d,
    useGrouping: o.grouping ?? true,
  });
}
