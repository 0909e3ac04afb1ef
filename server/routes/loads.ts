import { defineRoutes } from '../http/route.js';
import { exportLoadCase } from '../services/reports/exports.js';
import { createLoadCase, deleteLoadCase, putLoads, updateLoadCase } from '../services/loads/loads.js';
import { getLoadCase, listVisibleLoadCases } from '../services/loads/loadsRead.js';
import { versionBody } from '../../shared/schemas/columns.js';
import { uuidParams } from '../../shared/schemas/common.js';
import { createLoadCaseBody, exportQuery, putLoadsBody, updateLoadCaseBody } from '../../shared/schemas/loads.js';
import type { CreateLoadCaseBody, PutLoadsBody, UpdateLoadCaseBody } from '../../shared/types/loads.js';

type Id = { id: string };

export const loadRoutes = defineRoutes([
  {
    method: 'get',
    path: '/columns/:id/load-cases',
    access: 'read',
    summary: 'Load cases of a column (summaries)',
    params: uuidParams,
    handler: async ({ ds, user, params }) => ({ items: await listVisibleLoadCases(ds, user, (params as Id).id) }),
  },
  {
    method: 'post',
    path: '/columns/:id/load-cases',
    access: 'loads.edit',
    summary: 'Create a load case with its per-tray loads (SI)',
    params: uuidParams,
    body: createLoadCaseBody,
    status: 201,
    handler: async ({ ds, user, params, body }) => createLoadCase(ds, user, (params as Id).id, body as CreateLoadCaseBody),
  },
  {
    method: 'get',
    path: '/load-cases/:id',
    access: 'read',
    summary: 'A load case with its per-tray loads',
    params: uuidParams,
    handler: async ({ ds, user, params }) => getLoadCase(ds, user, (params as Id).id),
  },
  {
    method: 'patch',
    path: '/load-cases/:id',
    access: 'loads.edit',
    summary: 'Rename a load case or change its basis or notes (optimistic lock on version)',
    params: uuidParams,
    body: updateLoadCaseBody,
    handler: async ({ ds, user, params, body }) => updateLoadCase(ds, user, (params as Id).id, body as UpdateLoadCaseBody),
  },
  {
    method: 'put',
    path: '/load-cases/:id/loads',
    access: 'loads.edit',
    summary: 'Replace the whole per-tray load grid (optimistic lock on version)',
    params: uuidParams,
    body: putLoadsBody,
    handler: async ({ ds, user, params, body }) => putLoads(ds, user, (params as Id).id, body as PutLoadsBody),
  },
  {
    method: 'delete',
    path: '/load-cases/:id',
    access: 'loads.edit',
    summary: 'Delete a load case (?version=N; stored runs keep their snapshot)',
    params: uuidParams,
    query: versionBody,
    handler: async ({ ds, user, params, query }) =>
      deleteLoadCase(ds, user, (params as Id).id, (query as { version: number }).version),
  },
  {
    method: 'get',
    path: '/load-cases/:id/export',
    access: 'read',
    summary: 'Download the per-tray loads as CSV or XLSX (?format=csv|xlsx)',
    params: uuidParams,
    query: exportQuery,
    handler: async ({ ds, user, params, query, res }) => {
      const file = await exportLoadCase(ds, user, (params as Id).id, (query as { format: 'csv' | 'xlsx' }).format);
      res.attachment(file.fileName).type(file.contentType).send(file.body);
    },
  },
]);
