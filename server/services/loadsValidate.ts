/** Consistency checks of a per-tray load grid against its column (the schema has checked each field). */
import type { ErrorDetail } from '../errors.js';
import type { StageMapEntry } from '../../shared/types/loads.js';
import type { TrayLoad } from '../../shared/types/rating.js';

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

/** Stage map: ranges inside the column, in order, not overlapping. */
export function stageMapErrors(map: StageMapEntry[] | null | undefined, trayCount: number, root = 'stageMap'): ErrorDetail[] {
  const errors: ErrorDetail[] = [];
  const sorted = (map ?? []).map((m, i) => ({ ...m, i })).sort((a, b) => a.firstTray - b.firstTray);
  sorted.forEach((m, k) => {
    const p = `${root}.${m.i}`;
    if (m.lastTray < m.firstTray)
      errors.push({ path: `${p}.lastTray`, message: `stage ${m.stage}: lastTray must not be below firstTray` });
    if (m.lastTray > trayCount)
      errors.push({
        path: `${p}.lastTray`,
        message: `stage ${m.stage}: tray ${m.lastTray} is outside the column (trays 1–${trayCount})`,
      });
    const prev = sorted[k - 1];
    if (prev && m.firstTray <= prev.lastTray)
      errors.push({
        path: `${p}.firstTray`,
        message: `stage ${m.stage}: trays ${m.firstTray}–${m.lastTray} overlap stage ${prev.stage} (trays ${prev.firstTray}–${prev.lastTray})`,
      });
  });
  return errors;
}

export const sortLoads = (loads: TrayLoad[]): TrayLoad[] => [...loads].sort((a, b) => a.tray - b.tray);
