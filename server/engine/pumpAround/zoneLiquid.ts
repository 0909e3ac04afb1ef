/**
 * Zone liquid without the base circulation. A load case taken from a rating case often carries the
 * pump-around circulation on the zone trays, while the study wants the net internal liquid there (it adds
 * the circulation at each duty itself). The base circulation m0 = Q0/(c_p ΔT) (or the fixed circulation,
 * pumpAroundCirculation) is taken off every zone tray (shiftFraction's region 'zone').
 */
import type { TrayLoad } from '../../../shared/types/rating.js';
import type { PumpAroundSpec, TrayNumbering } from '../../../shared/types/pumpAround.js';
import { pumpAroundCirculation, shiftFraction } from './traffic.js';

export interface NetZoneLiquid {
  /** the loads with m0 taken off each zone tray; the loads unchanged when a zone tray falls short */
  trays: TrayLoad[];
  /** base circulation [kg/h]; 0 when the pump-around gives neither ΔT nor a circulation, or no c_p */
  m0: number;
  /** zone trays whose liquid is below m0 (the load case cannot carry the circulation) */
  shortTrays: TrayLoad[];
}

export function netZoneLiquid(trays: TrayLoad[], pa: PumpAroundSpec, numbering: TrayNumbering): NetZoneLiquid {
  const hasOne = (pa.returnTemperatureDrop_K !== undefined) !== (pa.circulation_kg_h !== undefined);
  if (!hasOne || !(pa.liquidHeatCapacity_kJ_kgK > 0)) return { trays, m0: 0, shortTrays: [] };
  const m0 = pumpAroundCirculation(pa, pa.baseDuty_kW).circulation_kg_h;
  const inZone = (t: TrayLoad): boolean => shiftFraction(t.tray, pa, numbering).region === 'zone';
  const shortTrays = trays.filter((t) => inZone(t) && t.liquidMassFlow_kg_h < m0);
  if (shortTrays.length) return { trays, m0, shortTrays };
  return {
    trays: trays.map((t) => (inZone(t) ? { ...t, liquidMassFlow_kg_h: t.liquidMassFlow_kg_h - m0 } : t)),
    m0,
    shortTrays,
  };
}
