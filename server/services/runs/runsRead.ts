/** Reading runs: summaries, full records, lists, and the operating window of one tray. */
import type { DataSource, EntityManager } from 'typeorm';
import { RatingRun } from '../../db/entities/RatingRun.js';
import { User } from '../../db/entities/User.js';
import { operatingWindow } from '../../engine/index.js';
import { NotFoundError } from '../../errors.js';
import { siteFilterSql } from '../access/access.js';
import { iso, visibleChild } from '../columns/columnsCommon.js';
import type { Page, SessionUser } from '../../../shared/types/api.js';
import type { ReviewStatus, RunRecord, RunSummary, RunWindow } from '../../../shared/types/runs.js';
import type { RunListQuerySchema, RunSortKey } from '../../../shared/contract/runs.js';
import { COLUMN_RUNS_CUT } from '../../../shared/contract/columns.js';
import type { Validated } from '../../../shared/contract/schema.js';

export function toRunSummary(r: Omit<RatingRun, 'results'>, authorName: string | null): RunSummary {
  return {
    id: r.id,
    columnId: r.columnId,
    label: r.label,
    kind: r.kind,
    status: r.status,
    loadCaseId: r.loadCaseId,
    loadCaseName: r.snapshot.loadCase.name,
    authorId: r.authorId,
    authorName,
    createdAt: iso(r.createdAt),
    engineVersion: r.engineVersion,
    ...r.summary,
    version: r.version,
  };
}

export async function toRunRecord(em: EntityManager, r: RatingRun): Promise<RunRecord> {
  const author = r.authorId ? await em.findOneBy(User, { id: r.authorId }) : null;
  return {
    ...toRunSummary(r, author?.name ?? null),
    snapshot: r.snapshot,
    results: r.results,
    reviews: r.reviews,
    reviewComment: r.reviewComment,
  };
}

interface SummaryRow {
  id: string;
  column_id: string;
  load_case_id: string | null;
  label: string;
  kind: RunSummary['kind'];
  status: ReviewStatus;
  engine_version: string;
  summary: RatingRun['summary'];
  author_id: string | null;
  author_name: string | null;
  created_at: Date;
  version: number;
  lc: string;
  total?: string;
}

/** Summary columns only (no snapshot or results): the column page and the list show many runs. */
const SUMMARY_SQL = `SELECT r.id, r.column_id, r.load_case_id, r.label, r.kind, r.status, r.engine_version, r.summary, r.author_id,
  a.name AS author_name, r.created_at, r.version, r.load_case_name AS lc
  FROM rating_runs r LEFT JOIN users a ON a.id = r.author_id`;

const fromRow = (r: SummaryRow): RunSummary => ({
  id: r.id,
  columnId: r.column_id,
  label: r.label,
  kind: r.kind,
  status: r.status,
  loadCaseId: r.load_case_id,
  loadCaseName: r.lc ?? '',
  authorId: r.author_id,
  authorName: r.author_name,
  createdAt: iso(r.created_at),
  engineVersion: r.engine_version,
  ...r.summary,
  version: r.version,
});

/**
 * The column page's runs: the newest COLUMN_RUNS_CUT ratings (runs of ratings as found are listed from their
 * inspection) and how many ratings the column has in all.
 */
export async function listRunSummaries(em: EntityManager, columnId: string): Promise<{ runs: RunSummary[]; runsTotal: number }> {
  const rows = await em.query<SummaryRow[]>(
    `${SUMMARY_SQL} WHERE r.column_id = $1 AND r.kind = 'rating' ORDER BY r.created_at DESC LIMIT ${COLUMN_RUNS_CUT}`,
    [columnId],
  );
  if (rows.length < COLUMN_RUNS_CUT) return { runs: rows.map(fromRow), runsTotal: rows.length };
  const [count] = await em.query<{ n: number }[]>(
    `SELECT count(*)::int AS n FROM rating_runs r WHERE r.column_id = $1 AND r.kind = 'rating'`,
    [columnId],
  );
  return { runs: rows.map(fromRow), runsTotal: count?.n ?? rows.length };
}

const ORDER_OF: Record<RunSortKey, string> = {
  createdAt: 'r.created_at',
  label: 'r.label',
  maxPercentOfLimit: `(r.summary->>'maxPercentOfLimit')::float8`,
};

/** One page of the runs the user may see, with the total of all pages. */
export async function listRuns(
  ds: DataSource,
  user: SessionUser,
  q: Validated<typeof RunListQuerySchema>,
): Promise<Page<RunSummary>> {
  const f = siteFilterSql(user, 'u.site_id', 1);
  const params: unknown[] = [...f.params];
  let where = f.sql;
  if (!q.inspection) where += ` AND r.kind = 'rating'`;
  if (q.columnId) {
    params.push(q.columnId);
    where += ` AND r.column_id = $${params.length}`;
  }
  if (q.status) {
    params.push(q.status);
    where += ` AND r.status = $${params.length}`;
  }
  const from = `rating_runs r JOIN columns c ON c.id = r.column_id JOIN process_units u ON u.id = c.unit_id WHERE ${where}`;
  const dir = q.descending ? 'DESC' : 'ASC';
  const order = `${ORDER_OF[q.sortBy]} ${dir} NULLS LAST, r.created_at DESC, r.id`;
  const page = [...params, q.pageSize, (q.page - 1) * q.pageSize];
  const rows = await ds.query<SummaryRow[]>(
    `SELECT * FROM (${SUMMARY_SQL.replace('SELECT r.id,', 'SELECT count(*) OVER () AS total, r.id,')}
       JOIN columns c ON c.id = r.column_id JOIN process_units u ON u.id = c.unit_id
      WHERE ${where} ORDER BY ${order} LIMIT $${page.length - 1} OFFSET $${page.length}) x`,
    page,
  );
  // a page past the end has no row to carry the total: count on its own
  const total = rows[0]?.total
    ? Number(rows[0].total)
    : Number((await ds.query<{ n: number }[]>(`SELECT count(*)::int AS n FROM ${from}`, params))[0]?.n ?? 0);
  return { items: rows.map(fromRow), total, page: q.page, pageSize: q.pageSize };
}

export async function getRun(ds: DataSource, user: SessionUser, id: string): Promise<RunRecord> {
  const r = await visibleChild(ds.manager, user, RatingRun, id, 'Rating run');
  return toRunRecord(ds.manager, r);
}

/** The engine's operating window of one rated tray, from the run's snapshot (geometry, loads, methods). */
export async function runWindow(ds: DataSource, user: SessionUser, id: string, tray: number): Promise<RunWindow> {
  const r = await visibleChild(ds.manager, user, RatingRun, id, 'Rating run');
  const load = r.snapshot.loads.find((l) => l.tray === tray);
  const section = r.snapshot.sections.find((s) => tray >= s.firstTray && tray <= s.lastTray);
  if (!load || !section) throw new NotFoundError(`Tray ${tray} in this run`);
  return { runId: r.id, sectionId: section.sectionId, load, window: operatingWindow(section.geometry, load, r.snapshot.methods) };
}
