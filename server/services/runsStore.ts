/**
 * The statements behind creating a rating run: one read (column visibility, load case and sections in one
 * round trip) and one write (the run and its audit row in one statement, so it is atomic without an
 * explicit transaction). Run creation is the busiest write of the API (bench/api.ts); snapshot and results
 * are sent compressed (services/runsPack.ts).
 *
 * The read is kept in a small cache keyed by column and load case (runInputsCache below). The write then
 * carries a guard: it inserts only if the column, the load case and every section of the column still
 * have the versions that were read, and the user may still see the column. Every edit of those rows bumps
 * their version (optimistic locking), so a stale cache entry can never be stored in a run: the guard
 * fails, the caller reads afresh and rates again.
 */
import type { EntityManager } from 'typeorm';
import { preparedQuery } from '../db/prepared.js';
import { NotFoundError } from '../errors.js';
import { siteFilterSql } from './access.js';
import { encodeJson, encodeResults } from './runsPack.js';
import type { RatingRun } from '../db/entities/RatingRun.js';
import type { SessionUser } from '../../shared/types/api.js';
import type { SectionGeometry, TrayLoad } from '../../shared/types/rating.js';
import type { LoadBasis } from '../../shared/types/loads.js';
import type { GeometryProvenance } from '../../shared/types/columns.js';

/** The versions a run's inputs were read at (checked again by the insert). */
export interface RunInputsGuard {
  columnVersion: number;
  loadCaseVersion: number;
  /** `${sectionId}:${version}` of every section of the column, by first tray */
  sections: string[];
}

export interface RunInputs {
  columnVersion: number;
  column: { id: string; tag: string; numbering: 'top-down' | 'bottom-up'; trayCount: number };
  loadCase: { id: string; name: string; basis: LoadBasis; version: number; loads: TrayLoad[] } | null;
  sections: {
    id: string;
    name: string;
    firstTray: number;
    lastTray: number;
    geometry: SectionGeometry;
    provenance: GeometryProvenance;
    provenanceDate: string | null;
    version: number;
  }[];
}

/** The guard of inputs read with a found load case (the versions they were read at). */
export function guardOf(inputs: RunInputs, loadCaseVersion: number): RunInputsGuard {
  return {
    columnVersion: inputs.columnVersion,
    loadCaseVersion,
    sections: inputs.sections.map((s) => `${s.id}:${s.version}`),
  };
}

/** Column (if the user may see it; 404 otherwise), the load case (null if not on this column) and its sections. */
export async function readRunInputs(
  em: EntityManager,
  user: SessionUser,
  columnId: string,
  loadCaseId: string,
): Promise<RunInputs> {
  const f = siteFilterSql(user, 'u.site_id', 3);
  const rows = await preparedQuery<RunInputs>(
    em,
    `frothline-read-run-inputs-${user.role === 'admin' ? 'all' : 'member'}`,
    `SELECT json_build_object('id', c.id, 'tag', c.tag, 'numbering', c.numbering, 'trayCount', c.tray_count) AS column,
       c.version AS "columnVersion",
       (SELECT json_build_object('id', l.id, 'name', l.name, 'basis', l.basis, 'version', l.version, 'loads', l.loads)
          FROM load_cases l WHERE l.id = $2 AND l.column_id = c.id) AS "loadCase",
       (SELECT coalesce(json_agg(json_build_object('id', s.id, 'name', s.name, 'firstTray', s.first_tray,
          'lastTray', s.last_tray, 'geometry', s.geometry, 'provenance', s.provenance,
          'provenanceDate', s.provenance_date, 'version', s.version) ORDER BY s.first_tray), '[]'::json)
          FROM tray_sections s WHERE s.column_id = c.id) AS sections
     FROM columns c JOIN process_units u ON u.id = c.unit_id
     WHERE c.id = $1 AND ${f.sql}`,
    [columnId, loadCaseId, ...f.params],
  );
  if (!rows[0]) throw new NotFoundError('Column');
  return rows[0];
}

export type NewRun = Omit<RatingRun, 'id' | 'createdAt' | 'updatedAt' | 'version' | 'loadCaseName'>;

/**
 * INSERT the run (snapshot and results compressed) and its audit row in one statement, only if the guard
 * still holds for this user; null when it does not (nothing is written).
 */
export async function insertRunWithAudit(
  em: EntityManager,
  user: SessionUser,
  r: NewRun,
  audit: { changes: unknown },
  guard: RunInputsGuard,
): Promise<{ id: string; createdAt: Date; updatedAt: Date; version: number } | null> {
  const f = siteFilterSql(user, 'u.site_id', 20);
  const rows = await preparedQuery<{ id: string; createdAt: Date; updatedAt: Date; version: number }>(
    em,
    `frothline-insert-run-${user.role === 'admin' ? 'all' : 'member'}`,
    `WITH guard AS (
       SELECT 1 FROM columns c JOIN process_units u ON u.id = c.unit_id
       WHERE c.id = $1::uuid AND c.version = $17 AND ${f.sql}
         AND EXISTS (SELECT 1 FROM load_cases l WHERE l.id = $2::uuid AND l.column_id = c.id AND l.version = $18)
         AND (SELECT coalesce(array_agg(s.id::text || ':' || s.version ORDER BY s.first_tray), '{}'::text[])
              FROM tray_sections s WHERE s.column_id = c.id) = $19::text[]),
     run AS (
       INSERT INTO rating_runs (column_id, load_case_id, label, kind, status, engine_version, snapshot, results, summary,
         reviews, review_comment, author_id, reviewer_id, load_case_name)
       SELECT $1::uuid, $2::uuid, $3::text, $4::text, $5::text, $6::text, $7::bytea, $8::bytea, $9::jsonb, $10::jsonb,
         $11::text, $12::uuid, $13::uuid, $16::text FROM guard
       RETURNING id, created_at, updated_at, version),
     logged AS (
       INSERT INTO audit_log (user_id, action, entity, entity_id, changes)
       SELECT $14::uuid, 'create', 'rating-run', run.id::text, $15::jsonb FROM run)
     SELECT id, created_at AS "createdAt", updated_at AS "updatedAt", version FROM run`,
    [
      r.columnId,
      r.loadCaseId,
      r.label,
      r.kind,
      r.status,
      r.engineVersion,
      encodeJson(r.snapshot),
      encodeResults(r.results),
      JSON.stringify(r.summary),
      JSON.stringify(r.reviews),
      r.reviewComment,
      r.authorId,
      r.reviewerId,
      user.id,
      JSON.stringify(audit.changes ?? null),
      r.snapshot.loadCase.name,
      guard.columnVersion,
      guard.loadCaseVersion,
      guard.sections,
      ...f.params,
    ],
  );
  return rows[0] ?? null;
}

const MAX_CACHED = 200;
const cache = new Map<string, { inputs: RunInputs; users: Set<string> }>();

/**
 * Run inputs for this user: from the cache when this user has read them before (visibility was checked
 * then, and the insert's guard checks it again), else read afresh. `fresh` forces a read.
 */
export async function runInputsCache(
  em: EntityManager,
  user: SessionUser,
  columnId: string,
  loadCaseId: string,
  fresh = false,
): Promise<{ inputs: RunInputs; cached: boolean }> {
  const key = `${columnId}|${loadCaseId}`;
  const hit = fresh ? undefined : cache.get(key);
  if (hit?.users.has(user.id)) return { inputs: hit.inputs, cached: true };
  const inputs = await readRunInputs(em, user, columnId, loadCaseId);
  if (inputs.loadCase) {
    const users = hit?.users ?? new Set<string>();
    users.add(user.id);
    cache.delete(key);
    if (cache.size >= MAX_CACHED) cache.delete(cache.keys().next().value as string);
    cache.set(key, { inputs, users });
  }
  return { inputs, cached: false };
}

/** Drop a cached entry (its guard failed). */
export function forgetRunInputs(columnId: string, loadCaseId: string): void {
  cache.delete(`${columnId}|${loadCaseId}`);
}
