/**
 * Inspection photos: content checked by magic bytes (JPEG, PNG, WebP), decoded and thumbnailed with
 * sharp, original and thumbnail stored in S3; read back only by users who may see the column.
 */
import { randomUUID } from 'node:crypto';
import type { Response } from 'express';
import sharp from 'sharp';
import type { DataSource } from 'typeorm';
import { InspectionPhoto } from '../../db/entities/InspectionPhoto.js';
import { NotFoundError, ValidationError } from '../../errors.js';
import { sniffImageType } from '../../storage/imageType.js';
import { getObjectStream, putObject } from '../../storage/s3.js';
import { audit } from '../audit/audit.js';
import { assertDraft, assertPass, visibleInspection } from './inspections.js';
import { photoRecord } from './inspectionRead.js';
import type { SessionUser } from '../../../shared/types/api.js';
import type { PhotoRecord } from '../../../shared/types/inspections.js';

export const THUMB_WIDTH_PX = 320;
const EXT = { 'image/jpeg': 'jpg', 'image/png': 'png', 'image/webp': 'webp' } as const;

export interface PhotoUpload {
  buffer: Buffer;
  fields: { tray?: string; pass?: string; finding?: string; caption?: string };
}

function optionalInt(v: string | undefined, field: string, min: number, max: number): number | null {
  if (v === undefined || v === '') return null;
  const n = Number(v);
  if (!Number.isInteger(n) || n < min || n > max)
    throw new ValidationError('Invalid photo fields', [{ path: field, message: `must be a whole number from ${min} to ${max}` }]);
  return n;
}

export async function uploadPhoto(ds: DataSource, user: SessionUser, id: string, up: PhotoUpload): Promise<PhotoRecord> {
  const tray = optionalInt(up.fields.tray, 'tray', 1, 500);
  const pass = optionalInt(up.fields.pass, 'pass', 1, 4);
  const type = sniffImageType(up.buffer);
  if (!type)
    throw new ValidationError('Unsupported photo type', [
      { path: 'photo', message: 'must be a JPEG, PNG or WebP image (checked by content, not by file name)' },
    ]);
  const insp = await visibleInspection(ds.manager, user, id);
  assertDraft(insp);
  await assertPass(ds.manager, insp.columnId, tray, pass);
  let thumb: Buffer;
  let meta: sharp.Metadata;
  try {
    meta = await sharp(up.buffer).metadata();
    thumb = await sharp(up.buffer)
      .rotate()
      .resize({ width: THUMB_WIDTH_PX, withoutEnlargement: true })
      .jpeg({ quality: 75 })
      .toBuffer();
  } catch {
    throw new ValidationError('Unreadable photo', [{ path: 'photo', message: `looks like ${type} but cannot be decoded` }]);
  }
  const photoId = randomUUID();
  const objectKey = `inspections/${id}/${photoId}.${EXT[type]}`;
  const thumbKey = `inspections/${id}/${photoId}-thumb.jpg`;
  await putObject(objectKey, up.buffer, type);
  await putObject(thumbKey, thumb, 'image/jpeg');
  return ds.transaction(async (em) => {
    assertDraft(await visibleInspection(em, user, id, true));
    const p = await em.save(
      InspectionPhoto,
      em.create(InspectionPhoto, {
        id: photoId,
        inspectionId: id,
        tray,
        pass,
        finding: (up.fields.finding ?? '').slice(0, 200),
        caption: (up.fields.caption ?? '').slice(0, 500),
        contentType: type,
        bytes: up.buffer.length,
        width: meta.width ?? null,
        height: meta.height ?? null,
        objectKey,
        thumbKey,
        uploadedBy: user.id,
      }),
    );
    await audit(em, user.id, 'create', 'inspection-photo', p.id, { tray, pass, bytes: p.bytes, contentType: type });
    return photoRecord(p, new Map([[user.id, user.name]]));
  });
}

/** The stored photo row (404 unless the user may see the inspection's column). */
export async function visiblePhoto(ds: DataSource, user: SessionUser, id: string, photoId: string): Promise<InspectionPhoto> {
  await visibleInspection(ds.manager, user, id);
  const p = await ds.manager.findOneBy(InspectionPhoto, { id: photoId, inspectionId: id });
  if (!p) throw new NotFoundError('Photo');
  return p;
}

/** Stream the original or the thumbnail to the response. */
export async function streamPhoto(
  ds: DataSource,
  user: SessionUser,
  id: string,
  photoId: string,
  size: 'original' | 'thumb',
  res: Response,
): Promise<void> {
  const p = await visiblePhoto(ds, user, id, photoId);
  const { stream, length } = await getObjectStream(size === 'thumb' ? p.thumbKey : p.objectKey);
  res.setHeader('Content-Type', size === 'thumb' ? 'image/jpeg' : p.contentType);
  if (length !== undefined) res.setHeader('Content-Length', String(length));
  res.setHeader('X-Content-Type-Options', 'nosniff');
  await new Promise<void>((resolve, reject) => {
    stream.on('error', reject);
    res.on('finish', resolve);
    res.on('close', resolve);
    stream.pipe(res);
  });
}
