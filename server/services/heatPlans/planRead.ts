/** Reading stored heat-recovery plans: lists for the column page, one plan for its page, one grid point's trays. */
import type { DataSource, EntityManager } from 'typeorm';
import { HeatPlan } from '../../db/entities/HeatPlan.js';
import { HeatPlanPoint } from '../../db/entities/HeatPlanPoint.js';
import { NotFoundError, ValidationError } from '../../errors.js';
import { assertColumnVisible, canSeeColumn } from '../access/access.js';
import type { SessionUser } from '../../../shared/types/api.js';
import type { HeatPlanRecord, HeatPlanSummary, SlimPlanPoint } from '../../../shared/types/heatPlans.js';

interface PlanRow {
  id: string;
  column_id: string;
  column_tag: string;
  label: string;
  status: HeatPlanRecord['status'];
  author_id: string;
  author_name: string;
  reviewer_id: string | null;
  reviewer_name: string | null;
  review_comment: string | null;
  reviews: HeatPlanRecord['reviews'];
  submitted_at: Date | null;
  reviewed_at: Date | null;
  created_at: Date;
  version: number;
  pump_around_names: string[] | null;
  load_case_name: string;
  suggested_duties_kw: number[] | null;
  recovered_above_kw: number | null;
}

const SUMMARY_SQL = `SELECT p.id, p.column_id, c.tag AS column_tag, p.label, p.status, p.author_id, a.name AS author_name,
  p.reviewer_id, r.name AS reviewer_name, p.review_comment, p.reviews, p.submitted_at, p.reviewed_at, p.created_at, p.version,
  ARRAY(SELECT x->>'name' FROM jsonb_array_elements(p.inputs->'source'->'pumpArounds') x) AS pump_around_names,
  p.inputs->'source'->>'loadCaseName' AS load_case_name, p.suggested_duties_kw, p.recovered_above_kw
  FROM heat_plans p JOIN columns c ON c.id = p.column_id JOIN users a ON a.id = p.author_id
  LEFT JOIN users r ON r.id = p.reviewer_id`;

function toSummary(r: PlanRow): HeatPlanSummary {
  return {
    id: r.id,
    columnId: r.column_id,
    label: r.label,
    pumpAroundNames: r.pump_around_names ?? [],
    loadCaseName: r.load_case_name,
    status: r.status,
    authorId: r.author_id,
    authorName: r.author_name,
    suggestedDuties_kW: r.suggested_duties_kw,
    recoveredAbove_kW: r.recovered_above_kw,
    createdAt: r.created_at.toISOString(),
    version: r.version,
  };
}

export async function listHeatPlans(ds: DataSource, user: SessionUser, columnId: string): Promise<HeatPlanSummary[]> {
  await assertColumnVisible(ds, user, columnId);
  const rows = await ds.query<PlanRow[]>(`${SUMMARY_SQL} WHERE p.column_id = $1 ORDER BY p.created_at DESC`, [columnId]);
  return rows.map(toSummary);
}

/** The plan's row with review state (no results); 404 when it does not exist or its column is not visible. */
async function visiblePlanRow(db: DataSource | EntityManager, user: SessionUser, id: string): Promise<PlanRow> {
  const [r] = await db.query<PlanRow[]>(`${SUMMARY_SQL} WHERE p.id = $1`, [id]);
  if (!r || !(await canSeeColumn(db, user, r.column_id))) throw new NotFoundError('Heat-recovery plan');
  return r;
}

/** Review state only (for the review step, which does not need the result). */
export async function getPlanHead(db: DataSource | EntityManager, user: SessionUser, id: string) {
  const r = await visiblePlanRow(db, user, id);
  return { ...toSummary(r), columnTag: r.column_tag, reviews: r.reviews };
}

async function storedPlan(db: DataSource | EntityManager, id: string): Promise<HeatPlan> {
  const row = await db.getRepository(HeatPlan).findOne({ where: { id }, select: ['id', 'inputs', 'results'] });
  if (!row) throw new NotFoundError('Heat-recovery plan');
  return row;
}

/** The plan with its snapshot and result (grid points without their trays). */
export async function getHeatPlan(db: DataSource | EntityManager, user: SessionUser, id: string): Promise<HeatPlanRecord> {
  const r = await visiblePlanRow(db, user, id);
  const full = await storedPlan(db, id);
  return {
    ...toSummary(r),
    columnTag: r.column_tag,
    inputs: full.inputs,
    result: full.results,
    reviewerId: r.reviewer_id,
    reviewerName: r.reviewer_name,
    reviewComment: r.review_comment,
    reviews: r.reviews,
    submittedAt: r.submitted_at?.toISOString() ?? null,
    reviewedAt: r.reviewed_at?.toISOString() ?? null,
  };
}

/** One grid point with every tray's traffic and percent of limit (the map's click). */
export async function getHeatPlanPoint(db: DataSource, user: SessionUser, id: string, index: number): Promise<SlimPlanPoint> {
  await visiblePlanRow(db, user, id);
  const { results } = await storedPlan(db, id);
  const summary = results.grid[index];
  const row = summary ? await db.getRepository(HeatPlanPoint).findOneBy({ planId: id, idx: index }) : null;
  if (!summary || !row)
    throw new ValidationError('No such grid point', [
      { path: 'index', message: `is ${index}; the plan's grid has points 0 to ${results.grid.length - 1}` },
    ]);
  return { ...summary, trays: row.trays };
}
