import { implement } from '../http/route.js';
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
import { columnContract as c, siteContract as s } from '../../shared/contract/columns.js';

/** Columns, and the sites and process units they belong to. */
export const columnRoutes = [
  implement(c.list)({ handler: ({ ds, user, query }) => listVisibleColumns(ds, user, query) }),
  implement(c.create)({ handler: ({ ds, user, body }) => createColumn(ds, user, body) }),
  implement(c.adminCreate)({ handler: ({ ds, user, body }) => createColumn(ds, user, body) }),
  implement(c.get)({ handler: ({ ds, user, params }) => getColumnDetail(ds, user, params.id) }),
  implement(c.update)({ handler: ({ ds, user, params, body }) => updateColumn(ds, user, params.id, body) }),
  implement(s.visible)({ handler: async ({ ds, user }) => ({ items: await listSites(ds, user) }) }),
  implement(s.create)({ handler: ({ ds, user, body }) => createSite(ds, user, body) }),
  implement(s.units)({ handler: async ({ ds, user, params }) => ({ items: await listUnits(ds, user, params.id) }) }),
  implement(s.createUnit)({ handler: ({ ds, user, body }) => createUnit(ds, user, body) }),
];
