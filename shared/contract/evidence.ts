/** Contracts of the field-evidence routes (issue 16): records, their reading against a run, scan imports, report. */
import { Type, type Static, type TSchema } from '@sinclair/typebox';
import {
  createEvidenceEnvelope,
  datumSchema,
  deleteEvidenceQuery,
  dpSurveyDataSchema,
  EVIDENCE_KINDS,
  evidenceListQuery,
  evidenceReadingQuery,
  gammaScanDataSchema,
  INSPECTION_TIMINGS,
  scanImportCommitBody,
  scanImportMapping,
  scanImportPreviewQuery,
  scanImportUnits,
  scanPointSchema,
  SCAN_MEASURES,
  temperatureSurveyDataSchema,
  updateEvidenceBody,
} from '../schemas/evidence.js';
import {
  gammaScanResultSchema,
  pressureDropSurveyResultSchema,
  temperatureSurveyResultSchema,
  trayElevationSchema,
} from '../schemas/fieldEvidence.js';
import { ImportFileForm, previewFields } from './imports.js';
import { ImportRowsErrorBodySchema } from './importRows.js';
import { fileAnswer, route } from './route.js';
import { ErrorDetail, IdParams, NewestOf, Nullable, Obj, StringEnum, Timestamp, Uuid } from './schema.js';

/** How many records GET /columns/:id/evidence lists at most (the newest by date taken; total counts all). */
export const EVIDENCE_LIST_CUT = 500;

const Kind = StringEnum(EVIDENCE_KINDS);
const Numbering = StringEnum(['top-down', 'bottom-up'] as const);

const summaryFields = {
  id: Uuid(),
  columnId: Uuid(),
  kind: Kind,
  title: Type.String(),
  takenOn: Type.String({ format: 'date' }),
  operatingCase: Type.String(),
  runId: Nullable(Uuid()),
  inspectionId: Nullable(Uuid()),
  inspectionTiming: Nullable(StringEnum(INSPECTION_TIMINGS)),
  authorName: Nullable(Type.String()),
  /** scan lines, ΔP readings or temperature readings */
  itemCount: Type.Integer({ minimum: 0 }),
  createdAt: Timestamp(),
};
/** A stored record as listed (no data). */
export const EvidenceSummarySchema = Obj(summaryFields);
export type EvidenceSummary = Static<typeof EvidenceSummarySchema>;

const recordOf = <K extends (typeof EVIDENCE_KINDS)[number], D extends TSchema>(kind: K, data: D) =>
  Obj({
    ...summaryFields,
    kind: Type.Literal(kind),
    data,
    notes: Type.String(),
    sourceFile: Nullable(Type.String()),
    /** the linked run and inspection by name (null when unlinked or gone) */
    runLabel: Nullable(Type.String()),
    inspectionLabel: Nullable(Type.String()),
    updatedAt: Timestamp(),
    version: Type.Integer(),
  });
/** A stored record with its data, one shape per kind. */
export const EvidenceRecordSchema = Type.Union([
  recordOf('gamma-scan', gammaScanDataSchema),
  recordOf('dp-survey', dpSurveyDataSchema),
  recordOf('temperature-survey', temperatureSurveyDataSchema),
]);
export type EvidenceRecord = Static<typeof EvidenceRecordSchema>;

const Faults = Type.Array(ErrorDetail);
/**
 * A record read against the column and a rating run: a gamma scan tray by tray and line by line (against the
 * run's prediction when one is chosen), a ΔP survey against the predicted tray ΔP, a temperature survey against
 * the load case's temperatures. Where something cannot be read, `errors` says why (paths name the record's fields).
 */
export const EvidenceReadingSchema = Obj({
  evidenceId: Uuid(),
  kind: Kind,
  runId: Nullable(Uuid()),
  runLabel: Nullable(Type.String()),
  numbering: Numbering,
  trayCount: Type.Integer(),
  datum: Nullable(datumSchema),
  /** every tray deck of the sections on the evidence's scale (datum and nudge applied), top first */
  decks: Type.Array(trayElevationSchema),
  lines: Type.Array(Obj({ label: Type.String(), result: Nullable(gammaScanResultSchema), errors: Faults })),
  pressureDrop: Nullable(Obj({ result: Nullable(pressureDropSurveyResultSchema), errors: Faults })),
  temperature: Nullable(Obj({ result: Nullable(temperatureSurveyResultSchema), errors: Faults })),
});
export type EvidenceReading = Static<typeof EvidenceReadingSchema>;

/** Preview of a scan file: what was detected, the points read (SI), and every row error. */
export const ScanImportPreviewSchema = Obj({
  ...previewFields,
  mapping: scanImportMapping,
  units: scanImportUnits,
  /** the lines found (one when the file has no line column), each with its points in SI */
  lines: Type.Array(Obj({ label: Type.String(), measure: StringEnum(SCAN_MEASURES), points: Type.Array(scanPointSchema) })),
});
export type ScanImportPreview = Static<typeof ScanImportPreviewSchema>;

export const evidenceContract = {
  list: route({
    method: 'get',
    path: '/columns/:id/evidence',
    access: 'read',
    summary: `Field evidence of a column (gamma scans, ΔP surveys, temperature surveys): the newest ${EVIDENCE_LIST_CUT} and the total`,
    params: IdParams,
    query: evidenceListQuery,
    response: NewestOf(EvidenceSummarySchema),
  }),
  create: route({
    method: 'post',
    path: '/columns/:id/evidence',
    access: 'evidence.record',
    summary: 'Store a gamma scan, ΔP survey or temperature survey of the column (data checked per kind)',
    params: IdParams,
    body: createEvidenceEnvelope,
    status: 201,
    response: EvidenceRecordSchema,
  }),
  get: route({
    method: 'get',
    path: '/evidence/:id',
    access: 'read',
    summary: 'One field-evidence record with its data',
    params: IdParams,
    response: EvidenceRecordSchema,
  }),
  reading: route({
    method: 'get',
    path: '/evidence/:id/reading',
    access: 'read',
    summary:
      'A gamma scan read tray by tray against the column (datum and nudge applied) and the prediction of a rating run (?runId=, else the linked run)',
    params: IdParams,
    query: evidenceReadingQuery,
    response: EvidenceReadingSchema,
  }),
  update: route({
    method: 'patch',
    path: '/evidence/:id',
    access: 'evidence.record',
    summary: "Edit a record's header, links and datum nudge (optimistic lock on version)",
    params: IdParams,
    body: updateEvidenceBody,
    response: EvidenceRecordSchema,
  }),
  remove: route({
    method: 'delete',
    path: '/evidence/:id',
    access: 'evidence.record',
    summary: 'Delete a record (?version= the version you saw)',
    params: IdParams,
    query: deleteEvidenceQuery,
    status: 204,
    response: null,
  }),
  scanPreview: route({
    method: 'post',
    path: '/columns/:id/evidence/scan-imports',
    access: 'evidence.record',
    summary:
      'Upload a gamma scan (multipart field "file", CSV or XLSX; ?sheet=) and get a preview: columns, units, points, row errors',
    params: IdParams,
    query: scanImportPreviewQuery,
    form: ImportFileForm,
    response: ScanImportPreviewSchema,
  }),
  scanCommit: route({
    method: 'post',
    path: '/columns/:id/evidence/scan-imports/commit',
    access: 'evidence.record',
    summary: 'Store the previewed scan as a gamma-scan record, all or nothing (any row error → 400 with the row errors)',
    params: IdParams,
    body: scanImportCommitBody,
    status: 201,
    response: EvidenceRecordSchema,
    otherResponses: { 400: ImportRowsErrorBodySchema },
  }),
  report: route({
    method: 'get',
    path: '/evidence/:id/report.pdf',
    access: 'read',
    summary:
      'Printable field-evidence report (PDF, A4 landscape): the scan with trays and findings beside the prediction (or the survey tables), cautions, methods (?runId= the run to compare with, else the linked run)',
    params: IdParams,
    query: Obj({ runId: Type.Optional(Uuid()) }),
    response: fileAnswer('application/pdf'),
  }),
};
