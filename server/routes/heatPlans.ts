import { implement } from '../http/route.js';
import { putPumpAroundDuties } from '../services/heatPlans/dutyTags.js';
import { getHeatPlan, getHeatPlanPoint, listHeatPlans } from '../services/heatPlans/planRead.js';
import { reviewHeatPlan } from '../services/heatPlans/planReview.js';
import { createHeatPlan } from '../services/heatPlans/plans.js';
import { exportHeatPlan, heatPlanReportPdf } from '../services/reports/heatPlanReportFiles.js';
import { heatPlanContract as c } from '../../shared/contract/heatPlans.js';

/** Heat-recovery plans (issue 17) and the pump-around duty tags of load cases they calibrate against. */
export const heatPlanRoutes = [
  implement(c.putDuties)({ handler: ({ ds, user, params, body }) => putPumpAroundDuties(ds, user, params.id, body) }),
  implement(c.create)({ handler: ({ ds, user, params, body }) => createHeatPlan(ds, user, params.id, body) }),
  implement(c.list)({ handler: ({ ds, user, params }) => listHeatPlans(ds, user, params.id) }),
  implement(c.get)({ handler: ({ ds, user, params }) => getHeatPlan(ds, user, params.id) }),
  implement(c.point)({ handler: ({ ds, user, params }) => getHeatPlanPoint(ds, user, params.id, params.index) }),
  implement(c.report)({
    handler: async ({ ds, user, params, res }) => {
      const { pdf, filename } = await heatPlanReportPdf(ds, user, params.id);
      res.setHeader('Content-Type', 'application/pdf');
      res.setHeader('Content-Disposition', `inline; filename="${filename}"`);
      res.end(pdf);
    },
  }),
  implement(c.export)({
    handler: async ({ ds, user, params, query, res }) => {
      const file = await exportHeatPlan(ds, user, params.id, query.format);
      res.attachment(file.fileName).type(file.contentType).send(file.body);
    },
  }),
  implement(c.submit)({ handler: ({ ds, user, params, body }) => reviewHeatPlan(ds, user, params.id, 'submit', body) }),
  implement(c.approve)({ handler: ({ ds, user, params, body }) => reviewHeatPlan(ds, user, params.id, 'approve', body) }),
  implement(c.return)({ handler: ({ ds, user, params, body }) => reviewHeatPlan(ds, user, params.id, 'return', body) }),
];
