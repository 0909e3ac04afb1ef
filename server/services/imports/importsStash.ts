/**
 * Import previews kept in PostgreSQL (table import_previews) until they are committed or expire, so any
 * server process can commit a preview another made. The rows are stored as gzip JSON (level 1: a
 * 1,000-row profile packs in about a millisecond). Expired rows are deleted whenever a preview is kept.
 */
import { randomUUID } from 'node:crypto';
import { gunzipSync, gzipSync } from 'node:zlib';
import { LessThan, type EntityManager } from 'typeorm';
import { ImportPreviewEntity } from '../../db/entities/ImportPreview.js';
import { ValidationError } from '../../errors.js';
import { IMPORT_LIMITS } from '../../../shared/importLimits.js';

export interface StashedTable {
  headers: string[];
  rows: string[][];
  firstDataRow: number;
  fileName: string;
}

/** previews one user keeps at once; older ones are dropped (each holds at most a few MB) */
const PER_USER = 10;

/** Keeps the previewed rows; answers the token. */
export async function keepPreview(em: EntityManager, userId: string, columnId: string, t: StashedTable): Promise<string> {
  const repo = em.getRepository(ImportPreviewEntity);
  await repo.delete({ expiresAt: LessThan(new Date()) });
  await em.query(
    `DELETE FROM import_previews WHERE id IN
       (SELECT id FROM import_previews WHERE user_id = $1 ORDER BY created_at DESC OFFSET $2)`,
    [userId, PER_USER - 1],
  );
  const id = randomUUID();
  await repo.insert({
    id,
    userId,
    columnId,
    fileName: t.fileName,
    firstDataRow: t.firstDataRow,
    tableData: gzipSync(JSON.stringify({ headers: t.headers, rows: t.rows }), { level: 1 }),
    expiresAt: new Date(Date.now() + IMPORT_LIMITS.previewMinutes * 60_000),
  });
  return id;
}

const refuse = (message: string, detail: string) => new ValidationError(message, [{ path: 'token', message: detail }]);

/**
 * The previewed rows of a token (same user and column, not expired). With `take`, the row is deleted in the
 * caller's transaction (and locked first, so two commits of one preview cannot both store it).
 */
export async function previewRows(
  em: EntityManager,
  userId: string,
  columnId: string,
  token: string,
  take = false,
): Promise<StashedTable> {
  const repo = em.getRepository(ImportPreviewEntity);
  const p = /^[0-9a-f-]{36}$/i.test(token)
    ? await repo.findOne({ where: { id: token }, ...(take ? { lock: { mode: 'pessimistic_write' } } : {}) })
    : null;
  if (!p || p.userId !== userId || p.columnId !== columnId)
    throw refuse(
      'Import preview not found',
      'this preview was already stored, has expired or belongs to another column: upload the file again',
    );
  if (p.expiresAt.getTime() < Date.now())
    throw refuse(
      'Import preview expired',
      `previews are kept for ${IMPORT_LIMITS.previewMinutes} minutes and this one expired at ${p.expiresAt.toISOString().slice(11, 16)} UTC: upload the file again`,
    );
  if (take) await repo.delete({ id: p.id });
  const { headers, rows } = JSON.parse(gunzipSync(p.tableData).toString('utf8')) as { headers: string[]; rows: string[][] };
  return { headers, rows, firstDataRow: p.firstDataRow, fileName: p.fileName };
}
