/**
 * Traffic with several pump-arounds at once (issue 17): the single pump-around balance of
 * server/engine/pumpAround/traffic.ts (after Lieberman, A Working Guide to Process Equipment, Ch. 15;
 * constant latent heat per zone, sensible heats neglected, properties held at base-case values) applied
 * to each pump-around and summed. The balance is linear in the condensed vapour, so the shifts add:
 *   V_t = V0_t − Σ_i s_i(t)·Δm_i,  L_t = L0_t − Σ_i s_i(t)·Δm_i + m_i(Q_i) on the trays of zone i,
 * with Δm_i = (Q_i − Q0_i)/λ_i and s_i(t) the single-pump-around fraction (1 above zone i, falling
 * linearly through it, 0 below its draw). Consequences: the overhead condenser duty changes by
 * −Σ(Q_i − Q0_i); below the lowest draw nothing changes; between two zones only the duties of the
 * pump-arounds below matter. Zones must not overlap (checked on input).
 */
import type { TrayLoad } from '../../../shared/types/rating.js';
import type { PlanPumpAround, TrayPropertyDrift } from '../../../shared/types/heatPlan.js';
import type { TrayNumbering } from '../../../shared/types/pumpAround.js';
import { condensedVapour, pumpAroundCirculation, shiftFraction } from '../pumpAround/traffic.js';
import { S_PER_H } from '../units.js';

/** How one tray's traffic depends on the duties. */
export interface TrayRole {
  tray: number;
  /** s_i(t) for each pump-around (input order) */
  fractions: number[];
  /** index of the pump-around whose zone holds the tray, −1 for none */
  zone: number;
  /** indices of the pump-arounds whose duty changes this tray's traffic (ascending) */
  dependsOn: number[];
  /** property drift of the tray (calibration), null when its properties are held at base */
  drift: TrayPropertyDrift | null;
}

/** One pump-around at one duty. */
export interface DutyState {
  duty_kW: number;
  /** Q − Q0 [kW] */
  dutyChange_kW: number;
  /** Δm = (Q − Q0)/λ [kg/h] */
  condensed_kg_h: number;
  circulation_kg_h: number;
  returnTemperatureDrop_K: number;
}

export interface PlanShiftedTray extends TrayLoad {
  /** liquid and vapour before clipping at zero [kg/h] (negative when the model runs the tray dry) */
  rawLiquid_kg_h: number;
  rawVapour_kg_h: number;
  dry: boolean;
}

export function trayRole(
  tray: number,
  pumpArounds: readonly PlanPumpAround[],
  numbering: TrayNumbering,
  drift: TrayPropertyDrift | null = null,
): TrayRole {
  const fractions: number[] = [];
  const dependsOn: number[] = [];
  let zone = -1;
  pumpArounds.forEach((pa, i) => {
    const { region, fraction } = shiftFraction(tray, pa, numbering);
    fractions.push(fraction);
    if (region === 'zone') zone = i;
    if (fraction !== 0 || region === 'zone') dependsOn.push(i);
  });
  return { tray, fractions, zone, dependsOn, drift: dependsOn.length > 0 ? drift : null };
}

export function trayRoles(
  trays: readonly TrayLoad[],
  pumpArounds: readonly PlanPumpAround[],
  numbering: TrayNumbering,
  drift: readonly TrayPropertyDrift[] = [],
): TrayRole[] {
  const byTray = new Map(drift.map((d) => [d.tray, d]));
  return trays.map((t) => trayRole(t.tray, pumpArounds, numbering, byTray.get(t.tray) ?? null));
}

/** The zone latent heat of a pump-around [kJ/kg]. */
export function zoneLatentHeat(pa: PlanPumpAround, latentHeat_kJ_kg: number): number {
  return pa.latentHeat_kJ_kg ?? latentHeat_kJ_kg;
}

export function dutyState(pa: PlanPumpAround, duty_kW: number, latentHeat_kJ_kg: number): DutyState {
  const c = pumpAroundCirculation(pa, duty_kW);
  return {
    duty_kW,
    dutyChange_kW: duty_kW - pa.baseDuty_kW,
    condensed_kg_h: condensedVapour(duty_kW, pa.baseDuty_kW, zoneLatentHeat(pa, latentHeat_kJ_kg)),
    circulation_kg_h: c.circulation_kg_h,
    returnTemperatureDrop_K: c.returnTemperatureDrop_K,
  };
}

/**
 * One tray's traffic with every pump-around at its state. Only the pump-arounds the tray depends on enter
 * the sums, so a tray's result is bit for bit the same whatever the other duties are.
 */
export function shiftPlanTray(load: TrayLoad, role: TrayRole, states: readonly DutyState[]): PlanShiftedTray {
  let shift = 0;
  let circulation = 0;
  for (const i of role.dependsOn) {
    const st = states[i]!;
    shift += role.fractions[i]! * st.condensed_kg_h;
    if (role.zone === i) circulation = st.circulation_kg_h;
  }
  const vapour = load.vapourMassFlow_kg_h - shift;
  const liquid = load.liquidMassFlow_kg_h - shift + circulation;
  // built field by field (one object shape on the hot path)
  const out: PlanShiftedTray = {
    tray: load.tray,
    vapourMassFlow_kg_h: vapour > 0 ? vapour : 0,
    liquidMassFlow_kg_h: liquid > 0 ? liquid : 0,
    vapourDensity_kg_m3: load.vapourDensity_kg_m3,
    liquidDensity_kg_m3: load.liquidDensity_kg_m3,
    surfaceTension_mN_m: load.surfaceTension_mN_m,
    rawLiquid_kg_h: liquid,
    rawVapour_kg_h: vapour,
    dry: role.dependsOn.length > 0 && (liquid <= 0 || vapour <= 0),
  };
  if (load.liquidViscosity_mPa_s !== undefined) out.liquidViscosity_mPa_s = load.liquidViscosity_mPa_s;
  if (load.temperature_C !== undefined) out.temperature_C = load.temperature_C;
  if (load.pressure_kPa !== undefined) out.pressure_kPa = load.pressure_kPa;
  if (role.drift) applyDrift(out, role, states);
  return out;
}

/** Properties moved by the tray's drift: p = p0 + Σ_i g_i·(Q_i − Q0_i) over the duties it depends on. */
function applyDrift(out: TrayLoad, role: TrayRole, states: readonly DutyState[]): void {
  const d = role.drift!;
  const mu = d.liquidViscosity_mPa_s_per_kW;
  for (const i of role.dependsOn) {
    const dq = states[i]!.dutyChange_kW;
    out.vapourDensity_kg_m3 += d.vapourDensity_kg_m3_per_kW[i]! * dq;
    out.liquidDensity_kg_m3 += d.liquidDensity_kg_m3_per_kW[i]! * dq;
    out.surfaceTension_mN_m += d.surfaceTension_mN_m_per_kW[i]! * dq;
    if (mu && out.liquidViscosity_mPa_s !== undefined) out.liquidViscosity_mPa_s += mu[i]! * dq;
  }
}

export interface PlanTraffic {
  duties_kW: number[];
  /** −Σ(Q_i − Q0_i) [kW] */
  condenserDutyChange_kW: number;
  states: DutyState[];
  trays: PlanShiftedTray[];
}

/** Every tray's traffic at the given duties (input order). */
export function shiftPlanTraffic(
  base: readonly TrayLoad[],
  pumpArounds: readonly PlanPumpAround[],
  duties_kW: readonly number[],
  latentHeat_kJ_kg: number,
  numbering: TrayNumbering = 'top-down',
  drift: readonly TrayPropertyDrift[] = [],
): PlanTraffic {
  const states = pumpArounds.map((pa, i) => dutyState(pa, duties_kW[i]!, latentHeat_kJ_kg));
  const roles = trayRoles(base, pumpArounds, numbering, drift);
  return {
    duties_kW: [...duties_kW],
    condenserDutyChange_kW: condenserDutyChange(pumpArounds, duties_kW),
    states,
    trays: base.map((load, k) => shiftPlanTray(load, roles[k]!, states)),
  };
}

/** Change of the overhead condenser duty from the base case: −Σ(Q_i − Q0_i) [kW]. */
export function condenserDutyChange(pumpArounds: readonly PlanPumpAround[], duties_kW: readonly number[]): number {
  let sum = 0;
  pumpArounds.forEach((pa, i) => (sum += duties_kW[i]! - pa.baseDuty_kW));
  return -sum;
}

/** −min(liquid, vapour) before clipping [kg/h]: positive when the tray has run dry. */
export function dryResidual(t: Pick<PlanShiftedTray, 'rawLiquid_kg_h' | 'rawVapour_kg_h'>): number {
  return -Math.min(t.rawLiquid_kg_h, t.rawVapour_kg_h);
}

/** A tray's liquid and vapour (before clipping) as linear functions of the duties: x = x0 + Σ_i x_i·Q_i. */
export interface LinearTraffic {
  liquid0: number;
  liquidPerDuty: number[];
  vapour0: number;
  vapourPerDuty: number[];
}

/**
 * The same balance as shiftPlanTray written out as its coefficients [kg/h per kW]: −s_i·3600/λ_i for
 * both flows, plus 3600/(c_p ΔT) on the liquid of a zone with a fixed ΔT (its circulation grows with the
 * duty) or the fixed circulation in liquid0. Used for the margin constraint, which scales the duties.
 */
export function linearTraffic(
  load: TrayLoad,
  role: TrayRole,
  pumpArounds: readonly PlanPumpAround[],
  latentHeat_kJ_kg: number,
): LinearTraffic {
  let l0 = load.liquidMassFlow_kg_h;
  let v0 = load.vapourMassFlow_kg_h;
  const lq: number[] = [];
  const vq: number[] = [];
  pumpArounds.forEach((pa, i) => {
    const per = (role.fractions[i]! * S_PER_H) / zoneLatentHeat(pa, latentHeat_kJ_kg);
    l0 += per * pa.baseDuty_kW;
    v0 += per * pa.baseDuty_kW;
    let lc = -per;
    if (role.zone === i) {
      if (pa.circulation_kg_h !== undefined) l0 += pa.circulation_kg_h;
      else if (pa.returnTemperatureDrop_K) lc += S_PER_H / (pa.liquidHeatCapacity_kJ_kgK * pa.returnTemperatureDrop_K);
    }
    lq.push(lc);
    vq.push(-per);
  });
  return { liquid0: l0, liquidPerDuty: lq, vapour0: v0, vapourPerDuty: vq };
}

/** −min(liquid, vapour) of a linear tray at the given duties [kg/h]: positive when dry. */
export function linearDryResidual(t: LinearTraffic, duties_kW: readonly number[]): number {
  let l = t.liquid0;
  let v = t.vapour0;
  for (let i = 0; i < duties_kW.length; i++) {
    l += t.liquidPerDuty[i]! * duties_kW[i]!;
    v += t.vapourPerDuty[i]! * duties_kW[i]!;
  }
  return -Math.min(l, v);
}
