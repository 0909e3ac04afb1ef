/**
 * Heat level of a pump-around: the temperature range over which its duty is released, and the part of the
 * duty released above a useful temperature T_u (what a preheat train can take).
 *
 * Derivation (sensible-heat balance, constant liquid heat capacity c_p over the cooling range): the
 * circulating liquid m is cooled from the draw temperature T_d to the return temperature
 * T_r = T_d − ΔT, with ΔT = Q/(m c_p). The heat released between T and T + dT is m c_p dT, the same for
 * every degree, so the cooling curve (heat against temperature) is a straight line and the heat released
 * above T_u is
 *   Q_u = m c_p (T_d − max(T_u, T_r)) = Q · (T_d − max(T_u, T_r)) / (T_d − T_r)   for T_u < T_d,
 *   Q_u = 0                                                                        for T_u ≥ T_d.
 * With a fixed ΔT, Q_u is a fixed fraction of Q; with a fixed circulation, T_r falls as Q rises and
 * Q_u = min(Q, m c_p (T_d − T_u)). T_d is held at its load-case value (the shortcut model keeps tray
 * temperatures at base). A c_p that varies with temperature bends the line; the error is that of using
 * one mean c_p over the range.
 */
import type { PlanPumpAround, PumpAroundHeat } from '../../../shared/types/heatPlan.js';
import { pumpAroundCirculation } from '../pumpAround/traffic.js';

/**
 * Heat released above T_u by a liquid cooled from T_d to T_r (linear cooling curve).
 * @param duty_kW Q [kW]; @param draw_C T_d [°C]; @param return_C T_r [°C]; @param useful_C T_u [°C]
 * Example: Q 6000 kW, 250 → 170 °C, T_u 200 °C → 6000 · 50/80 = 3750 kW.
 */
export function heatAboveTemperature(duty_kW: number, draw_C: number, return_C: number, useful_C: number): number {
  if (!(duty_kW > 0) || useful_C >= draw_C) return 0;
  if (useful_C <= return_C) return duty_kW;
  return (duty_kW * (draw_C - useful_C)) / (draw_C - return_C);
}

/** Circulation, return temperature and useful heat of a pump-around at a duty. */
export function pumpAroundHeat(pa: PlanPumpAround, duty_kW: number, usefulAbove_C: number): PumpAroundHeat {
  const c = pumpAroundCirculation(pa, duty_kW);
  const returnTemperature_C = pa.drawTemperature_C - c.returnTemperatureDrop_K;
  return {
    name: pa.name,
    duty_kW,
    circulation_kg_h: c.circulation_kg_h,
    drawTemperature_C: pa.drawTemperature_C,
    returnTemperature_C,
    aboveTemperature_kW: heatAboveTemperature(duty_kW, pa.drawTemperature_C, returnTemperature_C, usefulAbove_C),
  };
}

export interface RecoveredHeat {
  recoveredHeat_kW: number;
  recoveredAboveTemperature_kW: number;
  condenserDutyChange_kW: number;
}

/** Totals over the pump-arounds at a set of duties (input order). */
export function recoveredHeat(
  pumpArounds: readonly PlanPumpAround[],
  duties_kW: readonly number[],
  usefulAbove_C: number,
): RecoveredHeat {
  let total = 0;
  let above = 0;
  let change = 0;
  pumpArounds.forEach((pa, i) => {
    const q = duties_kW[i]!;
    total += q;
    above += pumpAroundHeat(pa, q, usefulAbove_C).aboveTemperature_kW;
    change -= q - pa.baseDuty_kW;
  });
  return { recoveredHeat_kW: total, recoveredAboveTemperature_kW: above, condenserDutyChange_kW: change };
}
