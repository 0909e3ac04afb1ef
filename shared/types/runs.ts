/**
 * Stored rating runs: an immutable snapshot of geometry, loads, method options and engine version, the
 * engine results, and the review state. Review statuses are shared with pump-around studies (issue 5).
 */
import type { MethodOptions, SectionGeometry } from './rating.js';
import type { ReviewStatusSchema, RunKindSchema } from '../contract/runs.js';
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

/** Run payloads: defined once, as schemas, in shared/contract/runs.ts (these are their types). */
export type {
  CheckDiff,
  CreateRunBody,
  ReviewActionBody,
  ReviewEntry,
  RunComparison,
  RunRecord,
  RunResults,
  RunSectionResult,
  RunSnapshot,
  RunSnapshotSection,
  RunSummary,
  RunTrayResult,
  RunWindow,
  TrayDiff,
} from '../contract/runs.js';

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
