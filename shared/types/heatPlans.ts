/**
 * Stored heat-recovery plans (issue 17): request bodies and answers of /columns/:id/heat-plans and
 * /heat-plans/:id, shared by the server and the client. SI units; the unit is part of each field name.
 * The engine's own payloads are in shared/types/heatPlan.ts.
 */
import type { CheckName, CheckStatus, MethodOptions } from './rating.js';
import type { DutySweep } from './pumpAround.js';
import type { ReviewEntry, ReviewStatus } from './runs.js';

export type HeatPlanStatus = ReviewStatus;

/** One chosen pump-around of a plan, with its duty range and heat level. */
export interface HeatPlanPumpAroundChoice {
  pumpAroundId: string;
  sweep: DutySweep;
  liquidHeatCapacity_kJ_kgK: number;
  /** give one of returnTemperatureDrop_K or circulation_kg_h */
  returnTemperatureDrop_K?: number;
  circulation_kg_h?: number;
  /** draw temperature [°C]; when absent, the base load case's temperature on the draw tray */
  drawTemperature_C?: number;
  /** duty in the base load case; defaults to the pump-around's stored duty */
  baseDuty_kW?: number;
}

/** POST /columns/:id/heat-plans */
export interface CreateHeatPlanBody {
  label?: string;
  /** base load case (traffic at the base duties) */
  loadCaseId: string;
  /** two or three of the column's pump-arounds, in the order of the map's axes */
  pumpArounds: HeatPlanPumpAroundChoice[];
  latentHeat_kJ_kg: number;
  /** heat is counted as useful above this temperature [°C] (what the preheat train can take) */
  usefulAboveTemperature_C: number;
  /** fraction of the dry-out duty kept as margin; default 0.7 (common practice) */
  margin?: number;
  /** liquid-to-vapour ratio per section flagged below this fraction of the base case's; default 0.8 */
  liquidToVapourThreshold?: number;
  /** two or more load cases tagged with these pump-arounds' duties (simulation cases) for the calibration fit */
  simulationCaseIds?: string[];
  /** true when the base case's zone liquid carries the circulation (as a rating case does) */
  zoneLiquidIncludesCirculation?: boolean;
  methods?: MethodOptions;
}

/** Where the plan's inputs came from, kept with the snapshot. */
export interface HeatPlanSource {
  columnTag: string;
  loadCaseId: string;
  loadCaseName: string;
  pumpArounds: { id: string; name: string; drawTray: number; returnTray: number }[];
  simulationCases: { id: string; name: string; duties_kW: number[] }[];
  request: CreateHeatPlanBody;
}

/** What is stored as the inputs snapshot: the exact engine input (opaque here) and its source. */
export interface HeatPlanInputsSnapshot {
  source: HeatPlanSource;
  input: unknown;
}

/** One tray at one duty point: traffic and, per check (in `checkNames` order), percent of limit and status. */
export interface PlanTrayPoint {
  tray: number;
  vapourMassFlow_kg_h: number;
  liquidMassFlow_kg_h: number;
  dry: boolean;
  percent: number[];
  status: CheckStatus[];
  controllingCheck: CheckName;
}

/** One point of the duty grid (or a key point), summarised for the map. */
export interface PlanPointSummary {
  duties_kW: number[];
  condenserDutyChange_kW: number;
  recoveredHeat_kW: number;
  recoveredAboveTemperature_kW: number;
  /** no tray dry and no monitored check over its limit */
  feasible: boolean;
  /** highest percent of limit over all trays and checks, with where */
  worstPercent: number;
  worstTray: number | null;
  worstCheck: CheckName | null;
  dryTrays: number[];
}

export interface PlanPoint extends PlanPointSummary {
  trays: PlanTrayPoint[];
}

/** A point on the edge of the feasible region: the tray and the check (or 'dry-out') that bounds it there. */
export interface PlanBoundaryPoint {
  duties_kW: number[];
  tray: number;
  check: string;
}

export interface PlanSuggestion {
  duties_kW: number[];
  recoveredHeat_kW: number;
  recoveredAboveTemperature_kW: number;
  condenserDutyChange_kW: number;
}

/** Fractionation signal: liquid-to-vapour ratio of a section at a point against the base case. */
export interface PlanSectionLV {
  section: string;
  base: number;
  atPoint: number;
  /** atPoint / base below the threshold */
  flagged: boolean;
}

/** Model against one simulation case, tray by tray, and the fit's quality. */
export interface PlanCalibration {
  cases: {
    loadCaseId: string;
    name: string;
    duties_kW: number[];
    trays: {
      tray: number;
      modelVapour_kg_h: number;
      simVapour_kg_h: number;
      modelLiquid_kg_h: number;
      simLiquid_kg_h: number;
    }[];
  }[];
  /** root-mean-square relative difference of traffic, model against simulation, after the fit */
  rmsRelative: number;
  maxRelative: number;
  fittedLatentHeat_kJ_kg: number[];
  summary: string;
}

export type PlanKeyKind = 'base' | 'suggestion';

/** The stored result; grid trays are kept per point and served one point at a time. */
export interface StoredHeatPlanResult {
  checkNames: CheckName[];
  pumpAroundNames: string[];
  /** the duties of each axis, in the input's pump-around order */
  axes: number[][];
  grid: PlanPointSummary[];
  gridTrays: PlanTrayPoint[][];
  boundary: PlanBoundaryPoint[];
  suggestion: PlanSuggestion | null;
  marginSensitivity: { margin: number; suggestion: PlanSuggestion | null }[];
  keyPoints: { kind: PlanKeyKind; point: PlanPoint }[];
  heatLevels: { name: string; drawTemperature_C: number; returnTemperature_C: number }[];
  sectionLV: PlanSectionLV[];
  calibration: PlanCalibration | null;
  margin: number;
  usefulAboveTemperature_C: number;
  notes: string[];
}

/** The plan as the page reads it: the grid without per-tray detail (GET /heat-plans/:id/points/:index). */
export type HeatPlanResultView = Omit<StoredHeatPlanResult, 'gridTrays'>;

export interface HeatPlanSummary {
  id: string;
  columnId: string;
  label: string;
  pumpAroundNames: string[];
  loadCaseName: string;
  status: HeatPlanStatus;
  authorId: string;
  authorName: string;
  suggestedDuties_kW: number[] | null;
  recoveredAbove_kW: number | null;
  createdAt: string;
  version: number;
}

export interface HeatPlanRecord extends HeatPlanSummary {
  columnTag: string;
  inputs: HeatPlanInputsSnapshot;
  result: HeatPlanResultView;
  reviewerId: string | null;
  reviewerName: string | null;
  reviewComment: string | null;
  reviews: ReviewEntry[];
  submittedAt: string | null;
  reviewedAt: string | null;
}

/** POST /heat-plans/:id/submit | approve | return (a comment is required to return). */
export interface HeatPlanReviewBody {
  comment?: string;
  version: number;
}
