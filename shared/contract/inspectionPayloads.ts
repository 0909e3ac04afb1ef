/**
 * Payloads of turnaround tray inspections (issue 6): per-tray/per-pass findings and measurements, tolerance
 * checks, photos, punch list, sign-off and the as-found rating. Lengths in mm. Each type is the Static of its
 * schema here (re-exported by shared/types/inspections.ts); the routes are in ./inspections.ts.
 */
import { Type, type Static } from '@sinclair/typebox';
import { CheckNameSchema, CheckStatusSchema, ResultNumber } from './rating.js';
import { Defaulted, Nullable, Obj, StringEnum, Timestamp, Uuid, type Validated } from './schema.js';

export const INSPECTION_STATUSES = ['draft', 'inspector-signed', 'engineer-signed'] as const;
export const DAMAGE_KINDS = ['none', 'uplift', 'crushing', 'both'] as const;
export const PUNCH_PRIORITIES = ['before-box-up', 'if-time-allows', 'next-turnaround'] as const;
export const TOLERANCE_ITEMS = ['weirHeight', 'downcomerClearance', 'traySpacing', 'levelness'] as const;

/** draft → inspector-signed (the inspector) → engineer-signed (the column's engineer); signed records are read-only. */
export const InspectionStatusSchema = StringEnum(INSPECTION_STATUSES);
export const DamageKindSchema = StringEnum(DAMAGE_KINDS);
export const PunchPrioritySchema = StringEnum(PUNCH_PRIORITIES);
/** 'void': withdrawn with a reason (a duplicate, a wrong entry); kept on the list, not counted as open. */
export const PunchStatusSchema = StringEnum(['open', 'closed', 'void'] as const);
export const ToleranceItemSchema = StringEnum(TOLERANCE_ITEMS);

const DateText = () => Type.String({ format: 'date' });
const Text = (maxLength: number) => Type.String({ maxLength });
/** free text that may span lines (notes, findings, actions) */
const Lines = (maxLength: number, minLength = 0) => Type.String({ minLength, maxLength, 'x-text': 'multiline' });
const Mm = () => Type.Number({ minimum: 0, maximum: 5000 });
const Points = () => Type.Array(Mm(), { maxItems: 12 });
const Version = () => Type.Integer({ minimum: 1 });

// ---- a tray's record

export const TrayMeasurementsSchema = Obj({
  /** outlet weir height at several points [mm] */
  weirHeight_mm: Points(),
  /** downcomer clearance at several points along the chord [mm] */
  downcomerClearance_mm: Points(),
  /** levelness, high point minus low point [mm] */
  levelness_mm: Nullable(Mm()),
  traySpacing_mm: Nullable(Mm()),
});

export const TrayFindingsSchema = Obj({
  fouling: Type.Boolean(),
  /** estimated share of holes or valves blocked [%], 0–100 */
  blockedPercent: Type.Number({ minimum: 0, maximum: 100 }),
  corrosion: Type.Boolean(),
  damage: DamageKindSchema,
  valvesMissing: Type.Integer({ minimum: 0, maximum: 100000 }),
  valvesStuck: Type.Integer({ minimum: 0, maximum: 100000 }),
  looseFasteners: Type.Boolean(),
  manwayInstalled: Type.Boolean(),
  closureWitnessed: Type.Boolean(),
  debris: Type.Boolean(),
  /** empty when not given (records stored before it was filled in may lack it) */
  notes: Defaulted(Lines(2000), ''),
});

/** Design values a tray's measurements are checked against (from the column's tray section geometry). */
export const TrayDesignSchema = Obj({
  sectionId: Nullable(Uuid()),
  weirHeight_mm: Nullable(Type.Number()),
  downcomerClearance_mm: Nullable(Type.Number()),
  traySpacing_mm: Nullable(Type.Number()),
  columnDiameter_mm: Nullable(Type.Number()),
});

export const MeasurementCheckSchema = Obj({
  item: ToleranceItemSchema,
  /** 0-based measuring point for multi-point items */
  point: Nullable(Type.Integer()),
  measured: Type.Number(),
  design: Nullable(Type.Number()),
  /** measured − design [mm] (levelness: the measured high−low) */
  deviation: Nullable(Type.Number()),
  /** allowed |deviation| (or max high−low) [mm] */
  tolerance: Nullable(Type.Number()),
  pass: Nullable(Type.Boolean()),
  source: Type.String(),
  message: Type.String(),
});

export const InspectionTrayRecordSchema = Obj({
  id: Uuid(),
  tray: Type.Integer(),
  pass: Type.Integer(),
  findings: TrayFindingsSchema,
  asFound: TrayMeasurementsSchema,
  asLeft: TrayMeasurementsSchema,
  design: TrayDesignSchema,
  checks: Obj({ asFound: Type.Array(MeasurementCheckSchema), asLeft: Type.Array(MeasurementCheckSchema) }),
  version: Type.Integer(),
});

// ---- tolerance rule sets

/** Largest allowed levelness (high − low) for columns up to a diameter. */
export const LevelnessBandSchema = Obj({
  /** upper bound of the column inside diameter for this band [mm], null = no upper bound */
  maxDiameter_mm: Nullable(Type.Number()),
  classA_mm: Type.Number(),
  classB_mm: Type.Number(),
});

const ruleFields = {
  item: ToleranceItemSchema,
  label: Text(200),
  /** symmetric tolerance about the design value [mm] */
  plusMinus_mm: Type.Optional(Type.Number({ exclusiveMinimum: 0, maximum: 100 })),
  /** levelness: a single limit for a project set [mm] */
  max_mm: Type.Optional(Type.Number({ exclusiveMinimum: 0, maximum: 100 })),
  source: Type.String({ minLength: 1, maxLength: 300 }),
};
const setFields = {
  id: Text(60),
  name: Type.String({ minLength: 1, maxLength: 200 }),
  source: Type.String({ minLength: 1, maxLength: 300 }),
  note: Type.Optional(Lines(1000)),
};

/** A rule of a project-specific set, as the user enters it. */
export const ProjectToleranceRuleSchema = Obj(ruleFields);
export const ProjectToleranceRuleSetSchema = Obj({
  ...setFields,
  rules: Type.Array(ProjectToleranceRuleSchema, { maxItems: 10 }),
});

/** A rule as checks read it: the published set adds levelness by diameter and the US wording. */
export const ToleranceRuleSchema = Obj({
  ...ruleFields,
  /** levelness: largest allowed high−low by column diameter */
  byDiameter: Type.Optional(Type.Array(LevelnessBandSchema)),
  us: Type.Optional(Type.String()),
});
export const ToleranceRuleSetSchema = Obj({ ...setFields, rules: Type.Array(ToleranceRuleSchema) });

/** Which rule set an inspection checks against: the published set (class A or B levelness) or a project set. */
export const InspectionRuleChoiceSchema = Obj({
  kind: StringEnum(['published', 'project'] as const),
  levelnessClass: StringEnum(['A', 'B'] as const),
  /** the project-specific set, entered by the user (kind 'project') */
  project: Type.Optional(ProjectToleranceRuleSetSchema),
});

// ---- punch list, photos, signatures

export const PunchItemSchema = Obj({
  id: Uuid(),
  itemNo: Type.Integer(),
  tray: Nullable(Type.Integer()),
  pass: Nullable(Type.Integer()),
  finding: Type.String(),
  action: Type.String(),
  priority: PunchPrioritySchema,
  owner: Type.String(),
  status: PunchStatusSchema,
  closedBy: Nullable(Uuid()),
  closedByName: Nullable(Type.String()),
  closedAt: Nullable(Timestamp()),
  voidedBy: Nullable(Uuid()),
  voidedByName: Nullable(Type.String()),
  voidedAt: Nullable(Timestamp()),
  voidReason: Type.String(),
  version: Type.Integer(),
});

export const PhotoRecordSchema = Obj({
  id: Uuid(),
  tray: Nullable(Type.Integer()),
  pass: Nullable(Type.Integer()),
  finding: Type.String(),
  caption: Type.String(),
  contentType: Type.String(),
  bytes: Type.Integer(),
  width: Nullable(Type.Integer()),
  height: Nullable(Type.Integer()),
  uploadedAt: Timestamp(),
  uploadedByName: Nullable(Type.String()),
});

export const SignatureRecordSchema = Obj({ userId: Uuid(), name: Type.String(), role: Type.String(), at: Timestamp() });

// ---- inspections

const summaryFields = {
  id: Uuid(),
  columnId: Uuid(),
  columnTag: Type.String(),
  turnaround: Type.String(),
  startDate: DateText(),
  endDate: Nullable(DateText()),
  inspectorId: Nullable(Uuid()),
  inspectorName: Nullable(Type.String()),
  status: InspectionStatusSchema,
  trayCount: Type.Integer(),
  openPunchItems: Type.Integer(),
  /** measurements out of tolerance (as found and as left); null in lists, where checks are not computed */
  failedChecks: Nullable(Type.Integer()),
  version: Type.Integer(),
  updatedAt: Timestamp(),
};
export const InspectionSummarySchema = Obj(summaryFields);

export const InspectionRecordSchema = Obj({
  ...summaryFields,
  permitRef: Type.String(),
  gasTestRef: Type.String(),
  rules: InspectionRuleChoiceSchema,
  ruleSet: ToleranceRuleSetSchema,
  notes: Type.String(),
  engineerId: Nullable(Uuid()),
  engineerName: Nullable(Type.String()),
  inspectorSignature: Nullable(SignatureRecordSchema),
  engineerSignature: Nullable(SignatureRecordSchema),
  trays: Type.Array(InspectionTrayRecordSchema),
  punch: Type.Array(PunchItemSchema),
  photos: Type.Array(PhotoRecordSchema),
  asFoundRunIds: Type.Array(Uuid()),
  /** trays of the column (1..columnTrayCount) and the design values of each tray section */
  columnTrayCount: Type.Integer(),
  /** the column's tray sections: span, number of liquid passes (the pass numbers a tray has) and design values */
  designSections: Type.Array(
    Obj({ firstTray: Type.Integer(), lastTray: Type.Integer(), passes: Type.Integer(), design: TrayDesignSchema }),
  ),
});

// ---- request bodies

const headerFields = {
  turnaround: Type.String({ minLength: 1, maxLength: 200 }),
  startDate: DateText(),
  endDate: Type.Optional(Nullable(DateText())),
  permitRef: Type.Optional(Text(200)),
  gasTestRef: Type.Optional(Text(200)),
  rules: Type.Optional(InspectionRuleChoiceSchema),
  notes: Type.Optional(Lines(5000)),
};
export const CreateInspectionBodySchema = Obj({ columnId: Uuid(), ...headerFields });
export const UpdateInspectionBodySchema = Obj({
  ...Type.Partial(Obj(headerFields)).properties,
  version: Version(),
});

/** PUT /inspections/:id/trays/:tray/:pass — create or replace one tray/pass record */
export const SaveTrayBodySchema = Obj({
  findings: TrayFindingsSchema,
  asFound: TrayMeasurementsSchema,
  asLeft: TrayMeasurementsSchema,
  /** omit to create; current version to replace */
  version: Type.Optional(Version()),
});

export const CreatePunchBodySchema = Obj({
  tray: Type.Optional(Nullable(Type.Integer({ minimum: 1, maximum: 500 }))),
  pass: Type.Optional(Nullable(Type.Integer({ minimum: 1, maximum: 4 }))),
  finding: Lines(1000, 1),
  action: Lines(1000, 1),
  priority: PunchPrioritySchema,
  owner: Type.Optional(Text(200)),
});

export const UpdatePunchBodySchema = Obj({
  finding: Type.Optional(Lines(1000, 1)),
  action: Type.Optional(Lines(1000, 1)),
  priority: Type.Optional(PunchPrioritySchema),
  owner: Type.Optional(Text(200)),
  /** open or closed; voiding goes through the void route (it needs a reason) */
  status: Type.Optional(StringEnum(['open', 'closed'] as const)),
  version: Version(),
});

export const VoidPunchBodySchema = Obj({ reason: Lines(1000, 1), version: Version() });

export const SignBodySchema = Obj({ version: Version() });

export const AsFoundBodySchema = Obj({
  loadCaseId: Uuid(),
  /** how per-tray measurements are combined per section: mean, or the worst tray (lowest clearance, highest weir, most plugging) */
  combine: Defaulted(StringEnum(['average', 'worst'] as const), 'average'),
  /** which measurements are rated */
  state: Defaulted(StringEnum(['asFound', 'asLeft'] as const), 'asFound'),
});

/** The text fields sent with a photo (multipart fields arrive as text; the service reads the numbers). */
export const photoFormFields = {
  tray: Type.Optional(Type.String({ maxLength: 10 })),
  pass: Type.Optional(Type.String({ maxLength: 10 })),
  finding: Type.Optional(Lines(1000)),
  caption: Type.Optional(Lines(2000)),
};

// ---- as-found rating

const RunHeadline = Obj({
  controllingTray: Type.Integer(),
  controllingCheck: CheckNameSchema,
  maxPercentOfLimit: ResultNumber(),
});

export const AsFoundTrayChangeSchema = Obj({
  tray: Type.Integer(),
  designControlling: Nullable(CheckNameSchema),
  asFoundControlling: Nullable(CheckNameSchema),
  controllingChanged: Type.Boolean(),
  /** checks whose status changed (ok/near/over) */
  movedChecks: Type.Array(
    Obj({
      check: CheckNameSchema,
      design: ResultNumber(),
      asFound: ResultNumber(),
      designStatus: CheckStatusSchema,
      asFoundStatus: CheckStatusSchema,
    }),
  ),
  /** dry-tray head of the tray's liquid [mm], design and as found */
  dryPressureDrop_mm: Obj({ design: ResultNumber(), asFound: ResultNumber() }),
  /** the load case's liquid density on the tray [kg/m³], to show the dry ΔP in the user's ΔP unit */
  liquidDensity_kg_m3: Nullable(Type.Number()),
});

export const AsFoundResultSchema = Obj({
  designRunId: Uuid(),
  asFoundRunId: Uuid(),
  /** geometry used per section id (after measurements, plugging and missing valves) */
  geometry: Type.Record(
    Type.String(),
    Obj({
      weirHeight_mm: Type.Number(),
      downcomerClearance_mm: Type.Number(),
      holeArea_m2: Type.Number(),
      valveCount: Nullable(Type.Integer()),
      blockedPercent: Type.Number(),
      trays: Type.Array(Type.Integer()),
    }),
  ),
  design: RunHeadline,
  asFound: RunHeadline,
  trays: Type.Array(AsFoundTrayChangeSchema),
});

export type InspectionStatus = Static<typeof InspectionStatusSchema>;
export type DamageKind = Static<typeof DamageKindSchema>;
export type PunchPriority = Static<typeof PunchPrioritySchema>;
export type PunchStatus = Static<typeof PunchStatusSchema>;
export type ToleranceItem = Static<typeof ToleranceItemSchema>;
export type TrayMeasurements = Static<typeof TrayMeasurementsSchema>;
export type TrayFindings = Static<typeof TrayFindingsSchema>;
export type TrayDesign = Static<typeof TrayDesignSchema>;
export type MeasurementCheck = Static<typeof MeasurementCheckSchema>;
export type InspectionTrayRecord = Static<typeof InspectionTrayRecordSchema>;
export type LevelnessBand = Static<typeof LevelnessBandSchema>;
export type ToleranceRule = Static<typeof ToleranceRuleSchema>;
export type ToleranceRuleSet = Static<typeof ToleranceRuleSetSchema>;
export type InspectionRuleChoice = Static<typeof InspectionRuleChoiceSchema>;
export type PunchItem = Static<typeof PunchItemSchema>;
export type PhotoRecord = Static<typeof PhotoRecordSchema>;
export type SignatureRecord = Static<typeof SignatureRecordSchema>;
export type InspectionSummary = Static<typeof InspectionSummarySchema>;
export type InspectionRecord = Static<typeof InspectionRecordSchema>;
export type CreateInspectionBody = Static<typeof CreateInspectionBodySchema>;
export type UpdateInspectionBody = Static<typeof UpdateInspectionBodySchema>;
export type SaveTrayBody = Static<typeof SaveTrayBodySchema>;
export type CreatePunchBody = Static<typeof CreatePunchBodySchema>;
export type UpdatePunchBody = Static<typeof UpdatePunchBodySchema>;
export type VoidPunchBody = Static<typeof VoidPunchBodySchema>;
export type SignBody = Static<typeof SignBodySchema>;
/** what a client sends; the service gets `AsFoundRequest` (defaults filled in) */
export type AsFoundBody = Static<typeof AsFoundBodySchema>;
export type AsFoundRequest = Validated<typeof AsFoundBodySchema>;
export type AsFoundTrayChange = Static<typeof AsFoundTrayChangeSchema>;
export type AsFoundResult = Static<typeof AsFoundResultSchema>;
