/** One point of a plan: duties, heat level, feasibility, fractionation signal and every tray's full rating. */
import type { PlanPoint } from '../../../shared/types/heatPlan.js';
import type { TrayLoad } from '../../../shared/types/rating.js';
import { fractionationSignal, sectionMembers, type SectionMembers } from './fractionation.js';
import type { RatedTray } from './grid.js';
import { pumpAroundHeat, recoveredHeat } from './heatLevel.js';
import {
  constraintName,
  DEFAULT_FRACTIONATION_THRESHOLD,
  marginResidual,
  overConstraints,
  shiftAt,
  statesAt,
  type PlanModel,
} from './model.js';
import { overAtDuties, type ConstraintRef } from './nodes.js';
import type { PlanShiftedTray } from './traffic.js';

export function planPoint(
  m: PlanModel,
  duties: number[],
  trays: readonly RatedTray[],
  over: readonly ConstraintRef[],
  sections: readonly SectionMembers[],
): PlanPoint {
  const useful = m.input.usefulAboveTemperature_C;
  return {
    duties_kW: duties,
    ...recoveredHeat(m.pumpArounds, duties, useful),
    feasible: over.length === 0,
    withinMargin: m.watched.every((k) => marginResidual(m, k, duties, m.margin) <= 0),
    violations: over.map(([k, c]) => ({ tray: m.trays[k]!.tray, check: constraintName(c) })),
    heat: m.pumpArounds.map((pa, i) => pumpAroundHeat(pa, duties[i]!, useful)),
    fractionation: fractionationSignal(
      sections,
      trays.map((t) => t.shifted),
      m.input.fractionationThreshold ?? DEFAULT_FRACTIONATION_THRESHOLD,
    ),
    trays: trays.map(({ shifted: s, rating }) => ({
      tray: s.tray,
      vapourMassFlow_kg_h: s.vapourMassFlow_kg_h,
      liquidMassFlow_kg_h: s.liquidMassFlow_kg_h,
      dry: s.dry,
      rating,
    })),
  };
}

/** A full point at any duties (input order), e.g. the base case or the suggestion between grid nodes. */
export function pointAt(m: PlanModel, duties_kW: readonly number[]): PlanPoint {
  const states = statesAt(m, duties_kW);
  const trays = m.trays.map((_, k) => {
    const shifted = shiftAt(m, k, states);
    return { shifted, rating: m.rate(k, shifted) };
  });
  return planPoint(m, [...duties_kW], trays, overAtDuties(m, duties_kW), sectionMembers(m.input.sections, m.trays, m.roles));
}

/**
 * A point rated on given loads instead of the model's traffic (a simulation case, or two interpolated):
 * `loads` in the load case's convention (net liquid on the zone trays), so each zone tray gets the
 * circulation at these duties added, as the model's trays do. Feasibility and violations come from these
 * loads (watched trays only, as on the model; a tray with no liquid or vapour counts as dry); the margin
 * stays the model's rule.
 */
export function pointOnLoads(
  m: PlanModel,
  duties_kW: readonly number[],
  loads: readonly TrayLoad[],
  sections: readonly SectionMembers[],
): PlanPoint {
  const states = statesAt(m, duties_kW);
  const byTray = new Map(loads.map((t) => [t.tray, t]));
  const over: ConstraintRef[] = [];
  const trays = m.trays.map((base, k) => {
    const load = byTray.get(base.tray);
    if (!load) throw new Error(`pointOnLoads: no load for tray ${base.tray}`); // cases are validated to cover every tray
    const role = m.roles[k]!;
    const liquid = load.liquidMassFlow_kg_h + (role.zone >= 0 ? states[role.zone]!.circulation_kg_h : 0);
    const vapour = load.vapourMassFlow_kg_h;
    const shifted: PlanShiftedTray = {
      ...load,
      liquidMassFlow_kg_h: Math.max(0, liquid),
      vapourMassFlow_kg_h: Math.max(0, vapour),
      rawLiquid_kg_h: liquid,
      rawVapour_kg_h: vapour,
      dry: role.dependsOn.length > 0 && (liquid <= 0 || vapour <= 0),
    };
    const rating = m.rate(k, shifted);
    // a simulated tray with no liquid (or vapour) left has run dry, even at exactly zero
    if (shifted.dry) over.push([k, 0]);
    else if (role.dependsOn.length > 0) for (const c of overConstraints(shifted, rating)) over.push([k, c]);
    return { shifted, rating };
  });
  return planPoint(m, [...duties_kW], trays, over, sections);
}
