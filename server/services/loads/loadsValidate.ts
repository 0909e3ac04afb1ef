/** Consistency checks of a per-tray load grid against its column (the schema has checked each field). */
import type { ErrorDetail } from '../../errors.js';
import type { TrayLoad } from '../../../shared/types/rating.js';

/** Faults naming the row and tray: tray outside the column, duplicate trays, vapour not lighter than liquid. */
export function loadErrors(loads: TrayLoad[], trayCount: number, root = 'loads'): ErrorDetail[] {
  const errors: ErrorDetail[] = [];
  const seen = new Map<number, number>();
  loads.forEach((l, i) => {
    const p = `${root}.${i}`;
    if (l.tray < 1 || l.tray > trayCount)
      errors.push({ path: `${p}.tray`, message: `tray ${l.tray} is outside the column (trays 1–${trayCount})` });
    const first = seen.get(l.tray);
    if (first !== undefined)
      errors.push({ path: `${p}.tray`, message: `tray ${l.tray} appears twice (also in row ${first + 1})` });
    else seen.set(l.tray, i);
    if (!(l.vapourDensity_kg_m3 < l.liquidDensity_kg_m3))
      errors.push({
        path: `${p}.vapourDensity_kg_m3`,
        message: `tray ${l.tray}: vapour density (${l.vapourDensity_kg_m3} kg/m³) must be below the liquid density (${l.liquidDensity_kg_m3} kg/m³)`,
      });
  });
  return errors;
}

/** Stage map faults: the shared check, so the client shows the same faults as the user types. */
export { stageMapErrors } from '../../../shared/stageMap.js';

export const sortLoads = (loads: TrayLoad[]): TrayLoad[] => [...loads].sort((a, b) => a.tray - b.tray);
