/**
 * Does a load case's liquid on the pump-around zone trays already carry the circulation? A rating case
 * taken from a simulation usually does (the zone trays see internal liquid plus the cooled return), while
 * the study wants the net internal liquid. The check compares the mean liquid on the zone trays with the
 * liquid on the tray just above the zone: a step up close to the base circulation points to "includes",
 * no step points to "net". This is a reading of the numbers (common practice), not a rule; the user decides.
 */
import type { TrayNumbering } from './types/columns.js';

export interface ZoneLiquidGuess {
  aboveTray: number;
  aboveLiquid_kg_h: number;
  zoneTrays: number[];
  zoneLiquid_kg_h: number;
  /** mean zone liquid minus the liquid above the zone */
  step_kg_h: number;
  /** the base circulation, when the inputs give it */
  circulation_kg_h: number | null;
  /** step / circulation; null without a circulation */
  ratio: number | null;
  likely: 'includes' | 'net' | null;
  /** false when the step is close to half the circulation (either answer fits about as well) */
  clearCut: boolean;
}

/** Base circulation m0 = Q0/(c_p ΔT), or the fixed circulation [kg/h]; null when the inputs do not give it. */
export function baseCirculation(p: {
  baseDuty_kW: number | null;
  cp_kJ_kgK: number | null;
  returnDrop_K: number | null;
  circulation_kg_h: number | null;
}): number | null {
  if (p.circulation_kg_h !== null) return p.circulation_kg_h > 0 ? p.circulation_kg_h : null;
  if (!p.baseDuty_kW || !p.cp_kJ_kgK || !p.returnDrop_K || p.baseDuty_kW <= 0 || p.cp_kJ_kgK <= 0 || p.returnDrop_K <= 0)
    return null;
  return (p.baseDuty_kW * 3600) / (p.cp_kJ_kgK * p.returnDrop_K);
}

/** The comparison above; null when the load case has no tray above the zone or no zone trays. */
export function guessZoneLiquid(
  loads: readonly { tray: number; liquidMassFlow_kg_h: number }[],
  pa: { drawTray: number; returnTray: number },
  numbering: TrayNumbering,
  circulation_kg_h: number | null,
): ZoneLiquidGuess | null {
  const pos = (t: number) => (numbering === 'bottom-up' ? -t : t); // top-down position
  const [top, bottom] = [pos(pa.returnTray), pos(pa.drawTray)];
  const zone = loads.filter((l) => pos(l.tray) >= top && pos(l.tray) <= bottom);
  const above = loads.filter((l) => pos(l.tray) < top).sort((a, b) => pos(b.tray) - pos(a.tray))[0];
  if (!zone.length || !above) return null;
  const zoneLiquid = zone.reduce((s, l) => s + l.liquidMassFlow_kg_h, 0) / zone.length;
  const step = zoneLiquid - above.liquidMassFlow_kg_h;
  const ratio = circulation_kg_h ? step / circulation_kg_h : null;
  return {
    aboveTray: above.tray,
    aboveLiquid_kg_h: above.liquidMassFlow_kg_h,
    zoneTrays: zone.map((l) => l.tray).sort((a, b) => a - b),
    zoneLiquid_kg_h: zoneLiquid,
    step_kg_h: step,
    circulation_kg_h,
    ratio,
    likely: ratio === null ? null : ratio >= 0.5 ? 'includes' : 'net',
    clearCut: ratio !== null && Math.abs(ratio - 0.5) >= 0.15,
  };
}
