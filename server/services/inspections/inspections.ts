/** Turnaround inspections: create, list, read, edit the header, record trays. Signed records are read-only. */
import type { DataSource, EntityManager } from 'typeorm';
import { Inspection } from '../../db/entities/Inspection.js';
import { InspectionTray } from '../../db/entities/InspectionTray.js';
import { ConflictError, ValidationError } from '../../errors.js';
import { siteFilterSql } from '../access/access.js';
import { audit } from '../audit/audit.js';
import { assertVersion, iso, trayOutOfRange, visibleChild, visibleColumn } from '../columns/columnsCommon.js';
import { columnSections, sectionPasses, toInspectionRecord } from './inspectionRead.js';
import { passFault } from '../../../shared/passes.js';
import { measurementErrors } from '../../../shared/inspectionTolerance.js';
import { INSPECTION_LIST_CUT } from '../../../shared/contract/inspections.js';
import type { SessionUser } from '../../../shared/types/api.js';
import type {
  CreateInspectionBody,
  InspectionRecord,
  InspectionRuleChoice,
  InspectionSummary,
  SaveTrayBody,
  UpdateInspectionBody,
} from '../../../shared/types/inspections.js';

export const DEFAULT_RULES: InspectionRuleChoice = { kind: 'published', levelnessClass: 'A' };

/** The inspection if the user may see its column (404 otherwise); `lock` takes a row lock for writes. */
export function visibleInspection(em: EntityManager, user: SessionUser, id: string, lock = false): Promise<Inspection> {
  return visibleChild(em, user, Inspection, id, 'Inspection', lock);
}

/** Signed records are read-only: any edit answers 409. */
export function assertDraft(insp: Inspection): void {
  if (insp.status !== 'draft')
    throw new ConflictError(`This inspection is ${insp.status}; signed records are read-only`, [
      { path: 'status', message: `is ${insp.status}` },
    ]);
}

function checkDates(start: string, end: string | null | undefined): void {
  if (end && end < start)
    throw new ValidationError('Invalid body', [{ path: 'endDate', message: `must not be before startDate ${start}` }]);
}

function checkRules(r: InspectionRuleChoice | undefined): void {
  if (r?.kind === 'project' && (!r.project || r.project.rules.length === 0))
    throw new ValidationError('Invalid body', [{ path: 'rules.project', message: 'a project rule set needs at least one rule' }]);
}

export async function createInspection(ds: DataSource, user: SessionUser, body: CreateInspectionBody): Promise<InspectionRecord> {
  checkDates(body.startDate, body.endDate);
  checkRules(body.rules);
  return ds.transaction(async (em) => {
    await visibleColumn(em, user, body.columnId);
    const insp = await em.save(
      Inspection,
      em.create(Inspection, {
        columnId: body.columnId,
        turnaround: body.turnaround.trim(),
        startDate: body.startDate,
        endDate: body.endDate ?? null,
        inspectorId: user.id,
        permitRef: body.permitRef ?? '',
        gasTestRef: body.gasTestRef ?? '',
        rules: body.rules ?? DEFAULT_RULES,
        notes: body.notes ?? '',
        status: 'draft',
        createdBy: user.id,
        asFoundRunIds: [],
      }),
    );
    await audit(em, user.id, 'create', 'inspection', insp.id, { columnId: body.columnId, turnaround: body.turnaround });
    return toInspectionRecord(em, insp);
  });
}

export async function getInspection(ds: DataSource, user: SessionUser, id: string): Promise<InspectionRecord> {
  return toInspectionRecord(ds.manager, await visibleInspection(ds.manager, user, id));
}

/** The newest INSPECTION_LIST_CUT inspections the user may see (of one column if given) and how many there are in all. */
export async function listInspections(
  ds: DataSource,
  user: SessionUser,
  columnId?: string,
): Promise<{ items: InspectionSummary[]; total: number }> {
  const f = siteFilterSql(user, 'u.site_id', columnId ? 2 : 1);
  const rows = await ds.query<Record<string, unknown>[]>(
    `SELECT i.id, i.column_id, c.tag, i.turnaround, to_char(i.start_date, 'YYYY-MM-DD') AS start_date,
            to_char(i.end_date, 'YYYY-MM-DD') AS end_date, i.inspector_id, us.name AS inspector_name, i.status,
            i.version, i.updated_at,
            (SELECT count(*)::int FROM inspection_trays t WHERE t.inspection_id = i.id) AS tray_count,
            (SELECT count(*)::int FROM punch_items p WHERE p.inspection_id = i.id AND p.status = 'open') AS open_punch,
            count(*) OVER ()::int AS total
       FROM inspections i JOIN columns c ON c.id = i.column_id JOIN process_units u ON u.id = c.unit_id
       LEFT JOIN users us ON us.id = i.inspector_id
      WHERE ${columnId ? 'i.column_id = $1 AND ' : ''}${f.sql}
      ORDER BY i.start_date DESC, i.created_at DESC LIMIT ${INSPECTION_LIST_CUT}`,
    [...(columnId ? [columnId] : []), ...f.params],
  );
  const items = rows.map((r) => ({
    id: r.id as string,
    columnId: r.column_id as string,
    columnTag: r.tag as string,
    turnaround: r.turnaround as string,
    startDate: r.start_date as string,
    endDate: (r.end_date as string | null) ?? null,
    inspectorId: (r.inspector_id as string | null) ?? null,
    inspectorName: (r.inspector_name as string | null) ?? null,
    status: r.status as InspectionSummary['status'],
    trayCount: r.tray_count as number,
    openPunchItems: r.open_punch as number,
    failedChecks: null,
    version: r.version as number,
    updatedAt: iso(r.updated_at as Date),
  }));
  return { items, total: (rows[0]?.total as number | undefined) ?? 0 };
}

export async function updateInspection(
  ds: DataSource,
  user: SessionUser,
  id: string,
  body: UpdateInspectionBody,
): Promise<InspectionRecord> {
  checkRules(body.rules);
  return ds.transaction(async (em) => {
    const insp = await visibleInspection(em, user, id, true);
    assertDraft(insp);
    assertVersion('inspection', insp.version, body.version);
    const { version: _v, ...changes } = body;
    void _v;
    Object.assign(insp, changes, { updatedAt: new Date() }); // a changed timestamp makes every save a new version
    checkDates(insp.startDate, insp.endDate);
    await em.save(Inspection, insp);
    await audit(em, user.id, 'update', 'inspection', id, changes);
    return toInspectionRecord(em, insp);
  });
}

/** 400 naming `pass` when the tray (or, without a tray, every tray of the column) has no such pass. */
export async function assertPass(em: EntityManager, columnId: string, tray: number | null, pass: number | null): Promise<void> {
  if (pass === null) return;
  const fault = passFault(sectionPasses(await columnSections(em, columnId)), tray, pass);
  if (fault) throw new ValidationError('Invalid pass', [{ path: 'pass', message: fault }]);
}

/** Create or replace the record of one tray and pass (optimistic lock on its version when it exists). */
export async function saveTray(
  ds: DataSource,
  user: SessionUser,
  id: string,
  tray: number,
  pass: number,
  body: SaveTrayBody,
): Promise<InspectionRecord> {
  const errs = [...measurementErrors(body.asFound, 'asFound'), ...measurementErrors(body.asLeft, 'asLeft')];
  if (body.findings.valvesMissing < 0 || body.findings.valvesStuck < 0)
    errs.push({ path: 'findings', message: 'valve counts must not be negative' });
  if (errs.length) throw new ValidationError('Invalid body', errs);
  return ds.transaction(async (em) => {
    const insp = await visibleInspection(em, user, id, true);
    assertDraft(insp);
    const [col] = await em.query<{ tray_count: number }[]>(`SELECT tray_count FROM columns WHERE id = $1`, [insp.columnId]);
    const bad = trayOutOfRange(tray, col?.tray_count ?? 0);
    if (bad) throw new ValidationError('Invalid tray', [{ path: 'tray', message: bad }]);
    await assertPass(em, insp.columnId, tray, pass);
    const existing = await em.findOneBy(InspectionTray, { inspectionId: id, tray, pass });
    if (existing) {
      if (body.version === undefined)
        throw new ConflictError(`Tray ${tray} pass ${pass} is already recorded; send its version to replace it`, [
          { path: 'version', message: 'is required to replace a record' },
        ]);
      assertVersion(`record of tray ${tray} pass ${pass}`, existing.version, body.version);
      // always a new version, even when the content is unchanged, so a stale copy can never be saved over it
      await em.query(
        `UPDATE inspection_trays SET findings = $2, as_found = $3, as_left = $4, updated_by = $5, updated_at = now(), version = version + 1 WHERE id = $1`,
        [existing.id, JSON.stringify(body.findings), JSON.stringify(body.asFound), JSON.stringify(body.asLeft), user.id],
      );
    } else {
      await em.save(
        InspectionTray,
        em.create(InspectionTray, {
          inspectionId: id,
          tray,
          pass,
          findings: body.findings,
          asFound: body.asFound,
          asLeft: body.asLeft,
          updatedBy: user.id,
        }),
      );
    }
    await em.query(`UPDATE inspections SET updated_at = now(), version = version + 1 WHERE id = $1`, [id]);
    await audit(em, user.id, existing ? 'update' : 'create', 'inspection-tray', `${id}/${tray}/${pass}`, {
      findings: body.findings,
    });
    return toInspectionRecord(em, await em.findOneByOrFail(Inspection, { id }));
  });
}
