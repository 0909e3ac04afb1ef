/**
 * Contracts of the heat-recovery plans (issue 17) and of the load cases' pump-around duty tags. The engine's
 * own payloads (HeatPlanInput, PlanSuggestion, BoundaryPoint, …) are typed once in shared/types/heatPlan.ts;
 * here they get the schemas that check the answers.
 */
import { Type, type Static } from '@sinclair/typebox';
import { heatPlanSchema } from '../schemas/heatPlan.js';
import { dutySweepSchema, pumpAroundSpecSchema, pumpAroundStudySchema } from '../schemas/pumpAroundStudy.js';
import { methodOptionsSchema } from '../schemas/ratingRequest.js';
import { CHECK_NAMES } from '../types/rating.js';
import { REVIEW_STATUSES } from '../types/runs.js';
import type {
  BoundaryPoint,
  PlanSuggestion,
  PlanViolation,
  PointLoadsSource,
  PumpAroundHeat,
  SectionFractionation,
} from '../types/heatPlan.js';
import { fileAnswer, route } from './route.js';
import { Defaulted, FromJson, IdParams, Nullable, Obj, StringEnum, Timestamp, Uuid } from './schema.js';

/** A contract part typed by its payload type (the engine's result types, shared/types/heatPlan.ts). */
const json = <T>(schema: object) => Type.Unsafe<T>(schema);
const Num = () => Type.Number();
const Duties = () => Type.Array(Type.Number());
const CheckName = StringEnum(CHECK_NAMES);
const PlanCheck = StringEnum([...CHECK_NAMES, 'dry-out'] as const);
const Sweep = FromJson({
  ...dutySweepSchema,
  properties: { ...dutySweepSchema.properties, steps: { type: 'integer', minimum: 1, maximum: 40 } },
} as const);
const pa = pumpAroundSpecSchema.properties;
const temperature = { type: 'number', minimum: -100, maximum: 800 } as const;
const duty = Type.Number({ minimum: 0, maximum: 1e6 });

// ---- load-case duty tags

export const PumpAroundDutyTagSchema = Obj({ pumpAroundId: Uuid(), duty_kW: duty });
export const PutPumpAroundDutiesBodySchema = Obj({
  duties: Type.Array(PumpAroundDutyTagSchema, { maxItems: 20 }),
  version: Type.Integer({ minimum: 1 }),
});
export type PutPumpAroundDutiesBody = Static<typeof PutPumpAroundDutiesBodySchema>;
/** The answer of a tag change: the load case's tags and its new version. */
export const LoadCaseDutyTagsSchema = Obj({
  id: Uuid(),
  pumpAroundDuties: Type.Array(PumpAroundDutyTagSchema),
  version: Type.Integer(),
});
export type LoadCaseDutyTags = Static<typeof LoadCaseDutyTagsSchema>;

// ---- request

export const HeatPlanPumpAroundChoiceSchema = Obj({
  pumpAroundId: Uuid(),
  sweep: Sweep,
  liquidHeatCapacity_kJ_kgK: FromJson(pa.liquidHeatCapacity_kJ_kgK),
  /** give one of returnTemperatureDrop_K or circulation_kg_h */
  returnTemperatureDrop_K: Type.Optional(FromJson(pa.returnTemperatureDrop_K)),
  circulation_kg_h: Type.Optional(FromJson(pa.circulation_kg_h)),
  /** draw temperature [°C]; when absent, the base load case's temperature on the draw tray */
  drawTemperature_C: Type.Optional(FromJson(temperature)),
  /** duty in the base load case; defaults to the pump-around's stored duty */
  baseDuty_kW: Type.Optional(FromJson(pa.baseDuty_kW)),
});
export type HeatPlanPumpAroundChoice = Static<typeof HeatPlanPumpAroundChoiceSchema>;

export const CreateHeatPlanBodySchema = Obj({
  label: Type.Optional(Type.String({ maxLength: 120 })),
  /** base load case (traffic at the base duties) */
  loadCaseId: Uuid(),
  /** two or three of the column's pump-arounds, in the order of the map's axes */
  pumpArounds: Type.Array(HeatPlanPumpAroundChoiceSchema, { minItems: 2, maxItems: 3 }),
  latentHeat_kJ_kg: FromJson(pumpAroundStudySchema.properties.latentHeat_kJ_kg),
  /** heat counts as useful above this temperature [°C] (what the preheat train can take) */
  usefulAboveTemperature_C: FromJson(temperature),
  /** fraction of the dry-out duty kept as margin; default 0.7 (common practice) */
  margin: Type.Optional(Type.Number({ exclusiveMinimum: 0, maximum: 1 })),
  /** a section's liquid-to-vapour ratio is flagged below this fraction of the base case's; default 0.8 */
  liquidToVapourThreshold: Type.Optional(Type.Number({ exclusiveMinimum: 0, maximum: 1 })),
  /** overhead condenser duty of the base case [kW], to show the duty left; optional */
  baseCondenserDuty_kW: Type.Optional(duty),
  /** two or more load cases tagged with these pump-arounds' duties (simulation cases) for the calibration fit */
  simulationCaseIds: Type.Optional(Type.Array(Uuid(), { minItems: 2, maxItems: 12 })),
  /** true when the base case's zone liquid carries the circulation (as a rating case does) */
  zoneLiquidIncludesCirculation: Defaulted(Type.Boolean(), false),
  methods: Type.Optional(FromJson(methodOptionsSchema)),
});
export type CreateHeatPlanBody = Static<typeof CreateHeatPlanBodySchema>;

export const HeatPlanReviewBodySchema = Obj({
  comment: Type.Optional(Type.String({ maxLength: 4000, 'x-text': 'multiline' })),
  version: Type.Integer({ minimum: 1 }),
});
export type HeatPlanReviewBody = Static<typeof HeatPlanReviewBodySchema>;

// ---- answers

const ViolationSchema = Obj({ tray: Type.Integer(), check: PlanCheck });
const SuggestionSchema = json<PlanSuggestion>(
  Obj({
    duties_kW: Duties(),
    recoveredHeat_kW: Num(),
    recoveredAboveTemperature_kW: Num(),
    condenserDutyChange_kW: Num(),
    margin: Num(),
    limitedBy: Nullable(Obj({ tray: Type.Integer(), check: PlanCheck, margin: Type.Boolean() })),
  }),
);
const BoundarySchema = json<BoundaryPoint>(
  Obj({ duties_kW: Duties(), tray: Type.Integer(), check: PlanCheck, along: Type.Integer(), feasibleBelow: Type.Boolean() }),
);
const HeatSchema = json<PumpAroundHeat>(
  Obj({
    name: Type.String(),
    duty_kW: Num(),
    circulation_kg_h: Num(),
    drawTemperature_C: Num(),
    returnTemperature_C: Num(),
    aboveTemperature_kW: Num(),
  }),
);
const FractionationSchema = json<SectionFractionation>(
  Obj({
    section: Type.String(),
    liquidToVapour: Nullable(Num()),
    baseLiquidToVapour: Nullable(Num()),
    ratioToBase: Nullable(Num()),
    flagged: Type.Boolean(),
  }),
);

const gridPointFields = {
  duties_kW: Duties(),
  condenserDutyChange_kW: Num(),
  recoveredHeat_kW: Num(),
  recoveredAboveTemperature_kW: Num(),
  feasible: Type.Boolean(),
  withinMargin: Type.Boolean(),
  violations: Type.Array(json<PlanViolation>(ViolationSchema)),
  heat: Type.Array(HeatSchema),
  fractionation: Type.Array(FractionationSchema),
  /** highest percent of limit over every tray and check */
  worstPercent: Num(),
  worstTray: Nullable(Type.Integer()),
  worstCheck: Nullable(CheckName),
  /** where the point's loads came from (plans with simulation cases; absent: the model) */
  loads: Type.Optional(
    json<PointLoadsSource>(
      Obj({
        source: StringEnum(['case', 'interpolated', 'model'] as const),
        cases: Type.Array(Type.String()),
        fraction: Nullable(Num()),
      }),
    ),
  ),
};
/** A point of the duty grid for the map: the engine's point without its trays, plus the worst tray. */
export const PlanGridPointSchema = Obj(gridPointFields);
export type PlanGridPoint = Static<typeof PlanGridPointSchema>;

/** One tray at one duty point, stored: traffic and, per check (in `checkNames` order), percent of limit and status. */
export const SlimPlanTraySchema = Obj({
  tray: Type.Integer(),
  vapourMassFlow_kg_h: Num(),
  liquidMassFlow_kg_h: Num(),
  dry: Type.Boolean(),
  percent: Type.Array(Num()),
  status: Type.Array(StringEnum(['ok', 'near', 'over', 'na'] as const)),
  controllingCheck: CheckName,
});
export type SlimPlanTray = Static<typeof SlimPlanTraySchema>;

export const SlimPlanPointSchema = Obj({ ...gridPointFields, trays: Type.Array(SlimPlanTraySchema) });
export type SlimPlanPoint = Static<typeof SlimPlanPointSchema>;

export const PlanKeyKindSchema = StringEnum(['base', 'suggestion'] as const);
export type PlanKeyKind = Static<typeof PlanKeyKindSchema>;

/** Model against simulation, tray by tray, and the fit's quality (from the engine's calibration). */
export const PlanCalibrationViewSchema = Obj({
  /** one line stating the fit quality, for pages and the report */
  summary: Type.String(),
  /** the fitted values by name (latent heat per zone, property drift) */
  fitted: Type.Array(Obj({ name: Type.String(), value: Num(), unit: Type.String() })),
  rmsRelative: Nullable(Num()),
  cases: Type.Array(
    Obj({
      loadCaseId: Uuid(),
      name: Type.String(),
      duties_kW: Duties(),
      trays: Type.Array(
        Obj({
          tray: Type.Integer(),
          modelVapour_kg_h: Num(),
          simVapour_kg_h: Num(),
          modelLiquid_kg_h: Num(),
          simLiquid_kg_h: Num(),
        }),
      ),
    }),
  ),
});
export type PlanCalibrationView = Static<typeof PlanCalibrationViewSchema>;

/** The stored result: the engine's result by field name with grid points summarised (their trays are stored apart). */
export const StoredHeatPlanResultSchema = Obj({
  pumpArounds: Type.Array(Type.String()),
  baseDuties_kW: Duties(),
  margin: Num(),
  usefulAboveTemperature_C: Num(),
  boundary: Type.Array(BoundarySchema),
  suggestion: Nullable(SuggestionSchema),
  marginSensitivity: Type.Array(Obj({ margin: Num(), suggestion: Nullable(SuggestionSchema) })),
  notes: Type.Array(Type.String()),
  checkNames: Type.Array(CheckName),
  /** duties of each axis, in the input's pump-around order */
  axes: Type.Array(Duties()),
  grid: Type.Array(PlanGridPointSchema),
  keyPoints: Type.Array(Obj({ kind: PlanKeyKindSchema, point: SlimPlanPointSchema })),
  calibration: Nullable(PlanCalibrationViewSchema),
  /** the correlations the ratings used (method ids), for the methods and sources of the report */
  methodIds: Type.Array(Type.String()),
});
export type StoredHeatPlanResult = Static<typeof StoredHeatPlanResultSchema>;

/** Where the plan's inputs came from, kept with the snapshot. */
export const HeatPlanSourceSchema = Obj({
  columnTag: Type.String(),
  loadCaseId: Uuid(),
  loadCaseName: Type.String(),
  pumpArounds: Type.Array(Obj({ id: Uuid(), name: Type.String(), drawTray: Type.Integer(), returnTray: Type.Integer() })),
  simulationCases: Type.Array(Obj({ id: Uuid(), name: Type.String(), duties_kW: Duties() })),
  request: CreateHeatPlanBodySchema,
});
export type HeatPlanSource = Static<typeof HeatPlanSourceSchema>;

/** What is stored as the inputs snapshot: the exact engine input and its source. */
export const HeatPlanInputsSnapshotSchema = Obj({ source: HeatPlanSourceSchema, input: FromJson(heatPlanSchema) });
export type HeatPlanInputsSnapshot = Static<typeof HeatPlanInputsSnapshotSchema>;

const summaryFields = {
  id: Uuid(),
  columnId: Uuid(),
  label: Type.String(),
  pumpAroundNames: Type.Array(Type.String()),
  loadCaseName: Type.String(),
  status: StringEnum(REVIEW_STATUSES),
  authorId: Uuid(),
  authorName: Type.String(),
  suggestedDuties_kW: Nullable(Duties()),
  recoveredAbove_kW: Nullable(Num()),
  createdAt: Timestamp(),
  version: Type.Integer(),
};
export const HeatPlanSummarySchema = Obj(summaryFields);
export type HeatPlanSummary = Static<typeof HeatPlanSummarySchema>;

const ReviewEntrySchema = Obj({
  at: Timestamp(),
  userId: Uuid(),
  userName: Type.String(),
  action: StringEnum(['submit', 'approve', 'return'] as const),
  comment: Type.String(),
});

export const HeatPlanRecordSchema = Obj({
  ...summaryFields,
  columnTag: Type.String(),
  inputs: HeatPlanInputsSnapshotSchema,
  result: StoredHeatPlanResultSchema,
  reviewerId: Nullable(Uuid()),
  reviewerName: Nullable(Type.String()),
  reviewComment: Nullable(Type.String()),
  reviews: Type.Array(ReviewEntrySchema),
  submittedAt: Nullable(Timestamp()),
  reviewedAt: Nullable(Timestamp()),
});
export type HeatPlanRecord = Static<typeof HeatPlanRecordSchema>;

export const PlanPointParams = Obj({ id: Uuid(), index: Type.Integer({ minimum: 0, maximum: 100000 }) });
export const ExportFormatQuery = Obj({ format: Defaulted(StringEnum(['csv', 'xlsx'] as const), 'csv') });

const review = <A extends 'submit' | 'approve' | 'return'>(
  action: A,
  access: 'ratings.run' | 'reviews.approve',
  summary: string,
) =>
  route({
    method: 'post',
    path: `/heat-plans/:id/${action}` as const,
    access,
    summary,
    params: IdParams,
    body: HeatPlanReviewBodySchema,
    response: HeatPlanRecordSchema,
  });

export const heatPlanContract = {
  putDuties: route({
    method: 'put',
    path: '/load-cases/:id/pump-around-duties',
    access: 'loads.edit',
    summary: 'Tag a load case with the pump-around duties it was made at (replaces the tags; optimistic lock on version)',
    params: IdParams,
    body: PutPumpAroundDutiesBodySchema,
    response: LoadCaseDutyTagsSchema,
  }),
  create: route({
    method: 'post',
    path: '/columns/:id/heat-plans',
    access: 'ratings.run',
    summary: 'Rate and store a heat-recovery plan: two or three pump-arounds over a grid of duties, boundary, suggestion',
    params: IdParams,
    body: CreateHeatPlanBodySchema,
    status: 201,
    response: HeatPlanRecordSchema,
  }),
  list: route({
    method: 'get',
    path: '/columns/:id/heat-plans',
    access: 'read',
    summary: 'Heat-recovery plans of a column, newest first',
    params: IdParams,
    response: Type.Array(HeatPlanSummarySchema),
  }),
  get: route({
    method: 'get',
    path: '/heat-plans/:id',
    access: 'read',
    summary: 'One heat-recovery plan: inputs, duty map, boundary, suggestion, review state (grid points without their trays)',
    params: IdParams,
    response: HeatPlanRecordSchema,
  }),
  point: route({
    method: 'get',
    path: '/heat-plans/:id/points/:index',
    access: 'read',
    summary: 'One grid point of a plan with every tray: traffic and percent of limit per check',
    params: PlanPointParams,
    response: SlimPlanPointSchema,
  }),
  report: route({
    method: 'get',
    path: '/heat-plans/:id/report.pdf',
    access: 'read',
    summary:
      'Printable plan report (PDF): inputs, suggested split, margin table, limits by tray and check, fit, cautions, methods',
    params: IdParams,
    response: fileAnswer('application/pdf'),
  }),
  export: route({
    method: 'get',
    path: '/heat-plans/:id/export',
    access: 'read',
    summary: 'Download the plan (inputs, suggestion, margin table, limits, traffic at the suggestion, cautions) as CSV or XLSX',
    params: IdParams,
    query: ExportFormatQuery,
    response: fileAnswer('text/csv', 'application/vnd.openxmlformats-officedocument.spreadsheetml.sheet'),
  }),
  submit: review('submit', 'ratings.run', 'Submit a draft or returned plan for review (author)'),
  approve: review('approve', 'reviews.approve', 'Approve a submitted plan (reviewer, not the author); it becomes read-only'),
  return: review('return', 'reviews.approve', 'Return a submitted plan to its author with a comment'),
};
