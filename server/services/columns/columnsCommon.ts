/** Helpers shared by the column, section, load-case and run services: locking, visibility, mapping. */
import type { EntityManager, EntityTarget, ObjectLiteral } from 'typeorm';
import { TowerColumn } from '../../db/entities/TowerColumn.js';
import { ConflictError, NotFoundError } from '../../errors.js';
import { assertColumnVisible, memberSiteSql } from '../access/access.js';
import type { SessionUser } from '../../../shared/types/api.js';

/** Optimistic lock: a stale version answers 409 and nothing is written. */
export function assertVersion(what: string, current: number, given: number): void {
  if (current !== given)
    throw new ConflictError(
      `This ${what} was changed by someone else since you loaded it (your version ${given}, current ${current}); reload and apply your change again`,
      [{ path: 'version', message: `is ${given}, current is ${current}` }],
    );
}

/** The column, if the user may see it; 404 otherwise (existence is not revealed). One query, visibility included. */
export async function visibleColumn(em: EntityManager, user: SessionUser, columnId: string, lock = false): Promise<TowerColumn> {
  const qb = em.createQueryBuilder(TowerColumn, 'c').where('c.id = :columnId', { columnId });
  if (user.role !== 'admin')
    qb.innerJoin('process_units', 'u', 'u.id = c.unit_id').andWhere(memberSiteSql('u.site_id', ':userId'), { userId: user.id });
  if (lock) qb.setLock('pessimistic_write', undefined, ['c']);
  const col = await qb.getOne();
  if (!col) throw new NotFoundError('Column');
  return col;
}

/** A row that belongs to a column (by columnId), if the user may see that column; 404 otherwise. */
export async function visibleChild<T extends ObjectLiteral & { columnId: string }>(
  em: EntityManager,
  user: SessionUser,
  entity: EntityTarget<T>,
  id: string,
  label: string,
  lock = false,
): Promise<T> {
  const row = await em.findOne(entity, {
    where: { id } as never,
    ...(lock ? { lock: { mode: 'pessimistic_write' as const } } : {}),
  });
  if (!row) throw new NotFoundError(label);
  try {
    await assertColumnVisible(em, user, row.columnId);
  } catch {
    throw new NotFoundError(label);
  }
  return row;
}

export const iso = (d: Date | string): string => new Date(d).toISOString();

/** A tray number inside the column: 1..trayCount (the per-tray load rule, shared/trayLoadRules.ts). */
export { trayOutsideColumn as trayOutOfRange } from '../../../shared/trayLoadRules.js';
