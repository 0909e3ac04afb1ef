/**
 * Field evidence payloads (issue 16), derived from the TypeBox schemas of shared/schemas/fieldEvidence.ts
 * (defined once there). SI units; the unit is part of each field name. Tray numbers use the input's
 * numbering (`top-down` by default).
 */
import type { Static } from '@sinclair/typebox';
import type {
  densityPointSchema,
  floodedRegionSchema,
  gammaScanInputSchema,
  gammaScanResultSchema,
  pressureDropMeasurementSchema,
  pressureDropSurveyInputSchema,
  pressureDropSurveyResultSchema,
  pressureDropSurveyRowSchema,
  scanCalibrationSchema,
  scanDatumSchema,
  scanFindingSchema,
  scanPointSchema,
  scanThresholdSchema,
  scanTrayReadingSchema,
  temperatureSurveyInputSchema,
  temperatureSurveyResultSchema,
  trayElevationSchema,
  trayFrothPredictionSchema,
} from '../schemas/fieldEvidence.js';

export { SCAN_FINDINGS, PRESSURE_DROP_FLAGS, TEMPERATURE_FLAGS } from '../schemas/fieldEvidence.js';

export type ScanFinding = Static<typeof scanFindingSchema>;
export type ScanDatum = Static<typeof scanDatumSchema>;
export type ScanPoint = Static<typeof scanPointSchema>;
export type ScanCalibration = Static<typeof scanCalibrationSchema>;
export type GammaScanInput = Static<typeof gammaScanInputSchema>;
export type TrayElevation = Static<typeof trayElevationSchema>;
export type ScanThreshold = Static<typeof scanThresholdSchema>;
export type ScanTrayReading = Static<typeof scanTrayReadingSchema>;
export type FloodedRegion = Static<typeof floodedRegionSchema>;
export type GammaScanResult = Static<typeof gammaScanResultSchema>;
export type TrayFrothPrediction = Static<typeof trayFrothPredictionSchema>;
export type PressureDropMeasurement = Static<typeof pressureDropMeasurementSchema>;
export type PressureDropSurveyInput = Static<typeof pressureDropSurveyInputSchema>;
export type PressureDropSurveyRow = Static<typeof pressureDropSurveyRowSchema>;
export type PressureDropSurveyResult = Static<typeof pressureDropSurveyResultSchema>;
export type TemperatureSurveyInput = Static<typeof temperatureSurveyInputSchema>;
export type TemperatureSurveyResult = Static<typeof temperatureSurveyResultSchema>;
/** A scan reduced to a density (the reader's input). */
export type DensityPoint = Static<typeof densityPointSchema>;
