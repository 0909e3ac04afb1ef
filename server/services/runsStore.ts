/**
 * The two statements behind creating a rating run: one read (column visibility, load case and sections in
 * one round trip) and one write (the run and its audit row in one statement, so it is atomic without an
 * explicit transaction). Run creation is the busiest write of the API (bench/api.ts); snapshot and results
 * are sent compressed (services/runsPack.ts).
 */
import type { EntityManager } from 'typeorm';
import { NotFoundError } from '../errors.js';
import { siteFilterSql } from './access.js';
import { encodeJson, encodeResults } from './runsPack.js';
import type { RatingRun } from '../db/entities/RatingRun.js';
import type { SessionUser } from '../../shared/types/api.js';
import type { SectionGeometry, TrayLoad } from '../../shared/types/rating.js';
import type { LoadBasis } from '../../shared/types/loads.js';
import type { GeometryProvenance } from '../../shared/types/columns.js';

export interface RunInputs {
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
  }[];
}

/** Column (if the user may see it; 404 otherwise), the load case (null if not on this column) and its sections. */
export async function readRunInputs(em: EntityManager, user: SessionUser, columnId: string, loadCaseId: string): Promise<RunInputs> {
  const f = siteFilterSql(user, 'u.site_id', 3);
  const rows = (await em.query(
    `SELECT json_build_object('id', c.id, 'tag', c.tag, 'numbering', c.numbering, 'trayCount', c.tray_count) AS column,
       (SELECT json_build_object('id', l.id, 'name', l.name, 'basis', l.basis, 'version', l.version, 'loads', l.loads)
          FROM load_cases l WHERE l.id = $2 AND l.column_id = c.id) AS "loadCase",
       (SELECT coalesce(json_agg(json_build_object('id', s.id, 'name', s.name, 'firstTray', s.first_tray,
          'lastTray', s.last_tray, 'geometry', s.geometry, 'provenance', s.provenance,
          'provenanceDate', s.provenance_date) ORDER BY s.first_tray), '[]'::json)
          FROM tray_sections s WHERE s.column_id = c.id) AS sections
     FROM columns c JOIN process_units u ON u.id = c.unit_id
     WHERE c.id = $1 AND ${f.sql}`,
    [columnId, loadCaseId, ...f.params],
  )) as RunInputs[];
  if (!rows[0]) throw new NotFoundError('Column');
  return rows[0];
}

export type NewRun = Omit<RatingRun, 'id' | 'createdAt' | 'updatedAt' | 'version' | 'loadCaseName'>;

/** INSERT the run (results compressed, services/runsPack.ts) and its audit row in one statement. */
export async function insertRunWithAudit(
  em: EntityManager,
  r: NewRun,
  audit: { userId: string; changes: unknown },
): Promise<{ id: string; createdAt: Date; updatedAt: Date; version: number }> {
  const rows = (await em.query(
    `WITH run AS (
       INSERT INTO rating_runs (column_id, load_case_id, label, kind, status, engine_version, snapshot, results, summary,
         reviews, review_comment, author_id, reviewer_id, load_case_name)
       VALUES ($1, $2, $3, $4, $5, $6, $7, $8, $9, $10, $11, $12, $13, $16) RETURNING id, created_at, updated_at, version),
     logged AS (
       INSERT INTO audit_log (user_id, action, entity, entity_id, changes)
       SELECT $14, 'create', 'rating-run', run.id::text, $15::jsonb FROM run)
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
      audit.userId,
      JSON.stringify(audit.changes ?? null),
      r.snapshot.loadCase.name,
    ],
  )) as { id: string; createdAt: Date; updatedAt: Date; version: number }[];
  return rows[0]!;
}
