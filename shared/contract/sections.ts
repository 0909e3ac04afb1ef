/** Contracts of a column's tray sections (tray range, engine geometry, provenance) and pump-arounds. */
import { Type, type Static } from '@sinclair/typebox';
import { SectionGeometrySchema } from './rating.js';
import { route } from './route.js';
import { IdParams, ItemsOf, Nullable, Obj, StringEnum, Timestamp, Uuid } from './schema.js';

/** Bounds of a tray number and of a column's tray count (trays are numbered 1..trayCount). */
export const TRAY_NUMBER = { minimum: 1, maximum: 500 } as const;
/** A tray number of a column, in the column's numbering direction. */
export const Tray = () => Type.Integer(TRAY_NUMBER);
/** A record's name: one line, not empty. */
export const Name = (maxLength = 120) => Type.String({ minLength: 1, maxLength });
/** The version last loaded (optimistic lock: a stale one answers 409). */
export const Version = () => Type.Integer({ minimum: 1 });
/** `?version=N` of a DELETE. */
export const VersionQuery = Obj({ version: Version() });

/** Where a section's geometry comes from: design drawings, as left after a turnaround, or as found at inspection. */
export const GeometryProvenanceSchema = StringEnum(['design', 'as-left', 'as-found'] as const);
export type GeometryProvenance = Static<typeof GeometryProvenanceSchema>;

const sectionFields = {
  name: Name(),
  firstTray: Tray(),
  lastTray: Tray(),
  geometry: SectionGeometrySchema,
  provenance: GeometryProvenanceSchema,
  /** ISO date (YYYY-MM-DD); required for as-left and as-found geometry */
  provenanceDate: Type.Optional(Nullable(Type.String({ format: 'date' }))),
  notes: Type.Optional(Type.String({ maxLength: 2000, 'x-text': 'multiline' })),
};
export const SectionBodySchema = Obj(sectionFields);
export type SectionBody = Static<typeof SectionBodySchema>;
export const UpdateSectionBodySchema = Obj({ ...sectionFields, version: Version() });
export type UpdateSectionBody = Static<typeof UpdateSectionBodySchema>;

/** A tray section: an inclusive tray range (firstTray ≤ lastTray, in the column's numbering) with one geometry. */
export const TraySectionRecordSchema = Obj({
  id: Uuid(),
  columnId: Uuid(),
  name: Type.String(),
  firstTray: Type.Integer(),
  lastTray: Type.Integer(),
  geometry: SectionGeometrySchema,
  provenance: GeometryProvenanceSchema,
  /** ISO date (YYYY-MM-DD); null for design geometry */
  provenanceDate: Nullable(Type.String({ format: 'date' })),
  notes: Type.String(),
  version: Type.Integer(),
  updatedAt: Timestamp(),
});
export type TraySectionRecord = Static<typeof TraySectionRecordSchema>;

/** Bounds of a pump-around's base duty [kW]. */
export const BASE_DUTY_KW = { minimum: 0, maximum: 1e6 } as const;

const pumpAroundFields = {
  name: Name(),
  /** tray the liquid is drawn from (the bottom of the pump-around zone) */
  drawTray: Tray(),
  /** tray the cooled liquid returns to (the top of the zone) */
  returnTray: Tray(),
  baseDuty_kW: Type.Number(BASE_DUTY_KW),
};
export const PumpAroundBodySchema = Obj(pumpAroundFields);
export type PumpAroundBody = Static<typeof PumpAroundBodySchema>;
export const UpdatePumpAroundBodySchema = Obj({ ...pumpAroundFields, version: Version() });
export type UpdatePumpAroundBody = Static<typeof UpdatePumpAroundBodySchema>;

export const PumpAroundRecordSchema = Obj({
  id: Uuid(),
  columnId: Uuid(),
  name: Type.String(),
  drawTray: Type.Integer(),
  returnTray: Type.Integer(),
  baseDuty_kW: Type.Number(),
  version: Type.Integer(),
});
export type PumpAroundRecord = Static<typeof PumpAroundRecordSchema>;

export const sectionContract = {
  list: route({
    method: 'get',
    path: '/columns/:id/sections',
    access: 'read',
    summary: 'Tray sections of a column, by first tray',
    params: IdParams,
    response: ItemsOf(TraySectionRecordSchema),
  }),
  create: route({
    method: 'post',
    path: '/columns/:id/sections',
    access: 'geometry.edit',
    summary: 'Add a tray section (engine geometry, tray range not overlapping other sections, provenance)',
    params: IdParams,
    body: SectionBodySchema,
    status: 201,
    response: TraySectionRecordSchema,
  }),
  update: route({
    method: 'put',
    path: '/sections/:id',
    access: 'geometry.edit',
    summary: 'Replace a tray section (optimistic lock on version)',
    params: IdParams,
    body: UpdateSectionBodySchema,
    response: TraySectionRecordSchema,
  }),
  delete: route({
    method: 'delete',
    path: '/sections/:id',
    access: 'geometry.edit',
    summary: 'Delete a tray section (?version=N; stored runs keep their snapshot)',
    params: IdParams,
    query: VersionQuery,
    response: null,
  }),
};

export const pumpAroundContract = {
  create: route({
    method: 'post',
    path: '/columns/:id/pump-arounds',
    access: 'geometry.edit',
    summary: 'Add a pump-around (draw tray, return tray above it, base duty kW)',
    params: IdParams,
    body: PumpAroundBodySchema,
    status: 201,
    response: PumpAroundRecordSchema,
  }),
  update: route({
    method: 'put',
    path: '/pump-arounds/:id',
    access: 'geometry.edit',
    summary: 'Edit a pump-around (optimistic lock on version)',
    params: IdParams,
    body: UpdatePumpAroundBodySchema,
    response: PumpAroundRecordSchema,
  }),
  delete: route({
    method: 'delete',
    path: '/pump-arounds/:id',
    access: 'geometry.edit',
    summary: 'Delete a pump-around (?version=N)',
    params: IdParams,
    query: VersionQuery,
    response: null,
  }),
};
