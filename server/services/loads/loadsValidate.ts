/** Consistency checks of a per-tray load grid against its column (the schema has checked each field). */
import type { ErrorDetail } from '../../errors.js';
import { trayLoadFaults } from '../../../shared/trayLoadRules.js';
import type { TrayLoad } from '../../../shared/types/rating.js';

/** Faults naming the row and field (shared/trayLoadRules.ts): tray outside the column, duplicate trays, vapour not lighter than liquid. */
export function loadErrors(loads: TrayLoad[], trayCount: number, root = 'loads'): ErrorDetail[] {
  return trayLoadFaults(loads, { trayCount, checkFields: false }).map((f) => ({
    path: `${root}.${f.index}.${f.field}`,
    message: f.message,
  }));
}

/** Stage map faults: the shared check, so the client shows the same faults as the user types. */
export { stageMapErrors } from '../../../shared/stageMap.js';

export const sortLoads = (loads: TrayLoad[]): TrayLoad[] => [...loads].sort((a, b) => a.tray - b.tray);
