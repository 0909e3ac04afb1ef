/**
 * Which rating checks the pump-around study watches, and where (issue 5).
 *  - Trays above the zone lose liquid and vapour as the duty rises: watch the minimum liquid load (crest),
 *    weir loading where it is a minimum (sense 'min'), and weeping as the vapour falls.
 *  - Zone trays carry the circulation: watch jet flood, downcomer backup, downcomer inlet velocity and
 *    weir loading where it is a maximum (sense 'max').
 * A check counts as over its limit when its percent of limit (oriented so 100 % is the limit for both
 * senses, shared/types/rating.ts) exceeds 100; the residual for solving is percentOfLimit − 100.
 */
import type { CheckName, CheckResult, TrayResult } from '../../../shared/types/rating.js';
import type { TrayRegion } from './traffic.js';
import { PERCENT_CAP } from '../units.js';

export const MINIMUM_LIQUID_CHECKS: readonly CheckName[] = ['liquidLoad', 'weirLoading', 'weeping'];
export const ZONE_OVERLOAD_CHECKS: readonly CheckName[] = [
  'jetFlood',
  'downcomerBackup',
  'downcomerInletVelocity',
  'weirLoading',
];

/** The checks of a tray in a region that the study watches (none below the draw: unchanged by duty). */
export function watchedChecks(region: TrayRegion, rating: TrayResult): CheckName[] {
  if (region === 'above') return MINIMUM_LIQUID_CHECKS.filter((c) => c !== 'weirLoading' || rating.checks[c]?.sense === 'min');
  if (region === 'zone') return ZONE_OVERLOAD_CHECKS.filter((c) => c !== 'weirLoading' || rating.checks[c]?.sense === 'max');
  return [];
}

/**
 * percentOfLimit − 100: positive when the check is over its limit; NaN when the check is missing. A watched
 * check that does not apply because the tray has run dry counts as far past its limit (as the capped
 * percent), so that the scan still sees the crossing before dry-out.
 */
export function checkResidual(check: CheckResult | undefined): number {
  if (check?.status === 'na') return PERCENT_CAP - 100;
  if (!check || !Number.isFinite(check.percentOfLimit)) return check && check.percentOfLimit > 0 ? Infinity : NaN;
  return check.percentOfLimit - 100;
}
