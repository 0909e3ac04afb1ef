/**
 * The product's words for what users read and sign: check names, statuses, tray verdicts, limit senses,
 * the basis of each correlation, and sources without drafting notes. Defined once; the pages, the
 * exports, the methods list and the PDFs use them, so no internal id reaches a user.
 */
import type { CheckName, CheckStatus, FoamingClass, TrayState, TrayType } from './types/rating.js';
import type { GeometryProvenance } from './types/columns.js';
import type { MethodInfo } from './types/methods.js';
import type { ReviewStatus } from './types/runs.js';
import type { DamageKind, InspectionStatus, PunchPriority, ToleranceItem } from './types/inspections.js';

/** Our own names for the checks (trade terms). */
export const CHECK_LABELS: Record<CheckName, string> = {
  jetFlood: 'Jet flood',
  entrainment: 'Entrainment',
  weeping: 'Weep margin',
  pressureDrop: 'Tray ΔP',
  weirLoading: 'Weir loading',
  liquidLoad: 'Weir crest',
  downcomerBackup: 'Downcomer backup',
  downcomerInletVelocity: 'Downcomer inlet velocity',
  downcomerResidenceTime: 'Downcomer residence',
  downcomerSeal: 'Downcomer seal',
};

/** Short column headers for dense tables. */
export const CHECK_SHORT: Record<CheckName, string> = {
  jetFlood: 'Flood',
  entrainment: 'Entr.',
  weeping: 'Weep',
  pressureDrop: 'ΔP',
  weirLoading: 'Weir load',
  liquidLoad: 'Crest',
  downcomerBackup: 'DC backup',
  downcomerInletVelocity: 'DC inlet',
  downcomerResidenceTime: 'DC resid.',
  downcomerSeal: 'DC seal',
};

/** Rows of the default-limits table (reference-tables/limits.json): the checks, and limits that are not checks of their own. */
export const LIMIT_LABELS: Record<string, string> = {
  ...CHECK_LABELS,
  pressureDropVacuum: 'Tray ΔP, vacuum service',
  passImbalance: 'Pass L/V imbalance (multipass layouts)',
  nearFraction: 'Flagged as close from',
};

/** Status words of our own: within the limit, close to it, beyond it, or the check does not apply. */
export const STATUS_LABELS: Record<CheckStatus, string> = { ok: 'within', near: 'close', over: 'beyond', na: 'not applicable' };

/** Verdict on a whole tray (shared/verdict.ts). */
export const TRAY_STATE_LABELS: Record<TrayState, string> = {
  ok: 'within limits',
  near: 'close to a limit',
  over: 'beyond a limit',
  flooded: 'flooded',
  dry: 'dry (no liquid)',
};

export const REVIEW_LABELS: Record<ReviewStatus, string> = {
  draft: 'Working copy',
  submitted: 'Awaiting review',
  approved: 'Approved',
  returned: 'Returned',
};

/** "at most" for limits a value must stay below, "at least" for those it must reach. */
export const SENSE_WORDS: Record<'max' | 'min', string> = { max: 'at most', min: 'at least' };

/** A value against its limit in words: "4.2 s, at least 3 s". Value and limit come formatted with their units. */
export function againstLimit(value: string, limit: string, sense: 'max' | 'min'): string {
  return `${value}, ${SENSE_WORDS[sense]} ${limit}`;
}

/** How each correlation's basis is named in reports. */
export const PROVENANCE_LABELS: Record<MethodInfo['provenance'], string> = {
  seen: 'as published',
  recalled: 'published correlation',
  derived: 'derived from published relations',
  'common-practice': 'common practice',
  'own-fit': 'our fit to published chart readings',
};

/** The uncertainty a report states once, in its methods list, for a correlation of this basis. */
export const PROVENANCE_UNCERTAINTY: Record<MethodInfo['provenance'], string | null> = {
  seen: null,
  recalled:
    'As commonly quoted from the cited source, not verified against the printed edition; compare with a second method before acting on a result near a limit.',
  derived: null,
  'common-practice': 'A rule of thumb of the trade, not a correlation fitted to data.',
  'own-fit': 'A fit to readings of a published chart; it carries the reading uncertainty of the chart.',
};

/**
 * A source as users read it: our provenance tags ("[seen]", "[from memory]", "[S9]", notes-file
 * references) left out, "[common practice]" kept in plain words; numeric brackets such as "[0.5, 0.7]" stay.
 */
export function publishedSource(source: string): string {
  return source
    .replace(/\s*\[common practice\]/gi, ' (common practice)')
    .replace(/\s*\[[^\]]*[A-Za-z][^\]]*\]/g, '')
    .replace(/,\s*from memory\)/gi, ')')
    .replace(/\s*\((?:[^()]*\.md\b[^()]*|from memory)\)/gi, '')
    .replace(/\s+([;,.])/g, '$1')
    .replace(/\s{2,}/g, ' ')
    .trim();
}

export const INSPECTION_STATUS_LABELS: Record<InspectionStatus, string> = {
  draft: 'Draft',
  'inspector-signed': 'Signed by inspector',
  'engineer-signed': 'Signed off',
};

export const TOLERANCE_ITEM_LABELS: Record<ToleranceItem, string> = {
  weirHeight: 'Outlet weir height',
  downcomerClearance: 'Downcomer clearance',
  traySpacing: 'Tray spacing',
  levelness: 'Levelness (high − low)',
};

export const DAMAGE_LABELS: Record<DamageKind, string> = {
  none: 'None',
  uplift: 'Uplift (edges bent down)',
  crushing: 'Crushing (edges bent up)',
  both: 'Uplift and crushing',
};

export const PUNCH_PRIORITY_LABELS: Record<PunchPriority, string> = {
  'before-box-up': 'Before box-up',
  'if-time-allows': 'If time allows',
  'next-turnaround': 'Next turnaround',
};

export const TRAY_TYPE_LABELS: Record<TrayType, string> = {
  sieve: 'sieve',
  'fixed-valve': 'fixed valve',
  'moving-valve': 'moving valve',
};

export const GEOMETRY_PROVENANCE_LABELS: Record<GeometryProvenance, string> = {
  design: 'design',
  'as-left': 'as left',
  'as-found': 'as found',
};

export const FOAMING_LABELS: Record<FoamingClass, string> = {
  low: 'low',
  moderate: 'moderate',
  high: 'high',
  'very-high': 'very high',
};

/** Percent of limit is held at this value when it has no finite size (a 'min' check at zero, a zero limit). */
export const PERCENT_CAP = 999;

/** Percent of limit as users read it: whole percent, and "≥ 999" where the engine held it at the cap. */
export function formatPercentOfLimit(percent: number): string {
  return percent >= PERCENT_CAP ? `≥ ${PERCENT_CAP}` : percent.toFixed(0);
}
