/**
 * The stored form of a heat-recovery plan result (issue 17). The engine rates every tray at every grid
 * point in full; the store keeps, per point, the map's summary (duties, heat, feasibility, margin, L/V,
 * worst tray) and, apart, each tray's traffic with per check only the percent of limit and status. The
 * engine's boundary, suggestion, margin sensitivity and notes are kept exactly, by field name.
 */
import { CHECK_NAMES, type CheckName } from '../../../shared/types/rating.js';
import type { HeatPlanInput, PlanPoint, SimulationCase } from '../../../shared/types/heatPlan.js';
import type { PlanGridPoint, SlimPlanPoint, SlimPlanTray, StoredHeatPlanResult } from '../../../shared/types/heatPlans.js';
import { heatPlanPointAt, runHeatPlanWith } from '../../engine/heatPlan/index.js';

const round2 = (x: number): number => Math.round(x * 100) / 100;

/** One tray in its stored form. Plain loops: this runs for every tray of every grid point. */
function slimTray(t: PlanPoint['trays'][number]): SlimPlanTray {
  const percent = new Array<number>(CHECK_NAMES.length);
  const status = new Array<SlimPlanTray['status'][number]>(CHECK_NAMES.length);
  const checks = t.rating.checks;
  for (let i = 0; i < CHECK_NAMES.length; i++) {
    const c = checks[CHECK_NAMES[i]!] as (typeof checks)[CheckName] | undefined;
    const v = c?.percentOfLimit;
    percent[i] = v !== undefined && Number.isFinite(v) ? round2(v) : 0;
    status[i] = c?.status ?? 'ok';
  }
  return {
    tray: t.tray,
    vapourMassFlow_kg_h: t.vapourMassFlow_kg_h,
    liquidMassFlow_kg_h: t.liquidMassFlow_kg_h,
    dry: t.dry,
    percent,
    status,
    controllingCheck: t.rating.controllingCheck,
  };
}

/** A grid point split into the map's summary and its stored trays; the worst check is over every tray. */
export function slimPlanPoint(p: PlanPoint): SlimPlanPoint {
  const trays = p.trays.map(slimTray);
  let worstPercent = 0;
  let worstTray: number | null = null;
  let worstCheck: CheckName | null = null;
  for (const t of trays)
    for (let i = 0; i < t.percent.length; i++)
      if (t.status[i] !== 'na' && t.percent[i]! > worstPercent) {
        worstPercent = t.percent[i]!;
        worstTray = t.tray;
        worstCheck = CHECK_NAMES[i]!;
      }
  const { trays: _full, ...rest } = p;
  return { ...rest, worstPercent, worstTray, worstCheck, trays };
}

export function gridSummary(p: SlimPlanPoint): PlanGridPoint {
  const { trays: _t, ...summary } = p;
  return summary;
}

/** Duties of each axis from the input's sweeps. */
export function planAxes(input: HeatPlanInput): number[][] {
  return input.pumpArounds.map(({ sweep: s }) =>
    Array.from({ length: s.steps + 1 }, (_, i) => s.fromDuty_kW + ((s.toDuty_kW - s.fromDuty_kW) * i) / s.steps),
  );
}

/**
 * The stored plan: the engine run with every grid point slimmed as it is rated; trays per point returned
 * apart. With simulation cases, points at or between them are rated on the simulated loads (each says so).
 */
export function runStoredPlan(
  input: HeatPlanInput,
  cases?: readonly SimulationCase[],
): { result: StoredHeatPlanResult; gridTrays: SlimPlanTray[][] } {
  const methods = new Set<string>();
  const r = runHeatPlanWith(
    input,
    (p) => {
      for (const t of p.trays) for (const c of Object.values(t.rating.checks)) methods.add(c.method);
      return slimPlanPoint(p);
    },
    { cases },
  );
  const { points, ...rest } = r;
  // the base and the suggestion rated at their own duties (they lie between grid nodes)
  const keyPoints: StoredHeatPlanResult['keyPoints'] = [
    { kind: 'base', point: slimPlanPoint(heatPlanPointAt(input, r.baseDuties_kW, cases)) },
  ];
  if (r.suggestion)
    keyPoints.push({ kind: 'suggestion', point: slimPlanPoint(heatPlanPointAt(input, r.suggestion.duties_kW, cases)) });
  return {
    result: {
      ...rest,
      checkNames: [...CHECK_NAMES] as CheckName[],
      axes: planAxes(input),
      grid: points.map(gridSummary),
      keyPoints,
      calibration: null,
      methodIds: [...methods].sort(),
    },
    gridTrays: points.map((p) => p.trays),
  };
}
