/** One sweep point of the pump-around study: the shifted traffic of every tray and its full rating. */
import type { TrayResult } from '../../../shared/types/rating.js';
import type { StudyInput, StudyPoint, TrayNumbering } from '../../../shared/types/pumpAround.js';
import { topDownPosition, type ShiftedTray, type TrafficShift } from './traffic.js';

/** The sweep's duties: steps + 1 points from fromDuty_kW to toDuty_kW. */
export function sweepDuties(input: Pick<StudyInput, 'sweep'>): number[] {
  const { fromDuty_kW: a, toDuty_kW: b, steps } = input.sweep;
  return Array.from({ length: steps + 1 }, (_, i) => (i === steps ? b : a + ((b - a) * i) / steps));
}

/** L/V (mass) of a tray; 0 when it carries no vapour. */
function liquidToVapour(t: ShiftedTray): number {
  return t.vapourMassFlow_kg_h > 0 ? t.liquidMassFlow_kg_h / t.vapourMassFlow_kg_h : 0;
}

export function studyPoint(
  s: TrafficShift,
  baseDuty_kW: number,
  numbering: TrayNumbering,
  rate: (tray: ShiftedTray) => TrayResult,
): StudyPoint {
  const above = s.trays.filter((t) => t.region === 'above');
  const top = s.trays.reduce((a, t) => (topDownPosition(t.tray, numbering) < topDownPosition(a.tray, numbering) ? t : a));
  let lv = Infinity;
  for (const t of above) lv = Math.min(lv, liquidToVapour(t));
  return {
    duty_kW: s.duty_kW,
    condenserDutyChange_kW: -(s.duty_kW - baseDuty_kW),
    reflux_kg_h: top.liquidMassFlow_kg_h,
    heatRecovered_kW: s.duty_kW - baseDuty_kW,
    liquidToVapourAboveZone: Number.isFinite(lv) ? lv : 0,
    circulation_kg_h: s.circulation_kg_h,
    returnTemperatureDrop_K: s.returnTemperatureDrop_K,
    dryTrays: s.trays.filter((t) => t.dry).map((t) => t.tray),
    trays: s.trays.map((t) => ({
      tray: t.tray,
      vapourMassFlow_kg_h: t.vapourMassFlow_kg_h,
      liquidMassFlow_kg_h: t.liquidMassFlow_kg_h,
      region: t.region,
      dry: t.dry,
      rating: rate(t),
    })),
  };
}
