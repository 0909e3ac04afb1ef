/**
 * Stored pump-around duty studies (issue 5): build the engine's StudyInput from a column's sections, a
 * base load case and one of its pump-arounds, run the study, store the inputs snapshot and the slimmed
 * result, and take the study through review like a rating run (draft → submitted → approved | returned;
 * approved is read-only).
 */
import type { DataSource, EntityManager } from 'typeorm';
import { PumpAroundStudy } from '../../db/entities/PumpAroundStudy.js';
import { ValidationError, NotFoundError } from '../../errors.js';
import { validateStudyInput } from '../../engine/pumpAround/index.js';
import { assertColumnVisible, canSeeColumn } from '../access/access.js';
import { audit } from '../audit/audit.js';
import { loadStudyParts, studyInputFrom, type StudyParts } from './studyInputs.js';
import { runSlimStudy } from './studyResult.js';
import type { SessionUser } from '../../../shared/types/api.js';
import type { StudyInput } from '../../../shared/types/pumpAround.js';
import type { CreateStudyBody, SlimStudyResult, StudyRecord, StudySummary } from '../../../shared/types/studies.js';

/** Engine field path → request field: the form's own name where the value came from the request. */
function requestPath(enginePath: string): string {
  const p = enginePath.replace(/^\//, '').split('/');
  if (p[0] === 'pumpAround')
    return ['drawTray', 'returnTray', 'name'].includes(p[1] ?? '') ? `pumpAroundId (${p[1]})` : p.slice(1).join('.');
  if (p[0] === 'sections') return `column sections.${p.slice(1).join('.')}`;
  if (p[0] === 'trays') return `loadCaseId (loads).${p.slice(1).join('.')}`;
  return p.join('.') || '(root)';
}

/** Build the engine input from the column's stored data, validate it, run the study and slim the result. */
export async function buildStudy(
  db: DataSource | EntityManager,
  columnId: string,
  body: CreateStudyBody,
): Promise<{ parts: StudyParts; input: StudyInput; result: SlimStudyResult }> {
  const parts = await loadStudyParts(db, columnId, body.loadCaseId, body.pumpAroundId);
  const { input: raw, excludedTrays, netOfCirculation_kg_h } = studyInputFrom(parts, body);
  const checked = validateStudyInput(raw);
  if (!checked.ok)
    throw new ValidationError(
      'The study input is not valid',
      checked.errors.map((e) => ({ path: requestPath(e.path), message: e.message })),
    );
  const input = checked.value;
  const result = runSlimStudy(input);
  if (excludedTrays.length)
    result.notes.push(`Load-case trays outside every section were left out of the study: ${excludedTrays.join(', ')}.`);
  if (netOfCirculation_kg_h !== null)
    result.notes.push(
      `The load case's zone liquid included the circulation: the base circulation ${Math.round(netOfCirculation_kg_h)} kg/h was taken off each zone tray before the study.`,
    );
  return { parts, input, result };
}

/** Store a built study as a draft by its author, audited, inside the caller's transaction. */
export async function insertStudy(
  em: EntityManager,
  authorId: string,
  body: CreateStudyBody,
  built: Awaited<ReturnType<typeof buildStudy>>,
): Promise<PumpAroundStudy> {
  const { parts, input, result } = built;
  const row = await em.save(
    PumpAroundStudy,
    em.create(PumpAroundStudy, {
      columnId: parts.column.id,
      loadCaseId: parts.loadCase.id,
      pumpAroundId: parts.pumpAround.id,
      label: body.label?.trim() || `${parts.pumpAround.name} duty study`,
      inputs: {
        source: {
          columnTag: parts.column.tag,
          loadCaseId: parts.loadCase.id,
          loadCaseName: parts.loadCase.name,
          pumpAroundId: parts.pumpAround.id,
          pumpAroundName: parts.pumpAround.name,
          request: body,
        },
        input,
      },
      results: result,
      authorId,
      status: 'draft',
      reviews: [],
    }),
  );
  await audit(em, authorId, 'create', 'pump_around_study', row.id, {
    label: row.label,
    pumpAroundId: row.pumpAroundId,
    loadCaseId: row.loadCaseId,
  });
  return row;
}

export async function createStudy(
  ds: DataSource,
  user: SessionUser,
  columnId: string,
  body: CreateStudyBody,
): Promise<StudyRecord> {
  await assertColumnVisible(ds, user, columnId);
  const built = await buildStudy(ds, columnId, body);
  const row = await ds.transaction((em) => insertStudy(em, user.id, body, built));
  return getStudy(ds, user, row.id);
}

interface StudyRow {
  id: string;
  column_id: string;
  column_tag: string;
  label: string;
  status: StudyRecord['status'];
  author_id: string;
  author_name: string;
  reviewer_id: string | null;
  reviewer_name: string | null;
  review_comment: string | null;
  reviews: StudyRecord['reviews'];
  submitted_at: Date | null;
  reviewed_at: Date | null;
  created_at: Date;
  version: number;
  pump_around_name: string;
  load_case_name: string;
  dry_out: number | null;
  limiting: number | null;
  recommended: number | null;
}

const SUMMARY_SQL = `SELECT s.id, s.column_id, c.tag AS column_tag, s.label, s.status, s.author_id, a.name AS author_name,
  s.reviewer_id, r.name AS reviewer_name, s.review_comment, s.reviews, s.submitted_at, s.reviewed_at, s.created_at, s.version,
  s.inputs->'source'->>'pumpAroundName' AS pump_around_name, s.inputs->'source'->>'loadCaseName' AS load_case_name,
  (s.results->>'dryOutDuty_kW')::float8 AS dry_out, (s.results->>'limitingDuty_kW')::float8 AS limiting,
  (s.results->>'recommendedDuty_kW')::float8 AS recommended
  FROM pump_around_studies s JOIN columns c ON c.id = s.column_id JOIN users a ON a.id = s.author_id
  LEFT JOIN users r ON r.id = s.reviewer_id`;

function toSummary(r: StudyRow): StudySummary {
  return {
    id: r.id,
    columnId: r.column_id,
    label: r.label,
    pumpAroundName: r.pump_around_name,
    loadCaseName: r.load_case_name,
    status: r.status,
    authorId: r.author_id,
    authorName: r.author_name,
    dryOutDuty_kW: r.dry_out,
    limitingDuty_kW: r.limiting,
    recommendedDuty_kW: r.recommended,
    createdAt: r.created_at.toISOString(),
    version: r.version,
  };
}

export async function listStudies(ds: DataSource, user: SessionUser, columnId: string): Promise<StudySummary[]> {
  await assertColumnVisible(ds, user, columnId);
  const rows = await ds.query<StudyRow[]>(`${SUMMARY_SQL} WHERE s.column_id = $1 ORDER BY s.created_at DESC`, [columnId]);
  return rows.map(toSummary);
}

/** The study with its snapshot and result; 404 when it does not exist or its column is not visible. */
export async function getStudy(db: DataSource | EntityManager, user: SessionUser, id: string): Promise<StudyRecord> {
  const rows = await db.query<StudyRow[]>(`${SUMMARY_SQL} WHERE s.id = $1`, [id]);
  const r = rows[0];
  if (!r || !(await canSeeColumn(db, user, r.column_id))) throw new NotFoundError('Study');
  const [full] = await db.query<
    {
      inputs: StudyRecord['inputs'];
      results: StudyRecord['result'];
    }[]
  >(`SELECT inputs, results FROM pump_around_studies WHERE id = $1`, [id]);
  return {
    ...toSummary(r),
    columnTag: r.column_tag,
    inputs: full!.inputs,
    result: full!.results,
    reviewerId: r.reviewer_id,
    reviewerName: r.reviewer_name,
    reviewComment: r.review_comment,
    reviews: r.reviews,
    submittedAt: r.submitted_at?.toISOString() ?? null,
    reviewedAt: r.reviewed_at?.toISOString() ?? null,
  };
}
