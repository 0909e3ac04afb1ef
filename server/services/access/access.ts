import type { DataSource, EntityManager } from 'typeorm';
import { NotFoundError } from '../../errors.js';
import type { SessionUser } from '../../../shared/types/api.js';

/** Who is asking: only the id and role decide what a user may see. */
export type Viewer = Pick<SessionUser, 'id' | 'role'>;

/**
 * The site-visibility rule, the one place it is written in SQL: admins see every site; everyone else sees
 * the sites they are members of. A column the user may not see answers 404 (its existence is not revealed).
 * Every query that lists or reads site data filters with these (tests/api/siteIsolation.test.ts).
 */

/** `siteIdExpr` is a site the user named by `userIdExpr` (an SQL expression: a parameter or a column) is a member of. */
export function memberSiteSql(siteIdExpr: string, userIdExpr: string): string {
  return `${siteIdExpr} IN (SELECT site_id FROM site_members WHERE user_id = ${userIdExpr})`;
}

/** The filter for one viewer, the user id as positional parameter `$paramIndex`. */
export function siteFilterSql(user: Viewer, siteIdExpr: string, paramIndex: number): { sql: string; params: unknown[] } {
  if (user.role === 'admin') return { sql: 'TRUE', params: [] };
  return { sql: memberSiteSql(siteIdExpr, `$${paramIndex}`), params: [user.id] };
}

export async function canSeeColumn(db: DataSource | EntityManager, user: Viewer, columnId: string): Promise<boolean> {
  const f = siteFilterSql(user, 'u.site_id', 2);
  const rows = await db.query<unknown[]>(
    `SELECT 1 FROM columns c JOIN process_units u ON u.id = c.unit_id WHERE c.id = $1 AND ${f.sql}`,
    [columnId, ...f.params],
  );
  return rows.length > 0;
}

export async function assertColumnVisible(db: DataSource | EntityManager, user: SessionUser, columnId: string): Promise<void> {
  if (!(await canSeeColumn(db, user, columnId))) throw new NotFoundError('Column');
}
