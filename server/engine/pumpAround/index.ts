/** Pump-around duty study engine (issue 5): traffic model, study runner, input validation. */
export {
  condensedVapour,
  dryOutDuty,
  estimateLatentHeat,
  pumpAroundCirculation,
  shiftFraction,
  shiftLoads,
  shiftTraffic,
  shiftTray,
  topDownPosition,
} from './traffic.js';
export type { ShiftedTray, TrafficShift, TrayRegion } from './traffic.js';
export { DEFAULT_MARGIN, runStudy, runStudyWith } from './study.js';
export type { StudyResultOf } from './study.js';
export { studyPoint, sweepDuties } from './points.js';
export { minimumLiquidLines, pointsAt } from './keyPoints.js';
export { netZoneLiquid } from './zoneLiquid.js';
export type { NetZoneLiquid } from './zoneLiquid.js';
export { SCAN_INTERVALS, scanWatchedChecks } from './scan.js';
export { MINIMUM_LIQUID_CHECKS, ZONE_OVERLOAD_CHECKS, watchedChecks } from './checks.js';
export { sectionForTray } from './column.js';
export { studyInputFaults } from './faults.js';
export { validateStudyInput } from './validate.js';
