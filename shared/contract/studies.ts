/**
 * Contracts of the stored pump-around duty studies (issue 5). The engine's own payloads (StudyInput and the
 * solved duties of StudyResult) are typed in shared/types/pumpAround.ts; the stored and sent forms are
 * declared here once. SI units; the unit is part of each field name.
 */
import { Type, type Static } from '@sinclair/typebox';
import { dutySweepSchema, pumpAroundSpecSchema, pumpAroundStudySchema } from '../schemas/pumpAroundStudy.js';
import { CHECK_NAMES } from '../types/rating.js';
import { MethodOptionsSchema, ResultNumber } from './rating.js';
import { ExportQuerySchema, EXPORT_TYPES, REVIEW_STATUSES, ReviewEntrySchema } from './runs.js';
import { fileAnswer, route } from './route.js';
import { FromJson, IdParams, Nullable, Obj, StringEnum, Timestamp, Uuid } from './schema.js';

const pa = pumpAroundSpecSchema.properties;
const CheckName = StringEnum(CHECK_NAMES);
const Tray = () => Type.Integer();

/** Stored studies keep at most 100 sweep intervals (101 points) to bound their size. */
export const STORED_STUDY_MAX_STEPS = 100;

// ---- requests

export const CreateStudyBodySchema = Obj({
  label: Type.Optional(Type.String({ maxLength: 120 })),
  loadCaseId: Uuid(),
  pumpAroundId: Uuid(),
  latentHeat_kJ_kg: FromJson(pumpAroundStudySchema.properties.latentHeat_kJ_kg),
  /** defaults to the pump-around's stored value when it has one */
  liquidHeatCapacity_kJ_kgK: Type.Optional(FromJson(pa.liquidHeatCapacity_kJ_kgK)),
  /** give one of returnTemperatureDrop_K or circulation_kg_h (else the pump-around's stored one is used) */
  returnTemperatureDrop_K: Type.Optional(FromJson(pa.returnTemperatureDrop_K)),
  circulation_kg_h: Type.Optional(FromJson(pa.circulation_kg_h)),
  /** duty of the pump-around in the base load case; defaults to the pump-around's stored duty */
  baseDuty_kW: Type.Optional(FromJson(pa.baseDuty_kW)),
  /**
   * true when the load case's liquid on the zone trays already carries the pump-around circulation (as a
   * rating case does); the base circulation is then taken off before the study. false: the zone liquid is
   * the net internal liquid, as the engine expects. Required, no default: a wrong guess either doubles the
   * circulation or leaves it out, so the caller must say which.
   */
  zoneLiquidIncludesCirculation: Type.Boolean(),
  sweep: FromJson({
    ...dutySweepSchema,
    properties: { ...dutySweepSchema.properties, steps: { type: 'integer', minimum: 1, maximum: STORED_STUDY_MAX_STEPS } },
  } as const),
  /** fraction of the dry-out duty recommended at most; default 0.7 (common practice) */
  margin: Type.Optional(Type.Number({ exclusiveMinimum: 0, maximum: 1, default: 0.7 })),
  methods: Type.Optional(MethodOptionsSchema),
});
/** POST /columns/:id/studies */
export type CreateStudyBody = Static<typeof CreateStudyBodySchema>;

/** POST /studies/:id/submit | approve | return (a comment is required to return). */
export const StudyReviewBodySchema = Obj({
  comment: Type.Optional(Type.String({ maxLength: 4000, 'x-text': 'multiline' })),
  version: Type.Integer({ minimum: 1 }),
});
export type StudyReviewBody = Static<typeof StudyReviewBodySchema>;

/** POST /studies/latent-heat: λ ≈ condenser duty / overhead vapour, from the engine's estimateLatentHeat. */
export const LatentHeatBodySchema = Obj({
  condenserDuty_kW: Type.Number({ exclusiveMinimum: 0, maximum: 1e6 }),
  overheadVapour_kg_h: Type.Number({ exclusiveMinimum: 0, maximum: 1e8 }),
});
export type LatentHeatBody = Static<typeof LatentHeatBodySchema>;
export const LatentHeatAnswerSchema = Obj({ latentHeat_kJ_kg: Type.Number() });
export type LatentHeatAnswer = Static<typeof LatentHeatAnswerSchema>;

// ---- answers

/** Where the study's inputs came from, kept with the snapshot. */
export const StudySourceSchema = Obj({
  columnTag: Type.String(),
  loadCaseId: Uuid(),
  loadCaseName: Type.String(),
  pumpAroundId: Uuid(),
  pumpAroundName: Type.String(),
  request: CreateStudyBodySchema,
});
export type StudySource = Static<typeof StudySourceSchema>;

/** What is stored as the inputs snapshot: the exact engine input and its source. */
export const StudyInputsSnapshotSchema = Obj({ source: StudySourceSchema, input: FromJson(pumpAroundStudySchema) });
export type StudyInputsSnapshot = Static<typeof StudyInputsSnapshotSchema>;

/** One tray at one duty, slimmed: traffic and, per check (in `checkNames` order), percent of limit and status. */
export const SlimTrayPointSchema = Obj({
  tray: Tray(),
  vapourMassFlow_kg_h: Type.Number(),
  liquidMassFlow_kg_h: Type.Number(),
  region: StringEnum(['above', 'zone', 'below'] as const),
  dry: Type.Boolean(),
  /** percent of limit per check, rounded to 0.01 %, same order as SlimStudyResult.checkNames */
  percent: Type.Array(Type.Number()),
  status: Type.Array(StringEnum(['ok', 'near', 'over', 'na'] as const)),
  controllingCheck: CheckName,
});
export type SlimTrayPoint = Static<typeof SlimTrayPointSchema>;

export const SlimStudyPointSchema = Obj({
  duty_kW: Type.Number(),
  condenserDutyChange_kW: Type.Number(),
  reflux_kg_h: Type.Number(),
  heatRecovered_kW: Type.Number(),
  liquidToVapourAboveZone: ResultNumber(),
  circulation_kg_h: Type.Number(),
  returnTemperatureDrop_K: Type.Number(),
  dryTrays: Type.Array(Tray()),
  trays: Type.Array(SlimTrayPointSchema),
});
export type SlimStudyPoint = Static<typeof SlimStudyPointSchema>;

/** Liquid at which a tray above the zone reaches its minimum crest (Francis), for the limit lines. */
export const MinimumLiquidLineSchema = Obj({ tray: Tray(), minimumLiquid_kg_h: Type.Number() });
export type MinimumLiquidLine = Static<typeof MinimumLiquidLineSchema>;

export const KeyPointKindSchema = StringEnum(['base', 'limiting', 'recommended'] as const);
export type KeyPointKind = Static<typeof KeyPointKindSchema>;

const duty = () => Nullable(Type.Number());
const tray = () => Nullable(Tray());
/** The stored result: the engine's duties and notes exactly, the sweep points slimmed. */
export const SlimStudyResultSchema = Obj({
  pumpAround: Type.String(),
  baseDuty_kW: Type.Number(),
  dryOutDuty_kW: duty(),
  dryOutTray: tray(),
  minimumLiquidDuty_kW: duty(),
  minimumLiquidTray: tray(),
  minimumLiquidCheck: Nullable(CheckName),
  zoneOverloadDuty_kW: duty(),
  zoneOverloadTray: tray(),
  zoneOverloadCheck: Nullable(CheckName),
  limitingDuty_kW: duty(),
  limitingTray: tray(),
  limitingCheck: Nullable(StringEnum([...CHECK_NAMES, 'dryOut'] as const)),
  recommendedDuty_kW: duty(),
  margin: Type.Number(),
  notes: Type.Array(Type.String()),
  checkNames: Type.Array(CheckName),
  minimumLiquidLines: Type.Array(MinimumLiquidLineSchema),
  /** the sweep points, in sweep order */
  points: Type.Array(SlimStudyPointSchema),
  /** the traffic at the base, limiting and recommended duties (rated like the sweep points) */
  keyPoints: Type.Array(Obj({ kind: KeyPointKindSchema, point: SlimStudyPointSchema })),
});
export type SlimStudyResult = Static<typeof SlimStudyResultSchema>;

const summaryFields = {
  id: Uuid(),
  columnId: Uuid(),
  label: Type.String(),
  pumpAroundName: Type.String(),
  loadCaseName: Type.String(),
  /** the same life cycle as a rating run: approved is read-only */
  status: StringEnum(REVIEW_STATUSES),
  authorId: Uuid(),
  authorName: Type.String(),
  dryOutDuty_kW: duty(),
  limitingDuty_kW: duty(),
  recommendedDuty_kW: duty(),
  createdAt: Timestamp(),
  version: Type.Integer(),
};
export const StudySummarySchema = Obj(summaryFields);
export type StudySummary = Static<typeof StudySummarySchema>;

export const StudyRecordSchema = Obj({
  ...summaryFields,
  columnTag: Type.String(),
  inputs: StudyInputsSnapshotSchema,
  result: SlimStudyResultSchema,
  reviewerId: Nullable(Uuid()),
  reviewerName: Nullable(Type.String()),
  reviewComment: Nullable(Type.String()),
  reviews: Type.Array(ReviewEntrySchema),
  submittedAt: Nullable(Timestamp()),
  reviewedAt: Nullable(Timestamp()),
});
export type StudyRecord = Static<typeof StudyRecordSchema>;

const review = <A extends 'submit' | 'approve' | 'return'>(
  action: A,
  access: 'ratings.run' | 'reviews.approve',
  summary: string,
) =>
  route({
    method: 'post',
    path: `/studies/:id/${action}` as const,
    access,
    summary,
    params: IdParams,
    body: StudyReviewBodySchema,
    response: StudyRecordSchema,
  });

export const studyContract = {
  create: route({
    method: 'post',
    path: '/columns/:id/studies',
    access: 'ratings.run',
    summary: 'Run and store a pump-around duty study of the column (base load case, one pump-around, duty sweep)',
    params: IdParams,
    body: CreateStudyBodySchema,
    status: 201,
    response: StudyRecordSchema,
  }),
  list: route({
    method: 'get',
    path: '/columns/:id/studies',
    access: 'read',
    summary: 'Pump-around duty studies of a column, newest first',
    params: IdParams,
    response: Type.Array(StudySummarySchema),
  }),
  get: route({
    method: 'get',
    path: '/studies/:id',
    access: 'read',
    summary: 'One pump-around duty study: inputs snapshot, result per duty, review state',
    params: IdParams,
    response: StudyRecordSchema,
  }),
  report: route({
    method: 'get',
    path: '/studies/:id/report.pdf',
    access: 'read',
    summary: 'Printable study report (PDF): inputs, duties found, traffic at the base duty, review record, cautions',
    params: IdParams,
    response: fileAnswer('application/pdf'),
  }),
  export: route({
    method: 'get',
    path: '/studies/:id/export',
    access: 'read',
    summary: 'Download the study (inputs, duties found, traffic at the base duty, cautions) as CSV or XLSX (?format=csv|xlsx)',
    params: IdParams,
    query: ExportQuerySchema,
    response: fileAnswer(...EXPORT_TYPES),
  }),
  submit: review('submit', 'ratings.run', 'Submit a draft or returned study for review (author)'),
  approve: review('approve', 'reviews.approve', 'Approve a submitted study (reviewer, not the author); it becomes read-only'),
  return: review('return', 'reviews.approve', 'Return a submitted study to its author with a comment'),
  latentHeat: route({
    method: 'post',
    path: '/studies/latent-heat',
    access: 'read',
    summary: 'Estimate the latent heat of the overhead vapour: condenser duty / overhead vapour flow',
    body: LatentHeatBodySchema,
    response: LatentHeatAnswerSchema,
  }),
};
