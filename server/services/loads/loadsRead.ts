/** Reading load cases: summaries for the column page, full records with the grid. */
import type { DataSource, EntityManager } from 'typeorm';
import { LoadCase } from '../../db/entities/LoadCase.js';
import { User } from '../../db/entities/User.js';
import { iso, visibleChild, visibleColumn } from '../columns/columnsCommon.js';
import type { SessionUser } from '../../../shared/types/api.js';
import type { LoadCaseRecord, LoadCaseSummary } from '../../../shared/types/loads.js';

export function toLoadCaseSummary(l: LoadCase, authorName: string | null): LoadCaseSummary {
  const trays = l.loads.map((x) => x.tray);
  return {
    id: l.id,
    columnId: l.columnId,
    name: l.name,
    basis: l.basis,
    source: l.source,
    sourceFile: l.sourceFile,
    trayCount: trays.length,
    firstTray: trays.length ? Math.min(...trays) : null,
    lastTray: trays.length ? Math.max(...trays) : null,
    createdBy: l.createdBy,
    createdByName: authorName,
    pumpAroundDuties: l.pumpAroundDuties ?? [],
    version: l.version,
    updatedAt: iso(l.updatedAt),
  };
}

async function userName(em: EntityManager, id: string | null): Promise<string | null> {
  if (!id) return null;
  return (await em.findOneBy(User, { id }))?.name ?? null;
}

export async function toLoadCaseRecord(em: EntityManager, l: LoadCase): Promise<LoadCaseRecord> {
  return { ...toLoadCaseSummary(l, await userName(em, l.createdBy)), notes: l.notes, loads: l.loads, stageMap: l.stageMap };
}

export async function listLoadCaseSummaries(em: EntityManager, columnId: string): Promise<LoadCaseSummary[]> {
  const rows = await em.find(LoadCase, { where: { columnId }, order: { createdAt: 'ASC' } });
  const names = new Map<string, string | null>();
  for (const r of rows) if (r.createdBy && !names.has(r.createdBy)) names.set(r.createdBy, await userName(em, r.createdBy));
  return rows.map((r) => toLoadCaseSummary(r, r.createdBy ? (names.get(r.createdBy) ?? null) : null));
}

export async function listVisibleLoadCases(ds: DataSource, user: SessionUser, columnId: string): Promise<LoadCaseSummary[]> {
  await visibleColumn(ds.manager, user, columnId);
  return listLoadCaseSummaries(ds.manager, columnId);
}

export async function getLoadCase(ds: DataSource, user: SessionUser, id: string): Promise<LoadCaseRecord> {
  const l = await visibleChild(ds.manager, user, LoadCase, id, 'Load case');
  return toLoadCaseRecord(ds.manager, l);
}
