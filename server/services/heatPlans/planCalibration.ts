/**
 * A plan's simulation cases (load cases tagged with the duties of its pump-arounds) through the engine's
 * calibration (calibrateHeatPlan): the latent heat per zone and the property drift fitted to them, the model
 * against each case tray by tray, and the fit quality stated in one sentence for the page and the report.
 */
import { ValidationError } from '../../errors.js';
import { calibrateHeatPlan, validateSimulationCases } from '../../engine/heatPlan/index.js';
import { netZoneLiquidOf } from '../studies/studyInputs.js';
import type { PlanParts } from './planInputs.js';
import type { CalibrationResult, HeatPlanInput, SimulationCase } from '../../../shared/types/heatPlan.js';
import type { HeatPlanSource, PlanCalibrationView } from '../../../shared/types/heatPlans.js';

/** Engine path of a case fault → request field: `/cases/1/trays/3/tray` → `simulationCaseIds.1 (trays.3.tray)`. */
export function casePath(enginePath: string): string {
  const [, i, ...rest] = enginePath.replace(/^\/cases\/?/, 'cases/').split('/');
  if (i === undefined || i === '') return 'simulationCaseIds';
  return rest.length ? `simulationCaseIds.${i} (${rest.join('.')})` : `simulationCaseIds.${i}`;
}

/** The cases as the engine takes them: the plan's trays only, zone liquid net of the circulation when the base case's is. */
function simulationCases(
  parts: PlanParts,
  source: HeatPlanSource,
  input: HeatPlanInput,
  includesCirculation: boolean,
): SimulationCase[] {
  const trays = new Set(input.trays.map((t) => t.tray));
  return parts.simulations.map((c, i) => {
    const duties = source.simulationCases[i]!.duties_kW;
    let loads = c.loads.filter((t) => trays.has(t.tray));
    if (includesCirculation)
      input.pumpArounds.forEach((pa, k) => {
        loads = netZoneLiquidOf(loads, { ...pa, baseDuty_kW: duties[k]! }, input.numbering ?? 'top-down').trays;
      });
    return { name: c.name, duties_kW: duties, trays: loads };
  });
}

const kgh = (x: number) => `${Math.round(x).toLocaleString('en-US')} kg/h`;

/** The fit quality in words (what the page and the report state). */
export function fitSummary(cal: CalibrationResult): string {
  const f = cal.fit;
  const parts = [
    `Fitted to ${f.cases} simulation cases (${f.flows} tray flows): the model's traffic differs from the simulation by ${kgh(f.rmsResidual_kg_h)} RMS, ${f.rmsResidual_percent.toFixed(1)} % of the mean simulated flow`,
  ];
  if (f.rSquared !== null)
    parts.push(`it explains ${(100 * Math.max(0, f.rSquared)).toFixed(0)} % of the simulated change of traffic`);
  if (f.worstFlow)
    parts.push(
      `largest difference ${kgh(Math.abs(f.worstFlow.residual_kg_h))} (${f.worstFlow.flow}, tray ${f.worstFlow.tray}, ${f.worstFlow.case})`,
    );
  if (f.worstRating)
    parts.push(
      `largest difference in percent of limit ${Math.abs(f.worstRating.difference_percent).toFixed(1)} points (tray ${f.worstRating.tray}, ${f.worstRating.case})`,
    );
  return `${parts.join('; ')}.`;
}

/** Calibrate the plan input against its simulation cases: the input to rate and what the page shows. */
export function calibratePlan(
  parts: PlanParts,
  source: HeatPlanSource,
  input: HeatPlanInput,
  includesCirculation: boolean,
): { input: HeatPlanInput; cases: SimulationCase[]; view: PlanCalibrationView; notes: string[] } {
  const checked = validateSimulationCases(input, simulationCases(parts, source, input, includesCirculation));
  if (!checked.ok)
    throw new ValidationError(
      'The simulation cases cannot calibrate this plan',
      checked.errors.map((e) => ({ path: casePath(e.path), message: e.message })),
    );
  const cal = calibrateHeatPlan(input, checked.value);
  const view: PlanCalibrationView = {
    summary: fitSummary(cal),
    fitted: cal.zones.map((z) => ({
      name: `Latent heat, ${z.pumpAround} zone${z.fitted_kJ_kg === null ? ' (kept as given)' : ''}`,
      value: z.fitted_kJ_kg ?? z.given_kJ_kg,
      unit: 'kJ/kg',
    })),
    rmsRelative: cal.fit.rmsResidual_percent / 100,
    cases: cal.comparisons.map((c, i) => ({
      loadCaseId: source.simulationCases[i]!.id,
      name: c.name,
      duties_kW: c.duties_kW,
      trays: c.trays.map((t) => ({
        tray: t.tray,
        modelVapour_kg_h: t.modelVapour_kg_h,
        simVapour_kg_h: t.simulatedVapour_kg_h,
        modelLiquid_kg_h: t.modelLiquid_kg_h,
        simLiquid_kg_h: t.simulatedLiquid_kg_h,
      })),
    })),
  };
  return { input: cal.calibratedInput, cases: checked.value, view, notes: cal.notes };
}
