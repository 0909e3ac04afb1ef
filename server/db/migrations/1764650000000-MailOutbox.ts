import type { MigrationInterface, QueryRunner } from 'typeorm';

/** Outgoing e-mail notices, queued in the triggering transaction and delivered by server/mail/sender.ts. */
export class MailOutbox1764650000000 implements MigrationInterface {
  name = 'MailOutbox1764650000000';

  async up(q: QueryRunner): Promise<void> {
    await q.query(`CREATE TABLE mail_outbox (
      id bigserial PRIMARY KEY,
      kind text NOT NULL,
      recipients text[] NOT NULL,
      subject text NOT NULL,
      body text NOT NULL,
      status text NOT NULL DEFAULT 'pending' CHECK (status IN ('pending','sent','failed')),
      attempts integer NOT NULL DEFAULT 0,
      last_error text,
      next_attempt_at timestamptz NOT NULL DEFAULT now(),
      created_at timestamptz NOT NULL DEFAULT now(),
      sent_at timestamptz)`);
    await q.query(`CREATE INDEX mail_outbox_due ON mail_outbox (next_attempt_at) WHERE status = 'pending'`);
  }

  async down(q: QueryRunner): Promise<void> {
    await q.query(`DROP TABLE IF EXISTS mail_outbox`);
  }
}
