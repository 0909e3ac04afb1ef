/**
 * Rating runs: an immutable snapshot (geometry of every section covering a loaded tray, the loads, the
 * method options, the engine version) and the engine results, rated section by section and merged by tray.
 */
import type { DataSource, EntityManager } from 'typeorm';
import { In } from 'typeorm';
import { LoadCase } from '../db/entities/LoadCase.js';
import { RatingRun } from '../db/entities/RatingRun.js';
import { TraySection } from '../db/entities/TraySection.js';
import { ENGINE_VERSION, rateSection, summarise, validateRatingRequest } from '../engine/index.js';
import { NotFoundError, ValidationError, type ErrorDetail } from '../errors.js';
import { audit } from './audit.js';
import { visibleColumn } from './columnsCommon.js';
import { packResults } from './runsPack.js';
import { toRunSummary } from './runsRead.js';
import type { SessionUser } from '../../shared/types/api.js';
import type { MethodOptions, TrayLoad } from '../../shared/types/rating.js';
import type {
  CreateRatingRunInput,
  CreateRunBody,
  RunSummary,
  RunResults,
  RunSnapshot,
  RunSnapshotSection,
  RunTrayResult,
} from '../../shared/types/runs.js';

/** Rate the snapshot: one engine call per section, trays merged and ordered by tray number. */
export function rateSnapshot(snapshot: Omit<RunSnapshot, 'engineVersion'>): { results: RunResults; methods: MethodOptions } {
  const trays: RunTrayResult[] = [];
  const sections: RunResults['sections'] = [];
  const errors: ErrorDetail[] = [];
  let methods: MethodOptions = snapshot.methods;
  for (const s of snapshot.sections) {
    const loads = snapshot.loads.filter((l) => l.tray >= s.firstTray && l.tray <= s.lastTray);
    const v = validateRatingRequest({ section: s.geometry, trays: loads, methods: snapshot.methods });
    if (!v.ok) {
      for (const e of v.errors)
        errors.push({ path: `sections.${s.name}${e.path.replace(/\//g, '.')}`, message: `section "${s.name}": ${e.message}` });
      continue;
    }
    methods = v.value.methods ?? methods;
    const r = rateSection(v.value);
    for (const t of r.trays) trays.push({ ...t, sectionId: s.sectionId });
    sections.push({
      sectionId: s.sectionId,
      name: s.name,
      firstTray: s.firstTray,
      lastTray: s.lastTray,
      summary: r.summary,
      warnings: r.warnings,
    });
  }
  if (errors.length) throw new ValidationError('The load case cannot be rated with this geometry', errors);
  trays.sort((a, b) => a.tray - b.tray);
  const covered = new Set(trays.map((t) => t.tray));
  const all = summarise(trays);
  return {
    methods,
    results: {
      engineVersion: ENGINE_VERSION,
      trays,
      sections,
      uncoveredTrays: snapshot.loads.map((l) => l.tray).filter((t) => !covered.has(t)),
      controllingCheck: all.controllingCheck,
      controllingTray: all.controllingTray,
      maxPercentOfLimit: 100 - all.marginToNearestLimit_percent,
      traysOver: all.traysOver,
      traysNear: all.traysNear,
    },
  };
}

type NewRun = Omit<RatingRun, 'id' | 'createdAt' | 'updatedAt' | 'version'>;

/**
 * Plain INSERT with packed results: TypeORM's save() deep-merges and diffs the large results object,
 * which cost more than the rating itself (bench/api.ts).
 */
async function insertRun(em: EntityManager, r: NewRun): Promise<RatingRun> {
  const rows = (await em.query(
    `INSERT INTO rating_runs (column_id, load_case_id, label, kind, status, engine_version, snapshot, results, summary, reviews,
       review_comment, author_id, reviewer_id)
     VALUES ($1, $2, $3, $4, $5, $6, $7, $8, $9, $10, $11, $12, $13) RETURNING id, created_at, updated_at, version`,
    [
      r.columnId,
      r.loadCaseId,
      r.label,
      r.kind,
      r.status,
      r.engineVersion,
      JSON.stringify(r.snapshot),
      JSON.stringify(packResults(r.results)),
      JSON.stringify(r.summary),
      JSON.stringify(r.reviews),
      r.reviewComment,
      r.authorId,
      r.reviewerId,
    ],
  )) as { id: string; created_at: Date; updated_at: Date; version: number }[];
  const row = rows[0]!;
  return Object.assign(new RatingRun(), r, {
    id: row.id,
    createdAt: row.created_at,
    updatedAt: row.updated_at,
    version: row.version,
  });
}

/**
 * Create a rating run inside the caller's transaction. Inspections call this with `geometryOverride`
 * (per section id, the as-found geometry) and kind 'as-found'.
 */
export async function createRatingRun(em: EntityManager, user: SessionUser, input: CreateRatingRunInput): Promise<RatingRun> {
  const col = await visibleColumn(em, user, input.columnId);
  const lc = await em.findOneBy(LoadCase, { id: input.loadCaseId, columnId: col.id });
  if (!lc) throw new NotFoundError('Load case');
  let stored = await em.find(TraySection, {
    where: input.sectionIds ? { columnId: col.id, id: In(input.sectionIds) } : { columnId: col.id },
    order: { firstTray: 'ASC' },
  });
  if (input.sectionIds) {
    const missing = input.sectionIds.filter((id) => !stored.some((s) => s.id === id));
    if (missing.length)
      throw new ValidationError(
        'Unknown sections',
        missing.map((id) => ({ path: 'sectionIds', message: `section ${id} is not a section of column ${col.tag}` })),
      );
  }
  for (const id of Object.keys(input.geometryOverride ?? {}))
    if (!stored.some((s) => s.id === id))
      throw new ValidationError('Unknown sections', [
        { path: `geometryOverride.${id}`, message: `is not a rated section of column ${col.tag}` },
      ]);
  const loaded = (s: TraySection): TrayLoad[] => lc.loads.filter((l) => l.tray >= s.firstTray && l.tray <= s.lastTray);
  stored = stored.filter((s) => loaded(s).length > 0);
  if (stored.length === 0)
    throw new ValidationError('Nothing to rate', [
      {
        path: 'loadCaseId',
        message: `no section of column ${col.tag} covers a tray of load case "${lc.name}"; add a section or loads`,
      },
    ]);
  const sections: RunSnapshotSection[] = stored.map((s) => {
    const o = input.geometryOverride?.[s.id];
    return {
      sectionId: s.id,
      name: s.name,
      firstTray: s.firstTray,
      lastTray: s.lastTray,
      geometry: o ?? s.geometry,
      overridden: !!o,
      provenance: o ? 'as-found' : s.provenance,
      provenanceDate: o ? (input.asFoundDate ?? null) : s.provenanceDate,
    };
  });
  const loads = lc.loads.filter((l) => stored.some((s) => l.tray >= s.firstTray && l.tray <= s.lastTray));
  const base = {
    column: { id: col.id, tag: col.tag, numbering: col.numbering, trayCount: col.trayCount },
    loadCase: { id: lc.id, name: lc.name, basis: lc.basis, version: lc.version },
    sections,
    loads,
    methods: input.methods ?? {},
  };
  const { results, methods } = rateSnapshot(base);
  // uncovered trays are those of the load case outside every rated section
  results.uncoveredTrays = lc.loads.map((l) => l.tray).filter((t) => !loads.some((l) => l.tray === t));
  const snapshot: RunSnapshot = { ...base, methods, engineVersion: ENGINE_VERSION };
  const run = await insertRun(em, {
    columnId: col.id,
    loadCaseId: lc.id,
    label: input.label,
    kind: input.kind,
    status: 'draft',
    engineVersion: ENGINE_VERSION,
    snapshot,
    results,
    authorId: user.id,
    reviews: [],
    reviewComment: null,
    reviewerId: null,
    summary: {
      controllingCheck: results.controllingCheck,
      controllingTray: results.controllingTray,
      maxPercentOfLimit: results.maxPercentOfLimit,
      traysOver: results.traysOver,
      traysNear: results.traysNear,
    },
  });
  await audit(em, user.id, 'create', 'rating-run', run.id, {
    label: input.label,
    kind: input.kind,
    loadCaseId: lc.id,
    sections: sections.map((s) => s.sectionId),
    overridden: sections.filter((s) => s.overridden).map((s) => s.sectionId),
  });
  return run;
}

/** POST /runs answers the summary (the run page loads the full record with GET /runs/:id). */
export async function createRunFromBody(ds: DataSource, user: SessionUser, body: CreateRunBody): Promise<RunSummary> {
  return ds.transaction(async (em) => {
    const lc = body.label
      ? []
      : ((await em.query(`SELECT name FROM load_cases WHERE id = $1`, [body.loadCaseId])) as { name: string }[]);
    const label = body.label ?? `${lc[0]?.name ?? 'Rating'} — ${new Date().toISOString().slice(0, 16).replace('T', ' ')} UTC`;
    const run = await createRatingRun(em, user, { ...body, label, kind: 'rating' });
    return toRunSummary(run, user.name);
  });
}
