import type { ErrorRequestHandler, RequestHandler } from 'express';
import { DomainError } from '../errors.js';
import { logger } from '../logger.js';

export const notFoundHandler: RequestHandler = (req, res) => {
  res.status(404).json({ error: `No API route ${req.method} ${req.originalUrl}` });
};

/** The one error middleware: domain errors keep their status and details; anything else is a bare 500. */
export const errorHandler: ErrorRequestHandler = (err, req, res, _next) => {
  if (err instanceof DomainError) {
    res.status(err.status).json(err.details ? { error: err.message, details: err.details } : { error: err.message });
    return;
  }
  const e = err as { type?: string; status?: number; message?: string; code?: string; field?: string };
  if (e.type === 'entity.parse.failed') {
    res.status(400).json({ error: 'Malformed JSON body', details: [{ path: '(root)', message: e.message ?? 'bad JSON' }] });
    return;
  }
  if (e.type === 'entity.too.large' || e.code === 'LIMIT_FILE_SIZE') {
    res.status(413).json({ error: 'Upload or body too large', details: e.field ? [{ path: e.field, message: 'exceeds the size limit' }] : undefined });
    return;
  }
  logger.error({ err, method: req.method, url: req.originalUrl }, 'unhandled error');
  res.status(500).json({ error: 'Internal server error' });
};
