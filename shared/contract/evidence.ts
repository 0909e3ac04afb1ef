/** Contracts of the field-evidence routes (the others in server/routes/evidence.ts are still to convert). */
import { fileAnswer, route } from './route.js';
import { IdParams, Obj, Uuid } from './schema.js';
import { Type } from '@sinclair/typebox';

export const evidenceContract = {
  report: route({
    method: 'get',
    path: '/evidence/:id/report.pdf',
    access: 'read',
    summary:
      'Printable field-evidence report (PDF, A4 landscape): the scan with trays and findings beside the prediction (or the survey tables), cautions, methods (?runId= the run to compare with, else the linked run)',
    params: IdParams,
    query: Obj({ runId: Type.Optional(Uuid()) }),
    response: fileAnswer('application/pdf'),
  }),
};
