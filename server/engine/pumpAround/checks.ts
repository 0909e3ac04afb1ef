/**
 * Which rating checks the pump-around study watches, and where: the lists live in shared/studyWatched.ts
 * (the study page reads the same ones). A check counts as over its limit when its percent of limit
 * (oriented so 100 % is the limit for both senses, shared/types/rating.ts) exceeds 100; the residual for
 * solving is percentOfLimit − 100.
 */
import type { CheckName, CheckResult, TrayResult } from '../../../shared/types/rating.js';
import { watchedCheckNames } from '../../../shared/studyWatched.js';
import type { TrayRegion } from './traffic.js';
import { PERCENT_CAP } from '../units.js';

export { MINIMUM_LIQUID_CHECKS, ZONE_OVERLOAD_CHECKS } from '../../../shared/studyWatched.js';

/** The checks of a tray in a region that the study watches (none below the draw: unchanged by duty). */
export function watchedChecks(region: TrayRegion, rating: TrayResult): CheckName[] {
  return watchedCheckNames(region, rating.checks.weirLoading?.sense);
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
