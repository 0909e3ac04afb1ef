import multer from 'multer';
import { config } from '../config.js';
import { defineRoutes, implement } from '../http/route.js';
import { createEvidence, deleteEvidence, getEvidence, listEvidence, updateEvidence } from '../services/evidence/evidence.js';
import { evidencePdf } from '../services/evidence/evidencePdf.js';
import { readEvidence } from '../services/evidence/evidenceReading.js';
import { commitScanImport, previewScanImport } from '../services/evidence/scanImport.js';
import { ImportRowsError } from '../services/imports/imports.js';
import { evidenceContract } from '../../shared/contract/evidence.js';
import { uuidParams } from '../../shared/schemas/common.js';
import {
  createEvidenceEnvelope,
  deleteEvidenceQuery,
  evidenceListQuery,
  evidenceReadingQuery,
  scanImportCommitBody,
  scanImportPreviewQuery,
  updateEvidenceBody,
} from '../../shared/schemas/evidence.js';
import type * as T from '../../shared/types/evidence.js';

type Id = { id: string };
const upload = multer({ storage: multer.memoryStorage(), limits: { fileSize: config.importMaxBytes, files: 1 } });

export const evidenceRoutes = defineRoutes([
  {
    method: 'get',
    path: '/columns/:id/evidence',
    access: 'read',
    summary: 'Field evidence of a column (gamma scans, ΔP surveys, temperature surveys), newest first',
    params: uuidParams,
    query: evidenceListQuery,
    handler: async ({ ds, user, params, query }) => ({
      items: await listEvidence(ds, user, (params as Id).id, (query as { kind?: T.EvidenceKind }).kind),
    }),
  },
  {
    method: 'post',
    path: '/columns/:id/evidence',
    access: 'evidence.record',
    summary: 'Store a gamma scan, ΔP survey or temperature survey of the column (data checked per kind)',
    params: uuidParams,
    body: createEvidenceEnvelope,
    status: 201,
    handler: async ({ ds, user, params, body }) => createEvidence(ds, user, (params as Id).id, body as T.CreateEvidenceBody),
  },
  {
    method: 'get',
    path: '/evidence/:id',
    access: 'read',
    summary: 'One field-evidence record with its data',
    params: uuidParams,
    handler: async ({ ds, user, params }) => getEvidence(ds, user, (params as Id).id),
  },
  {
    method: 'get',
    path: '/evidence/:id/reading',
    access: 'read',
    summary:
      'A gamma scan read tray by tray against the column (datum and nudge applied) and the prediction of a rating run (?runId=, else the linked run)',
    params: uuidParams,
    query: evidenceReadingQuery,
    handler: async ({ ds, user, params, query }) =>
      readEvidence(ds, user, (params as Id).id, (query as { runId?: string }).runId),
  },
  {
    method: 'patch',
    path: '/evidence/:id',
    access: 'evidence.record',
    summary: "Edit a record's header, links and datum nudge (optimistic lock on version)",
    params: uuidParams,
    body: updateEvidenceBody,
    handler: async ({ ds, user, params, body }) => updateEvidence(ds, user, (params as Id).id, body as T.UpdateEvidenceBody),
  },
  {
    method: 'delete',
    path: '/evidence/:id',
    access: 'evidence.record',
    summary: 'Delete a record (?version= the version you saw)',
    params: uuidParams,
    query: deleteEvidenceQuery,
    status: 204,
    handler: async ({ ds, user, params, query }) => {
      await deleteEvidence(ds, user, (params as Id).id, (query as { version: number }).version);
    },
  },
  {
    method: 'post',
    path: '/columns/:id/evidence/scan-imports',
    access: 'evidence.record',
    summary:
      'Upload a gamma scan (multipart field "file", CSV or XLSX; ?sheet=) and get a preview: columns, units, points, row errors',
    params: uuidParams,
    query: scanImportPreviewQuery,
    before: [upload.single('file')],
    handler: async ({ ds, user, params, query, req }) =>
      previewScanImport(ds, user, (params as Id).id, req.file, (query as { sheet?: string }).sheet),
  },
  {
    method: 'post',
    path: '/columns/:id/evidence/scan-imports/commit',
    access: 'evidence.record',
    summary: 'Store the previewed scan as a gamma-scan record, all or nothing (any row error → 400 with the row errors)',
    params: uuidParams,
    body: scanImportCommitBody,
    status: 201,
    handler: async ({ ds, user, params, body, res }) => {
      try {
        return await commitScanImport(ds, user, (params as Id).id, body as T.ScanImportCommitBody);
      } catch (e) {
        if (!(e instanceof ImportRowsError)) throw e;
        res.status(400);
        return { error: e.message, details: e.details, rowErrors: e.rowErrors, errorCount: e.errorCount };
      }
    },
  },
  implement(evidenceContract.report)({
    handler: async ({ ds, user, params, query, res }) => {
      const { pdf, filename } = await evidencePdf(ds, user, params.id, query.runId);
      res.setHeader('Content-Type', 'application/pdf');
      res.setHeader('Content-Disposition', `inline; filename="${filename}"`);
      res.end(pdf);
    },
  }),
]);
