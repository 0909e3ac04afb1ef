import { implement } from '../http/route.js';
import { photoUpload } from '../http/photoUpload.js';
import { streamPhoto, uploadPhoto } from '../services/inspections/photos.js';
import { inspectionContract as c } from '../../shared/contract/inspections.js';

/** Inspection photos: multipart upload (multer, size limit in photoUpload) and the stored image. */
export const photoRoutes = [
  implement(c.uploadPhoto)({
    before: [photoUpload()],
    handler: ({ ds, user, params, body, files }) =>
      uploadPhoto(ds, user, params.id, { buffer: files.photo.buffer, fields: body }),
  }),
  implement(c.photo)({
    handler: ({ ds, user, params, query, res }) => streamPhoto(ds, user, params.id, params.photoId, query.size, res),
  }),
];
