/**
 * Scan of the watched checks (checks.ts) between two duties: each tray above the zone and in the zone is
 * rated on a uniform grid of SCAN_INTERVALS intervals, and for each of its watched checks the first upward
 * crossing of the limit is solved exactly (firstCrossing.ts). Trays below the draw are not scanned:
 * their traffic does not depend on the duty.
 */
import type { CheckName, TrayLoad, TrayResult } from '../../../shared/types/rating.js';
import { checkResidual, watchedChecks } from './checks.js';
import { firstCrossing } from './firstCrossing.js';
import type { ShiftedTray } from './traffic.js';

export const SCAN_INTERVALS = 40;
/** relative tolerance on the solved duties (× the upper end of the scan, at least 1 kW) */
const SOLVE_RTOL = 1e-9;

export interface Found {
  duty_kW: number;
  tray: number;
  check: CheckName;
}

export interface ScanResult {
  /** first upward crossing of a minimum-liquid check on a tray above the zone */
  minimumLiquid: Found | null;
  /** first upward crossing of an overload check on a zone tray */
  zoneOverload: Found | null;
  /** watched checks over at the lower end that clear further up, with the duty where they clear */
  clearing: Found[];
  /** watched checks over from the lower end up to the upper end */
  alwaysOver: { tray: number; check: CheckName }[];
}

/**
 * @param trays base loads of the trays to scan (above the zone and in the zone)
 * @param shiftOne shifted traffic of one base tray at a duty
 * @param rate rating of one shifted tray
 */
export function scanWatchedChecks(
  qLo: number,
  qHi: number,
  trays: readonly TrayLoad[],
  shiftOne: (tray: TrayLoad, q: number) => ShiftedTray,
  rate: (load: TrayLoad) => TrayResult,
): ScanResult {
  const out: ScanResult = { minimumLiquid: null, zoneOverload: null, clearing: [], alwaysOver: [] };
  const xs = Array.from({ length: SCAN_INTERVALS + 1 }, (_, i) =>
    i === SCAN_INTERVALS ? qHi : qLo + ((qHi - qLo) * i) / SCAN_INTERVALS,
  );
  const grid = xs.map((q) => trays.map((t) => shiftOne(t, q)));
  const tol = SOLVE_RTOL * Math.max(1, qHi);
  trays.forEach((base, idx) => {
    const t0 = grid[0]![idx]!;
    const ratings = grid.map((shifted) => rate(shifted[idx]!));
    const kind = t0.region === 'above' ? 'minimumLiquid' : 'zoneOverload';
    for (const check of watchedChecks(t0.region, ratings[0]!)) {
      const rs = ratings.map((r) => checkResidual(r.checks[check]));
      const residual = (q: number): number => checkResidual(rate(shiftOne(base, q)).checks[check]);
      const c = firstCrossing(xs, rs, residual, tol, out[kind]?.duty_kW);
      if (c.clearedAt !== null) out.clearing.push({ duty_kW: c.clearedAt, tray: t0.tray, check });
      if (c.overAtStart && c.clearedAt === null) out.alwaysOver.push({ tray: t0.tray, check });
      if (c.x !== null && (!out[kind] || c.x < out[kind].duty_kW)) out[kind] = { duty_kW: c.x, tray: t0.tray, check };
    }
  });
  return out;
}
