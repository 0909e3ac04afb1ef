/**
 * Pump-around duty study payloads (issue 5), shared by the engine, the CLI, the API and the client.
 * SI units throughout; the unit is part of each field name. Trays are numbered as the input says
 * (`numbering`, top-down by default); every tray number in the result uses the input's numbering.
 */
import type {
  dutySweepSchema,
  pumpAroundSpecSchema,
  pumpAroundStudySchema,
  studySectionSchema,
} from '../schemas/pumpAroundStudy.js';
import type { JsonPayload as Input } from './jsonPayload.js';
import type { CheckName, TrayResult } from './rating.js';

/*
 * Study input types are derived from their JSON schemas (shared/schemas/pumpAroundStudy.ts), where each field
 * is declared once with its bounds and description. Defaulted fields (margin, methods, numbering) stay
 * optional: the engine applies the same defaults to inputs built in code.
 */

/** A column section: the rating geometry plus its name and tray range (inclusive, either order). */
export type StudySection = Input<typeof studySectionSchema>;
/** The pump-around varied by the study: exactly one of returnTemperatureDrop_K or circulation_kg_h. */
export type PumpAroundSpec = Input<typeof pumpAroundSpecSchema>;
export type DutySweep = Input<typeof dutySweepSchema>;
export type StudyInput = Input<typeof pumpAroundStudySchema>;
export type TrayNumbering = NonNullable<StudyInput['numbering']>;

/** One tray at one duty: the shifted traffic and its full rating. */
export interface StudyTrayPoint {
  tray: number;
  vapourMassFlow_kg_h: number;
  liquidMassFlow_kg_h: number;
  /** 'above' the zone, in the pump-around 'zone' (return..draw), or 'below' the draw */
  region: 'above' | 'zone' | 'below';
  /** true when the model's liquid (or vapour) went below zero and was clipped to zero */
  dry: boolean;
  /** full rating; below the draw the traffic never changes, so one rating object is shared by all points */
  rating: TrayResult;
}

export interface StudyPoint {
  duty_kW: number;
  /** change of the overhead condenser duty from the base case = −(Q − Q0) [kW] */
  condenserDutyChange_kW: number;
  /** internal reflux: liquid leaving the topmost tray of the load case [kg/h]; falls by Δm */
  reflux_kg_h: number;
  /** heat moved from the overhead condenser into the pump-around, relative to the base case = Q − Q0 [kW] */
  heatRecovered_kW: number;
  /** lowest L/V (mass) over the trays above the zone: a sign of lost fractionation */
  liquidToVapourAboveZone: number;
  circulation_kg_h: number;
  returnTemperatureDrop_K: number;
  /** trays whose liquid (or vapour) was clipped at zero */
  dryTrays: number[];
  trays: StudyTrayPoint[];
}

/** The check that limits: a rating check name, or 'dryOut' when the liquid itself reaches zero. */
export type StudyLimit = CheckName | 'dryOut';

export interface StudyResult {
  pumpAround: string;
  baseDuty_kW: number;
  /** duty at which the first tray above the zone has no liquid left; null if none */
  dryOutDuty_kW: number | null;
  dryOutTray: number | null;
  /** duty at which the first tray above the zone goes below its minimum liquid load or starts to weep */
  minimumLiquidDuty_kW: number | null;
  minimumLiquidTray: number | null;
  minimumLiquidCheck: CheckName | null;
  /** duty at which the first zone tray reaches a flood, downcomer or weir loading limit */
  zoneOverloadDuty_kW: number | null;
  zoneOverloadTray: number | null;
  zoneOverloadCheck: CheckName | null;
  /** the lowest of the three duties above */
  limitingDuty_kW: number | null;
  limitingTray: number | null;
  limitingCheck: StudyLimit | null;
  /** lower of margin × dry-out duty and the highest duty with no monitored check over its limit */
  recommendedDuty_kW: number | null;
  margin: number;
  notes: string[];
  points: StudyPoint[];
}

export type StudyValidation = { ok: true; value: StudyInput } | { ok: false; errors: { path: string; message: string }[] };
