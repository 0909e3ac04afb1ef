import { implement } from '../http/route.js';
import { exportLoadCase } from '../services/reports/exports.js';
import { createLoadCase, deleteLoadCase, putLoads, updateLoadCase } from '../services/loads/loads.js';
import { getLoadCase, listVisibleLoadCases } from '../services/loads/loadsRead.js';
import { loadCaseContract as c } from '../../shared/contract/loads.js';

/** Load cases of a column: per-tray loads, their edits and their download. */
export const loadRoutes = [
  implement(c.list)({ handler: async ({ ds, user, params }) => ({ items: await listVisibleLoadCases(ds, user, params.id) }) }),
  implement(c.create)({ handler: ({ ds, user, params, body }) => createLoadCase(ds, user, params.id, body) }),
  implement(c.get)({ handler: ({ ds, user, params }) => getLoadCase(ds, user, params.id) }),
  implement(c.update)({ handler: ({ ds, user, params, body }) => updateLoadCase(ds, user, params.id, body) }),
  implement(c.putLoads)({ handler: ({ ds, user, params, body }) => putLoads(ds, user, params.id, body) }),
  implement(c.delete)({ handler: ({ ds, user, params, query }) => deleteLoadCase(ds, user, params.id, query.version) }),
  implement(c.export)({
    handler: async ({ ds, user, params, query, res }) => {
      const file = await exportLoadCase(ds, user, params.id, query.format);
      res.attachment(file.fileName).type(file.contentType).send(file.body);
    },
  }),
];
