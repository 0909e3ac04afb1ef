/** Contracts of rating runs: create, list, read, compare, window, export, report and review. */
import { Type, type Static } from '@sinclair/typebox';
import { LoadBasisSchema } from './loadBasis.js';
import {
  byCheckName,
  CheckNameSchema,
  CheckStatusSchema,
  ChecksSchema,
  EngineWarningSchema,
  MethodOptionsSchema,
  OperatingWindowSchema,
  ResultNumber,
  SectionGeometrySchema,
  SectionSummarySchema,
  TrayDetailsSchema,
  TrayLoadSchema,
} from './rating.js';
import { fileAnswer, route } from './route.js';
import { GeometryProvenanceSchema } from './sections.js';
import { Defaulted, IdParams, Nullable, Obj, PageOf, pageFields, StringEnum, Timestamp, Uuid } from './schema.js';

export const REVIEW_STATUSES = ['draft', 'submitted', 'approved', 'returned'] as const;
export const ReviewStatusSchema = StringEnum(REVIEW_STATUSES);
export const RUN_KINDS = ['rating', 'as-found', 'as-found-design'] as const;
export const RunKindSchema = StringEnum(RUN_KINDS);

export const RunSummarySchema = Obj({
  id: Uuid(),
  columnId: Uuid(),
  label: Type.String(),
  kind: RunKindSchema,
  status: ReviewStatusSchema,
  loadCaseId: Nullable(Uuid()),
  loadCaseName: Type.String(),
  authorId: Nullable(Uuid()),
  authorName: Nullable(Type.String()),
  createdAt: Timestamp(),
  engineVersion: Type.String(),
  controllingCheck: CheckNameSchema,
  controllingTray: Type.Integer(),
  maxPercentOfLimit: ResultNumber(),
  traysOver: Type.Array(Type.Integer()),
  traysNear: Type.Array(Type.Integer()),
  version: Type.Integer(),
});
export type RunSummary = Static<typeof RunSummarySchema>;

export const ReviewEntrySchema = Obj({
  at: Type.String(),
  userId: Type.String(),
  userName: Type.String(),
  action: StringEnum(['submit', 'approve', 'return'] as const),
  comment: Type.String(),
});
export type ReviewEntry = Static<typeof ReviewEntrySchema>;

export const RunSnapshotSectionSchema = Obj({
  sectionId: Uuid(),
  name: Type.String(),
  firstTray: Type.Integer(),
  lastTray: Type.Integer(),
  provenance: GeometryProvenanceSchema,
  provenanceDate: Nullable(Type.String()),
  geometry: SectionGeometrySchema,
  /** true when the geometry came from a geometryOverride (as-found measurements) */
  overridden: Type.Boolean(),
});

/** A run's immutable input: column, load case, the sections and loads rated, method options, engine version. */
export const RunSnapshotSchema = Obj({
  column: Obj({
    id: Uuid(),
    tag: Type.String(),
    numbering: StringEnum(['top-down', 'bottom-up'] as const),
    trayCount: Type.Integer(),
  }),
  loadCase: Obj({ id: Uuid(), name: Type.String(), basis: LoadBasisSchema, version: Type.Integer() }),
  sections: Type.Array(RunSnapshotSectionSchema),
  /** the loads that were rated (trays covered by a snapshot section), ordered by tray */
  loads: Type.Array(TrayLoadSchema),
  methods: MethodOptionsSchema,
  engineVersion: Type.String(),
});

/**
 * A stored tray result. Its checks are those the engine computed when the run was rated: a check added
 * since is absent from older runs (stored runs decode by name, DEVELOPERS.md "Stored runs").
 * Section ids inside stored results are kept as stored (runs of early versions carry other ids).
 */
export const RunTrayResultSchema = Obj({
  tray: Type.Integer(),
  sectionId: Type.String(),
  checks: ChecksSchema,
  details: TrayDetailsSchema,
  controllingCheck: CheckNameSchema,
  warnings: Type.Array(EngineWarningSchema),
});

export const RunSectionResultSchema = Obj({
  sectionId: Type.String(),
  name: Type.String(),
  firstTray: Type.Integer(),
  lastTray: Type.Integer(),
  summary: SectionSummarySchema,
  warnings: Type.Array(EngineWarningSchema),
});

export const RunResultsSchema = Obj({
  engineVersion: Type.String(),
  /** every rated tray, ordered by tray number */
  trays: Type.Array(RunTrayResultSchema),
  sections: Type.Array(RunSectionResultSchema),
  /** trays with loads but no section covering them (not rated) */
  uncoveredTrays: Type.Array(Type.Integer()),
  controllingCheck: CheckNameSchema,
  controllingTray: Type.Integer(),
  maxPercentOfLimit: ResultNumber(),
  traysOver: Type.Array(Type.Integer()),
  traysNear: Type.Array(Type.Integer()),
});

export const RunRecordSchema = Obj({
  ...RunSummarySchema.properties,
  snapshot: RunSnapshotSchema,
  results: RunResultsSchema,
  reviews: Type.Array(ReviewEntrySchema),
  /** last reviewer comment (on approve or return), null before review */
  reviewComment: Nullable(Type.String()),
});

export const RunWindowSchema = Obj({ runId: Uuid(), sectionId: Uuid(), load: TrayLoadSchema, window: OperatingWindowSchema });

const diffNumber = () => Type.Unsafe<number | null>({ type: ['number', 'null'] });
/** b − a in percent of limit, null when a tray is missing from one run */
const CheckDiffSchema = Obj({ a: diffNumber(), b: diffNumber(), delta: diffNumber() });
export const TrayDiffSchema = Obj({
  tray: Type.Integer(),
  controllingA: Nullable(CheckNameSchema),
  controllingB: Nullable(CheckNameSchema),
  controllingChanged: Type.Boolean(),
  statusA: Nullable(CheckStatusSchema),
  statusB: Nullable(CheckStatusSchema),
  /** percentOfLimit of every check in both runs */
  checks: byCheckName(CheckDiffSchema, { additionalProperties: false }),
});
export const RunComparisonSchema = Obj({
  a: RunSummarySchema,
  b: RunSummarySchema,
  trays: Type.Array(TrayDiffSchema),
  /** trays whose controlling check differs between the runs */
  controllingChanged: Type.Array(Type.Integer()),
});

export type RunSnapshotSection = Static<typeof RunSnapshotSectionSchema>;
export type RunSnapshot = Static<typeof RunSnapshotSchema>;
export type RunTrayResult = Static<typeof RunTrayResultSchema>;
export type RunSectionResult = Static<typeof RunSectionResultSchema>;
export type RunResults = Static<typeof RunResultsSchema>;
export type RunRecord = Static<typeof RunRecordSchema>;
export type RunWindow = Static<typeof RunWindowSchema>;
export type CheckDiff = Static<typeof CheckDiffSchema>;
export type TrayDiff = Static<typeof TrayDiffSchema>;
export type RunComparison = Static<typeof RunComparisonSchema>;

const uuid = Uuid();
export const CreateRunBodySchema = Obj({
  columnId: uuid,
  loadCaseId: uuid,
  /** sections to rate (default: every section of the column covering a loaded tray) */
  sectionIds: Type.Optional(Type.Array(uuid, { minItems: 1, maxItems: 100, uniqueItems: true })),
  methods: Type.Optional(MethodOptionsSchema),
  label: Type.Optional(Type.String({ minLength: 1, maxLength: 200 })),
});
export type CreateRunBody = Static<typeof CreateRunBodySchema>;

const comment = { maxLength: 4000, 'x-text': 'multiline' };
export const ReviewActionBodySchema = Obj({
  comment: Type.Optional(Type.String(comment)),
  version: Type.Integer({ minimum: 1 }),
});
export type ReviewActionBody = Static<typeof ReviewActionBodySchema>;
/** approve and return need a comment */
export const ReviewDecisionBodySchema = Obj({
  comment: Type.String({ minLength: 1, ...comment }),
  version: Type.Integer({ minimum: 1 }),
});

export const RelabelBodySchema = Obj({
  label: Type.String({ minLength: 1, maxLength: 200 }),
  version: Type.Integer({ minimum: 1 }),
});

export const ExportQuerySchema = Obj({ format: Defaulted(StringEnum(['csv', 'xlsx'] as const), 'csv') });
export const EXPORT_TYPES = ['text/csv', 'application/vnd.openxmlformats-officedocument.spreadsheetml.sheet'];

/** what a run list can be ordered by (the newest first among equals) */
export const RUN_SORT_KEYS = ['createdAt', 'label', 'maxPercentOfLimit'] as const;
export type RunSortKey = (typeof RUN_SORT_KEYS)[number];

export const RunListQuerySchema = Obj({
  ...pageFields,
  columnId: Type.Optional(uuid),
  status: Type.Optional(ReviewStatusSchema),
  /** also list the runs of ratings as found (the as-found runs and their design working copies) */
  inspection: Defaulted(Type.Boolean(), false),
  sortBy: Defaulted(StringEnum(RUN_SORT_KEYS), 'createdAt'),
  descending: Defaulted(Type.Boolean(), true),
});
export type RunListQuery = Static<typeof RunListQuerySchema>;

export const runContract = {
  list: route({
    method: 'get',
    path: '/runs',
    access: 'read',
    summary:
      'Rating runs the user may see (filter by columnId, status; paged: page, pageSize up to 200, total gives all; ordered by sortBy, newest first by default)',
    query: RunListQuerySchema,
    response: PageOf(RunSummarySchema),
  }),
  create: route({
    method: 'post',
    path: '/runs',
    access: 'ratings.run',
    summary:
      'Rate a load case on the column’s sections and store the run (immutable snapshot and results); answers the run summary',
    body: CreateRunBodySchema,
    status: 201,
    response: RunSummarySchema,
  }),
  compare: route({
    method: 'get',
    path: '/runs/compare',
    access: 'read',
    summary: 'Per-tray differences of two runs (percent of limit of every check; controlling-check changes)',
    query: Obj({ a: uuid, b: uuid }),
    response: RunComparisonSchema,
  }),
  get: route({
    method: 'get',
    path: '/runs/:id',
    access: 'read',
    summary: 'A rating run with snapshot, results and review history',
    params: IdParams,
    response: RunRecordSchema,
  }),
  report: route({
    method: 'get',
    path: '/runs/:id/report.pdf',
    access: 'read',
    summary: 'Printable rating report (PDF, A4 landscape): review record, cautions, charts, per-tray table, methods',
    params: IdParams,
    response: fileAnswer('application/pdf'),
  }),
  relabel: route({
    method: 'patch',
    path: '/runs/:id',
    access: 'ratings.run',
    summary: 'Relabel a run (not when approved; optimistic lock on version)',
    params: IdParams,
    body: RelabelBodySchema,
    response: RunRecordSchema,
  }),
  window: route({
    method: 'get',
    path: '/runs/:id/window/:tray',
    access: 'read',
    summary: 'Operating window of one rated tray (engine curves and the operating point)',
    params: Obj({ id: uuid, tray: Type.Integer({ minimum: 0, maximum: 100000 }) }),
    response: RunWindowSchema,
  }),
  export: route({
    method: 'get',
    path: '/runs/:id/export',
    access: 'read',
    summary: 'Download the per-tray results as CSV or XLSX (?format=csv|xlsx)',
    params: IdParams,
    query: ExportQuerySchema,
    response: fileAnswer(...EXPORT_TYPES),
  }),
  submit: route({
    method: 'post',
    path: '/runs/:id/submit',
    access: 'ratings.run',
    summary: 'Submit a draft or returned run for review (author only)',
    params: IdParams,
    body: ReviewActionBodySchema,
    response: RunRecordSchema,
  }),
  approve: route({
    method: 'post',
    path: '/runs/:id/approve',
    access: 'reviews.approve',
    summary: 'Approve a submitted run with a comment (not your own); approved runs are read-only',
    params: IdParams,
    body: ReviewDecisionBodySchema,
    response: RunRecordSchema,
  }),
  return: route({
    method: 'post',
    path: '/runs/:id/return',
    access: 'reviews.approve',
    summary: 'Return a submitted run to its author with a comment',
    params: IdParams,
    body: ReviewDecisionBodySchema,
    response: RunRecordSchema,
  }),
};
