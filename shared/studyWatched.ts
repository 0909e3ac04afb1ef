/**
 * Which rating checks the pump-around study watches, and where: one list for the engine (which guards them
 * when it suggests a duty, server/engine/pumpAround/) and the study page (which says which limits are watched).
 *  - Trays above the zone lose liquid and vapour as the duty rises: the minimum liquid load (crest), weir
 *    loading where it is a minimum (sense 'min'), and weeping as the vapour falls.
 *  - Zone trays carry the circulation: jet flood, downcomer backup, downcomer inlet velocity and weir
 *    loading where it is a maximum (sense 'max').
 *  - Trays below the draw are not changed by the duty: none.
 */
import type { CheckName } from './types/rating.js';

export type WatchRegion = 'above' | 'zone' | 'below';
export type CheckSense = 'max' | 'min';

/** The rating engine rates weir loading as a maximum (server/engine/rateTray.ts takes it from here). */
export const WEIR_LOADING_SENSE: CheckSense = 'max';

export const MINIMUM_LIQUID_CHECKS: readonly CheckName[] = ['liquidLoad', 'weirLoading', 'weeping'];
export const ZONE_OVERLOAD_CHECKS: readonly CheckName[] = [
  'jetFlood',
  'downcomerBackup',
  'downcomerInletVelocity',
  'weirLoading',
];

/** The checks the study watches on a tray of a region, given the sense its weir loading is rated in. */
export function watchedCheckNames(
  region: WatchRegion,
  weirLoadingSense: CheckSense | undefined = WEIR_LOADING_SENSE,
): CheckName[] {
  if (region === 'above') return MINIMUM_LIQUID_CHECKS.filter((c) => c !== 'weirLoading' || weirLoadingSense === 'min');
  if (region === 'zone') return ZONE_OVERLOAD_CHECKS.filter((c) => c !== 'weirLoading' || weirLoadingSense === 'max');
  return [];
}

export const isWatched = (region: WatchRegion, check: CheckName): boolean => watchedCheckNames(region).includes(check);
