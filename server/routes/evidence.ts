import multer from 'multer';
import { config } from '../config.js';
import { implement } from '../http/route.js';
import { createEvidence, deleteEvidence, getEvidence, listEvidence, updateEvidence } from '../services/evidence/evidence.js';
import { evidencePdf } from '../services/evidence/evidencePdf.js';
import { readEvidence } from '../services/evidence/evidenceReading.js';
import { commitScanImport, previewScanImport } from '../services/evidence/scanImport.js';
import { evidenceContract as c } from '../../shared/contract/evidence.js';

const upload = multer({ storage: multer.memoryStorage(), limits: { fileSize: config.importMaxBytes, files: 1 } });

export const evidenceRoutes = [
  implement(c.list)({
    handler: ({ ds, user, params, query }) => listEvidence(ds, user, params.id, query.kind),
  }),
  implement(c.create)({ handler: async ({ ds, user, params, body }) => createEvidence(ds, user, params.id, body) }),
  implement(c.get)({ handler: async ({ ds, user, params }) => getEvidence(ds, user, params.id) }),
  implement(c.reading)({ handler: async ({ ds, user, params, query }) => readEvidence(ds, user, params.id, query.runId) }),
  implement(c.update)({ handler: async ({ ds, user, params, body }) => updateEvidence(ds, user, params.id, body) }),
  implement(c.remove)({
    handler: async ({ ds, user, params, query }) => {
      await deleteEvidence(ds, user, params.id, query.version);
    },
  }),
  implement(c.scanPreview)({
    before: [upload.single('file')],
    handler: async ({ ds, user, params, query, files }) => previewScanImport(ds, user, params.id, files.file, query.sheet),
  }),
  implement(c.scanCommit)({
    handler: async ({ ds, user, params, body }) => commitScanImport(ds, user, params.id, body),
  }),
  implement(c.report)({
    handler: async ({ ds, user, params, query, res }) => {
      const { pdf, filename } = await evidencePdf(ds, user, params.id, query.runId);
      res.setHeader('Content-Type', 'application/pdf');
      res.setHeader('Content-Disposition', `inline; filename="${filename}"`);
      res.end(pdf);
    },
  }),
];
