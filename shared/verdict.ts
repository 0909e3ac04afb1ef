/**
 * One verdict per tray, shared by the engine's summary, the pages and the exports (also for stored runs
 * rated before trays had a verdict of their own: it is read from the checks and details every run holds).
 */
import { CHECK_NAMES, type CheckName, type CheckResult, type TrayDetails, type TrayState } from './types/rating.js';

/** A tray's results as stored (runs rated before a check existed lack it) or fresh from the engine. */
interface TrayLike {
  checks: Partial<Record<CheckName, CheckResult>>;
  details: TrayDetails;
}

/** Percent of jet flood (by the method chosen for flood) at which a tray is flooded. */
export const FLOOD_PERCENT = 100;

/** A tray with no liquid: no weir loading (zero liquid flow gives exactly zero). */
export function isDryTray(t: Pick<TrayLike, 'details'>): boolean {
  return !(t.details.weirLoading_m3_h_m > 0);
}

/** At or past jet flood: the jet-flood check's value is the percent of flood of the chosen method. */
export function isFloodedTray(t: TrayLike): boolean {
  return !isDryTray(t) && (t.checks.jetFlood?.value ?? 0) >= FLOOD_PERCENT;
}

/** 'dry', 'flooded', or the worst status of the tray's checks ('over', 'near', 'ok'). */
export function trayState(t: TrayLike): TrayState {
  if (isDryTray(t)) return 'dry';
  if (isFloodedTray(t)) return 'flooded';
  let state: TrayState = 'ok';
  for (const name of CHECK_NAMES) {
    const s = t.checks[name]?.status;
    if (s === 'over') return 'over';
    if (s === 'near') state = 'near';
  }
  return state;
}

/** Tray numbers as runs: [1, 2, 3, 7, 9, 10] → "1–3, 7, 9–10". */
export function trayRuns(trays: readonly number[]): string {
  const sorted = [...trays].sort((a, b) => a - b);
  const parts: string[] = [];
  for (let i = 0; i < sorted.length;) {
    let j = i;
    while (j + 1 < sorted.length && sorted[j + 1] === sorted[j]! + 1) j++;
    parts.push(j > i ? `${sorted[i]}–${sorted[j]}` : String(sorted[i]));
    i = j + 1;
  }
  return parts.join(', ');
}

export interface SectionCoverage {
  rated: number;
  total: number;
  /** trays of the section with no loads (not rated) */
  missing: number[];
}

/** How many of a section's trays were rated, and which had no loads. */
export function sectionCoverage(firstTray: number, lastTray: number, ratedTrays: Iterable<number>): SectionCoverage {
  const rated = new Set<number>();
  for (const t of ratedTrays) if (t >= firstTray && t <= lastTray) rated.add(t);
  const missing: number[] = [];
  for (let t = firstTray; t <= lastTray; t++) if (!rated.has(t)) missing.push(t);
  return { rated: rated.size, total: lastTray - firstTray + 1, missing };
}

/** "all 22 trays rated" or "rated 12 of 22 trays; no loads for 21–30". */
export function coverageSentence(c: SectionCoverage): string {
  if (c.missing.length === 0) return `all ${c.total} tray${c.total === 1 ? '' : 's'} rated`;
  return `rated ${c.rated} of ${c.total} trays; no loads for ${c.missing.length === 1 ? 'tray' : 'trays'} ${trayRuns(c.missing)}`;
}
