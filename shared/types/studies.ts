/**
 * Stored pump-around duty studies (issue 5): payload types of /columns/:id/studies and /studies/:id, defined
 * once by their contract (shared/contract/studies.ts) and re-exported here for the client and services.
 * The engine's own payloads are in shared/types/pumpAround.ts.
 */
import type { ReviewStatus } from './runs.js';

export type {
  CreateStudyBody,
  KeyPointKind,
  LatentHeatAnswer,
  LatentHeatBody,
  MinimumLiquidLine,
  SlimStudyPoint,
  SlimStudyResult,
  SlimTrayPoint,
  StudyInputsSnapshot,
  StudyRecord,
  StudyReviewBody,
  StudySource,
  StudySummary,
} from '../contract/studies.js';

/** Review status, the same life cycle as a rating run (shared/types/runs.ts): approved is read-only. */
export type StudyStatus = ReviewStatus;
