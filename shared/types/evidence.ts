/**
 * Field evidence (issue 16): the request shapes come from the TypeBox schemas in shared/schemas/evidence.ts,
 * the answers from the routes' contract (shared/contract/evidence.ts). SI throughout (m, kg/m³, Pa, °C).
 */
import type { Static } from '@sinclair/typebox';
import type * as S from '../schemas/evidence.js';
import type { StudySection } from './pumpAround.js';
import type { MethodOptions, TrayLoad } from './rating.js';

export type EvidenceKind = (typeof S.EVIDENCE_KINDS)[number];
export type ScanMeasure = (typeof S.SCAN_MEASURES)[number];
export type InspectionTiming = (typeof S.INSPECTION_TIMINGS)[number];
export type EvidenceDatum = Static<typeof S.datumSchema>;
export type ScanPoint = Static<typeof S.scanPointSchema>;
export type ScanCalibration = Static<typeof S.calibrationSchema>;
export type ScanLine = Static<typeof S.scanLineSchema>;
export type GammaScanData = Static<typeof S.gammaScanDataSchema>;
export type DpReading = Static<typeof S.dpReadingSchema>;
export type DpSurveyData = Static<typeof S.dpSurveyDataSchema>;
export type TemperatureReading = Static<typeof S.temperatureReadingSchema>;
export type TemperatureSurveyData = Static<typeof S.temperatureSurveyDataSchema>;
export type CreateEvidenceBody = Static<typeof S.createEvidenceBody>;
/** What the route checks of a new record: the header and the kind (the service checks `data` per kind). */
export type CreateEvidenceEnvelope = Static<typeof S.createEvidenceEnvelope>;
export type UpdateEvidenceBody = Static<typeof S.updateEvidenceBody>;
export type ScanImportMapping = Static<typeof S.scanImportMapping>;
export type ScanImportUnits = Static<typeof S.scanImportUnits>;
export type ScanImportCommitBody = Static<typeof S.scanImportCommitBody>;

export interface EvidenceDataByKind {
  'gamma-scan': GammaScanData;
  'dp-survey': DpSurveyData;
  'temperature-survey': TemperatureSurveyData;
}

export type { EvidenceReading, EvidenceRecord, EvidenceSummary, ScanImportPreview } from '../contract/evidence.js';

/** What a reading is made from: the column's (or the chosen run's) sections and, with a run, its loads. */
export interface ReadingBasis {
  numbering: 'top-down' | 'bottom-up';
  trayCount: number;
  runId: string | null;
  runLabel: string | null;
  sections: StudySection[];
  loads: TrayLoad[] | null;
  methods: MethodOptions | null;
}
