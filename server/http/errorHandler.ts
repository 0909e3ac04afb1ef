import type { ErrorRequestHandler, RequestHandler, Response } from 'express';
import { DomainError } from '../errors.js';
import { logger } from '../logger.js';
import { databaseFault, type HttpFault } from './dbErrors.js';
import { uploadFault } from './uploadErrors.js';

export const notFoundHandler: RequestHandler = (req, res) => {
  res.status(404).json({ error: `No API route ${req.method} ${req.originalUrl}` });
};

interface LibraryError {
  type?: string;
  status?: number;
  statusCode?: number;
  expose?: boolean;
  message?: string;
  charset?: string;
  encoding?: string;
  code?: unknown;
}

/** 4xx errors raised by body-parser, the router (undecodable path) and other http-errors users. */
function libraryFault(err: unknown): HttpFault | null {
  const e = (err ?? {}) as LibraryError;
  const status = e.status ?? e.statusCode;
  if (typeof status !== 'number' || status < 400 || status > 499) return null;
  switch (e.type) {
    case 'entity.parse.failed':
      return { status: 400, error: 'Malformed JSON body', details: [{ path: '(root)', message: e.message ?? 'bad JSON' }] };
    case 'entity.too.large':
      return { status: 413, error: 'Upload or body too large' };
    case 'charset.unsupported':
      return {
        status: 415,
        error: 'Unsupported charset',
        details: [{ path: 'Content-Type', message: `charset "${e.charset ?? ''}" is not supported; send UTF-8` }],
      };
    case 'encoding.unsupported':
      return {
        status: 415,
        error: 'Unsupported content encoding',
        details: [
          { path: 'Content-Encoding', message: `"${e.encoding ?? ''}" is not supported; send gzip, deflate, br or none` },
        ],
      };
  }
  // zlib's errors (Z_DATA_ERROR…, brotli's ERR_…) while inflating a gzip/deflate/br body
  if (typeof e.code === 'string' && /^(Z_|ERR__?ERROR)/.test(e.code))
    return {
      status: 400,
      error: 'Body could not be decompressed',
      details: [{ path: 'Content-Encoding', message: `the body is not valid for its content encoding (${e.message ?? e.code})` }],
    };
  if (/decode param/i.test(e.message ?? ''))
    return { status: 400, error: 'Malformed address', details: [{ path: '(url)', message: 'has invalid percent-encoding' }] };
  const message = e.expose !== false && e.message ? e.message : 'Bad request';
  return { status, error: message };
}

function send(res: Response, f: HttpFault): void {
  if (f.retryAfter !== undefined) res.set('Retry-After', String(f.retryAfter));
  res.status(f.status).json(f.details ? { error: f.error, details: f.details } : { error: f.error });
}

/**
 * The one error middleware: domain errors keep their status and details; library 4xx errors (body parser,
 * router, multer) keep theirs; database errors map to 4xx/503 (dbErrors.ts); anything else is a bare 500.
 */
export const errorHandler: ErrorRequestHandler = (err, req, res, _next) => {
  if (err instanceof DomainError) {
    res.status(err.status).json(err.body());
    return;
  }
  const fault = uploadFault(err) ?? libraryFault(err) ?? databaseFault(err);
  if (fault) {
    if (fault.status >= 500) logger.warn({ err: String(err), method: req.method, url: req.originalUrl }, fault.error);
    if (!res.headersSent) send(res, fault);
    return;
  }
  logger.error({ err, method: req.method, url: req.originalUrl }, 'unhandled error');
  if (!res.headersSent) res.status(500).json({ error: 'Internal server error' });
  else res.end();
};
