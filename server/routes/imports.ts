import multer from 'multer';
import { config } from '../config.js';
import { defineRoutes } from '../http/route.js';
import { checkImport, commitImport, ImportRowsError, previewImport } from '../services/imports/imports.js';
import { uuidParams } from '../../shared/schemas/common.js';
import { importCheckBody, importCommitBody, importPreviewQuery } from '../../shared/schemas/imports.js';
import type { ImportCheckBody, ImportCommitBody } from '../../shared/types/imports.js';

type Id = { id: string };
const upload = multer({ storage: multer.memoryStorage(), limits: { fileSize: config.importMaxBytes, files: 1 } });

export const importRoutes = defineRoutes([
  {
    method: 'post',
    path: '/columns/:id/imports',
    access: 'loads.edit',
    summary:
      'Upload a tray profile (multipart field "file", CSV or XLSX; ?sheet=) and get a preview: mapping, units, numbering, row errors',
    params: uuidParams,
    query: importPreviewQuery,
    before: [upload.single('file')],
    handler: async ({ ds, user, params, query, req }) =>
      previewImport(ds, user, (params as Id).id, req.file, (query as { sheet?: string }).sheet),
  },
  {
    method: 'post',
    path: '/columns/:id/imports/check',
    access: 'loads.edit',
    summary:
      'Re-check the previewed rows with a changed mapping, units or numbering: converted loads and every row error; stores nothing',
    params: uuidParams,
    body: importCheckBody,
    handler: async ({ ds, user, params, body }) => checkImport(ds, user, (params as Id).id, body as ImportCheckBody),
  },
  {
    method: 'post',
    path: '/columns/:id/imports/commit',
    access: 'loads.edit',
    summary:
      'Store the confirmed import as a new load case, all or nothing (any row error → 400 with the first rowErrors and errorCount, nothing stored)',
    params: uuidParams,
    body: importCommitBody,
    status: 201,
    handler: async ({ ds, user, params, body, res }) => {
      try {
        return await commitImport(ds, user, (params as Id).id, body as ImportCommitBody);
      } catch (e) {
        if (!(e instanceof ImportRowsError)) throw e;
        res.status(400);
        return { error: e.message, details: e.details, rowErrors: e.rowErrors, errorCount: e.errorCount };
      }
    },
  },
]);
