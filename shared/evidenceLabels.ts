/**
 * Words for field evidence shown on pages and in the report (one place for both). The findings are the
 * field-evidence engine's; the reasons it gives are shown beside these labels.
 */
import type { EvidenceKind } from './types/evidence.js';
import type { ScanFinding } from './types/fieldEvidence.js';
import type { PRESSURE_DROP_FLAGS, TEMPERATURE_FLAGS } from './schemas/fieldEvidence.js';

export const EVIDENCE_KIND_LABELS: Record<EvidenceKind, string> = {
  'gamma-scan': 'Gamma scan',
  'dp-survey': 'Pressure-drop survey',
  'temperature-survey': 'Temperature survey',
};

export const SCAN_FINDING_LABELS: Record<ScanFinding, string> = {
  normal: 'As expected',
  flooded: 'Flooded',
  'missing-tray': 'No tray peak',
  'low-liquid': 'Little liquid',
  'high-froth': 'High froth',
};

/** Tray number in the column's numbering and, in brackets, counted the other way ("12 (9 from the bottom)"). */
export function trayBothWays(tray: number, trayCount: number, numbering: 'top-down' | 'bottom-up'): string {
  const other = trayCount + 1 - tray;
  return `${tray} (${other} from the ${numbering === 'top-down' ? 'bottom' : 'top'})`;
}

/** Short form for chart labels: "T12 · 9↑" (top-down numbering) or "T12 · 9↓" (bottom-up). */
export function trayBothWaysShort(tray: number, trayCount: number, numbering: 'top-down' | 'bottom-up'): string {
  return `T${tray} · ${trayCount + 1 - tray}${numbering === 'top-down' ? '↑' : '↓'}`;
}

/** The cautions shown with every piece of field evidence read against a rating (pages and report). */
export const EVIDENCE_CAUTIONS: readonly string[] = [
  'A gamma scan is interpreted by qualified people, together with the process data and the tray drawings; the findings here are screening estimates that point to where to look.',
  'Gamma scanning uses sealed radioactive sources: the work is done only by licensed contractors under the site rules, permits and licences.',
  'Before acting on a finding (an operating change, a shutdown or a column entry), follow the management-of-change review and have the conclusion confirmed by the internals vendor and licensed engineers; column entry needs the site permits.',
];

export type DpFlag = (typeof PRESSURE_DROP_FLAGS)[number];
export type TFlag = (typeof TEMPERATURE_FLAGS)[number];

export const DP_LABELS: Record<DpFlag, string> = {
  low: 'Below prediction',
  'as-predicted': 'As predicted',
  high: 'Above prediction',
  flooding: 'Flooding',
};

export const T_LABELS: Record<TFlag, string> = {
  'as-predicted': 'As predicted',
  hotter: 'Hotter',
  colder: 'Colder',
  'no-prediction': 'No load-case temperature',
};
