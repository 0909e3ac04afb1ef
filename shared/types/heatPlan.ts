/**
 * Heat-recovery plan payloads (issue 17): several pump-arounds varied together over a duty grid, shared by
 * the engine (server/engine/heatPlan/), the CLI, the API and the client. SI units; the unit is part of
 * each field name. Duties are always listed in the input's pump-around order.
 */
import type { heatPlanSchema, planPumpAroundSchema, simulationCaseSchema, trayPropertyDriftSchema } from '../schemas/heatPlan.js';
import type { JsonPayload as Input } from './jsonPayload.js';
import type { CheckName, TrayLoad, TrayResult } from './rating.js';

/*
 * Plan input types are derived from their JSON schemas (shared/schemas/heatPlan.ts), where each field is
 * declared once with its bounds and description. Defaulted fields (numbering, margin, methods,
 * fractionationThreshold) stay optional: the engine applies the same defaults to inputs built in code.
 */

/** A pump-around of the plan: the study's pump-around plus its draw temperature and its duty sweep. */
export type PlanPumpAround = Input<typeof planPumpAroundSchema>;
export type HeatPlanInput = Input<typeof heatPlanSchema>;
/** Property drift of one tray per kW of each pump-around's duty change (trayPropertyDriftSchema). */
export type TrayPropertyDrift = Input<typeof trayPropertyDriftSchema>;
/** A simulation case tagged with its pump-around duties (input order), every tray of the base case. */
export type SimulationCase = Input<typeof simulationCaseSchema>;

/** The constraint a boundary point is named by: a rating check, or 'dry-out' (no liquid or vapour left). */
export type PlanCheck = CheckName | 'dry-out';

export interface PlanTrayPoint {
  tray: number;
  vapourMassFlow_kg_h: number;
  liquidMassFlow_kg_h: number;
  /** the model's liquid (or vapour) went to zero or below on a tray whose traffic depends on a duty */
  dry: boolean;
  /** full rating; trays whose traffic does not depend on a duty share one rating object */
  rating: TrayResult;
}

/** The heat of one pump-around at one duty. */
export interface PumpAroundHeat {
  name: string;
  duty_kW: number;
  circulation_kg_h: number;
  drawTemperature_C: number;
  returnTemperature_C: number;
  /** the part of the duty released above usefulAboveTemperature_C [kW] */
  aboveTemperature_kW: number;
}

/** Fractionation signal of one section: its L/V (mass, trays outside the pump-around zones) against base. */
export interface SectionFractionation {
  section: string;
  liquidToVapour: number | null;
  baseLiquidToVapour: number | null;
  /** liquidToVapour / baseLiquidToVapour */
  ratioToBase: number | null;
  flagged: boolean;
}

/** A watched limit that is over at a point. */
export interface PlanViolation {
  tray: number;
  check: PlanCheck;
}

/** Which loads a point was rated on (plans run with simulation cases): the model, one case, or two cases. */
export interface PointLoadsSource {
  source: 'case' | 'interpolated' | 'model';
  /** the case(s) used, by name */
  cases: string[];
  /** position between the two bracketing cases (0 = first, 1 = second), interpolated only */
  fraction: number | null;
}

export interface PlanPoint {
  duties_kW: number[];
  /** change of the overhead condenser duty from the base case = −Σ(Q − Q0) [kW] */
  condenserDutyChange_kW: number;
  /** total pump-around duty = Σ Q [kW] */
  recoveredHeat_kW: number;
  recoveredAboveTemperature_kW: number;
  /** no tray dry and no watched check over its limit */
  feasible: boolean;
  /** the duties scaled together by 1/margin leave no tray dry */
  withinMargin: boolean;
  violations: PlanViolation[];
  heat: PumpAroundHeat[];
  fractionation: SectionFractionation[];
  trays: PlanTrayPoint[];
  /** present when the plan ran with simulation cases: where this point's loads came from */
  loads?: PointLoadsSource;
}

export interface BoundaryPoint {
  duties_kW: number[];
  tray: number;
  check: PlanCheck;
  /** index (input order) of the pump-around whose duty was varied to find the point */
  along: number;
  /** true when the feasible side lies at the lower duty along that line */
  feasibleBelow: boolean;
}

export interface PlanSuggestion {
  duties_kW: number[];
  recoveredHeat_kW: number;
  recoveredAboveTemperature_kW: number;
  condenserDutyChange_kW: number;
  margin: number;
  /** the constraint the suggestion lies on, when it is on a boundary (not a grid point or the sweep's end) */
  limitedBy: (PlanViolation & { margin: boolean }) | null;
}

export interface HeatPlanResult {
  pumpArounds: string[];
  baseDuties_kW: number[];
  margin: number;
  usefulAboveTemperature_C: number;
  /** lexicographic over the sweeps, the first pump-around's duty varying slowest */
  points: PlanPoint[];
  /** exact feasibility boundary on the grid lines */
  boundary: BoundaryPoint[];
  suggestion: PlanSuggestion | null;
  /** the suggestion at other margins (the chosen margin included) */
  marginSensitivity: { margin: number; suggestion: PlanSuggestion | null }[];
  notes: string[];
}

export type HeatPlanValidation = { ok: true; value: HeatPlanInput } | { ok: false; errors: { path: string; message: string }[] };

export interface ZoneFit {
  pumpAround: string;
  /** latent heat the plan had */
  given_kJ_kg: number;
  /** fitted latent heat of the zone; null when the cases do not vary this duty (the given value is kept) */
  fitted_kJ_kg: number | null;
}

/** Model against simulation on one tray of one case. */
export interface TrayComparison {
  tray: number;
  simulatedVapour_kg_h: number;
  modelVapour_kg_h: number;
  simulatedLiquid_kg_h: number;
  modelLiquid_kg_h: number;
  /** percent of limit per check, rated on the simulated loads and on the model's */
  simulatedPercent: Partial<Record<CheckName, number>>;
  modelPercent: Partial<Record<CheckName, number>>;
}

export interface CaseComparison {
  name: string;
  duties_kW: number[];
  trays: TrayComparison[];
}

export interface FitQuality {
  cases: number;
  /** tray flows compared (vapour and liquid of each tray whose traffic depends on a duty, per case) */
  flows: number;
  rmsResidual_kg_h: number;
  /** RMS residual as percent of the mean simulated flow */
  rmsResidual_percent: number;
  /** share of the simulated traffic change that the model explains (1 − SS_res/SS_shift) */
  rSquared: number | null;
  worstFlow: { tray: number; case: string; flow: 'vapour' | 'liquid'; residual_kg_h: number } | null;
  worstRating: { tray: number; case: string; check: CheckName; difference_percent: number } | null;
}

export interface CalibrationResult {
  zones: ZoneFit[];
  drift: TrayPropertyDrift[];
  fit: FitQuality;
  comparisons: CaseComparison[];
  /** the plan input with the fitted latent heats and drift: run it to plan on the calibrated model */
  calibratedInput: HeatPlanInput;
  notes: string[];
}

/** The loads at some duties and where they came from: a simulated case, two bracketing cases, or the model. */
export interface CalibratedLoads extends PointLoadsSource {
  trays: TrayLoad[];
}
