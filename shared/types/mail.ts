/** Outbox row as shown to admins (server/routes/mail.ts). */
export interface OutboxItem {
  id: string;
  kind: string;
  to: string[];
  subject: string;
  status: 'pending' | 'sent' | 'failed';
  attempts: number;
  lastError: string | null;
  nextAttemptAt: string;
  createdAt: string;
  sentAt: string | null;
}

/** A message captured by the local SMTP fake (scripts/fake-smtp.mjs), development only. */
export interface CapturedMail {
  id: string;
  receivedAt: string;
  from: string;
  to: string[];
  subject: string;
  text: string;
}

export interface OutboxList {
  items: OutboxItem[];
  counts: { pending: number; sent: number; failed: number };
}
