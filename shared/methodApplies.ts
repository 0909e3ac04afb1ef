/**
 * Which correlations' validity ranges a section's geometry is checked against, from the methods' own
 * metadata (`trayTypes`, the tray types each was developed for), not from a hand-kept list.
 */
import type { MethodInfo } from './types/methods.js';
import type { TrayType } from './types/rating.js';

/** Kister & Haas is a rating option (chosen per run), checked by the engine when chosen, not on the form. */
const RATING_OPTIONS = new Set(['kisterHaasFloodCapacity', 'transitionClearLiquidHeightKisterHaas']);

/** True when a section of this tray type is rated with the correlation whatever the run's options. */
export function appliesToSection(m: Pick<MethodInfo, 'id' | 'trayTypes'>, trayType: TrayType): boolean {
  if (RATING_OPTIONS.has(m.id)) return false;
  return m.trayTypes === null || m.trayTypes.includes(trayType);
}
