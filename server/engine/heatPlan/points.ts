/** One point of a plan: duties, heat level, feasibility, fractionation signal and every tray's full rating. */
import type { PlanPoint } from '../../../shared/types/heatPlan.js';
import { fractionationSignal, sectionMembers, type SectionMembers } from './fractionation.js';
import type { RatedTray } from './grid.js';
import { pumpAroundHeat, recoveredHeat } from './heatLevel.js';
import { constraintName, DEFAULT_FRACTIONATION_THRESHOLD, marginResidual, shiftAt, statesAt, type PlanModel } from './model.js';
import { overAtDuties, type ConstraintRef } from './nodes.js';

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
