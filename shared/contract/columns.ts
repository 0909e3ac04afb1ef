/** Contracts of sites, process units and columns (with what hangs off a column, for its page). */
import { Type, type Static } from '@sinclair/typebox';
import { LoadCaseSummarySchema } from './loads.js';
import { route } from './route.js';
import { RunSummarySchema } from './runs.js';
import { IdParams, ItemsOf, Nullable, Obj, PageOf, pageFields, StringEnum, Timestamp, Uuid } from './schema.js';
import { Name, PumpAroundRecordSchema, Tray, TraySectionRecordSchema, Version } from './sections.js';

// ---- sites and units

/** A site as the column pages see it (the administrators' list adds its members: SiteRecord in auth.ts). */
export const SiteSummarySchema = Obj({ id: Uuid(), name: Type.String(), location: Type.String(), version: Type.Integer() });
export type SiteSummary = Static<typeof SiteSummarySchema>;
export const CreateSiteBodySchema = Obj({ name: Name(), location: Type.Optional(Type.String({ maxLength: 200 })) });
export type CreateSiteBody = Static<typeof CreateSiteBodySchema>;

export const UnitRecordSchema = Obj({ id: Uuid(), siteId: Uuid(), name: Type.String(), version: Type.Integer() });
export type UnitRecord = Static<typeof UnitRecordSchema>;
export const CreateUnitBodySchema = Obj({ siteId: Uuid(), name: Name() });
export type CreateUnitBody = Static<typeof CreateUnitBodySchema>;

// ---- columns

export const TrayNumberingSchema = StringEnum(['top-down', 'bottom-up'] as const);
export type TrayNumbering = Static<typeof TrayNumberingSchema>;

/** A flag on one tray of a column: feed, side draw, pump-around draw/return, chimney tray, free note. */
export const TrayMarkKindSchema = StringEnum(['feed', 'side-draw', 'pa-draw', 'pa-return', 'chimney', 'note'] as const);
export type TrayMarkKind = Static<typeof TrayMarkKindSchema>;
export const TrayMarkSchema = Obj({ tray: Tray(), kind: TrayMarkKindSchema, label: Type.String({ maxLength: 200 }) });
export type TrayMark = Static<typeof TrayMarkSchema>;
const TrayMarks = () => Type.Array(TrayMarkSchema, { maxItems: 500 });

const editable = {
  tag: Name(40),
  service: Type.Optional(Type.String({ maxLength: 200 })),
  numbering: TrayNumberingSchema,
  trayCount: Tray(),
  engineerId: Type.Optional(Nullable(Uuid())),
  trayMarks: Type.Optional(TrayMarks()),
};
/** POST /columns body (trays are numbered 1..trayCount in the column's numbering direction). */
export const CreateColumnBodySchema = Obj({ unitId: Uuid(), ...editable });
export type CreateColumnBody = Static<typeof CreateColumnBodySchema>;
/** PUT /columns/:id body: every editable field is optional; version is the one loaded. */
export const UpdateColumnBodySchema = Obj({
  ...editable,
  tag: Type.Optional(editable.tag),
  numbering: Type.Optional(editable.numbering),
  trayCount: Type.Optional(editable.trayCount),
  version: Version(),
});
export type UpdateColumnBody = Static<typeof UpdateColumnBodySchema>;

export const ColumnListQuerySchema = Obj({
  ...pageFields,
  q: Type.Optional(Type.String({ maxLength: 200 })),
  siteId: Type.Optional(Uuid()),
  unitId: Type.Optional(Uuid()),
});

const summaryFields = {
  id: Uuid(),
  tag: Type.String(),
  service: Type.String(),
  numbering: TrayNumberingSchema,
  trayCount: Type.Integer(),
  siteId: Uuid(),
  siteName: Type.String(),
  unitId: Uuid(),
  unitName: Type.String(),
  engineerId: Nullable(Uuid()),
  version: Type.Integer(),
  updatedAt: Timestamp(),
};
export const ColumnSummarySchema = Obj(summaryFields);
export type ColumnSummary = Static<typeof ColumnSummarySchema>;

/** How many run summaries GET /columns/:id carries at most (the newest; runsTotal counts all). */
export const COLUMN_RUNS_CUT = 200;

/**
 * GET /columns/:id: the column with its sections, pump-arounds, load cases and the newest COLUMN_RUNS_CUT
 * run summaries (ratings); runsTotal is the number of its ratings in all (GET /runs pages through them).
 */
export const ColumnDetailSchema = Obj({
  ...summaryFields,
  trayMarks: Type.Array(TrayMarkSchema),
  sections: Type.Array(TraySectionRecordSchema),
  pumpArounds: Type.Array(PumpAroundRecordSchema),
  loadCases: Type.Array(LoadCaseSummarySchema),
  runs: Type.Array(RunSummarySchema),
  runsTotal: Type.Integer({ minimum: 0 }),
});
export type ColumnDetail = Static<typeof ColumnDetailSchema>;

const createColumn = <P extends string, A extends 'geometry.edit' | 'users.manage'>(path: P, access: A, summary: string) =>
  route({ method: 'post', path, access, summary, body: CreateColumnBodySchema, status: 201, response: ColumnDetailSchema });

export const columnContract = {
  list: route({
    method: 'get',
    path: '/columns',
    access: 'read',
    summary: 'Columns the signed-in user may see (paged; search with q, filter by siteId or unitId)',
    query: ColumnListQuerySchema,
    response: PageOf(ColumnSummarySchema),
  }),
  create: createColumn('/columns', 'geometry.edit', 'Create a column in a unit the user may see'),
  adminCreate: createColumn(
    '/admin/columns',
    'users.manage',
    'Create a column (administrator set-up of the plant; same body as POST /columns)',
  ),
  get: route({
    method: 'get',
    path: '/columns/:id',
    access: 'read',
    summary: 'A column with its sections, pump-arounds, load cases and run summaries',
    params: IdParams,
    response: ColumnDetailSchema,
  }),
  update: route({
    method: 'put',
    path: '/columns/:id',
    access: 'geometry.edit',
    summary: 'Edit a column (optimistic lock on version)',
    params: IdParams,
    body: UpdateColumnBodySchema,
    response: ColumnDetailSchema,
  }),
};

export const siteContract = {
  visible: route({
    method: 'get',
    path: '/sites/visible',
    access: 'read',
    summary: 'Sites the signed-in user may see',
    response: ItemsOf(SiteSummarySchema),
  }),
  create: route({
    method: 'post',
    path: '/sites',
    access: 'users.manage',
    summary: 'Create a site',
    body: CreateSiteBodySchema,
    status: 201,
    response: SiteSummarySchema,
  }),
  units: route({
    method: 'get',
    path: '/sites/:id/units',
    access: 'read',
    summary: 'Process units of a site',
    params: IdParams,
    response: ItemsOf(UnitRecordSchema),
  }),
  createUnit: route({
    method: 'post',
    path: '/units',
    access: 'users.manage',
    summary: 'Create a process unit on a site',
    body: CreateUnitBodySchema,
    status: 201,
    response: UnitRecordSchema,
  }),
};
