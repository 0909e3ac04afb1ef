/** Rate every tray of a section and summarise: worst value per check, controlling check, margin, turndown. */
import { CHECK_NAMES } from '../../shared/types/rating.js';
import type {
  CheckName,
  EngineWarning,
  RatingRequest,
  RatingResult,
  SectionSummary,
  SectionSummaryEntry,
  TrayResult,
} from '../../shared/types/rating.js';
import { prepareSection } from './prepare.js';
import { rateTrayPrepared } from './rateTray.js';
import { ENGINE_VERSION } from './version.js';
import { isFloodedTray, trayState } from '../../shared/verdict.js';

/**
 * Worst tray per check; the section's controlling check and tray are those of the tray whose own
 * controlling check (rateTray: jet flood on a flooded tray) is furthest past its limit, a flooded tray
 * before any other, and the margin is measured on that check, so section and trays give one verdict.
 */
export function summarise(trays: readonly TrayResult[]): SectionSummary {
  const worst: SectionSummaryEntry[] = [];
  for (const name of CHECK_NAMES) {
    let best: SectionSummaryEntry | undefined;
    for (const t of trays) {
      const c = t.checks[name];
      if (!best || c.percentOfLimit > best.percentOfLimit) {
        best = { check: name, worstTray: t.tray, worstValue: c.value, percentOfLimit: c.percentOfLimit, status: c.status };
      }
    }
    if (best) worst.push(best);
  }
  // A flooded tray controls ahead of any tray that is not (a specialist names the flooded tray first, even
  // where another tray's entrainment is further past its own limit); then the furthest past its limit.
  let controllingCheck: CheckName = CHECK_NAMES[0];
  let controllingTray = trays[0]?.tray ?? 0;
  let maxPct = -1;
  let controlFlooded = false;
  for (const t of trays) {
    const pct = t.checks[t.controllingCheck].percentOfLimit;
    const flooded = isFloodedTray(t);
    if ((flooded && !controlFlooded) || (flooded === controlFlooded && pct > maxPct)) {
      maxPct = pct;
      controllingCheck = t.controllingCheck;
      controllingTray = t.tray;
      controlFlooded = flooded;
    }
  }
  let turndown = Number.POSITIVE_INFINITY;
  const traysOver: number[] = [];
  const traysNear: number[] = [];
  for (const t of trays) {
    const state = trayState(t);
    // a dry tray has no weep point worth the name: it does not set the section's turndown
    const r = t.details.turndownRatio ?? 0;
    if (r < turndown && state !== 'dry') turndown = r;
    if (state === 'near') traysNear.push(t.tray);
    else if (state !== 'ok') traysOver.push(t.tray);
  }
  return {
    worst,
    controllingCheck,
    controllingTray,
    marginToNearestLimit_percent: 100 - Math.max(maxPct, 0),
    turndown: Number.isFinite(turndown) ? turndown : 0,
    traysOver,
    traysNear,
  };
}

/** Rate all trays of a (validated) rating request. */
export function rateSection(req: RatingRequest): RatingResult {
  const prepared = prepareSection(req.section, req.methods);
  const trays = new Array<TrayResult>(req.trays.length);
  for (let i = 0; i < req.trays.length; i++) trays[i] = rateTrayPrepared(prepared, req.trays[i]!);
  const warnings: EngineWarning[] = prepared.sectionWarnings.slice();
  return { engineVersion: ENGINE_VERSION, trays, summary: summarise(trays), warnings };
}
