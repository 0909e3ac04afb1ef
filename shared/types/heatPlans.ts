/**
 * Stored heat-recovery plans (issue 17): payload types of /columns/:id/heat-plans and /heat-plans/:id, defined
 * once by their contract (shared/contract/heatPlans.ts) and re-exported here for the client and services.
 * The engine's own payloads are in shared/types/heatPlan.ts.
 */
export type {
  CreateHeatPlanBody,
  HeatPlanInputsSnapshot,
  HeatPlanPumpAroundChoice,
  HeatPlanRecord,
  HeatPlanReviewBody,
  HeatPlanSource,
  HeatPlanSummary,
  LoadCaseDutyTags,
  PlanCalibrationView,
  PlanGridPoint,
  PlanKeyKind,
  PutPumpAroundDutiesBody,
  SlimPlanPoint,
  SlimPlanTray,
  StoredHeatPlanResult,
} from '../contract/heatPlans.js';
export type { BoundaryPoint, PlanSuggestion } from './heatPlan.js';
export type { ReviewStatus as HeatPlanStatus } from './runs.js';
