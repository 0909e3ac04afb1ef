/** Where a heat-recovery plan point's loads came from, in words (page, printed report, exports). */
import type { PointLoadsSource } from './types/heatPlan.js';

/**
 * @param source the point's `loads` (absent on plans stored before points carried it: the model)
 * @param calibrated whether the plan was calibrated against simulation cases
 */
export function loadsSourceText(source: PointLoadsSource | undefined, calibrated: boolean): string {
  if (source?.source === 'case') return `simulation case “${source.cases[0]}”`;
  if (source?.source === 'interpolated')
    return `interpolated between simulation cases “${source.cases[0]}” and “${source.cases[1]}” (${Math.round(
      100 * (source.fraction ?? 0),
    )} % of the way)`;
  return calibrated ? 'model calibrated against the simulation cases' : 'shortcut model';
}
