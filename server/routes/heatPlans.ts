import { defineRoutes, type RouteDef } from '../http/route.js';
import { putPumpAroundDuties } from '../services/heatPlans/dutyTags.js';
import { getHeatPlan, getHeatPlanPoint, listHeatPlans } from '../services/heatPlans/planRead.js';
import { reviewHeatPlan } from '../services/heatPlans/planReview.js';
import { createHeatPlan } from '../services/heatPlans/plans.js';
import { exportHeatPlan, heatPlanReportPdf } from '../services/reports/heatPlanReportFiles.js';
import { exportQuery } from '../../shared/schemas/loads.js';
import type { ReviewAction } from '../services/studies/reviewRules.js';
import { uuidParams } from '../../shared/schemas/common.js';
import {
  createHeatPlanSchema,
  heatPlanReviewSchema,
  planPointParams,
  putPumpAroundDutiesBody,
} from '../../shared/schemas/heatPlans.js';
import type { CreateHeatPlanBody, HeatPlanReviewBody } from '../../shared/types/heatPlans.js';
import type { PutPumpAroundDutiesBody } from '../../shared/types/loads.js';

type Id = { id: string };

const review = (action: ReviewAction, access: 'ratings.run' | 'reviews.approve', summary: string): RouteDef => ({
  method: 'post',
  path: `/heat-plans/:id/${action}`,
  access,
  summary,
  params: uuidParams,
  body: heatPlanReviewSchema,
  handler: ({ ds, user, params, body }) => reviewHeatPlan(ds, user, (params as Id).id, action, body as HeatPlanReviewBody),
});

/** Heat-recovery plans (issue 17) and the pump-around duty tags of load cases they calibrate against. */
export const heatPlanRoutes = defineRoutes([
  {
    method: 'put',
    path: '/load-cases/:id/pump-around-duties',
    access: 'loads.edit',
    summary: 'Tag a load case with the pump-around duties it was made at (replaces the tags; optimistic lock on version)',
    params: uuidParams,
    body: putPumpAroundDutiesBody,
    handler: ({ ds, user, params, body }) => putPumpAroundDuties(ds, user, (params as Id).id, body as PutPumpAroundDutiesBody),
  },
  {
    method: 'post',
    path: '/columns/:id/heat-plans',
    access: 'ratings.run',
    summary: 'Rate and store a heat-recovery plan: two or three pump-arounds over a grid of duties, boundary, suggestion',
    params: uuidParams,
    body: createHeatPlanSchema,
    status: 201,
    handler: ({ ds, user, params, body }) => createHeatPlan(ds, user, (params as Id).id, body as CreateHeatPlanBody),
  },
  {
    method: 'get',
    path: '/columns/:id/heat-plans',
    access: 'read',
    summary: 'Heat-recovery plans of a column, newest first',
    params: uuidParams,
    handler: ({ ds, user, params }) => listHeatPlans(ds, user, (params as Id).id),
  },
  {
    method: 'get',
    path: '/heat-plans/:id',
    access: 'read',
    summary: 'One heat-recovery plan: inputs, duty map, boundary, suggestion, review state (grid points without their trays)',
    params: uuidParams,
    handler: ({ ds, user, params }) => getHeatPlan(ds, user, (params as Id).id),
  },
  {
    method: 'get',
    path: '/heat-plans/:id/points/:index',
    access: 'read',
    summary: 'One grid point of a plan with every tray: traffic and percent of limit per check',
    params: planPointParams,
    handler: ({ ds, user, params }) => {
      const p = params as Id & { index: number };
      return getHeatPlanPoint(ds, user, p.id, p.index);
    },
  },
  {
    method: 'get',
    path: '/heat-plans/:id/report.pdf',
    access: 'read',
    summary:
      'Printable plan report (PDF): inputs, suggested split, margin table, limits by tray and check, fit, cautions, methods',
    params: uuidParams,
    handler: async ({ ds, user, params, res }) => {
      const { pdf, filename } = await heatPlanReportPdf(ds, user, (params as Id).id);
      res.setHeader('Content-Type', 'application/pdf');
      res.setHeader('Content-Disposition', `inline; filename="${filename}"`);
      res.end(pdf);
    },
  },
  {
    method: 'get',
    path: '/heat-plans/:id/export',
    access: 'read',
    summary: 'Download the plan (inputs, suggestion, margin table, limits, traffic at the suggestion, cautions) as CSV or XLSX',
    params: uuidParams,
    query: exportQuery,
    handler: async ({ ds, user, params, query, res }) => {
      const file = await exportHeatPlan(ds, user, (params as Id).id, (query as { format: 'csv' | 'xlsx' }).format);
      res.attachment(file.fileName).type(file.contentType).send(file.body);
    },
  },
  review('submit', 'ratings.run', 'Submit a draft or returned plan for review (author)'),
  review('approve', 'reviews.approve', 'Approve a submitted plan (reviewer, not the author); it becomes read-only'),
  review('return', 'reviews.approve', 'Return a submitted plan to its author with a comment'),
]);
