/** Writing load cases: create, rename, replace the whole per-tray grid (optimistic lock), delete. */
import type { DataSource, EntityManager } from 'typeorm';
import { LoadCase } from '../../db/entities/LoadCase.js';
import { ConflictError, ValidationError } from '../../errors.js';
import { audit } from '../audit/audit.js';
import { assertVersion, visibleChild, visibleColumn } from '../columns/columnsCommon.js';
import { toLoadCaseRecord } from './loadsRead.js';
import { loadErrors, sortLoads, stageMapErrors } from './loadsValidate.js';
import type { SessionUser } from '../../../shared/types/api.js';
import type {
  CreateLoadCaseBody,
  LoadCaseRecord,
  PumpAroundDutyTag,
  PutLoadsBody,
  UpdateLoadCaseBody,
} from '../../../shared/types/loads.js';

async function assertNameFree(em: EntityManager, columnId: string, name: string, selfId?: string): Promise<void> {
  const other = await em.findOneBy(LoadCase, { columnId, name });
  if (other && other.id !== selfId)
    throw new ConflictError(`This column already has a load case named "${name}"`, [
      { path: 'name', message: 'is already taken on this column' },
    ]);
}

/**
 * Create a load case inside the caller's transaction (used by the route and by the import commit, which may
 * tag it with the pump-around duties of a simulation case, checked by the caller).
 */
export async function insertLoadCase(
  em: EntityManager,
  user: SessionUser,
  columnId: string,
  body: CreateLoadCaseBody,
  pumpAroundDuties: PumpAroundDutyTag[] = [],
): Promise<LoadCase> {
  const col = await visibleColumn(em, user, columnId, true);
  const errors = [...loadErrors(body.loads, col.trayCount), ...stageMapErrors(body.stageMap, col.trayCount)];
  if (errors.length) throw new ValidationError('Invalid load case', errors);
  await assertNameFree(em, columnId, body.name);
  const l = await em.save(
    LoadCase,
    em.create(LoadCase, {
      columnId,
      name: body.name,
      basis: body.basis,
      source: body.source,
      sourceFile: body.sourceFile ?? null,
      notes: body.notes ?? '',
      loads: sortLoads(body.loads),
      stageMap: body.stageMap ?? null,
      pumpAroundDuties: pumpAroundDuties.map((d) => ({ pumpAroundId: d.pumpAroundId, duty_kW: d.duty_kW })),
      createdBy: user.id,
    }),
  );
  await audit(em, user.id, 'create', 'load-case', l.id, {
    name: body.name,
    basis: body.basis,
    source: body.source,
    sourceFile: body.sourceFile ?? null,
    trays: body.loads.length,
    ...(pumpAroundDuties.length ? { pumpAroundDuties } : {}),
  });
  return l;
}

export async function createLoadCase(
  ds: DataSource,
  user: SessionUser,
  columnId: string,
  body: CreateLoadCaseBody,
): Promise<LoadCaseRecord> {
  return ds.transaction(async (em) => toLoadCaseRecord(em, await insertLoadCase(em, user, columnId, body)));
}

export async function updateLoadCase(
  ds: DataSource,
  user: SessionUser,
  id: string,
  body: UpdateLoadCaseBody,
): Promise<LoadCaseRecord> {
  return ds.transaction(async (em) => {
    const l = await visibleChild(em, user, LoadCase, id, 'Load case', true);
    assertVersion('load case', l.version, body.version);
    if (body.name !== undefined) await assertNameFree(em, l.columnId, body.name, id);
    const { version: _v, ...changes } = body;
    Object.assign(l, changes);
    const saved = await em.save(LoadCase, l);
    await audit(em, user.id, 'update', 'load-case', id, changes);
    return toLoadCaseRecord(em, saved);
  });
}

export async function putLoads(ds: DataSource, user: SessionUser, id: string, body: PutLoadsBody): Promise<LoadCaseRecord> {
  return ds.transaction(async (em) => {
    const l = await visibleChild(em, user, LoadCase, id, 'Load case', true);
    assertVersion('load case', l.version, body.version);
    const col = await visibleColumn(em, user, l.columnId);
    const errors = [...loadErrors(body.loads, col.trayCount), ...stageMapErrors(body.stageMap, col.trayCount)];
    if (errors.length) throw new ValidationError('Invalid loads', errors);
    l.loads = sortLoads(body.loads);
    if (body.stageMap !== undefined) l.stageMap = body.stageMap;
    if (body.source) l.source = body.source;
    const saved = await em.save(LoadCase, l);
    await audit(em, user.id, 'update-loads', 'load-case', id, {
      trays: body.loads.length,
      source: body.source ?? null,
      previous: { version: body.version },
    });
    return toLoadCaseRecord(em, saved);
  });
}

export async function deleteLoadCase(ds: DataSource, user: SessionUser, id: string, version: number): Promise<void> {
  await ds.transaction(async (em) => {
    const l = await visibleChild(em, user, LoadCase, id, 'Load case', true);
    assertVersion('load case', l.version, version);
    await em.delete(LoadCase, { id });
    await audit(em, user.id, 'delete', 'load-case', id, { name: l.name });
  });
}
