import { implement } from '../http/route.js';
import { exportRun } from '../services/reports/exports.js';
import { relabelRun, reviewRun } from '../services/runs/review.js';
import { createRunFromBody } from '../services/runs/runs.js';
import { compareRuns } from '../services/runs/runsCompare.js';
import { getRun, listRuns, runWindow } from '../services/runs/runsRead.js';
import { runReportPdf } from '../services/reports/runReportPdf.js';
import { runContract as c } from '../../shared/contract/runs.js';

export const runRoutes = [
  implement(c.list)({ handler: async ({ ds, user, query }) => listRuns(ds, user, query) }),
  implement(c.create)({ handler: async ({ ds, user, body }) => createRunFromBody(ds, user, body) }),
  implement(c.compare)({ handler: async ({ ds, user, query }) => compareRuns(ds, user, query.a, query.b) }),
  implement(c.get)({ handler: async ({ ds, user, params }) => getRun(ds, user, params.id) }),
  implement(c.report)({
    handler: async ({ ds, user, params, res }) => {
      const { pdf, filename } = await runReportPdf(ds, user, params.id);
      res.setHeader('Content-Type', 'application/pdf');
      res.setHeader('Content-Disposition', `inline; filename="${filename}"`);
      res.end(pdf);
    },
  }),
  implement(c.relabel)({ handler: async ({ ds, user, params, body }) => relabelRun(ds, user, params.id, body) }),
  implement(c.window)({ handler: async ({ ds, user, params }) => runWindow(ds, user, params.id, params.tray) }),
  implement(c.export)({
    handler: async ({ ds, user, params, query, res }) => {
      const file = await exportRun(ds, user, params.id, query.format);
      res.attachment(file.fileName).type(file.contentType).send(file.body);
    },
  }),
  implement(c.submit)({ handler: async ({ ds, user, params, body }) => reviewRun(ds, user, params.id, 'submit', body) }),
  implement(c.approve)({ handler: async ({ ds, user, params, body }) => reviewRun(ds, user, params.id, 'approve', body) }),
  implement(c.return)({ handler: async ({ ds, user, params, body }) => reviewRun(ds, user, params.id, 'return', body) }),
];
