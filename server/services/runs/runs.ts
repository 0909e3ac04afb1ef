/**
 * Rating runs: an immutable snapshot (geometry of every section covering a loaded tray, the loads, the
 * method options, the engine version) and the engine results, rated section by section and merged by tray.
 */
import type { DataSource, EntityManager } from 'typeorm';
import { encodeJson, encodeResults } from '../../db/codec/index.js';
import { RatingRun } from '../../db/entities/RatingRun.js';
import { ENGINE_VERSION, rateSection, summarise, validateRatingRequest } from '../../engine/index.js';
import { ConflictError, NotFoundError, ValidationError, type ErrorDetail } from '../../errors.js';
import { forgetRunInputs, guardOf, insertRunWithAudit, runInputsCache, runInputsMemo, type NewRun } from './runsStore.js';
import { toRunSummary } from './runsRead.js';
import type { SessionUser } from '../../../shared/types/api.js';
import type { MethodOptions, RatingRequest, TrayLoad, TrayResult } from '../../../shared/types/rating.js';
import type {
  CreateRatingRunInput,
  CreateRunBody,
  RunSummary,
  RunResults,
  RunSnapshot,
  RunSnapshotSection,
} from '../../../shared/types/runs.js';

/** Rate the snapshot: one engine call per section, trays merged and ordered by tray number. */
export function rateSnapshot(
  snapshot: Omit<RunSnapshot, 'engineVersion'>,
  /** validated requests by section id, filled here; only for sections whose geometry and loads are fixed for the map's life */
  validated?: Map<string, RatingRequest>,
): { results: RunResults; methods: MethodOptions } {
  const trays: (TrayResult & { sectionId: string })[] = [];
  const sections: RunResults['sections'] = [];
  const errors: ErrorDetail[] = [];
  let methods: MethodOptions = snapshot.methods;
  for (const s of snapshot.sections) {
    let request = validated?.get(s.sectionId);
    if (!request) {
      const loads = snapshot.loads.filter((l) => l.tray >= s.firstTray && l.tray <= s.lastTray);
      const v = validateRatingRequest({ section: s.geometry, trays: loads, methods: snapshot.methods });
      if (!v.ok) {
        for (const e of v.errors)
          errors.push({ path: `sections.${s.name}${e.path.replace(/\//g, '.')}`, message: `section "${s.name}": ${e.message}` });
        continue;
      }
      request = v.value;
      validated?.set(s.sectionId, request);
    }
    methods = request.methods ?? methods;
    const r = rateSection(request);
    // An explicit literal, not `{ ...t, sectionId }`: V8 (Node 20) placed the spread copies in the old
    // generation, where, dead, they kept each tray's young checks and details alive through scavenges
    // (2–3 MB promoted per scavenge and 10–20 ms pauses under load; see DEVELOPERS.md, "Stored runs").
    for (const t of r.trays)
      trays.push({
        tray: t.tray,
        sectionId: s.sectionId,
        controllingCheck: t.controllingCheck,
        checks: t.checks,
        details: t.details,
        warnings: t.warnings,
      });
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

/**
 * Rate the snapshot and pack the results. A plain function, so that no frame of the async caller holds
 * the results while the write is awaited unless they are kept.
 */
function rateAndPack(
  base: Omit<RunSnapshot, 'engineVersion'>,
  validated: Map<string, RatingRequest> | undefined,
  uncoveredTrays: number[],
  keep: boolean,
): { packed: Buffer; summary: RatingRun['summary']; methods: MethodOptions; results?: RunResults } {
  const { results, methods } = rateSnapshot(base, validated);
  results.uncoveredTrays = uncoveredTrays;
  const summary = {
    controllingCheck: results.controllingCheck,
    controllingTray: results.controllingTray,
    maxPercentOfLimit: results.maxPercentOfLimit,
    traysOver: results.traysOver,
    traysNear: results.traysNear,
  };
  return { packed: encodeResults(results), summary, methods, results: keep ? results : undefined };
}

/**
 * Create a rating run: one read, rate, one write (run and audit row). Works inside the caller's
 * transaction too: inspections pass `geometryOverride` (per section id, the as-found geometry) and kind
 * 'as-found'. Without a label the run is named after the load case and the time.
 */
export async function createRatingRun(
  em: EntityManager,
  user: SessionUser,
  input: Omit<CreateRatingRunInput, 'label'> & { label?: string },
): Promise<RatingRun> {
  const { run, results } = await storeRatingRun(em, user, input, true);
  return Object.assign(run, { results: results! });
}

/**
 * Rate and store; the results come back only when `keepResults` is set. Otherwise they are let go as soon
 * as they are packed, before the write is awaited: a 60-tray result is a few hundred kB of objects, and
 * holding one per request in flight makes every young-generation collection copy them.
 */
async function storeRatingRun(
  em: EntityManager,
  user: SessionUser,
  input: Omit<CreateRatingRunInput, 'label'> & { label?: string },
  keepResults: boolean,
  fresh = false,
): Promise<{ run: RatingRun; results?: RunResults }> {
  const { inputs, cached } = await runInputsCache(em, user, input.columnId, input.loadCaseId, fresh);
  const { column: col, loadCase: lc, sections: all } = inputs;
  if (!lc) throw new NotFoundError('Load case');
  let stored = input.sectionIds ? all.filter((s) => input.sectionIds!.includes(s.id)) : all;
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
  const loaded = (s: { firstTray: number; lastTray: number }): TrayLoad[] =>
    lc.loads.filter((l) => l.tray >= s.firstTray && l.tray <= s.lastTray);
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
    column: col,
    loadCase: { id: lc.id, name: lc.name, basis: lc.basis, version: lc.version },
    sections,
    loads,
    methods: input.methods ?? {},
  };
  // without a geometry override, validation and the snapshot bytes depend only on the rows read and the options
  const memo = input.geometryOverride
    ? undefined
    : runInputsMemo(inputs, JSON.stringify([input.methods ?? {}, input.sectionIds ?? null]));
  const uncovered = lc.loads.map((l) => l.tray).filter((t) => !loads.some((l) => l.tray === t));
  const { packed, summary, methods, results: kept } = rateAndPack(base, memo?.validated, uncovered, keepResults);
  const snapshot: RunSnapshot = { ...base, methods, engineVersion: ENGINE_VERSION };
  const label = input.label ?? `${lc.name} — ${new Date().toISOString().slice(0, 16).replace('T', ' ')} UTC`;
  const run: NewRun = {
    columnId: col.id,
    loadCaseId: lc.id,
    label,
    kind: input.kind,
    status: 'draft',
    engineVersion: ENGINE_VERSION,
    snapshot,
    authorId: user.id,
    reviews: [],
    reviewComment: null,
    reviewerId: null,
    summary,
  };
  const changes = {
    label,
    kind: input.kind,
    loadCaseId: lc.id,
    sections: sections.map((s) => s.sectionId),
    overridden: sections.filter((s) => s.overridden).map((s) => s.sectionId),
  };
  const snapshotBytes = memo ? (memo.snapshotBytes ??= encodeJson(snapshot)) : undefined;
  const row = await insertRunWithAudit(
    em,
    user,
    run,
    { snapshot: snapshotBytes, results: packed },
    { changes },
    guardOf(inputs, lc.version),
  );
  if (!row) {
    // the column, load case or sections changed since they were read (or the user lost access): read again
    forgetRunInputs(input.columnId, input.loadCaseId);
    if (cached) return storeRatingRun(em, user, input, keepResults, true);
    throw new ConflictError('The column, its sections or the load case changed while the run was being rated; rate again', [
      { path: 'loadCaseId', message: 'changed during rating' },
    ]);
  }
  return { run: Object.assign(new RatingRun(), run, row, { loadCaseName: lc.name }), results: kept };
}

/** POST /runs answers the summary (the run page loads the full record with GET /runs/:id). */
export async function createRunFromBody(ds: DataSource, user: SessionUser, body: CreateRunBody): Promise<RunSummary> {
  // no explicit transaction: one read, then one atomic statement writes the run and its audit row
  const { run } = await storeRatingRun(ds.manager, user, { ...body, kind: 'rating' }, false);
  return toRunSummary(run, user.name);
}
