import { implement } from '../http/route.js';
import { estimateLatentHeat } from '../engine/pumpAround/index.js';
import { ValidationError } from '../errors.js';
import { createStudy, getStudy, listStudies } from '../services/studies/studies.js';
import { reviewStudy } from '../services/studies/studyReview.js';
import { exportStudy, studyReportPdf } from '../services/reports/studyReportFiles.js';
import { studyContract as c } from '../../shared/contract/studies.js';

/** Pump-around duty studies (issue 5): stored, reviewed, shown. */
export const studyRoutes = [
  implement(c.create)({ handler: ({ ds, user, params, body }) => createStudy(ds, user, params.id, body) }),
  implement(c.list)({ handler: ({ ds, user, params }) => listStudies(ds, user, params.id) }),
  implement(c.get)({ handler: ({ ds, user, params }) => getStudy(ds, user, params.id) }),
  implement(c.report)({
    handler: async ({ ds, user, params, res }) => {
      const { pdf, filename } = await studyReportPdf(ds, user, params.id);
      res.setHeader('Content-Type', 'application/pdf');
      res.setHeader('Content-Disposition', `inline; filename="${filename}"`);
      res.end(pdf);
    },
  }),
  implement(c.export)({
    handler: async ({ ds, user, params, query, res }) => {
      const file = await exportStudy(ds, user, params.id, query.format);
      res.attachment(file.fileName).type(file.contentType).send(file.body);
    },
  }),
  implement(c.submit)({ handler: ({ ds, user, params, body }) => reviewStudy(ds, user, params.id, 'submit', body) }),
  implement(c.approve)({ handler: ({ ds, user, params, body }) => reviewStudy(ds, user, params.id, 'approve', body) }),
  implement(c.return)({ handler: ({ ds, user, params, body }) => reviewStudy(ds, user, params.id, 'return', body) }),
  implement(c.latentHeat)({
    handler: ({ body }) => {
      const l = estimateLatentHeat(body.condenserDuty_kW, body.overheadVapour_kg_h);
      if (l === null)
        throw new ValidationError('Cannot estimate the latent heat', [
          { path: 'condenserDuty_kW', message: 'and overheadVapour_kg_h must both be above zero' },
        ]);
      return { latentHeat_kJ_kg: l };
    },
  }),
];
