import { defineRoutes, type RouteDef } from '../http/route.js';
import { estimateLatentHeat } from '../engine/pumpAround/index.js';
import { ValidationError } from '../errors.js';
import { createStudy, getStudy, listStudies } from '../services/studies/studies.js';
import { reviewStudy, type StudyAction } from '../services/studies/studyReview.js';
import { exportStudy, studyReportPdf } from '../services/reports/studyReportFiles.js';
import { exportQuery } from '../../shared/schemas/loads.js';
import { uuidParams } from '../../shared/schemas/common.js';
import { createStudySchema, latentHeatSchema, studyReviewSchema } from '../../shared/schemas/studies.js';
import type { CreateStudyBody, LatentHeatAnswer, LatentHeatBody, StudyReviewBody } from '../../shared/types/studies.js';

const review = (action: StudyAction, access: 'ratings.run' | 'reviews.approve', summary: string): RouteDef => ({
  method: 'post',
  path: `/studies/:id/${action}`,
  access,
  summary,
  params: uuidParams,
  body: studyReviewSchema,
  handler: ({ ds, user, params, body }) => reviewStudy(ds, user, (params as { id: string }).id, action, body as StudyReviewBody),
});

/** Pump-around duty studies (issue 5): stored, reviewed, shown. */
export const studyRoutes = defineRoutes([
  {
    method: 'post',
    path: '/columns/:id/studies',
    access: 'ratings.run',
    summary: 'Run and store a pump-around duty study of the column (base load case, one pump-around, duty sweep)',
    params: uuidParams,
    body: createStudySchema,
    status: 201,
    handler: ({ ds, user, params, body }) => createStudy(ds, user, (params as { id: string }).id, body as CreateStudyBody),
  },
  {
    method: 'get',
    path: '/columns/:id/studies',
    access: 'read',
    summary: 'Pump-around duty studies of a column, newest first',
    params: uuidParams,
    handler: ({ ds, user, params }) => listStudies(ds, user, (params as { id: string }).id),
  },
  {
    method: 'get',
    path: '/studies/:id',
    access: 'read',
    summary: 'One pump-around duty study: inputs snapshot, result per duty, review state',
    params: uuidParams,
    handler: ({ ds, user, params }) => getStudy(ds, user, (params as { id: string }).id),
  },
  {
    method: 'get',
    path: '/studies/:id/report.pdf',
    access: 'read',
    summary: 'Printable study report (PDF): inputs, duties found, traffic at the base duty, review record, cautions',
    params: uuidParams,
    handler: async ({ ds, user, params, res }) => {
      const { pdf, filename } = await studyReportPdf(ds, user, (params as { id: string }).id);
      res.setHeader('Content-Type', 'application/pdf');
      res.setHeader('Content-Disposition', `inline; filename="${filename}"`);
      res.end(pdf);
    },
  },
  {
    method: 'get',
    path: '/studies/:id/export',
    access: 'read',
    summary: 'Download the study (inputs, duties found, traffic at the base duty, cautions) as CSV or XLSX (?format=csv|xlsx)',
    params: uuidParams,
    query: exportQuery,
    handler: async ({ ds, user, params, query, res }) => {
      const file = await exportStudy(ds, user, (params as { id: string }).id, (query as { format: 'csv' | 'xlsx' }).format);
      res.attachment(file.fileName).type(file.contentType).send(file.body);
    },
  },
  review('submit', 'ratings.run', 'Submit a draft or returned study for review (author)'),
  review('approve', 'reviews.approve', 'Approve a submitted study (reviewer, not the author); it becomes read-only'),
  review('return', 'reviews.approve', 'Return a submitted study to its author with a comment'),
  {
    method: 'post',
    path: '/studies/latent-heat',
    access: 'read',
    summary: 'Estimate the latent heat of the overhead vapour: condenser duty / overhead vapour flow',
    body: latentHeatSchema,
    handler: ({ body }): LatentHeatAnswer => {
      const b = body as LatentHeatBody;
      const l = estimateLatentHeat(b.condenserDuty_kW, b.overheadVapour_kg_h);
      if (l === null)
        throw new ValidationError('Cannot estimate the latent heat', [
          { path: 'condenserDuty_kW', message: 'and overheadVapour_kg_h must both be above zero' },
        ]);
      return { latentHeat_kJ_kg: l };
    },
  },
]);
