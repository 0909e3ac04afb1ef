/**
 * Contracts of load cases: per-tray vapour and liquid loads with properties at actual conditions (SI, the
 * unit is in the field name), as the engine's TrayLoad. Vapour is the vapour entering the tray from below,
 * liquid the liquid leaving the tray. Tray numbers follow the column's numbering direction.
 */
import { Type, type Static } from '@sinclair/typebox';
import { PumpAroundDutyTagSchema } from './heatPlans.js';
import { LoadBasisSchema } from './loadBasis.js';
import { TrayLoadSchema } from './rating.js';
import { fileAnswer, route } from './route.js';
import { EXPORT_TYPES, ExportQuerySchema } from './runs.js';
import { IdParams, ItemsOf, Nullable, Obj, StringEnum, Timestamp, Uuid } from './schema.js';
import { Name, Version, VersionQuery } from './sections.js';

export { LOAD_BASES, LoadBasisSchema, type LoadBasis } from './loadBasis.js';

export const LOAD_SOURCES = ['typed', 'pasted', 'imported'] as const;
export const LoadSourceSchema = StringEnum(LOAD_SOURCES);
export type LoadSource = Static<typeof LoadSourceSchema>;

/** One simulation stage covering an inclusive range of actual trays (each tray takes the stage's loads). */
export const StageMapEntrySchema = Obj({
  stage: Type.Integer({ minimum: 0, maximum: 10000 }),
  firstTray: Type.Integer({ minimum: 1, maximum: 500 }),
  lastTray: Type.Integer({ minimum: 1, maximum: 500 }),
});
export type StageMapEntry = Static<typeof StageMapEntrySchema>;
export const StageMapSchema = Type.Array(StageMapEntrySchema, { maxItems: 1000 });

/** The whole per-tray grid of a case (one row per tray). */
export const LoadsSchema = Type.Array(TrayLoadSchema, { maxItems: 500 });

const notes = () => Type.String({ maxLength: 4000, 'x-text': 'multiline' });

export const CreateLoadCaseBodySchema = Obj({
  name: Name(),
  basis: LoadBasisSchema,
  source: LoadSourceSchema,
  /** file name when imported */
  sourceFile: Type.Optional(Nullable(Type.String({ maxLength: 255 }))),
  notes: Type.Optional(notes()),
  loads: LoadsSchema,
  stageMap: Type.Optional(Nullable(StageMapSchema)),
});
export type CreateLoadCaseBody = Static<typeof CreateLoadCaseBodySchema>;

/** PATCH /load-cases/:id: name, basis, notes. */
export const UpdateLoadCaseBodySchema = Obj({
  name: Type.Optional(Name()),
  basis: Type.Optional(LoadBasisSchema),
  notes: Type.Optional(notes()),
  version: Version(),
});
export type UpdateLoadCaseBody = Static<typeof UpdateLoadCaseBodySchema>;

/** PUT /load-cases/:id/loads: the whole per-tray grid replaces the stored one. */
export const PutLoadsBodySchema = Obj({
  loads: LoadsSchema,
  stageMap: Type.Optional(Nullable(StageMapSchema)),
  /** how the grid was last filled ('typed' or 'pasted'); unchanged when absent */
  source: Type.Optional(LoadSourceSchema),
  version: Version(),
});
export type PutLoadsBody = Static<typeof PutLoadsBodySchema>;

const summaryFields = {
  id: Uuid(),
  columnId: Uuid(),
  name: Type.String(),
  basis: LoadBasisSchema,
  source: LoadSourceSchema,
  /** file name when imported, else null */
  sourceFile: Nullable(Type.String()),
  trayCount: Type.Integer(),
  /** lowest and highest tray number with loads (null when empty) */
  firstTray: Nullable(Type.Integer()),
  lastTray: Nullable(Type.Integer()),
  createdBy: Nullable(Uuid()),
  createdByName: Nullable(Type.String()),
  /** pump-around duties the case was made at; empty when not tagged */
  pumpAroundDuties: Type.Array(PumpAroundDutyTagSchema),
  version: Type.Integer(),
  updatedAt: Timestamp(),
};
export const LoadCaseSummarySchema = Obj(summaryFields);
export type LoadCaseSummary = Static<typeof LoadCaseSummarySchema>;

export const LoadCaseRecordSchema = Obj({
  ...summaryFields,
  notes: Type.String(),
  /** ordered by tray number */
  loads: Type.Array(TrayLoadSchema),
  stageMap: Nullable(Type.Array(StageMapEntrySchema)),
});
export type LoadCaseRecord = Static<typeof LoadCaseRecordSchema>;

export const loadCaseContract = {
  list: route({
    method: 'get',
    path: '/columns/:id/load-cases',
    access: 'read',
    summary: 'Load cases of a column (summaries)',
    params: IdParams,
    response: ItemsOf(LoadCaseSummarySchema),
  }),
  create: route({
    method: 'post',
    path: '/columns/:id/load-cases',
    access: 'loads.edit',
    summary: 'Create a load case with its per-tray loads (SI)',
    params: IdParams,
    body: CreateLoadCaseBodySchema,
    status: 201,
    response: LoadCaseRecordSchema,
  }),
  get: route({
    method: 'get',
    path: '/load-cases/:id',
    access: 'read',
    summary: 'A load case with its per-tray loads',
    params: IdParams,
    response: LoadCaseRecordSchema,
  }),
  update: route({
    method: 'patch',
    path: '/load-cases/:id',
    access: 'loads.edit',
    summary: 'Rename a load case or change its basis or notes (optimistic lock on version)',
    params: IdParams,
    body: UpdateLoadCaseBodySchema,
    response: LoadCaseRecordSchema,
  }),
  putLoads: route({
    method: 'put',
    path: '/load-cases/:id/loads',
    access: 'loads.edit',
    summary: 'Replace the whole per-tray load grid (optimistic lock on version)',
    params: IdParams,
    body: PutLoadsBodySchema,
    response: LoadCaseRecordSchema,
  }),
  delete: route({
    method: 'delete',
    path: '/load-cases/:id',
    access: 'loads.edit',
    summary: 'Delete a load case (?version=N; stored runs keep their snapshot)',
    params: IdParams,
    query: VersionQuery,
    response: null,
  }),
  export: route({
    method: 'get',
    path: '/load-cases/:id/export',
    access: 'read',
    summary: 'Download the per-tray loads as CSV or XLSX (?format=csv|xlsx)',
    params: IdParams,
    query: ExportQuerySchema,
    response: fileAnswer(...EXPORT_TYPES),
  }),
};
