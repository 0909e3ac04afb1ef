/** Sites, units and columns: create, update, detail. Every read and write checks column visibility. */
import type { DataSource, EntityManager } from 'typeorm';
import { ProcessUnit, Site, TowerColumn } from '../../db/entities/index.js';
import { ConflictError, NotFoundError, ValidationError } from '../../errors.js';
import { siteFilterSql } from '../access/access.js';
import { audit } from '../audit/audit.js';
import { assertColumnEngineer } from './columnEngineer.js';
import { assertVersion, iso, visibleColumn } from './columnsCommon.js';
import { listLoadCaseSummaries } from '../loads/loadsRead.js';
import { listPumpArounds } from './sectionsPumpArounds.js';
import { listSections } from './sections.js';
import { listRunSummaries } from '../runs/runsRead.js';
import type { SessionUser } from '../../../shared/types/api.js';
import type {
  ColumnDetail,
  ColumnSummary,
  CreateColumnBody,
  CreateSiteBody,
  CreateUnitBody,
  SiteSummary,
  TrayMark,
  UnitRecord,
  UpdateColumnBody,
} from '../../../shared/types/columns.js';

const siteRecord = (s: Site): SiteSummary => ({ id: s.id, name: s.name, location: s.location, version: s.version });
const unitRecord = (u: ProcessUnit): UnitRecord => ({ id: u.id, siteId: u.siteId, name: u.name, version: u.version });

export async function listSites(ds: DataSource, user: SessionUser): Promise<SiteSummary[]> {
  const f = siteFilterSql(user, 's.id', 1);
  const rows = await ds.query<{ id: string }[]>(`SELECT s.id FROM sites s WHERE ${f.sql} ORDER BY s.name`, f.params);
  if (rows.length === 0) return [];
  const sites = await ds.getRepository(Site).find({ order: { name: 'ASC' } });
  const ids = new Set(rows.map((r) => r.id));
  return sites.filter((s) => ids.has(s.id)).map(siteRecord);
}

async function assertSiteVisible(em: EntityManager | DataSource, user: SessionUser, siteId: string): Promise<void> {
  const f = siteFilterSql(user, 's.id', 2);
  const rows = await em.query<unknown[]>(`SELECT 1 FROM sites s WHERE s.id = $1 AND ${f.sql}`, [siteId, ...f.params]);
  if (rows.length === 0) throw new NotFoundError('Site');
}

export async function listUnits(ds: DataSource, user: SessionUser, siteId: string): Promise<UnitRecord[]> {
  await assertSiteVisible(ds, user, siteId);
  const units = await ds.getRepository(ProcessUnit).find({ where: { siteId }, order: { name: 'ASC' } });
  return units.map(unitRecord);
}

export async function createSite(ds: DataSource, user: SessionUser, body: CreateSiteBody): Promise<SiteSummary> {
  return ds.transaction(async (em) => {
    if (await em.findOneBy(Site, { name: body.name }))
      throw new ConflictError('A site with this name already exists', [{ path: 'name', message: 'is already taken' }]);
    const s = await em.save(Site, em.create(Site, { name: body.name, location: body.location ?? '' }));
    await audit(em, user.id, 'create', 'site', s.id, body);
    return siteRecord(s);
  });
}

export async function createUnit(ds: DataSource, user: SessionUser, body: CreateUnitBody): Promise<UnitRecord> {
  return ds.transaction(async (em) => {
    await assertSiteVisible(em, user, body.siteId);
    if (await em.findOneBy(ProcessUnit, { siteId: body.siteId, name: body.name }))
      throw new ConflictError('This site already has a unit with this name', [{ path: 'name', message: 'is already taken' }]);
    const u = await em.save(ProcessUnit, em.create(ProcessUnit, body));
    await audit(em, user.id, 'create', 'unit', u.id, body);
    return unitRecord(u);
  });
}

function checkMarks(marks: TrayMark[] | undefined, trayCount: number): void {
  const bad = (marks ?? []).flatMap((m, i) =>
    m.tray > trayCount
      ? [{ path: `trayMarks.${i}.tray`, message: `tray ${m.tray} is outside the column (trays 1–${trayCount})` }]
      : [],
  );
  if (bad.length) throw new ValidationError('Invalid tray marks', bad);
}

async function assertTagFree(em: EntityManager, unitId: string, tag: string, exceptId?: string): Promise<void> {
  const other = await em.findOneBy(TowerColumn, { unitId, tag });
  if (other && other.id !== exceptId)
    throw new ConflictError(`Column ${tag} already exists in this unit`, [
      { path: 'tag', message: 'is already taken in this unit' },
    ]);
}

export async function createColumn(ds: DataSource, user: SessionUser, body: CreateColumnBody): Promise<ColumnDetail> {
  const id = await ds.transaction(async (em) => {
    const unit = await em.findOneBy(ProcessUnit, { id: body.unitId });
    if (!unit) throw new NotFoundError('Unit');
    try {
      await assertSiteVisible(em, user, unit.siteId);
    } catch {
      throw new NotFoundError('Unit');
    }
    checkMarks(body.trayMarks, body.trayCount);
    await assertTagFree(em, body.unitId, body.tag);
    await assertColumnEngineer(em, body.engineerId, unit.siteId);
    const col = await em.save(
      TowerColumn,
      em.create(TowerColumn, {
        unitId: body.unitId,
        tag: body.tag,
        service: body.service ?? '',
        numbering: body.numbering,
        trayCount: body.trayCount,
        engineerId: body.engineerId ?? null,
        trayMarks: body.trayMarks ?? [],
      }),
    );
    await audit(em, user.id, 'create', 'column', col.id, body);
    return col.id;
  });
  return getColumnDetail(ds, user, id);
}

/** Highest tray number used by the column's sections, pump-arounds and load cases (0 when none). */
async function highestUsedTray(em: EntityManager, id: string): Promise<number> {
  const rows = await em.query<{ m: number | null }[]>(
    `SELECT greatest(
       (SELECT max(last_tray) FROM tray_sections WHERE column_id = $1),
       (SELECT max(greatest(draw_tray, return_tray)) FROM pump_arounds WHERE column_id = $1),
       (SELECT max((l->>'tray')::int) FROM load_cases lc, jsonb_array_elements(lc.loads) l WHERE lc.column_id = $1)) AS m`,
    [id],
  );
  return rows[0]?.m ?? 0;
}

/** Stored tray numbers keep their meaning: no flip of the numbering direction, no cut below a used tray. */
async function assertRenumberable(em: EntityManager, col: TowerColumn, body: UpdateColumnBody): Promise<void> {
  const flips = body.numbering !== undefined && body.numbering !== col.numbering;
  const cuts = body.trayCount !== undefined && body.trayCount < col.trayCount;
  if (!flips && !cuts) return;
  const used = await highestUsedTray(em, col.id);
  if (flips && used > 0)
    throw new ValidationError('Invalid body', [
      {
        path: 'numbering',
        message: 'cannot change while sections, pump-arounds or load cases use tray numbers (their meaning would flip)',
      },
    ]);
  if (cuts && used > body.trayCount!)
    throw new ValidationError('Invalid body', [
      { path: 'trayCount', message: `is below tray ${used}, used by a section, pump-around or load case; change those first` },
    ]);
}

export async function updateColumn(ds: DataSource, user: SessionUser, id: string, body: UpdateColumnBody): Promise<ColumnDetail> {
  await ds.transaction(async (em) => {
    const col = await visibleColumn(em, user, id, true);
    assertVersion('column', col.version, body.version);
    const trayCount = body.trayCount ?? col.trayCount;
    checkMarks(body.trayMarks ?? col.trayMarks, trayCount);
    await assertRenumberable(em, col, body);
    if (body.tag !== undefined) await assertTagFree(em, col.unitId, body.tag, id);
    if (body.engineerId !== undefined && body.engineerId !== col.engineerId) {
      const unit = await em.findOneByOrFail(ProcessUnit, { id: col.unitId });
      await assertColumnEngineer(em, body.engineerId, unit.siteId);
    }
    const { version: _v, ...changes } = body;
    Object.assign(col, changes);
    await em.save(TowerColumn, col);
    await audit(em, user.id, 'update', 'column', id, changes);
  });
  return getColumnDetail(ds, user, id);
}

export function toColumnSummary(c: TowerColumn, unit: ProcessUnit, site: Site): ColumnSummary {
  return {
    id: c.id,
    tag: c.tag,
    service: c.service,
    numbering: c.numbering,
    trayCount: c.trayCount,
    siteId: site.id,
    siteName: site.name,
    unitId: unit.id,
    unitName: unit.name,
    engineerId: c.engineerId,
    version: c.version,
    updatedAt: iso(c.updatedAt),
  };
}

export async function getColumnDetail(ds: DataSource | EntityManager, user: SessionUser, id: string): Promise<ColumnDetail> {
  const em = 'manager' in ds ? ds.manager : ds;
  const col = await visibleColumn(em, user, id);
  const unit = await em.findOneByOrFail(ProcessUnit, { id: col.unitId });
  const site = await em.findOneByOrFail(Site, { id: unit.siteId });
  return {
    ...toColumnSummary(col, unit, site),
    trayMarks: col.trayMarks,
    sections: await listSections(em, id),
    pumpArounds: await listPumpArounds(em, id),
    loadCases: await listLoadCaseSummaries(em, id),
    ...(await listRunSummaries(em, id)),
  };
}
