import nodemailer, { type Transporter } from 'nodemailer';
import type { DataSource } from 'typeorm';
import { config } from '../config.js';
import { logger } from '../logger.js';

/** After this many failed attempts a notice is marked 'failed' and shown to admins; it can be retried by hand. */
export const MAX_ATTEMPTS = 6;
/** Retry delay after the n-th failure: 30 s, 1 min, 2 min, … capped at 30 min (our own choice). */
export const backoffSeconds = (attempts: number): number => Math.min(30 * 2 ** Math.max(0, attempts - 1), 1800);

let transport: Transporter | null = null;
function getTransport(): Transporter {
  transport ??= nodemailer.createTransport({
    host: config.smtp.host,
    port: config.smtp.port,
    secure: false,
    ignoreTLS: true,
    connectionTimeout: 5000,
    greetingTimeout: 5000,
    socketTimeout: 10000,
  });
  return transport;
}

interface DueRow {
  id: string;
  kind: string;
  recipients: string[];
  subject: string;
  body: string;
  attempts: number;
}

/**
 * Deliver every due notice once (or, with `ids`, those notices now whatever their schedule). Each row is claimed with SKIP LOCKED so two servers never send the
 * same notice; a failure increments attempts, records the error and schedules a retry with backoff.
 * Returns how many were sent and how many failed in this pass.
 */
export async function deliverPending(
  ds: DataSource,
  opts: { limit?: number; via?: Transporter; ids?: string[] } = {},
): Promise<{ sent: number; failed: number }> {
  const { limit = 50, ids } = opts;
  const via = opts.via ?? getTransport();
  const tried: string[] = [];
  let sent = 0;
  let failed = 0;
  for (let i = 0; i < limit; i++) {
    const done = await ds.transaction(async (em) => {
      const rows = await em.query<DueRow[]>(
        `SELECT id, kind, recipients, subject, body, attempts FROM mail_outbox
          WHERE status = 'pending' AND NOT (id = ANY($1::bigint[]))
            AND ${ids ? 'id = ANY($2::bigint[])' : 'next_attempt_at <= now()'}
          ORDER BY id LIMIT 1 FOR UPDATE SKIP LOCKED`,
        ids ? [tried, ids] : [tried],
      );
      const row = rows[0];
      if (!row) return false;
      tried.push(String(row.id));
      try {
        await via.sendMail({
          from: config.smtp.from,
          to: row.recipients,
          subject: row.subject,
          text: row.body,
          headers: { 'X-Frothline-Kind': row.kind },
        });
        await em.query(
          `UPDATE mail_outbox SET status = 'sent', sent_at = now(), attempts = attempts + 1, last_error = NULL WHERE id = $1`,
          [row.id],
        );
        sent++;
      } catch (err) {
        const attempts = row.attempts + 1;
        const msg = err instanceof Error ? err.message : String(err);
        await em.query(
          `UPDATE mail_outbox SET attempts = $2::int, last_error = $3,
             status = CASE WHEN $2::int >= $4::int THEN 'failed' ELSE 'pending' END,
             next_attempt_at = now() + make_interval(secs => $5::double precision)
           WHERE id = $1`,
          [row.id, attempts, msg.slice(0, 500), MAX_ATTEMPTS, backoffSeconds(attempts)],
        );
        logger.warn({ outboxId: row.id, attempts, err: msg }, 'mail delivery failed');
        failed++;
      }
      return true;
    });
    if (!done) break;
  }
  return { sent, failed };
}

/** Put a failed (or pending) notice back in the queue for immediate delivery. */
export async function retryNotice(ds: DataSource, id: string): Promise<boolean> {
  const r = await ds.query<[unknown[], number] | unknown[]>(
    `UPDATE mail_outbox SET status = 'pending', next_attempt_at = now() WHERE id = $1 AND status <> 'sent' RETURNING id`,
    [id],
  );
  const rows = Array.isArray(r[0]) ? (r[0] as unknown[]) : (r as unknown[]);
  return rows.length > 0;
}

/** Start the background sender (server/main.ts); returns a stop function. */
export function startMailSender(ds: DataSource, intervalMs = 5000): () => void {
  let busy = false;
  const tick = (): void => {
    if (busy || !ds.isInitialized) return;
    busy = true;
    deliverPending(ds)
      .catch((err: unknown) => logger.error({ err }, 'mail sender pass failed'))
      .finally(() => {
        busy = false;
      });
  };
  const timer = setInterval(tick, intervalMs);
  timer.unref();
  return () => clearInterval(timer);
}
