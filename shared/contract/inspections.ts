/** Contracts of turnaround inspections: tolerances, records, trays, punch list, sign-off, as-found rating, report, photos. */
import { Type } from '@sinclair/typebox';
import {
  AsFoundBodySchema,
  AsFoundResultSchema,
  CreateInspectionBodySchema,
  CreatePunchBodySchema,
  InspectionRecordSchema,
  InspectionSummarySchema,
  PhotoRecordSchema,
  photoFormFields,
  SaveTrayBodySchema,
  SignBodySchema,
  ToleranceRuleSetSchema,
  UpdateInspectionBodySchema,
  UpdatePunchBodySchema,
  VoidPunchBodySchema,
} from './inspectionPayloads.js';
import { fileAnswer, route } from './route.js';
import { Defaulted, FilePart, IdParams, NewestOf, Obj, StringEnum, Uuid } from './schema.js';

/** How many inspections GET /inspections lists at most (the newest by start date; total counts all). */
export const INSPECTION_LIST_CUT = 500;

export const TrayParams = Obj({
  id: Uuid(),
  tray: Type.Integer({ minimum: 1, maximum: 500 }),
  pass: Type.Integer({ minimum: 1, maximum: 4 }),
});
export const PunchParams = Obj({ id: Uuid(), itemId: Uuid() });
export const PhotoParams = Obj({ id: Uuid(), photoId: Uuid() });

const record = InspectionRecordSchema;

export const inspectionContract = {
  tolerances: route({
    method: 'get',
    path: '/tolerances',
    access: 'read',
    summary: 'The published installed-tray tolerance rule set (PIP VEFV1102) with sources',
    response: ToleranceRuleSetSchema,
  }),
  list: route({
    method: 'get',
    path: '/inspections',
    access: 'read',
    summary: `Inspections of the columns the user may see (optionally of one column): the newest ${INSPECTION_LIST_CUT} and the total`,
    query: Obj({ columnId: Type.Optional(Uuid()) }),
    response: NewestOf(InspectionSummarySchema),
  }),
  create: route({
    method: 'post',
    path: '/inspections',
    access: 'inspections.record',
    summary: 'Start a turnaround inspection of a column (the signed-in inspector is its inspector)',
    body: CreateInspectionBodySchema,
    status: 201,
    response: record,
  }),
  get: route({
    method: 'get',
    path: '/inspections/:id',
    access: 'read',
    summary: 'An inspection with trays, tolerance checks, punch list and photos',
    params: IdParams,
    response: record,
  }),
  update: route({
    method: 'patch',
    path: '/inspections/:id',
    access: 'inspections.record',
    summary: 'Edit the inspection header (draft only; optimistic lock on version)',
    params: IdParams,
    body: UpdateInspectionBodySchema,
    response: record,
  }),
  saveTray: route({
    method: 'put',
    path: '/inspections/:id/trays/:tray/:pass',
    access: 'inspections.record',
    summary: 'Record or replace the findings and measurements of one tray and pass (draft only)',
    params: TrayParams,
    body: SaveTrayBodySchema,
    response: record,
  }),
  addPunch: route({
    method: 'post',
    path: '/inspections/:id/punch',
    access: 'inspections.record',
    summary: 'Add a punch-list item (draft only)',
    params: IdParams,
    body: CreatePunchBodySchema,
    status: 201,
    response: record,
  }),
  updatePunch: route({
    method: 'patch',
    path: '/inspections/:id/punch/:itemId',
    access: 'inspections.record',
    summary: 'Edit or close a punch-list item (draft only; optimistic lock on version)',
    params: PunchParams,
    body: UpdatePunchBodySchema,
    response: record,
  }),
  voidPunch: route({
    method: 'post',
    path: '/inspections/:id/punch/:itemId/void',
    access: 'inspections.record',
    summary: 'Void a punch-list item with a reason (draft only; kept on the list, no longer open)',
    params: PunchParams,
    body: VoidPunchBodySchema,
    response: record,
  }),
  signInspector: route({
    method: 'post',
    path: '/inspections/:id/sign/inspector',
    access: 'inspections.record',
    summary: 'Inspector sign-off; e-mails the column engineer; the record becomes read-only',
    params: IdParams,
    body: SignBodySchema,
    response: record,
  }),
  signEngineer: route({
    method: 'post',
    path: '/inspections/:id/sign/engineer',
    access: 'read',
    summary:
      "Engineer countersignature (the column's engineer, else a process engineer or internals specialist with site access)",
    params: IdParams,
    body: SignBodySchema,
    response: record,
  }),
  asFound: route({
    method: 'post',
    path: '/inspections/:id/as-found',
    access: 'ratings.run',
    summary: 'Rate the column as found (measured weirs and clearances, plugging, missing valves) and compare with design',
    params: IdParams,
    body: AsFoundBodySchema,
    status: 201,
    response: AsFoundResultSchema,
  }),
  report: route({
    method: 'get',
    path: '/inspections/:id/report.pdf',
    access: 'read',
    summary: 'PDF report: per-tray sheets, tolerance table, photo log, punch list, signatures, safety cautions',
    params: IdParams,
    response: fileAnswer('application/pdf'),
  }),
  uploadPhoto: route({
    method: 'post',
    path: '/inspections/:id/photos',
    access: 'inspections.record',
    summary:
      'Upload a photo (multipart field "photo": JPEG, PNG or WebP, checked by content; fields tray, pass, finding, caption)',
    params: IdParams,
    form: Obj({ photo: FilePart({ description: 'JPEG, PNG or WebP image, checked by content' }), ...photoFormFields }),
    status: 201,
    response: PhotoRecordSchema,
  }),
  photo: route({
    method: 'get',
    path: '/inspections/:id/photos/:photoId',
    access: 'read',
    summary: 'A photo (size=original|thumb), only for users who may see the column',
    params: PhotoParams,
    query: Obj({ size: Defaulted(StringEnum(['original', 'thumb'] as const), 'original') }),
    response: fileAnswer('image/jpeg', 'image/png', 'image/webp'),
  }),
};
