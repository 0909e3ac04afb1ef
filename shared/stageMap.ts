/**
 * Stage-to-tray maps (pure): one simulation stage covers an inclusive range of actual trays, in the column's
 * tray numbering. The server refuses a map with any fault below; the client shows the same faults as the user types.
 */
import type { TrayNumbering } from './types/columns.js';
import type { StageMapEntry } from './types/loads.js';

/** Same shape as the API's error details: path `${root}.${row}.${field}`. */
export interface StageMapFault {
  path: string;
  message: string;
}

const FIELDS = ['stage', 'firstTray', 'lastTray'] as const;
const trays = (a: number, b: number): string => (a === b ? `tray ${a}` : `trays ${a}–${b}`);

/**
 * Every fault of a map against a column of `trayCount` trays: a field that is not a whole number (a stage may be 0,
 * trays start at 1), a stage listed twice, lastTray below firstTray, a tray outside 1..trayCount, and ranges that
 * overlap (each tray takes the loads of exactly one stage).
 */
export function stageMapErrors(map: StageMapEntry[] | null | undefined, trayCount: number, root = 'stageMap'): StageMapFault[] {
  const errors: StageMapFault[] = [];
  const rows = (map ?? []).map((m, i) => ({ ...m, i }));
  const stageRow = new Map<number, number>();
  const complete: typeof rows = [];
  for (const m of rows) {
    const p = `${root}.${m.i}`;
    let whole = true;
    for (const f of FIELDS) {
      const min = f === 'stage' ? 0 : 1;
      if (!Number.isInteger(m[f]) || m[f] < min) {
        errors.push({ path: `${p}.${f}`, message: `row ${m.i + 1}: ${f} must be a whole number of at least ${min}` });
        whole = false;
      }
    }
    if (Number.isInteger(m.stage)) {
      const first = stageRow.get(m.stage);
      if (first !== undefined)
        errors.push({ path: `${p}.stage`, message: `stage ${m.stage} appears twice (also in row ${first + 1})` });
      else stageRow.set(m.stage, m.i);
    }
    if (!whole) continue;
    if (m.lastTray < m.firstTray)
      errors.push({
        path: `${p}.lastTray`,
        message: `stage ${m.stage}: lastTray (${m.lastTray}) must not be below firstTray (${m.firstTray})`,
      });
    else complete.push(m);
    if (Math.max(m.firstTray, m.lastTray) > trayCount)
      errors.push({
        path: `${p}.${m.lastTray > trayCount ? 'lastTray' : 'firstTray'}`,
        message: `stage ${m.stage}: tray ${Math.max(m.firstTray, m.lastTray)} is outside the column (trays 1–${trayCount})`,
      });
  }
  // sweep by first tray; compare each range with the one reaching furthest so far (not only its neighbour)
  complete.sort((a, b) => a.firstTray - b.firstTray || a.i - b.i);
  let reach: (typeof rows)[number] | undefined;
  for (const m of complete) {
    if (reach && m.firstTray <= reach.lastTray)
      errors.push({
        path: `${root}.${m.i}.firstTray`,
        message: `stage ${m.stage} (${trays(m.firstTray, m.lastTray)}) overlaps stage ${reach.stage} (${trays(reach.firstTray, reach.lastTray)})`,
      });
    if (!reach || m.lastTray > reach.lastTray) reach = m;
  }
  return errors;
}

/**
 * One stage per tray for trays 1..trayCount: stage = position + offset, where position counts trays from the end
 * where the stages start (the column's tray 1 when both run the same way, its last tray otherwise).
 * Example: 4 trays numbered top-down, stages counted from the top, offset 1 (stage 1 is the condenser):
 * trays 1, 2, 3, 4 → stages 2, 3, 4, 5.
 */
export function fillStageMap(
  trayCount: number,
  offset: number,
  stagesRun: TrayNumbering,
  columnNumbering: TrayNumbering,
): StageMapEntry[] {
  const reversed = stagesRun !== columnNumbering;
  const map: StageMapEntry[] = [];
  for (let t = 1; t <= trayCount; t++)
    map.push({ stage: (reversed ? trayCount + 1 - t : t) + offset, firstTray: t, lastTray: t });
  return map.sort((a, b) => a.stage - b.stage);
}

/** One line, e.g. "42 stages → trays 1–46; trays 7–8 share stage 6; no stage for tray 20". Complete rows only. */
export function stageMapSummary(map: StageMapEntry[] | null | undefined): string {
  const rows = (map ?? []).filter((m) => FIELDS.every((f) => Number.isInteger(m[f])) && m.firstTray <= m.lastTray);
  if (!rows.length) return 'No stage-to-tray map';
  const stages = new Set(rows.map((m) => m.stage)).size;
  const lo = Math.min(...rows.map((m) => m.firstTray));
  const hi = Math.max(...rows.map((m) => m.lastTray));
  const parts = [`${stages} stage${stages === 1 ? '' : 's'} → ${trays(lo, hi)}`];
  const lumped = rows.filter((m) => m.lastTray > m.firstTray).sort((a, b) => a.firstTray - b.firstTray);
  parts.push(...lumped.slice(0, 3).map((m) => `${trays(m.firstTray, m.lastTray)} share stage ${m.stage}`));
  if (lumped.length > 3) parts.push(`${lumped.length - 3} more stages cover several trays`);
  const covered = new Set(rows.flatMap((m) => Array.from({ length: m.lastTray - m.firstTray + 1 }, (_, k) => m.firstTray + k)));
  const gaps: [number, number][] = [];
  for (let t = lo; t <= hi; t++)
    if (!covered.has(t)) {
      const last = gaps[gaps.length - 1];
      if (last && last[1] === t - 1) last[1] = t;
      else gaps.push([t, t]);
    }
  if (gaps.length) parts.push(`no stage for ${gaps.map(([a, b]) => trays(a, b)).join(', ')}`);
  return parts.join('; ');
}
