import type { EntityManager } from 'typeorm';
import { config } from '../config.js';
import { canSeeColumn } from '../services/access/access.js';
import { PERMISSION_MATRIX, ROLES, type Role } from '../../shared/permissions.js';

export interface Notice {
  /** what triggered it, e.g. 'run.submitted', 'inspection.signed' */
  kind: string;
  to: string[];
  subject: string;
  text: string;
  /** the page the notice is about, e.g. '/runs/<id>'; the mail ends with its full address (config.appUrl) */
  link?: string;
}

/** The body as sent: the text, then the address of the item it is about. */
export const noticeBody = (n: Pick<Notice, 'text' | 'link'>): string =>
  n.link ? `${n.text}\n\nOpen it in Frothline: ${config.appUrl}${n.link}` : n.text;

/**
 * Queue an e-mail notice inside the caller's transaction: the notice is stored with the action that
 * triggered it and delivered later by the sender (server/mail/sender.ts), so a mail failure never
 * loses or rolls back the action. Empty or duplicate addresses are dropped; no recipients → nothing queued.
 */
export async function queueNotice(em: EntityManager, n: Notice): Promise<void> {
  const to = [...new Set(n.to.map((a) => a.trim()).filter((a) => a.length > 0))];
  if (to.length === 0) return;
  await em.query(`INSERT INTO mail_outbox (kind, recipients, subject, body) VALUES ($1, $2, $3, $4)`, [
    n.kind,
    to,
    n.subject,
    noticeBody(n),
  ]);
}

/** Roles that hold a permission, read from the one permission matrix. */
export function rolesWith(permission: (typeof PERMISSION_MATRIX)[keyof typeof PERMISSION_MATRIX][number]): string[] {
  return ROLES.filter((r) => PERMISSION_MATRIX[r].includes(permission));
}

/**
 * E-mail addresses of active users whose role may approve reviews ('reviews.approve') and who may see
 * the column (its site): a notice names the column and its results, so it goes to no one else.
 */
export async function reviewerEmails(em: EntityManager, columnId: string): Promise<string[]> {
  const rows = await em.query<{ id: string; role: Role; email: string }[]>(
    `SELECT id, role, email FROM users WHERE active AND role = ANY($1) ORDER BY email`,
    [rolesWith('reviews.approve')],
  );
  const out: string[] = [];
  for (const r of rows) if (await canSeeColumn(em, r, columnId)) out.push(r.email);
  return out;
}

/**
 * E-mail address of an active user, or null (unknown or deactivated user → no mail); with `columnId`,
 * also null when the user may no longer see that column's site.
 */
export async function userEmail(em: EntityManager, userId: string | null | undefined, columnId?: string): Promise<string | null> {
  if (!userId) return null;
  const rows = await em.query<
    {
      id: string;
      role: Role;
      email: string;
    }[]
  >(`SELECT id, role, email FROM users WHERE id = $1 AND active`, [userId]);
  const u = rows[0];
  if (!u || (columnId && !(await canSeeColumn(em, u, columnId)))) return null;
  return u.email;
}
