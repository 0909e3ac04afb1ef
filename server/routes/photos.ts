import { defineRoutes } from '../http/route.js';
import { photoUpload } from '../http/photoUpload.js';
import { streamPhoto, uploadPhoto } from '../services/inspections/photos.js';
import { uuidParams } from '../../shared/schemas/common.js';
import { photoFieldsBody, photoParams, photoQuery } from '../../shared/schemas/inspections.js';

export const photoRoutes = defineRoutes([
  {
    method: 'post',
    path: '/inspections/:id/photos',
    access: 'inspections.record',
    summary:
      'Upload a photo (multipart field "photo": JPEG, PNG or WebP, checked by content; fields tray, pass, finding, caption)',
    params: uuidParams,
    body: photoFieldsBody,
    before: [photoUpload()],
    status: 201,
    handler: async ({ ds, user, params, req }) =>
      uploadPhoto(ds, user, (params as { id: string }).id, {
        buffer: req.file!.buffer,
        fields: (req.body ?? {}) as Record<string, string>,
      }),
  },
  {
    method: 'get',
    path: '/inspections/:id/photos/:photoId',
    access: 'read',
    summary: 'A photo (size=original|thumb), only for users who may see the column',
    params: photoParams,
    query: photoQuery,
    handler: async ({ ds, user, params, query, res }) => {
      const p = params as { id: string; photoId: string };
      await streamPhoto(ds, user, p.id, p.photoId, (query as { size: 'original' | 'thumb' }).size, res);
    },
  },
]);
