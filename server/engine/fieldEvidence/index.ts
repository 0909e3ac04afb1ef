/**
 * Field evidence against the rating (issue 16) — public API. Pure TypeScript, SI units, no I/O.
 * Screening estimates: scans are interpreted by qualified people; operating changes need
 * management-of-change review and confirmation by the internals vendor and licensed engineers.
 */
export { trayDeckElevations, traysTopDown, type ElevationSection } from './elevations.js';
export { densityFromCountRateBeerLambert, countRateFromDensityBeerLambert, type CountCalibration } from './scanDensity.js';
export {
  readGammaScan,
  decksInSpan,
  floodedRegions,
  THRESHOLD_FRACTION,
  THRESHOLD_BASIS,
  type ReadOptions,
  type ScanReading,
  type TrayPrediction,
} from './reader.js';
export { frothHeightFromClearLiquid, predictTrays, predictTray } from './prediction.js';
export {
  syntheticGammaScan,
  syntheticDensity,
  frothHeightsFromRating,
  seededNormal,
  seededUniform,
  type SyntheticScanSpec,
  type SyntheticTrayState,
} from './synthetic.js';
export { FIELD_EVIDENCE_METHODS, FIELD_EVIDENCE_REGISTRY, FIELD_EVIDENCE_USES } from './methods.js';
export { runGammaScan, scanToDensities, SCAN_CAUTION } from './gammaScan.js';
export {
  validateGammaScanInput,
  validatePressureDropSurveyInput,
  validateTemperatureSurveyInput,
  columnFaults,
  type Validation,
} from './validate.js';
export {
  runPressureDropSurvey,
  traysBetween,
  vapourStaticHead,
  floodedTrayPressureDrop,
  LOW_RATIO,
  HIGH_RATIO,
  FLOODING_FRACTION,
} from './pressureSurvey.js';
export { runTemperatureSurvey, DEFAULT_TOLERANCE_K, FLAT_PROFILE_FRACTION } from './temperatureSurvey.js';
