/**
 * Punch list of an inspection: numbered items, closed by someone at a time, or voided with a reason (kept on
 * the list, struck through, no longer open); read-only once signed, and a voided item can no longer change.
 */
import type { DataSource } from 'typeorm';
import { PunchItemEntity } from '../../db/entities/PunchItem.js';
import { ConflictError, NotFoundError, ValidationError } from '../../errors.js';
import { audit } from '../audit/audit.js';
import { assertVersion } from '../columns/columnsCommon.js';
import { toInspectionRecord } from './inspectionRead.js';
import { assertDraft, assertPass, visibleInspection } from './inspections.js';
import type { SessionUser } from '../../../shared/types/api.js';
import type { CreatePunchBody, InspectionRecord, UpdatePunchBody, VoidPunchBody } from '../../../shared/types/inspections.js';

export async function addPunchItem(
  ds: DataSource,
  user: SessionUser,
  id: string,
  body: CreatePunchBody,
): Promise<InspectionRecord> {
  if (!body.finding.trim()) throw new ValidationError('Invalid body', [{ path: 'finding', message: 'must not be empty' }]);
  if (!body.action.trim()) throw new ValidationError('Invalid body', [{ path: 'action', message: 'must not be empty' }]);
  return ds.transaction(async (em) => {
    const insp = await visibleInspection(em, user, id, true);
    assertDraft(insp);
    await assertPass(em, insp.columnId, body.tray ?? null, body.pass ?? null);
    const [m] = await em.query<{ n: number }[]>(
      `SELECT coalesce(max(item_no), 0)::int AS n FROM punch_items WHERE inspection_id = $1`,
      [id],
    );
    const item = await em.save(
      PunchItemEntity,
      em.create(PunchItemEntity, {
        inspectionId: id,
        itemNo: (m?.n ?? 0) + 1,
        tray: body.tray ?? null,
        pass: body.pass ?? null,
        finding: body.finding.trim(),
        action: body.action.trim(),
        priority: body.priority,
        owner: body.owner ?? '',
        status: 'open',
      }),
    );
    await audit(em, user.id, 'create', 'punch-item', item.id, body);
    return toInspectionRecord(em, insp);
  });
}

export async function updatePunchItem(
  ds: DataSource,
  user: SessionUser,
  id: string,
  itemId: string,
  body: UpdatePunchBody,
): Promise<InspectionRecord> {
  return ds.transaction(async (em) => {
    const insp = await visibleInspection(em, user, id, true);
    assertDraft(insp);
    const item = await em.findOneBy(PunchItemEntity, { id: itemId, inspectionId: id });
    if (!item) throw new NotFoundError('Punch item');
    assertVersion('punch item', item.version, body.version);
    assertNotVoid(item);
    const { version: _v, status, ...rest } = body;
    void _v;
    Object.assign(item, rest, { updatedAt: new Date() }); // a changed timestamp makes every save a new version
    if (status && status !== item.status) {
      item.status = status;
      item.closedBy = status === 'closed' ? user.id : null;
      item.closedAt = status === 'closed' ? new Date() : null;
    }
    await em.save(PunchItemEntity, item);
    await audit(em, user.id, status === 'closed' ? 'close' : 'update', 'punch-item', item.id, body);
    return toInspectionRecord(em, insp);
  });
}

function assertNotVoid(item: PunchItemEntity): void {
  if (item.status === 'void')
    throw new ConflictError(`Punch item ${item.itemNo} is voided and can no longer change`, [
      { path: 'status', message: 'is void' },
    ]);
}

/** Void a punch item (draft inspections only): who, when and why are kept, and an audit row written. */
export async function voidPunchItem(
  ds: DataSource,
  user: SessionUser,
  id: string,
  itemId: string,
  body: VoidPunchBody,
): Promise<InspectionRecord> {
  const reason = body.reason.trim();
  if (!reason) throw new ValidationError('Invalid body', [{ path: 'reason', message: 'must not be empty' }]);
  return ds.transaction(async (em) => {
    const insp = await visibleInspection(em, user, id, true);
    assertDraft(insp);
    const item = await em.findOneBy(PunchItemEntity, { id: itemId, inspectionId: id });
    if (!item) throw new NotFoundError('Punch item');
    assertVersion('punch item', item.version, body.version);
    assertNotVoid(item);
    const was = item.status;
    Object.assign(item, {
      status: 'void',
      voidedBy: user.id,
      voidedAt: new Date(),
      voidReason: reason,
      closedBy: null,
      closedAt: null,
      updatedAt: new Date(),
    });
    await em.save(PunchItemEntity, item);
    await audit(em, user.id, 'void', 'punch-item', item.id, { reason, was });
    return toInspectionRecord(em, insp);
  });
}
