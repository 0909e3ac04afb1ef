import { defineRoutes } from '../http/route.js';
import {
  createColumn,
  createSite,
  createUnit,
  getColumnDetail,
  listSites,
  listUnits,
  updateColumn,
} from '../services/columns/columns.js';
import { listVisibleColumns } from '../services/columns/columnsList.js';
import {
  columnListQuery,
  createColumnBody,
  createSiteBody,
  createUnitBody,
  updateColumnBody,
} from '../../shared/schemas/columns.js';
import { uuidParams } from '../../shared/schemas/common.js';
import type {
  ColumnListQuery,
  CreateColumnBody,
  CreateSiteBody,
  CreateUnitBody,
  UpdateColumnBody,
} from '../../shared/types/columns.js';

type Id = { id: string };

export const columnRoutes = defineRoutes([
  {
    method: 'get',
    path: '/columns',
    access: 'read',
    summary: 'Columns the signed-in user may see (paged; search with q, filter by siteId or unitId)',
    query: columnListQuery,
    handler: async ({ ds, user, query }) =>
      listVisibleColumns(ds, user, query as Required<Pick<ColumnListQuery, 'page' | 'pageSize'>> & ColumnListQuery),
  },
  {
    method: 'post',
    path: '/columns',
    access: 'geometry.edit',
    summary: 'Create a column in a unit the user may see',
    body: createColumnBody,
    status: 201,
    handler: async ({ ds, user, body }) => createColumn(ds, user, body as CreateColumnBody),
  },
  {
    method: 'post',
    path: '/admin/columns',
    access: 'users.manage',
    summary: 'Create a column (administrator set-up of the plant; same body as POST /columns)',
    body: createColumnBody,
    status: 201,
    handler: async ({ ds, user, body }) => createColumn(ds, user, body as CreateColumnBody),
  },
  {
    method: 'get',
    path: '/columns/:id',
    access: 'read',
    summary: 'A column with its sections, pump-arounds, load cases and run summaries',
    params: uuidParams,
    handler: async ({ ds, user, params }) => getColumnDetail(ds, user, (params as Id).id),
  },
  {
    method: 'put',
    path: '/columns/:id',
    access: 'geometry.edit',
    summary: 'Edit a column (optimistic lock on version)',
    params: uuidParams,
    body: updateColumnBody,
    handler: async ({ ds, user, params, body }) => updateColumn(ds, user, (params as Id).id, body as UpdateColumnBody),
  },
  {
    method: 'get',
    path: '/sites/visible',
    access: 'read',
    summary: 'Sites the signed-in user may see',
    handler: async ({ ds, user }) => ({ items: await listSites(ds, user) }),
  },
  {
    method: 'post',
    path: '/sites',
    access: 'users.manage',
    summary: 'Create a site',
    body: createSiteBody,
    status: 201,
    handler: async ({ ds, user, body }) => createSite(ds, user, body as CreateSiteBody),
  },
  {
    method: 'get',
    path: '/sites/:id/units',
    access: 'read',
    summary: 'Process units of a site',
    params: uuidParams,
    handler: async ({ ds, user, params }) => ({ items: await listUnits(ds, user, (params as Id).id) }),
  },
  {
    method: 'post',
    path: '/units',
    access: 'users.manage',
    summary: 'Create a process unit on a site',
    body: createUnitBody,
    status: 201,
    handler: async ({ ds, user, body }) => createUnit(ds, user, body as CreateUnitBody),
  },
]);
