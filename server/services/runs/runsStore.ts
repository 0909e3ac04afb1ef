/**
 * The statements behind creating a rating run: one read (column visibility, load case and sections in one
 * round trip) and one write (the run and its audit row in one statement, so it is atomic without an
 * explicit transaction; runs created at the same moment share that statement, db/writeBatcher.ts). Run
 * creation is the busiest write of the API (bench/api.ts); snapshot and results are sent compressed
 * (db/codec).
 *
 * The read is kept in a small cache keyed by column and load case (runInputsCache below). The write then
 * carries a guard: it inserts only if the column, the load case and every section of the column still
 * have the versions that were read, and the user may still see the column. Every edit of those rows bumps
 * their version (optimistic locking), so a stale cache entry can never be stored in a run: the guard
 * fails, the caller reads afresh and rates again.
 */
import type { EntityManager } from 'typeorm';
import { randomUUID } from 'node:crypto';
import { driverPool, preparedQuery } from '../../db/prepared.js';
import { WriteBatcher } from '../../db/writeBatcher.js';
import { NotFoundError } from '../../errors.js';
import { memberSiteSql, siteFilterSql } from '../access/access.js';
import { encodeJson } from '../../db/codec/index.js';
import type { RatingRun } from '../../db/entities/RatingRun.js';
import type { SessionUser } from '../../../shared/types/api.js';
import type { RatingRequest, TrayLoad } from '../../../shared/types/rating.js';
import type { LoadBasis } from '../../../shared/types/loads.js';
import type { TraySectionRecord, TrayNumbering } from '../../../shared/types/columns.js';

/** The versions a run's inputs were read at (checked again by the insert). */
export interface RunInputsGuard {
  columnVersion: number;
  loadCaseVersion: number;
  /** `${sectionId}:${version}` of every section of the column, by first tray */
  sections: string[];
}

export interface RunInputs {
  columnVersion: number;
  column: { id: string; tag: string; numbering: TrayNumbering; trayCount: number };
  loadCase: { id: string; name: string; basis: LoadBasis; version: number; loads: TrayLoad[] } | null;
  sections: Omit<TraySectionRecord, 'columnId' | 'notes'>[];
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

/** A run to insert; its results go in packed (db/codec). */
export type NewRun = Omit<RatingRun, 'id' | 'createdAt' | 'updatedAt' | 'version' | 'loadCaseName' | 'results'>;

/**
 * Work derived from one cached read of the inputs that does not depend on the run: per (method options,
 * section choice) the validated engine requests of each section and the stored bytes of the snapshot.
 * Kept beside the cached rows (a WeakMap on them), so it goes when they are re-read or evicted. The rating
 * itself is always computed afresh.
 */
export interface RunInputsMemo {
  validated: Map<string, RatingRequest>;
  snapshotBytes?: Buffer;
}
const memos = new WeakMap<RunInputs, Map<string, RunInputsMemo>>();
const MAX_MEMOS_PER_INPUTS = 16;

export function runInputsMemo(inputs: RunInputs, key: string): RunInputsMemo {
  let byKey = memos.get(inputs);
  if (!byKey) memos.set(inputs, (byKey = new Map<string, RunInputsMemo>()));
  let m = byKey.get(key);
  if (!m) {
    if (byKey.size >= MAX_MEMOS_PER_INPUTS) byKey.delete(byKey.keys().next().value as string);
    byKey.set(key, (m = { validated: new Map() }));
  }
  return m;
}

type InsertedRun = { id: string; createdAt: Date; updatedAt: Date; version: number };

/** The rating_runs columns a run insert fills, with their types. */
const STORED_COLUMNS: [name: string, type: string][] = [
  ['id', 'uuid'],
  ['column_id', 'uuid'],
  ['load_case_id', 'uuid'],
  ['label', 'text'],
  ['kind', 'text'],
  ['status', 'text'],
  ['engine_version', 'text'],
  ['snapshot', 'bytea'],
  ['results', 'bytea'],
  ['summary', 'jsonb'],
  ['reviews', 'jsonb'],
  ['review_comment', 'text'],
  ['author_id', 'uuid'],
  ['reviewer_id', 'uuid'],
  ['load_case_name', 'text'],
];
/** Values that go with each row but are not stored in the run: its audit row and its guard. */
const GUARD_COLUMNS: [name: string, type: string][] = [
  ['audit_user', 'uuid'],
  ['changes', 'jsonb'],
  ['column_version', 'int'],
  ['load_case_version', 'int'],
  ['sections', 'text[]'],
  ['member', 'uuid'], // null for an administrator (every site), else the user whose site access is checked
];
const RUN_ROW_COLUMNS = [...STORED_COLUMNS, ...GUARD_COLUMNS];
const STORED = STORED_COLUMNS.map(([n]) => n).join(', ');
/** Values of one run insert, in the order of RUN_ROW_COLUMNS. */
type RunRow = unknown[];

const batchSql = new Map<number, string>();
/**
 * One statement inserting n runs and their audit rows. A row is inserted only if its guard still holds:
 * the column, its load case and every section of the column have the versions the run was rated on, and
 * the user may still see the column. Rows that fail their guard are skipped (the caller reads again).
 */
function insertRunsSql(n: number): string {
  let sql = batchSql.get(n);
  if (sql) return sql;
  const w = RUN_ROW_COLUMNS.length;
  const rows = Array.from(
    { length: n },
    (_, i) => `(${RUN_ROW_COLUMNS.map(([, type], j) => `$${i * w + j + 1}${i === 0 ? `::${type}` : ''}`).join(', ')})`,
  );
  sql = `WITH v (${RUN_ROW_COLUMNS.map(([name]) => name).join(', ')}) AS (VALUES ${rows.join(', ')}),
     ok AS (
       SELECT v.* FROM v JOIN columns c ON c.id = v.column_id AND c.version = v.column_version
         JOIN process_units u ON u.id = c.unit_id
       WHERE (v.member IS NULL OR ${memberSiteSql('u.site_id', 'v.member')})
         AND EXISTS (SELECT 1 FROM load_cases l WHERE l.id = v.load_case_id AND l.column_id = c.id AND l.version = v.load_case_version)
         AND (SELECT coalesce(array_agg(s.id::text || ':' || s.version ORDER BY s.first_tray), '{}'::text[])
              FROM tray_sections s WHERE s.column_id = c.id) = v.sections),
     run AS (
       INSERT INTO rating_runs (${STORED}, created_at, updated_at)
       SELECT ${STORED}, t.at, t.at FROM ok, LATERAL (SELECT clock_timestamp() AS at) t
       RETURNING id, created_at, updated_at, version),
     logged AS (
       INSERT INTO audit_log (user_id, action, entity, entity_id, changes)
       SELECT ok.audit_user, 'create', 'rating-run', run.id::text, ok.changes FROM run JOIN ok ON ok.id = run.id)
     SELECT id, created_at AS "createdAt", updated_at AS "updatedAt", version FROM run`;
  batchSql.set(n, sql);
  return sql;
}

/** Insert rows in one statement (prepared per batch size; inside a transaction it runs there). */
async function sendRuns(em: EntityManager, rows: RunRow[]): Promise<(InsertedRun | null)[]> {
  const out = await preparedQuery<InsertedRun>(
    em,
    `frothline-insert-runs-${rows.length}`,
    insertRunsSql(rows.length),
    rows.flat(),
  );
  const byId = new Map(out.map((r) => [r.id, r]));
  return rows.map((r) => byId.get(r[0] as string) ?? null);
}

/** One batcher per connection pool (db/writeBatcher.ts). */
const batchers = new WeakMap<object, WriteBatcher<RunRow, InsertedRun>>();
function batcherFor(em: EntityManager): WriteBatcher<RunRow, InsertedRun> {
  const pool = driverPool(em);
  let b = batchers.get(pool);
  if (!b) batchers.set(pool, (b = new WriteBatcher({ send: (rows) => sendRuns(em, rows) })));
  return b;
}

/**
 * INSERT the run (snapshot and results compressed) and its audit row, only if the guard still holds for
 * this user; null when it does not (nothing is written). Inside a transaction the statement runs there;
 * otherwise it joins the runs being written at the same moment in one statement (db/writeBatcher.ts).
 */
export async function insertRunWithAudit(
  em: EntityManager,
  user: SessionUser,
  r: NewRun,
  packed: { snapshot?: Buffer; results: Buffer },
  audit: { changes: unknown },
  guard: RunInputsGuard,
): Promise<InsertedRun | null> {
  const snapshot = packed.snapshot ?? encodeJson(r.snapshot);
  const results = packed.results;
  const row: RunRow = [
    randomUUID(),
    r.columnId,
    r.loadCaseId,
    r.label,
    r.kind,
    r.status,
    r.engineVersion,
    snapshot,
    results,
    JSON.stringify(r.summary),
    JSON.stringify(r.reviews),
    r.reviewComment,
    r.authorId,
    r.reviewerId,
    r.snapshot.loadCase.name,
    user.id,
    JSON.stringify(audit.changes ?? null),
    guard.columnVersion,
    guard.loadCaseVersion,
    guard.sections,
    user.role === 'admin' ? null : user.id,
  ];
  if (em.queryRunner) return (await sendRuns(em, [row]))[0]!;
  return batcherFor(em).write(row);
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
