/**
 * Pump-around duty study payloads (issue 5), shared by the engine, the CLI, the API and the client.
 * SI units throughout; the unit is part of each field name. Trays are numbered as the input says
 * (`numbering`, top-down by default); every tray number in the result uses the input's numbering.
 */
import type { CheckName, MethodOptions, SectionGeometry, TrayLoad, TrayResult } from './rating.js';

export type TrayNumbering = 'top-down' | 'bottom-up';

/** A column section: the rating geometry plus its name and tray range (inclusive, either order). */
export interface StudySection extends SectionGeometry {
  name: string;
  fromTray: number;
  toTray: number;
}

/**
 * The pump-around varied by the study. Give exactly one of `returnTemperatureDrop_K` (circulation then
 * follows the duty, m = Q/(c_p ΔT)) or `circulation_kg_h` (ΔT then follows the duty).
 */
export interface PumpAroundSpec {
  name: string;
  /** tray the pump-around liquid is drawn from (the bottom of the zone) */
  drawTray: number;
  /** tray the cooled liquid is returned to (the top of the zone, above the draw) */
  returnTray: number;
  /** duty of the base load case [kW] */
  baseDuty_kW: number;
  liquidHeatCapacity_kJ_kgK: number;
  returnTemperatureDrop_K?: number;
  circulation_kg_h?: number;
}

export interface DutySweep {
  fromDuty_kW: number;
  toDuty_kW: number;
  /** number of intervals; the sweep has steps + 1 points */
  steps: number;
}

export interface StudyInput {
  sections: StudySection[];
  /**
   * Base load case at the base duty: vapour entering each tray from below, liquid leaving it. In the
   * pump-around zone the liquid is the net internal liquid, without the pump-around circulation (the
   * pump-around modelled as a side cooler, as a simulator's per-stage export gives it).
   */
  trays: TrayLoad[];
  pumpAround: PumpAroundSpec;
  /** latent heat of the vapour condensed by the extra duty [kJ/kg]; see estimateLatentHeat */
  latentHeat_kJ_kg: number;
  /** fraction of the dry-out duty recommended at most (default 0.7, common practice) */
  margin?: number;
  sweep: DutySweep;
  methods?: MethodOptions;
  numbering?: TrayNumbering;
}

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
