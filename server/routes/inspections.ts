import { defineRoutes } from '../http/route.js';
import { rateAsFound } from '../services/inspections/inspectionAsFound.js';
import { inspectionPdf } from '../services/reports/inspectionPdf.js';
import {
  createInspection,
  getInspection,
  listInspections,
  saveTray,
  updateInspection,
} from '../services/inspections/inspections.js';
import { signAsEngineer, signAsInspector } from '../services/inspections/inspectionSign.js';
import { addPunchItem, updatePunchItem, voidPunchItem } from '../services/inspections/punch.js';
import { PUBLISHED_TOLERANCES } from '../../shared/inspectionTolerance.js';
import { uuidParams } from '../../shared/schemas/common.js';
import {
  asFoundBody,
  createInspectionBody,
  createPunchBody,
  inspectionListQuery,
  punchParams,
  saveTrayBody,
  signBody,
  trayParams,
  updateInspectionBody,
  updatePunchBody,
  voidPunchBody,
} from '../../shared/schemas/inspections.js';
import type * as T from '../../shared/types/inspections.js';

type Id = { id: string };

export const inspectionRoutes = defineRoutes([
  {
    method: 'get',
    path: '/tolerances',
    access: 'read',
    summary: 'The published installed-tray tolerance rule set (PIP VEFV1102) with sources',
    handler: () => PUBLISHED_TOLERANCES,
  },
  {
    method: 'get',
    path: '/inspections',
    access: 'read',
    summary: 'Inspections of the columns the user may see (optionally of one column)',
    query: inspectionListQuery,
    handler: async ({ ds, user, query }) => ({
      items: await listInspections(ds, user, (query as { columnId?: string }).columnId),
    }),
  },
  {
    method: 'post',
    path: '/inspections',
    access: 'inspections.record',
    summary: 'Start a turnaround inspection of a column (the signed-in inspector is its inspector)',
    body: createInspectionBody,
    status: 201,
    handler: async ({ ds, user, body }) => createInspection(ds, user, body as T.CreateInspectionBody),
  },
  {
    method: 'get',
    path: '/inspections/:id',
    access: 'read',
    summary: 'An inspection with trays, tolerance checks, punch list and photos',
    params: uuidParams,
    handler: async ({ ds, user, params }) => getInspection(ds, user, (params as Id).id),
  },
  {
    method: 'patch',
    path: '/inspections/:id',
    access: 'inspections.record',
    summary: 'Edit the inspection header (draft only; optimistic lock on version)',
    params: uuidParams,
    body: updateInspectionBody,
    handler: async ({ ds, user, params, body }) => updateInspection(ds, user, (params as Id).id, body as T.UpdateInspectionBody),
  },
  {
    method: 'put',
    path: '/inspections/:id/trays/:tray/:pass',
    access: 'inspections.record',
    summary: 'Record or replace the findings and measurements of one tray and pass (draft only)',
    params: trayParams,
    body: saveTrayBody,
    handler: async ({ ds, user, params, body }) => {
      const p = params as Id & { tray: number; pass: number };
      return saveTray(ds, user, p.id, p.tray, p.pass, body as T.SaveTrayBody);
    },
  },
  {
    method: 'post',
    path: '/inspections/:id/punch',
    access: 'inspections.record',
    summary: 'Add a punch-list item (draft only)',
    params: uuidParams,
    body: createPunchBody,
    status: 201,
    handler: async ({ ds, user, params, body }) => addPunchItem(ds, user, (params as Id).id, body as T.CreatePunchBody),
  },
  {
    method: 'patch',
    path: '/inspections/:id/punch/:itemId',
    access: 'inspections.record',
    summary: 'Edit or close a punch-list item (draft only; optimistic lock on version)',
    params: punchParams,
    body: updatePunchBody,
    handler: async ({ ds, user, params, body }) => {
      const p = params as Id & { itemId: string };
      return updatePunchItem(ds, user, p.id, p.itemId, body as T.UpdatePunchBody);
    },
  },
  {
    method: 'post',
    path: '/inspections/:id/punch/:itemId/void',
    access: 'inspections.record',
    summary: 'Void a punch-list item with a reason (draft only; kept on the list, no longer open)',
    params: punchParams,
    body: voidPunchBody,
    handler: async ({ ds, user, params, body }) => {
      const p = params as Id & { itemId: string };
      return voidPunchItem(ds, user, p.id, p.itemId, body as T.VoidPunchBody);
    },
  },
  {
    method: 'post',
    path: '/inspections/:id/sign/inspector',
    access: 'inspections.record',
    summary: 'Inspector sign-off; e-mails the column engineer; the record becomes read-only',
    params: uuidParams,
    body: signBody,
    handler: async ({ ds, user, params, body }) => signAsInspector(ds, user, (params as Id).id, (body as T.SignBody).version),
  },
  {
    method: 'post',
    path: '/inspections/:id/sign/engineer',
    access: 'read',
    summary:
      "Engineer countersignature (the column's engineer, else a process engineer or internals specialist with site access)",
    params: uuidParams,
    body: signBody,
    handler: async ({ ds, user, params, body }) => signAsEngineer(ds, user, (params as Id).id, (body as T.SignBody).version),
  },
  {
    method: 'post',
    path: '/inspections/:id/as-found',
    access: 'ratings.run',
    summary: 'Rate the column as found (measured weirs and clearances, plugging, missing valves) and compare with design',
    params: uuidParams,
    body: asFoundBody,
    status: 201,
    handler: async ({ ds, user, params, body }) => rateAsFound(ds, user, (params as Id).id, body as T.AsFoundBody),
  },
  {
    method: 'get',
    path: '/inspections/:id/report.pdf',
    access: 'read',
    summary: 'PDF report: per-tray sheets, tolerance table, photo log, punch list, signatures, safety cautions',
    params: uuidParams,
    handler: async ({ ds, user, params, res }) => {
      const { pdf, filename } = await inspectionPdf(ds, user, (params as Id).id);
      res.setHeader('Content-Type', 'application/pdf');
      res.setHeader('Content-Disposition', `inline; filename="${filename}"`);
      res.end(pdf);
    },
  },
]);
