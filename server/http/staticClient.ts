/**
 * The built client: files precompressed at build (vite-plugin-compression2 writes .br and .gz beside
 * each) are served compressed, Brotli first (express-static-gzip). Vite names the files under /assets
 * by their content hash, so they never change and are cached for a year; index.html and the other
 * unhashed files are revalidated on each visit so a new release is picked up at once.
 */
import type { RequestHandler } from 'express';
import expressStaticGzip from 'express-static-gzip';
import path from 'node:path';

export const IMMUTABLE = 'public, max-age=31536000, immutable';
export const REVALIDATE = 'no-cache';

/** Cache-Control for a file of the build (the path may be that of its .br/.gz sibling). */
export function cacheControlFor(dist: string, filePath: string): string {
  const rel = path.relative(dist, filePath).split(path.sep).join('/');
  return rel.startsWith('assets/') ? IMMUTABLE : REVALIDATE;
}

/** Middleware for the built client under `dist`: its files, then index.html for any other GET (client-side routes). */
export function clientStatic(dist: string): RequestHandler[] {
  const files = expressStaticGzip(dist, {
    enableBrotli: true,
    orderPreference: ['br', 'gzip'],
    index: false,
    serveStatic: {
      index: false,
      setHeaders: (res, filePath) => {
        res.setHeader('Cache-Control', cacheControlFor(dist, filePath));
      },
    },
  }) as RequestHandler;
  const page: RequestHandler = (req, res, next) => {
    // a missing hashed file is a 404, not the page (a stale page asking for a removed chunk must fail visibly)
    if ((req.method !== 'GET' && req.method !== 'HEAD') || req.path.startsWith('/assets/')) return next();
    req.url = '/index.html';
    files(req, res, next);
  };
  return [files, page];
}
