import type { EntityManager } from 'typeorm';
import { PERMISSION_MATRIX, ROLES } from '../../shared/permissions.js';

export interface Notice {
  /** what triggered it, e.g. 'run.submitted', 'inspection.signed' */
  kind: string;
  to: string[];
  subject: string;
  text: string;
}

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
    n.text,
  ]);
}

/** Roles that hold a permission, read from the one permission matrix. */
export function rolesWith(permission: (typeof PERMISSION_MATRIX)[keyof typeof PERMISSION_MATRIX][number]): string[] {
  return ROLES.filter((r) => PERMISSION_MATRIX[r].includes(permission));
}

/** E-mail addresses of active users whose role may approve reviews ('reviews.approve'). */
export async function reviewerEmails(em: EntityManager): Promise<string[]> {
  const rows = (await em.query(`SELECT email FROM users WHERE active AND role = ANY($1) ORDER BY email`, [
    rolesWith('reviews.approve'),
  ])) as { email: string }[];
  return rows.map((r) => r.email);
}

/** E-mail address of an active user, or null (unknown or deactivated user → no mail). */
export async function userEmail(em: EntityManager, userId: string | null | undefined): Promise<string | null> {
  if (!userId) return null;
  const rows = (await em.query(`SELECT email FROM users WHERE id = $1 AND active`, [userId])) as { email: string }[];
  return rows[0]?.email ?? null;
}
