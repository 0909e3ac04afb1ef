/**
 * Stored rating runs: an immutable snapshot of geometry, loads, method options and engine version, the
 * engine results, and the review state. Review statuses are shared with pump-around studies (issue 5).
 */
import type {
  CheckName,
  CheckResult,
  EngineWarning,
  MethodOptions,
  OperatingWindow,
  SectionGeometry,
  SectionSummary,
  TrayLoad,
  TrayResult,
} from './rating.js';
import type { GeometryProvenance, TrayNumbering } from './columns.js';
import type { LoadBasis } from './loads.js';

import type { ReviewEntry, ReviewStatusSchema, RunKindSchema, RunSummary } from '../contract/runs.js';
import type { Static } from '@sinclair/typebox';

export { REVIEW_STATUSES } from '../contract/runs.js';
/** draft → submitted (author, ratings.run) → approved | returned (reviews.approve, with a comment); returned → submitted again. Approved is read-only. */
export type ReviewStatus = Static<typeof ReviewStatusSchema>;

/**
 * 'rating' from design/as-left geometry; 'as-found' with geometry measured at inspection (issue 6);
 * 'as-found-design' the design run rated beside an as-found run for its comparison (a working copy: run
 * lists and the column profile leave both inspection kinds out unless asked).
 */
export type RunKind = Static<typeof RunKindSchema>;
export const INSPECTION_RUN_KINDS: readonly RunKind[] = ['as-found', 'as-found-design'];

export interface RunSnapshotSection {
  sectionId: string;
  name: string;
  firstTray: number;
  lastTray: number;
  provenance: GeometryProvenance;
  provenanceDate: string | null;
  geometry: SectionGeometry;
  /** true when the geometry came from a geometryOverride (as-found measurements) */
  overridden: boolean;
}

export interface RunSnapshot {
  column: { id: string; tag: string; numbering: TrayNumbering; trayCount: number };
  loadCase: { id: string; name: string; basis: LoadBasis; version: number };
  sections: RunSnapshotSection[];
  /** the loads that were rated (trays covered by a snapshot section), ordered by tray */
  loads: TrayLoad[];
  methods: MethodOptions;
  engineVersion: string;
}

/**
 * A stored tray result. Its checks are those the engine computed when the run was rated: a check added
 * since is absent from older runs (stored runs decode by name, DEVELOPERS.md "Stored runs").
 */
export interface RunTrayResult extends Omit<TrayResult, 'checks'> {
  sectionId: string;
  checks: Partial<Record<CheckName, CheckResult>>;
}

export interface RunSectionResult {
  sectionId: string;
  name: string;
  firstTray: number;
  lastTray: number;
  summary: SectionSummary;
  warnings: EngineWarning[];
}

export interface RunResults {
  engineVersion: string;
  /** every rated tray, ordered by tray number */
  trays: RunTrayResult[];
  sections: RunSectionResult[];
  /** trays with loads but no section covering them (not rated) */
  uncoveredTrays: number[];
  controllingCheck: CheckName;
  controllingTray: number;
  maxPercentOfLimit: number;
  traysOver: number[];
  traysNear: number[];
}

export type { CreateRunBody, ReviewActionBody, ReviewEntry, RunSummary } from '../contract/runs.js';

export interface RunRecord extends RunSummary {
  snapshot: RunSnapshot;
  results: RunResults;
  reviews: ReviewEntry[];
  /** last reviewer comment (on approve or return), null before review */
  reviewComment: string | null;
}

/** Input of services/runs/runs.ts createRatingRun (also used by inspections for an as-found rating). */
export interface CreateRatingRunInput {
  columnId: string;
  loadCaseId: string;
  sectionIds?: string[];
  /** per section id: geometry replacing the stored one (as-found measurements) */
  geometryOverride?: Record<string, SectionGeometry>;
  methods?: MethodOptions;
  label: string;
  kind: RunKind;
  /** ISO date of the as-found geometry, recorded as the provenance date of overridden sections */
  asFoundDate?: string;
}

/** GET /runs/:id/window/:tray */
export interface RunWindow {
  runId: string;
  sectionId: string;
  load: TrayLoad;
  window: OperatingWindow;
}

export interface CheckDiff {
  a: number | null;
  b: number | null;
  /** b − a in percent of limit, null when a tray is missing from one run */
  delta: number | null;
}

export interface TrayDiff {
  tray: number;
  controllingA: CheckName | null;
  controllingB: CheckName | null;
  controllingChanged: boolean;
  statusA: CheckResult['status'] | null;
  statusB: CheckResult['status'] | null;
  /** percentOfLimit of every check in both runs */
  checks: Record<CheckName, CheckDiff>;
}

/** GET /runs/compare?a=&b= */
export interface RunComparison {
  a: RunSummary;
  b: RunSummary;
  trays: TrayDiff[];
  /** trays whose controlling check differs between the runs */
  controllingChanged: number[];
}
