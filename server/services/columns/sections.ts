/**
 * Tray sections: tray range + engine geometry + provenance. Geometry is checked with the engine's schema
 * (route body) and physics checks; tray ranges of one column may not overlap.
 */
import type { DataSource, EntityManager } from 'typeorm';
import { TraySection } from '../../db/entities/TraySection.js';
import { physicsErrors } from '../../engine/index.js';
import { ValidationError, type ErrorDetail } from '../../errors.js';
import { audit } from '../audit/audit.js';
import { assertVersion, iso, trayOutOfRange, visibleChild, visibleColumn } from './columnsCommon.js';
import type { SessionUser } from '../../../shared/types/api.js';
import type { SectionBody, TraySectionRecord, UpdateSectionBody } from '../../../shared/types/columns.js';
import type { TowerColumn } from '../../db/entities/TowerColumn.js';

export const toSectionRecord = (s: TraySection): TraySectionRecord => ({
  id: s.id,
  columnId: s.columnId,
  name: s.name,
  firstTray: s.firstTray,
  lastTray: s.lastTray,
  geometry: s.geometry,
  provenance: s.provenance,
  provenanceDate: s.provenanceDate,
  notes: s.notes,
  version: s.version,
  updatedAt: iso(s.updatedAt),
});

export async function listSections(em: EntityManager, columnId: string): Promise<TraySectionRecord[]> {
  const rows = await em.find(TraySection, { where: { columnId }, order: { firstTray: 'ASC' } });
  return rows.map(toSectionRecord);
}

export async function listVisibleSections(ds: DataSource, user: SessionUser, columnId: string): Promise<TraySectionRecord[]> {
  await visibleColumn(ds.manager, user, columnId);
  return listSections(ds.manager, columnId);
}

/** Every fault of a section body against its column and the column's other sections. */
async function sectionErrors(em: EntityManager, col: TowerColumn, body: SectionBody, selfId?: string): Promise<ErrorDetail[]> {
  const errors: ErrorDetail[] = [];
  for (const f of ['firstTray', 'lastTray'] as const) {
    const m = trayOutOfRange(body[f], col.trayCount);
    if (m) errors.push({ path: f, message: m });
  }
  if (body.lastTray < body.firstTray)
    errors.push({
      path: 'lastTray',
      message: `(${body.lastTray}) must not be below firstTray (${body.firstTray}); give the range in the column's tray numbers`,
    });
  if (body.provenance !== 'design' && !body.provenanceDate)
    errors.push({ path: 'provenanceDate', message: `is required for ${body.provenance} geometry (the date it was measured)` });
  for (const e of physicsErrors({ section: body.geometry, trays: [] }))
    errors.push({ path: e.path.replace(/^\/section\//, 'geometry.').replace(/\//g, '.'), message: e.message });
  const others = await em.find(TraySection, { where: { columnId: col.id } });
  for (const o of others) {
    if (o.id === selfId) continue;
    if (body.firstTray <= o.lastTray && o.firstTray <= body.lastTray)
      errors.push({
        path: 'firstTray',
        message: `trays ${body.firstTray}–${body.lastTray} overlap section "${o.name}" (trays ${o.firstTray}–${o.lastTray})`,
      });
  }
  return errors;
}

function fields(body: SectionBody): Partial<TraySection> {
  return {
    name: body.name,
    firstTray: body.firstTray,
    lastTray: body.lastTray,
    geometry: body.geometry,
    provenance: body.provenance,
    provenanceDate: body.provenanceDate ?? null,
    notes: body.notes ?? '',
  };
}

export async function createSection(
  ds: DataSource,
  user: SessionUser,
  columnId: string,
  body: SectionBody,
): Promise<TraySectionRecord> {
  return ds.transaction(async (em) => {
    const col = await visibleColumn(em, user, columnId, true);
    const errors = await sectionErrors(em, col, body);
    if (errors.length) throw new ValidationError('Invalid tray section', errors);
    const s = await em.save(TraySection, em.create(TraySection, { ...fields(body), columnId, createdBy: user.id }));
    await audit(em, user.id, 'create', 'tray-section', s.id, body);
    return toSectionRecord(s);
  });
}

export async function updateSection(
  ds: DataSource,
  user: SessionUser,
  id: string,
  body: UpdateSectionBody,
): Promise<TraySectionRecord> {
  return ds.transaction(async (em) => {
    const s = await visibleChild(em, user, TraySection, id, 'Tray section', true);
    const col = await visibleColumn(em, user, s.columnId, true);
    assertVersion('tray section', s.version, body.version);
    const errors = await sectionErrors(em, col, body, id);
    if (errors.length) throw new ValidationError('Invalid tray section', errors);
    Object.assign(s, fields(body));
    const saved = await em.save(TraySection, s);
    const { version: _v, ...changes } = body;
    await audit(em, user.id, 'update', 'tray-section', id, changes);
    return toSectionRecord(saved);
  });
}

export async function deleteSection(ds: DataSource, user: SessionUser, id: string, version: number): Promise<void> {
  await ds.transaction(async (em) => {
    const s = await visibleChild(em, user, TraySection, id, 'Tray section', true);
    assertVersion('tray section', s.version, version);
    await em.delete(TraySection, { id });
    await audit(em, user.id, 'delete', 'tray-section', id, { name: s.name, firstTray: s.firstTray, lastTray: s.lastTray });
  });
}
