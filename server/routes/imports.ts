import multer from 'multer';
import { config } from '../config.js';
import { implement } from '../http/route.js';
import { checkImport, commitImport, previewImport } from '../services/imports/imports.js';
import { importContract as c } from '../../shared/contract/imports.js';

const upload = multer({ storage: multer.memoryStorage(), limits: { fileSize: config.importMaxBytes, files: 1 } });

export const importRoutes = [
  implement(c.preview)({
    before: [upload.single('file')],
    handler: ({ ds, user, params, query, files }) => previewImport(ds, user, params.id, files.file, query.sheet),
  }),
  implement(c.check)({ handler: ({ ds, user, params, body }) => checkImport(ds, user, params.id, body) }),
  implement(c.commit)({ handler: ({ ds, user, params, body }) => commitImport(ds, user, params.id, body) }),
];
