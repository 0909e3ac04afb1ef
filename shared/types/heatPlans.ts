/**
 * Stored heat-recovery plans (issue 17): request bodies and answers of /columns/:id/heat-plans and
 * /heat-plans/:id, shared by the server and the client. SI units; the unit is part of each field name.
 * The engine's own payloads are in shared/types/heatPlan.ts; the store keeps them by field name.
 */
import type { CheckName, CheckStatus, MethodOptions } from './rating.js';
import type { DutySweep } from './pumpAround.js';
import type { BoundaryPoint, HeatPlanInput, HeatPlanResult, PlanPoint, PlanSuggestion } from './heatPlan.js';
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
  /** heat counts as useful above this temperature [°C] (what the preheat train can take) */
  usefulAboveTemperature_C: number;
  /** fraction of the dry-out duty kept as margin; default 0.7 (common practice) */
  margin?: number;
  /** a section's liquid-to-vapour ratio is flagged below this fraction of the base case's; default 0.8 */
  liquidToVapourThreshold?: number;
  /** overhead condenser duty of the base case [kW], to show the duty left; optional */
  baseCondenserDuty_kW?: number;
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

/** What is stored as the inputs snapshot: the exact engine input and its source. */
export interface HeatPlanInputsSnapshot {
  source: HeatPlanSource;
  input: HeatPlanInput;
}

/** One tray at one duty point, stored: traffic and, per check (in `checkNames` order), percent of limit and status. */
export interface SlimPlanTray {
  tray: number;
  vapourMassFlow_kg_h: number;
  liquidMassFlow_kg_h: number;
  dry: boolean;
  percent: number[];
  status: CheckStatus[];
  controllingCheck: CheckName;
}

/** A point of the duty grid for the map: the engine's point without its trays, plus the worst tray. */
export interface PlanGridPoint extends Omit<PlanPoint, 'trays'> {
  /** highest percent of limit over every tray and check */
  worstPercent: number;
  worstTray: number | null;
  worstCheck: CheckName | null;
}

export interface SlimPlanPoint extends PlanGridPoint {
  trays: SlimPlanTray[];
}

export type PlanKeyKind = 'base' | 'suggestion';

/** Model against simulation, tray by tray, and the fit's quality (from the engine's calibration). */
export interface PlanCalibrationView {
  /** one line stating the fit quality, for pages and the report */
  summary: string;
  /** the fitted values by name (latent heat per zone, property drift) */
  fitted: { name: string; value: number; unit: string }[];
  rmsRelative: number | null;
  cases: {
    loadCaseId: string;
    name: string;
    duties_kW: number[];
    trays: { tray: number; modelVapour_kg_h: number; simVapour_kg_h: number; modelLiquid_kg_h: number; simLiquid_kg_h: number }[];
  }[];
}

/** The stored result: the engine's result by field name with grid points summarised (their trays are stored apart). */
export interface StoredHeatPlanResult extends Omit<HeatPlanResult, 'points'> {
  checkNames: CheckName[];
  /** duties of each axis, in the input's pump-around order */
  axes: number[][];
  grid: PlanGridPoint[];
  keyPoints: { kind: PlanKeyKind; point: SlimPlanPoint }[];
  calibration: PlanCalibrationView | null;
  /** the correlations the ratings used (method ids), for the methods and sources of the report */
  methodIds: string[];
}

export type { BoundaryPoint, PlanSuggestion };

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
  result: StoredHeatPlanResult;
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
