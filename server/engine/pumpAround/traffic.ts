/**
 * Pump-around traffic model (issue 5): how the tray loads of a base case shift when the duty of one
 * pump-around changes from Q0 to Q, with vapour and liquid properties held at their base-case values.
 *
 * Balance derived here (after Lieberman, A Working Guide to Process Equipment, Ch. 15); constant latent
 * heat λ, sensible heats of the column streams neglected.
 *
 * Conventions: on each tray the vapour is the vapour entering it from below and the liquid the liquid
 * leaving it (the usual convention of tray rating). Positions are counted top-down; a bottom-up
 * column is handled by mirroring the position (p = −tray), so tray numbers are never rewritten.
 *
 * The extra duty condenses Δm = (Q − Q0)/λ more vapour. The net upward flow across every cut between
 * trays (vapour up minus net liquid down = products taken above the cut) does not depend on the duty,
 * so vapour and net liquid shift by the same amount s·Δm:
 *   - above the zone (above the return tray R): s = 1, so both fall by Δm on every tray; the reflux
 *     falls by Δm and the overhead condenser duty by exactly Q − Q0;
 *   - in the zone (R..D, k = |D − R| + 1 trays): our choice is to spread the extra condensation evenly,
 *     Δm/k on each zone tray; then on the tray j places below R (j = 0..k−1) s = (k − 1 − j)/k,
 *     so the shift falls linearly from (k−1)/k·Δm on the return tray to 0 on the draw tray; the liquid
 *     of every zone tray also carries the circulation m = Q/(c_p ΔT) (fixed ΔT) or the fixed
 *     circulation (ΔT = Q/(m c_p) then follows the duty);
 *   - below the draw tray D: s = 0, unchanged.
 * Flows never go negative: a flow that would is clipped to zero and its tray reported dry.
 */
import type { TrayLoad } from '../../../shared/types/rating.js';
import type { PumpAroundSpec, TrayNumbering } from '../../../shared/types/pumpAround.js';
import { S_PER_H } from '../units.js';

export type TrayRegion = 'above' | 'zone' | 'below';

export interface ShiftedTray extends TrayLoad {
  region: TrayRegion;
  /** liquid or vapour clipped at zero */
  dry: boolean;
}

export interface TrafficShift {
  duty_kW: number;
  /** extra vapour condensed relative to the base case, Δm = (Q − Q0)/λ [kg/h] (negative below Q0) */
  condensed_kg_h: number;
  circulation_kg_h: number;
  returnTemperatureDrop_K: number;
  trays: ShiftedTray[];
}

/** Top-down position of a tray: the tray number itself, mirrored for bottom-up numbering. */
export function topDownPosition(tray: number, numbering: TrayNumbering = 'top-down'): number {
  return numbering === 'bottom-up' ? -tray : tray;
}

/** Where a tray sits relative to the pump-around zone, and the fraction s of Δm its traffic loses. */
export function shiftFraction(
  tray: number,
  pumpAround: Pick<PumpAroundSpec, 'drawTray' | 'returnTray'>,
  numbering: TrayNumbering = 'top-down',
): { region: TrayRegion; fraction: number } {
  const p = topDownPosition(tray, numbering);
  const pR = topDownPosition(pumpAround.returnTray, numbering);
  const pD = topDownPosition(pumpAround.drawTray, numbering);
  if (p < pR) return { region: 'above', fraction: 1 };
  if (p > pD) return { region: 'below', fraction: 0 };
  const k = pD - pR + 1;
  return { region: 'zone', fraction: (pD - p) / k };
}

/**
 * Pump-around circulation and return temperature drop at a duty.
 * Q = m c_p ΔT (sensible-heat balance); Q [kW], c_p [kJ/(kg·K)], m [kg/h], ΔT [K].
 * Example: 6000 kW, c_p 2.6, ΔT 80 K → 6000/(2.6·80) = 28.85 kg/s = 103 846 kg/h.
 */
export function pumpAroundCirculation(
  pumpAround: Pick<PumpAroundSpec, 'liquidHeatCapacity_kJ_kgK' | 'returnTemperatureDrop_K' | 'circulation_kg_h'>,
  duty_kW: number,
): { circulation_kg_h: number; returnTemperatureDrop_K: number } {
  const cp = pumpAround.liquidHeatCapacity_kJ_kgK;
  if (pumpAround.circulation_kg_h !== undefined) {
    const m = pumpAround.circulation_kg_h;
    return { circulation_kg_h: m, returnTemperatureDrop_K: m > 0 ? (duty_kW * S_PER_H) / (m * cp) : 0 };
  }
  const dT = pumpAround.returnTemperatureDrop_K ?? 0;
  return { circulation_kg_h: dT > 0 ? (duty_kW * S_PER_H) / (cp * dT) : 0, returnTemperatureDrop_K: dT };
}

/** Extra vapour condensed by a duty change, Δm = (Q − Q0)/λ [kg/h]. */
export function condensedVapour(duty_kW: number, baseDuty_kW: number, latentHeat_kJ_kg: number): number {
  return ((duty_kW - baseDuty_kW) * S_PER_H) / latentHeat_kJ_kg;
}

/** One tray's shifted traffic, given Δm [kg/h] and the circulation [kg/h] at the duty. */
export function shiftTray(
  load: TrayLoad,
  pumpAround: Pick<PumpAroundSpec, 'drawTray' | 'returnTray'>,
  condensed_kg_h: number,
  circulation_kg_h: number,
  numbering: TrayNumbering = 'top-down',
): ShiftedTray {
  const { region, fraction } = shiftFraction(load.tray, pumpAround, numbering);
  const vapour = load.vapourMassFlow_kg_h - fraction * condensed_kg_h;
  const liquid = load.liquidMassFlow_kg_h - fraction * condensed_kg_h + (region === 'zone' ? circulation_kg_h : 0);
  // built field by field (not by spreading) so every shifted tray has one shape: this is the hot path
  const out: ShiftedTray = {
    tray: load.tray,
    vapourMassFlow_kg_h: vapour > 0 ? vapour : 0,
    liquidMassFlow_kg_h: liquid > 0 ? liquid : 0,
    vapourDensity_kg_m3: load.vapourDensity_kg_m3,
    liquidDensity_kg_m3: load.liquidDensity_kg_m3,
    surfaceTension_mN_m: load.surfaceTension_mN_m,
    region,
    dry: region !== 'below' && (liquid <= 0 || vapour <= 0),
  };
  if (load.liquidViscosity_mPa_s !== undefined) out.liquidViscosity_mPa_s = load.liquidViscosity_mPa_s;
  if (load.temperature_C !== undefined) out.temperature_C = load.temperature_C;
  if (load.pressure_kPa !== undefined) out.pressure_kPa = load.pressure_kPa;
  return out;
}

/** The shifted traffic of every tray at duty Q, with region and dry flags. */
export function shiftTraffic(
  base: readonly TrayLoad[],
  pumpAround: PumpAroundSpec,
  duty_kW: number,
  latentHeat_kJ_kg: number,
  numbering: TrayNumbering = 'top-down',
): TrafficShift {
  const dm = condensedVapour(duty_kW, pumpAround.baseDuty_kW, latentHeat_kJ_kg);
  const circ = pumpAroundCirculation(pumpAround, duty_kW);
  const trays = base.map((load) => shiftTray(load, pumpAround, dm, circ.circulation_kg_h, numbering));
  return { duty_kW, condensed_kg_h: dm, ...circ, trays };
}

/** Shifted tray loads at duty Q (the rating engine's TrayLoad, same tray numbers as the base case). */
export function shiftLoads(
  base: readonly TrayLoad[],
  pumpAround: PumpAroundSpec,
  duty_kW: number,
  latentHeat_kJ_kg: number,
  numbering: TrayNumbering = 'top-down',
): TrayLoad[] {
  return shiftTraffic(base, pumpAround, duty_kW, latentHeat_kJ_kg, numbering).trays.map(
    ({ region: _r, dry: _d, ...load }) => load,
  );
}

/**
 * Dry-out duty, closed form: the liquid of a tray above the zone is L − (Q − Q0)/λ, so it reaches zero at
 * Q = Q0 + λ·L; the first tray to dry is the one above the zone with the least base liquid (ties: the
 * one nearest the zone). Returns null when no tray lies above the zone.
 */
export function dryOutDuty(
  base: readonly TrayLoad[],
  pumpAround: PumpAroundSpec,
  latentHeat_kJ_kg: number,
  numbering: TrayNumbering = 'top-down',
): { duty_kW: number; tray: number } | null {
  let best: TrayLoad | undefined;
  for (const load of base) {
    if (shiftFraction(load.tray, pumpAround, numbering).region !== 'above') continue;
    const nearer = best && topDownPosition(load.tray, numbering) > topDownPosition(best.tray, numbering);
    if (
      !best ||
      load.liquidMassFlow_kg_h < best.liquidMassFlow_kg_h ||
      (load.liquidMassFlow_kg_h === best.liquidMassFlow_kg_h && nearer)
    )
      best = load;
  }
  if (!best) return null;
  return {
    duty_kW: pumpAround.baseDuty_kW + (latentHeat_kJ_kg * Math.max(0, best.liquidMassFlow_kg_h)) / S_PER_H,
    tray: best.tray,
  };
}

/**
 * Estimate of λ from the overhead: with a total condenser and little subcooling, the condenser duty
 * condenses the overhead vapour, λ ≈ Q_c / V_overhead [D]. Q_c [kW], V [kg/h] → λ [kJ/kg].
 * Example: 9000 kW condensing 120 000 kg/h → 9000·3600/120 000 = 270 kJ/kg.
 */
export function estimateLatentHeat(condenserDuty_kW: number, overheadVapour_kg_h: number): number | null {
  if (!(condenserDuty_kW > 0) || !(overheadVapour_kg_h > 0)) return null;
  return (condenserDuty_kW * S_PER_H) / overheadVapour_kg_h;
}
