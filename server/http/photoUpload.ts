import type { NextFunction, Request, Response } from 'express';
import multer from 'multer';
import { config } from '../config.js';
import { DomainError, ValidationError } from '../errors.js';

const mb = (n: number): string => `${(n / 1024 / 1024).toFixed(1)} MB`;

/** multer (memory storage) for one photo in the field "photo"; a missing or too large photo is answered here naming the field. */
export function photoUpload() {
  const m = multer({ storage: multer.memoryStorage(), limits: { fileSize: config.photoMaxBytes, files: 1, fields: 10 } }).single(
    'photo',
  );
  return (req: Request, res: Response, next: NextFunction): void => {
    m(req, res, (err: unknown) => {
      if (!err) {
        if (!req.file)
          return next(new ValidationError('No photo', [{ path: 'photo', message: 'is required (multipart field "photo")' }]));
        return next();
      }
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
