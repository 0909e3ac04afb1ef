import { Column, Entity, PrimaryGeneratedColumn } from 'typeorm';

export type MailStatus = 'pending' | 'sent' | 'failed';

/** One queued e-mail notice; the sender delivers it and records each failed attempt. */
@Entity({ name: 'mail_outbox' })
export class MailOutbox {
  @PrimaryGeneratedColumn('increment', { type: 'bigint' }) id: string;
  @Column({ type: 'text' }) kind: string;
  @Column({ type: 'text', array: true }) recipients: string[];
  @Column({ type: 'text' }) subject: string;
  @Column({ type: 'text' }) body: string;
  @Column({ type: 'text', default: 'pending' }) status: MailStatus;
  @Column({ type: 'integer', default: 0 }) attempts: number;
  @Column({ type: 'text', name: 'last_error', nullable: true }) lastError: string | null;
  @Column({ type: 'timestamptz', name: 'next_attempt_at', default: () => 'now()' }) nextAttemptAt: Date;
  @Column({ type: 'timestamptz', name: 'created_at', default: () => 'now()' }) createdAt: Date;
  @Column({ type: 'timestamptz', name: 'sent_at', nullable: true }) sentAt: Date | null;
}
