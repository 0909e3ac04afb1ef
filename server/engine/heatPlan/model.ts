/**
 * The rated column of a heat-recovery plan: each tray's role, its section's prepared geometry, and the
 * constraints the plan watches on every tray whose traffic depends on a duty:
 *   - 'dry-out': the model's liquid or vapour reaches zero (residual −min(L, V), linear in the duties);
 *   - every rating check of the tray (residual = percent of limit − 100). A check that does not apply
 *     because the tray is dry counts as far over its limit (so a minimum-liquid crossing just before the
 *     tray dries is still seen); one that does not apply for another reason (downcomer seal on a tray
 *     whose clearance is below the weir, entrainment past flood) counts as not over.
 * Trays below the lowest draw do not depend on any duty and are not watched (as in the single study).
 */
import { CHECK_NAMES, type CheckName, type TrayLoad, type TrayResult } from '../../../shared/types/rating.js';
import type { HeatPlanInput, PlanCheck, PlanPumpAround } from '../../../shared/types/heatPlan.js';
import type { StudySection, TrayNumbering } from '../../../shared/types/pumpAround.js';
import { prepareSection, rateTrayPrepared, type PreparedSection } from '../index.js';
import { sectionForTray } from '../pumpAround/column.js';
import { PERCENT_CAP } from '../units.js';
import {
  dryResidual,
  dutyState,
  linearDryResidual,
  linearTraffic,
  shiftPlanTray,
  trayRoles,
  type DutyState,
  type LinearTraffic,
  type PlanShiftedTray,
  type TrayRole,
} from './traffic.js';

export const DEFAULT_MARGIN = 0.7;
export const DEFAULT_FRACTIONATION_THRESHOLD = 0.8;

/** Constraint numbers per tray: 0 dry-out, 1..10 the checks in CHECK_NAMES order. */
export const CONSTRAINTS_PER_TRAY = CHECK_NAMES.length + 1;

export function constraintName(c: number): PlanCheck {
  return c === 0 ? 'dry-out' : CHECK_NAMES[c - 1]!;
}

export interface PlanModel {
  input: HeatPlanInput;
  pumpArounds: PlanPumpAround[];
  numbering: TrayNumbering;
  latentHeat_kJ_kg: number;
  margin: number;
  trays: TrayLoad[];
  roles: TrayRole[];
  /** indices (into trays) of the trays whose traffic depends on a duty */
  watched: number[];
  rate: (k: number, load: TrayLoad) => TrayResult;
  linear: LinearTraffic[];
}

export function planModel(input: HeatPlanInput): PlanModel {
  const numbering = input.numbering ?? 'top-down';
  const prepared = new Map<StudySection, PreparedSection>(input.sections.map((s) => [s, prepareSection(s, input.methods)]));
  const sectionOf = input.trays.map((t) => prepared.get(sectionForTray(input.sections, t.tray)!)!);
  const roles = trayRoles(input.trays, input.pumpArounds, numbering, input.propertyDrift);
  return {
    input,
    pumpArounds: input.pumpArounds,
    numbering,
    latentHeat_kJ_kg: input.latentHeat_kJ_kg,
    margin: input.margin ?? DEFAULT_MARGIN,
    trays: input.trays,
    roles,
    watched: roles.flatMap((r, k) => (r.dependsOn.length > 0 ? [k] : [])),
    rate: (k, load) => rateTrayPrepared(sectionOf[k]!, load),
    linear: input.trays.map((t, k) => linearTraffic(t, roles[k]!, input.pumpArounds, input.latentHeat_kJ_kg)),
  };
}

export function statesAt(m: PlanModel, duties_kW: readonly number[]): DutyState[] {
  return m.pumpArounds.map((pa, i) => dutyState(pa, duties_kW[i]!, m.latentHeat_kJ_kg));
}

export function shiftAt(m: PlanModel, k: number, states: readonly DutyState[]): PlanShiftedTray {
  return shiftPlanTray(m.trays[k]!, m.roles[k]!, states);
}

/** Residual of one check (positive = over its limit), given whether the tray is dry. */
export function checkResidual(rating: TrayResult, check: CheckName, dry: boolean): number {
  const c = rating.checks[check];
  if (c.status === 'na') return dry ? PERCENT_CAP - 100 : -100;
  return Number.isNaN(c.percentOfLimit) ? -100 : c.percentOfLimit - 100;
}

/** Residual of constraint c of a shifted, rated tray. */
export function constraintResidual(t: PlanShiftedTray, rating: TrayResult, c: number): number {
  return c === 0 ? dryResidual(t) : checkResidual(rating, CHECK_NAMES[c - 1]!, t.dry);
}

/** Constraints over on one tray: dry-out alone when dry, otherwise each check over its limit. */
export function overConstraints(t: PlanShiftedTray, rating: TrayResult): number[] {
  if (dryResidual(t) > 0) return [0];
  const out: number[] = [];
  for (let c = 1; c < CONSTRAINTS_PER_TRAY; c++) if (constraintResidual(t, rating, c) > 0) out.push(c);
  return out;
}

/**
 * The margin constraint of tray k: its dry-out residual with every duty scaled by 1/margin (from zero
 * duty). In one pump-around this is Q ≤ margin × dry-out duty, the single study's rule.
 */
export function marginResidual(m: PlanModel, k: number, duties_kW: readonly number[], margin: number): number {
  return linearDryResidual(
    m.linear[k]!,
    duties_kW.map((q) => q / margin),
  );
}
