import { implement } from '../http/route.js';
import { createPumpAround, deletePumpAround, updatePumpAround } from '../services/columns/sectionsPumpArounds.js';
import { createSection, deleteSection, listVisibleSections, updateSection } from '../services/columns/sections.js';
import { pumpAroundContract as p, sectionContract as s } from '../../shared/contract/sections.js';

/** Tray sections and pump-arounds of a column. */
export const sectionRoutes = [
  implement(s.list)({ handler: async ({ ds, user, params }) => ({ items: await listVisibleSections(ds, user, params.id) }) }),
  implement(s.create)({ handler: ({ ds, user, params, body }) => createSection(ds, user, params.id, body) }),
  implement(s.update)({ handler: ({ ds, user, params, body }) => updateSection(ds, user, params.id, body) }),
  implement(s.delete)({ handler: ({ ds, user, params, query }) => deleteSection(ds, user, params.id, query.version) }),
  implement(p.create)({ handler: ({ ds, user, params, body }) => createPumpAround(ds, user, params.id, body) }),
  implement(p.update)({ handler: ({ ds, user, params, body }) => updatePumpAround(ds, user, params.id, body) }),
  implement(p.delete)({ handler: ({ ds, user, params, query }) => deletePumpAround(ds, user, params.id, query.version) }),
];
