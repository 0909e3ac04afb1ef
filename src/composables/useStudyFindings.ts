/**
 * Findings the pump-around study page states in plain words, worked out from the stored result alone
 * (no server round trip): limits over at a duty, whether the base duty already sits above the suggested
 * duty, and whether the trays above the return have run dry at a slider duty.
 */
import type { CheckName } from '../../shared/types/rating';
import { isWatched } from '../../shared/studyWatched';
import type { SlimStudyPoint, SlimStudyResult } from '../../shared/types/studies';

export type TrayRegion = SlimStudyPoint['trays'][number]['region'];
/** 'watched': guarded when the duty is suggested; 'unwatched': rated but not guarded; 'below': below the draw, not changed by the duty */
export type OverKind = 'watched' | 'unwatched' | 'below';

/** One check over its limit at one duty, with the trays where it is over (in the point's tray order). */
export interface OverLimit {
  check: CheckName;
  kind: OverKind;
  trays: number[];
}

/**
 * The checks over their limit (percent of limit above 100, as the engine counts it) at a duty, grouped by
 * check and kind; watched first, then the others, then the trays below the draw.
 */
export function overLimits(checkNames: readonly CheckName[], point: SlimStudyPoint | undefined | null): OverLimit[] {
  if (!point) return [];
  const groups = new Map<string, OverLimit>();
  for (const t of point.trays) {
    t.percent.forEach((pct, i) => {
      const check = checkNames[i];
      if (!check || !(pct > 100)) return;
      const kind: OverKind = t.region === 'below' ? 'below' : isWatched(t.region, check) ? 'watched' : 'unwatched';
      const key = `${kind}:${check}`;
      const g = groups.get(key) ?? { check, kind, trays: [] };
      g.trays.push(t.tray);
      groups.set(key, g);
    });
  }
  const order: OverKind[] = ['watched', 'unwatched', 'below'];
  return [...groups.values()].sort((a, b) => order.indexOf(a.kind) - order.indexOf(b.kind));
}

/** "tray 4", "trays 1, 5 and 6", "trays 1 and 5–16": ascending, runs of three or more trays as a range. */
export function trayList(trays: readonly number[]): string {
  const t = [...new Set(trays)].sort((a, b) => a - b);
  if (t.length === 1) return `tray ${t[0]}`;
  const parts: string[] = [];
  for (let i = 0; i < t.length;) {
    let j = i;
    while (j + 1 < t.length && t[j + 1] === t[j]! + 1) j++;
    if (j - i >= 2) parts.push(`${t[i]}–${t[j]}`);
    else for (let k = i; k <= j; k++) parts.push(String(t[k]));
    i = j + 1;
  }
  return parts.length === 1 ? `trays ${parts[0]}` : `trays ${parts.slice(0, -1).join(', ')} and ${parts.at(-1)}`;
}

/** Engine notes speak of the "recommended" duty; the page calls it the suggested duty throughout. */
export function noteInPageWords(note: string): string {
  return note.replace(/\b([Rr])ecommended duty\b/g, (_, r: string) => `${r === 'R' ? 'S' : 's'}uggested duty`);
}

/** The base duty already sits above the suggested one: by how much, and the base as a share of dry-out. */
export interface BaseAboveSuggested {
  by_kW: number;
  /** base duty / dry-out duty, or null without a dry-out duty */
  baseShareOfDryOut: number | null;
}

export function baseAboveSuggested(
  r: Pick<SlimStudyResult, 'baseDuty_kW' | 'recommendedDuty_kW' | 'dryOutDuty_kW'>,
): BaseAboveSuggested | null {
  const s = r.recommendedDuty_kW;
  if (s === null || !(r.baseDuty_kW > s)) return null;
  const dry = r.dryOutDuty_kW;
  return { by_kW: r.baseDuty_kW - s, baseShareOfDryOut: dry !== null && dry > 0 ? r.baseDuty_kW / dry : null };
}

/** Trays above the return whose liquid is gone (clipped at zero) at a duty. */
export function dryTraysAbove(point: SlimStudyPoint | null | undefined): number[] {
  return (point?.trays ?? []).filter((t) => t.region === 'above' && (t.dry || t.liquidMassFlow_kg_h <= 0)).map((t) => t.tray);
}
