/**
 * Sign-off: the inspector signs first, then the column's engineer (columns.engineer_id, or — when none
 * is set — any process engineer or internals specialist with access to the site). The countersigner is
 * never the inspector who signed, and holds COLUMN_ENGINEER_PERMISSION at the time of signing. Signing
 * queues an e-mail notice in the same transaction; delivery happens later, so a mail failure never loses a
 * signature.
 */
import type { DataSource, EntityManager } from 'typeorm';
import { Inspection } from '../../db/entities/Inspection.js';
import { ConflictError, ForbiddenError } from '../../errors.js';
import { queueNotice, userEmail } from '../../mail/outbox.js';
import { audit } from '../audit/audit.js';
import { memberSiteSql } from '../access/access.js';
import { engineerRoleNames } from '../columns/columnEngineer.js';
import { assertVersion } from '../columns/columnsCommon.js';
import { toInspectionRecord } from './inspectionRead.js';
import { visibleInspection } from './inspections.js';
import { can, COLUMN_ENGINEER_PERMISSION, rolesWith } from '../../../shared/permissions.js';
import type { SessionUser } from '../../../shared/types/api.js';
import type { InspectionRecord, SignatureRecord } from '../../../shared/types/inspections.js';

const signature = (u: SessionUser): SignatureRecord => ({
  userId: u.id,
  name: u.name,
  role: u.role,
  at: new Date().toISOString(),
});

async function columnInfo(
  em: EntityManager,
  columnId: string,
): Promise<{ tag: string; engineerId: string | null; siteId: string }> {
  const [c] = await em.query<{ tag: string; engineer_id: string | null; site_id: string }[]>(
    `SELECT c.tag, c.engineer_id, u.site_id FROM columns c JOIN process_units u ON u.id = c.unit_id WHERE c.id = $1`,
    [columnId],
  );
  return { tag: c?.tag ?? '', engineerId: c?.engineer_id ?? null, siteId: c?.site_id ?? '' };
}

/** Addresses of whoever may countersign: the column's engineer, else every engineer with site access. */
async function engineerEmails(em: EntityManager, engineerId: string | null, siteId: string): Promise<string[]> {
  if (engineerId) {
    const e = await userEmail(em, engineerId);
    if (e) return [e];
  }
  const rows = await em.query<{ email: string }[]>(
    `SELECT u.email FROM users u WHERE ${memberSiteSql('$1::uuid', 'u.id')} AND u.active AND u.role = ANY($2)`,
    [siteId, rolesWith(COLUMN_ENGINEER_PERMISSION)],
  );
  return rows.map((r) => r.email);
}

export async function signAsInspector(ds: DataSource, user: SessionUser, id: string, version: number): Promise<InspectionRecord> {
  return ds.transaction(async (em) => {
    const insp = await visibleInspection(em, user, id, true);
    if (!can(user.role, 'inspections.record')) throw new ForbiddenError('Only an inspector may sign as inspector');
    if (insp.inspectorId && insp.inspectorId !== user.id)
      throw new ForbiddenError('Only the inspector named on this inspection may sign it');
    if (insp.status !== 'draft') throw new ConflictError(`This inspection is already ${insp.status}`);
    assertVersion('inspection', insp.version, version);
    const [trays] = await em.query<
      {
        n: number;
      }[]
    >(`SELECT count(*)::int AS n FROM inspection_trays WHERE inspection_id = $1`, [id]);
    if (!trays?.n)
      throw new ConflictError('Record at least one tray before signing', [{ path: 'trays', message: 'none recorded' }]);
    const open = await em.query<{ item_no: number }[]>(
      `SELECT item_no FROM punch_items WHERE inspection_id = $1 AND status = 'open' AND priority = 'before-box-up' ORDER BY item_no`,
      [id],
    );
    if (open.length)
      throw new ConflictError(`Close the before-box-up punch items first: ${open.map((o) => `#${o.item_no}`).join(', ')}`, [
        { path: 'punch', message: `${open.length} before-box-up item(s) open` },
      ]);
    insp.status = 'inspector-signed';
    insp.inspectorSignature = signature(user);
    insp.inspectorId ??= user.id;
    await em.save(Inspection, insp);
    await audit(em, user.id, 'sign-inspector', 'inspection', id);
    const col = await columnInfo(em, insp.columnId);
    await queueNotice(em, {
      kind: 'inspection.inspector-signed',
      to: await engineerEmails(em, col.engineerId, col.siteId),
      subject: `Inspection of ${col.tag} (${insp.turnaround}) signed by the inspector — your sign-off is due`,
      text:
        `${user.name} signed the turnaround inspection of ${col.tag} (${insp.turnaround}, from ${insp.startDate}).\n` +
        `Please review the tray records, tolerance checks and punch list and countersign in Frothline.\n\n` +
        `Column entry and any repair work remain under the site's permits and procedures.`,
      link: `/inspections/${id}`,
    });
    return toInspectionRecord(em, insp);
  });
}

export async function signAsEngineer(ds: DataSource, user: SessionUser, id: string, version: number): Promise<InspectionRecord> {
  return ds.transaction(async (em) => {
    const insp = await visibleInspection(em, user, id, true);
    const col = await columnInfo(em, insp.columnId);
    if (col.engineerId && col.engineerId !== user.id) throw new ForbiddenError(`Only the engineer of ${col.tag} may countersign`);
    if (!can(user.role, COLUMN_ENGINEER_PERMISSION))
      throw new ForbiddenError(`Only a ${engineerRoleNames()} may countersign; your role does not allow it`);
    if (user.id === insp.inspectorId || user.id === insp.inspectorSignature?.userId)
      throw new ForbiddenError('You signed this inspection as its inspector; another engineer must countersign it');
    if (insp.status !== 'inspector-signed')
      throw new ConflictError(
        insp.status === 'draft' ? 'The inspector signs first' : 'This inspection is already signed by the engineer',
      );
    assertVersion('inspection', insp.version, version);
    insp.status = 'engineer-signed';
    insp.engineerSignature = signature(user);
    await em.save(Inspection, insp);
    await audit(em, user.id, 'sign-engineer', 'inspection', id);
    const to = [await userEmail(em, insp.inspectorId), await userEmail(em, user.id)].filter((x): x is string => !!x);
    await queueNotice(em, {
      kind: 'inspection.engineer-signed',
      to,
      subject: `Inspection of ${col.tag} (${insp.turnaround}) signed off`,
      text: `${user.name} countersigned the turnaround inspection of ${col.tag} (${insp.turnaround}). The record is now read-only.`,
      link: `/inspections/${id}`,
    });
    return toInspectionRecord(em, insp);
  });
}
