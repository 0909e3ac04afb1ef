import type { NextFunction, Request, Response } from 'express';
import multer from 'multer';
import { config } from '../config.js';
import { DomainError } from '../errors.js';

const mb = (n: number): string => `${(n / 1024 / 1024).toFixed(1)} MB`;

/**
 * multer (memory storage) for one photo in the field "photo"; a too large photo is answered here naming the
 * field and the limit (a missing one by the route: the contract's form requires it).
 */
export function photoUpload() {
  const m = multer({ storage: multer.memoryStorage(), limits: { fileSize: config.photoMaxBytes, files: 1, fields: 10 } }).single(
    'photo',
  );
  return (req: Request, res: Response, next: NextFunction): void => {
    m(req, res, (err: unknown) => {
      if (!err) return next();
      if (err instanceof multer.MulterError && err.code === 'LIMIT_FILE_SIZE')
        return next(
          new DomainError(413, `Photo too large: the field "photo" is limited to ${mb(config.photoMaxBytes)}`, [
            { path: 'photo', message: `exceeds ${mb(config.photoMaxBytes)}` },
          ]),
        );
      next(err); // other multer and parser errors: uploadFault in the error middleware
    });
  };
}
