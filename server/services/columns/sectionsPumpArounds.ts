/** Pump-arounds of a column: name, draw tray, return tray, base duty. */
import type { DataSource, EntityManager } from 'typeorm';
import { PumpAround } from '../../db/entities/PumpAround.js';
import { ConflictError, ValidationError, type ErrorDetail } from '../../errors.js';
import { audit } from '../audit/audit.js';
import { assertVersion, trayOutOfRange, visibleChild, visibleColumn } from './columnsCommon.js';
import type { SessionUser } from '../../../shared/types/api.js';
import type { PumpAroundBody, PumpAroundRecord, UpdatePumpAroundBody } from '../../../shared/types/columns.js';
import type { TowerColumn } from '../../db/entities/TowerColumn.js';

const toRecord = (p: PumpAround): PumpAroundRecord => ({
  id: p.id,
  columnId: p.columnId,
  name: p.name,
  drawTray: p.drawTray,
  returnTray: p.returnTray,
  baseDuty_kW: p.baseDuty_kW,
  version: p.version,
});

export async function listPumpArounds(em: EntityManager, columnId: string): Promise<PumpAroundRecord[]> {
  return (await em.find(PumpAround, { where: { columnId }, order: { name: 'ASC' } })).map(toRecord);
}

async function check(em: EntityManager, col: TowerColumn, body: PumpAroundBody, selfId?: string): Promise<void> {
  const errors: ErrorDetail[] = [];
  for (const f of ['drawTray', 'returnTray'] as const) {
    const m = trayOutOfRange(body[f], col.trayCount);
    if (m) errors.push({ path: f, message: m });
  }
  if (body.drawTray === body.returnTray) errors.push({ path: 'returnTray', message: 'must differ from the draw tray' });
  // The return is above the draw: a smaller tray number when trays are numbered top-down.
  const returnAbove = col.numbering === 'top-down' ? body.returnTray < body.drawTray : body.returnTray > body.drawTray;
  if (body.drawTray !== body.returnTray && !returnAbove)
    errors.push({ path: 'returnTray', message: `must be above the draw tray (trays are numbered ${col.numbering})` });
  if (errors.length) throw new ValidationError('Invalid pump-around', errors);
  const same = await em.findOneBy(PumpAround, { columnId: col.id, name: body.name });
  if (same && same.id !== selfId)
    throw new ConflictError('This column already has a pump-around with this name', [
      { path: 'name', message: 'is already taken' },
    ]);
}

export async function createPumpAround(
  ds: DataSource,
  user: SessionUser,
  columnId: string,
  body: PumpAroundBody,
): Promise<PumpAroundRecord> {
  return ds.transaction(async (em) => {
    const col = await visibleColumn(em, user, columnId, true);
    await check(em, col, body);
    const p = await em.save(PumpAround, em.create(PumpAround, { ...body, columnId }));
    await audit(em, user.id, 'create', 'pump-around', p.id, body);
    return toRecord(p);
  });
}

export async function updatePumpAround(
  ds: DataSource,
  user: SessionUser,
  id: string,
  body: UpdatePumpAroundBody,
): Promise<PumpAroundRecord> {
  return ds.transaction(async (em) => {
    const p = await visibleChild(em, user, PumpAround, id, 'Pump-around', true);
    assertVersion('pump-around', p.version, body.version);
    const col = await visibleColumn(em, user, p.columnId);
    await check(em, col, body, id);
    const { version: _v, ...changes } = body;
    Object.assign(p, changes);
    const saved = await em.save(PumpAround, p);
    await audit(em, user.id, 'update', 'pump-around', id, changes);
    return toRecord(saved);
  });
}

export async function deletePumpAround(ds: DataSource, user: SessionUser, id: string, version: number): Promise<void> {
  await ds.transaction(async (em) => {
    const p = await visibleChild(em, user, PumpAround, id, 'Pump-around', true);
    assertVersion('pump-around', p.version, version);
    await em.delete(PumpAround, { id });
    await audit(em, user.id, 'delete', 'pump-around', id, { name: p.name });
  });
}
