import { implement } from '../http/route.js';
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
import { inspectionContract as c } from '../../shared/contract/inspections.js';

/** Turnaround inspections (issue 6); photos are in ./photos.ts. */
export const inspectionRoutes = [
  implement(c.tolerances)({ handler: () => PUBLISHED_TOLERANCES }),
  implement(c.list)({ handler: ({ ds, user, query }) => listInspections(ds, user, query.columnId) }),
  implement(c.create)({ handler: ({ ds, user, body }) => createInspection(ds, user, body) }),
  implement(c.get)({ handler: ({ ds, user, params }) => getInspection(ds, user, params.id) }),
  implement(c.update)({ handler: ({ ds, user, params, body }) => updateInspection(ds, user, params.id, body) }),
  implement(c.saveTray)({
    handler: ({ ds, user, params, body }) => saveTray(ds, user, params.id, params.tray, params.pass, body),
  }),
  implement(c.addPunch)({ handler: ({ ds, user, params, body }) => addPunchItem(ds, user, params.id, body) }),
  implement(c.updatePunch)({
    handler: ({ ds, user, params, body }) => updatePunchItem(ds, user, params.id, params.itemId, body),
  }),
  implement(c.voidPunch)({ handler: ({ ds, user, params, body }) => voidPunchItem(ds, user, params.id, params.itemId, body) }),
  implement(c.signInspector)({ handler: ({ ds, user, params, body }) => signAsInspector(ds, user, params.id, body.version) }),
  implement(c.signEngineer)({ handler: ({ ds, user, params, body }) => signAsEngineer(ds, user, params.id, body.version) }),
  implement(c.asFound)({ handler: ({ ds, user, params, body }) => rateAsFound(ds, user, params.id, body) }),
  implement(c.report)({
    handler: async ({ ds, user, params, res }) => {
      const { pdf, filename } = await inspectionPdf(ds, user, params.id);
      res.setHeader('Content-Type', 'application/pdf');
      res.setHeader('Content-Disposition', `inline; filename="${filename}"`);
      res.end(pdf);
    },
  }),
];
