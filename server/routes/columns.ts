import { defineRoutes } from '../http/route.js';
import { listVisibleColumns } from '../services/columnsList.js';
import { pageQuery } from '../../shared/schemas/common.js';

export const columnRoutes = defineRoutes([
  {
    method: 'get',
    path: '/columns',
    access: 'read',
    summary: 'Columns the signed-in user may see (paged, searchable with q)',
    query: pageQuery,
    handler: async ({ ds, user, query }) => listVisibleColumns(ds, user, query as { page: number; pageSize: number; q?: string }),
  },
]);
