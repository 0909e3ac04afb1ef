/**
 * Who may be a column's engineer (columns.engineer_id): an active user who holds
 * COLUMN_ENGINEER_PERMISSION and may see the column's site. Checked when a column is created or edited,
 * and again when the engineer countersigns (roles and site access can change after the assignment).
 */
import type { EntityManager } from 'typeorm';
import { ValidationError } from '../../errors.js';
import { memberSiteSql } from '../access/access.js';
import { can, COLUMN_ENGINEER_PERMISSION, ROLE_LABELS, rolesWith, type Role } from '../../../shared/permissions.js';

// Canonical textual form only: PostgreSQL would refuse other spellings the schema format lets through.
const UUID = /^[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}$/i;

export const engineerRoleNames = (): string =>
  rolesWith(COLUMN_ENGINEER_PERMISSION)
    .map((r) => ROLE_LABELS[r].toLowerCase())
    .join(' or ');

/** Why a user cannot be the engineer of a column on this site, or null when they can. */
export async function engineerProblem(em: EntityManager, userId: string, siteId: string): Promise<string | null> {
  if (!UUID.test(userId)) return 'is not a user id';
  const [u] = await em.query<{ name: string; role: Role; active: boolean; member: boolean }[]>(
    `SELECT u.name, u.role, u.active, ${memberSiteSql('$2::uuid', 'u.id')} AS member
       FROM users u WHERE u.id = $1`,
    [userId, siteId],
  );
  if (!u) return 'no user has this id';
  if (!u.active) return `${u.name} is deactivated`;
  if (!can(u.role, COLUMN_ENGINEER_PERMISSION))
    return `${u.name} is ${ROLE_LABELS[u.role].toLowerCase()}; a column's engineer is a ${engineerRoleNames()}`;
  if (!u.member) return `${u.name} has no access to this column's site; an administrator grants it on the Users page`;
  return null;
}

/** 400 naming engineerId when the user cannot be the column's engineer; null (no engineer) is always allowed. */
export async function assertColumnEngineer(
  em: EntityManager,
  engineerId: string | null | undefined,
  siteId: string,
): Promise<void> {
  if (!engineerId) return;
  const problem = await engineerProblem(em, engineerId, siteId);
  if (problem) throw new ValidationError('This user cannot be the column’s engineer', [{ path: 'engineerId', message: problem }]);
}
