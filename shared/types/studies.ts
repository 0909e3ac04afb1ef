/**
 * Stored pump-around duty studies (issue 5): request bodies and answers of /columns/:id/studies and
 * /studies/:id, shared by the server and the client. SI units; the unit is part of each field name.
 * The engine's own payloads are in shared/types/pumpAround.ts.
 */
import type { CheckName, CheckStatus, MethodOptions } from './rating.js';
import type { DutySweep, StudyInput, StudyPoint, StudyResult, StudyTrayPoint } from './pumpAround.js';
import type { ReviewEntry, ReviewStatus } from './runs.js';

/** Review status, the same life cycle as a rating run (shared/types/runs.ts): approved is read-only. */
export type StudyStatus = ReviewStatus;

/** POST /columns/:id/studies */
export interface CreateStudyBody {
  label?: string;
  loadCaseId: string;
  pumpAroundId: string;
  latentHeat_kJ_kg: number;
  /** defaults to the pump-around's stored value when it has one */
  liquidHeatCapacity_kJ_kgK?: number;
  /** give one of returnTemperatureDrop_K or circulation_kg_h (else the pump-around's stored one is used) */
  returnTemperatureDrop_K?: number;
  circulation_kg_h?: number;
  /** duty of the pump-around in the base load case; defaults to the pump-around's stored duty */
  baseDuty_kW?: number;
  /**
   * true when the load case's liquid on the zone trays already carries the pump-around circulation (as a
   * rating case does); the base circulation is then taken off before the study. false: the zone liquid is
   * the net internal liquid, as the engine expects. Required, no default: a wrong guess either doubles the
   * circulation or leaves it out, so the caller must say which.
   */
  zoneLiquidIncludesCirculation: boolean;
  sweep: DutySweep;
  /** fraction of the dry-out duty recommended at most; default 0.7 (common practice) */
  margin?: number;
  methods?: MethodOptions;
}

/** Where the study's inputs came from, kept with the snapshot. */
export interface StudySource {
  columnTag: string;
  loadCaseId: string;
  loadCaseName: string;
  pumpAroundId: string;
  pumpAroundName: string;
  request: CreateStudyBody;
}

/** What is stored as the inputs snapshot: the exact engine input and its source. */
export interface StudyInputsSnapshot {
  source: StudySource;
  input: StudyInput;
}

/** One tray at one duty, slimmed: traffic and, per check (in `checkNames` order), percent of limit and status. */
export interface SlimTrayPoint extends Omit<StudyTrayPoint, 'rating'> {
  /** percent of limit per check, rounded to 0.01 %, same order as SlimStudyResult.checkNames */
  percent: number[];
  status: CheckStatus[];
  controllingCheck: CheckName;
}

export interface SlimStudyPoint extends Omit<StudyPoint, 'trays'> {
  trays: SlimTrayPoint[];
}

/** Liquid at which a tray above the zone reaches its minimum crest (Francis), for the limit lines. */
export interface MinimumLiquidLine {
  tray: number;
  minimumLiquid_kg_h: number;
}

/** The stored result: the engine's duties and notes exactly, the sweep points slimmed. */
export interface SlimStudyResult extends Omit<StudyResult, 'points'> {
  checkNames: CheckName[];
  minimumLiquidLines: MinimumLiquidLine[];
  /** the sweep points, in sweep order */
  points: SlimStudyPoint[];
  /** the traffic at the base, limiting and recommended duties (rated like the sweep points) */
  keyPoints: { kind: KeyPointKind; point: SlimStudyPoint }[];
}

export type KeyPointKind = 'base' | 'limiting' | 'recommended';

export interface StudySummary {
  id: string;
  columnId: string;
  label: string;
  pumpAroundName: string;
  loadCaseName: string;
  status: StudyStatus;
  authorId: string;
  authorName: string;
  dryOutDuty_kW: number | null;
  limitingDuty_kW: number | null;
  recommendedDuty_kW: number | null;
  createdAt: string;
  version: number;
}

export interface StudyRecord extends StudySummary {
  columnTag: string;
  inputs: StudyInputsSnapshot;
  result: SlimStudyResult;
  reviewerId: string | null;
  reviewerName: string | null;
  reviewComment: string | null;
  reviews: ReviewEntry[];
  submittedAt: string | null;
  reviewedAt: string | null;
}

/** POST /studies/:id/submit | approve | return (a comment is required to return). */
export interface StudyReviewBody {
  comment?: string;
  version: number;
}

/** POST /studies/latent-heat: λ ≈ condenser duty / overhead vapour, from the engine's estimateLatentHeat. */
export interface LatentHeatBody {
  condenserDuty_kW: number;
  overheadVapour_kg_h: number;
}
export interface LatentHeatAnswer {
  latentHeat_kJ_kg: number;
}
