import { readdir, readFile } from 'node:fs/promises';
import path from 'node:path';
import type { DataSource } from 'typeorm';
import { config } from '../config.js';
import type { CapturedMail, OutboxItem, OutboxList } from '../../shared/types/mail.js';

/** Messages the local SMTP fake wrote to config.mailboxDir, newest first (development mailbox page). */
export async function listCapturedMail(dir = config.mailboxDir, limit = 200): Promise<CapturedMail[]> {
  let names: string[];
  try {
    names = (await readdir(dir)).filter((n) => n.endsWith('.json'));
  } catch {
    return [];
  }
  names.sort().reverse();
  const out: CapturedMail[] = [];
  for (const n of names.slice(0, limit)) {
    try {
      const m = JSON.parse(await readFile(path.join(dir, n), 'utf8')) as CapturedMail;
      out.push({ id: m.id, receivedAt: m.receivedAt, from: m.from, to: m.to, subject: m.subject, text: m.text });
    } catch {
      /* a half-written file: skip it, the next listing will show it */
    }
  }
  return out;
}

interface OutboxRow {
  id: string;
  kind: string;
  recipients: string[];
  subject: string;
  status: OutboxItem['status'];
  attempts: number;
  last_error: string | null;
  next_attempt_at: Date;
  created_at: Date;
  sent_at: Date | null;
}

/** Outbox state for admins: failures first, then the newest. */
export async function listOutbox(ds: DataSource, limit = 200): Promise<OutboxList> {
  const rows = await ds.query<OutboxRow[]>(
    `SELECT id, kind, recipients, subject, status, attempts, last_error, next_attempt_at, created_at, sent_at
       FROM mail_outbox ORDER BY (status = 'failed') DESC, (status = 'pending') DESC, id DESC LIMIT $1`,
    [limit],
  );
  const c = await ds.query<
    {
      status: string;
      n: number;
    }[]
  >(`SELECT status, count(*)::int AS n FROM mail_outbox GROUP BY status`);
  const counts = { pending: 0, sent: 0, failed: 0 };
  for (const r of c) if (r.status in counts) counts[r.status as keyof typeof counts] = r.n;
  return {
    counts,
    items: rows.map((r) => ({
      id: String(r.id),
      kind: r.kind,
      to: r.recipients,
      subject: r.subject,
      status: r.status,
      attempts: r.attempts,
      lastError: r.last_error,
      nextAttemptAt: r.next_attempt_at.toISOString(),
      createdAt: r.created_at.toISOString(),
      sentAt: r.sent_at ? r.sent_at.toISOString() : null,
    })),
  };
}
