/** Heat-recovery plan engine (issue 17): several pump-arounds at once, duty grid, boundary, heat level. */
export {
  condenserDutyChange,
  dryResidual,
  dutyState,
  linearDryResidual,
  linearTraffic,
  shiftPlanTraffic,
  shiftPlanTray,
  trayRole,
  trayRoles,
  zoneLatentHeat,
} from './traffic.js';
export type { DutyState, LinearTraffic, PlanShiftedTray, PlanTraffic, TrayRole } from './traffic.js';
export { heatAboveTemperature, pumpAroundHeat, recoveredHeat } from './heatLevel.js';
export type { RecoveredHeat } from './heatLevel.js';
export { fractionationSignal, sectionMembers } from './fractionation.js';
export { DEFAULT_FRACTIONATION_THRESHOLD, DEFAULT_MARGIN } from './model.js';
export { heatPlanPointAt, PLAN_NOTES, planPointStatus, runHeatPlan, runHeatPlanWith } from './plan.js';
export type { HeatPlanOptions, HeatPlanResultOf } from './plan.js';
export { SENSITIVITY_MARGINS } from './suggestion.js';
export { validateHeatPlanInput } from './validate.js';
export { heatPlanFaults, MAX_GRID_POINTS } from './faults.js';
export { calibrateHeatPlan, DUTY_MATCH_KW } from './calibration.js';
export { calibratedLoadsAt, interpolateLoads, simulatedLoadsAt } from './calibratedLoads.js';
export { validateSimulationCases } from './validateCases.js';
export type { CasesValidation } from './validateCases.js';
export { driftFaults } from './faults.js';
