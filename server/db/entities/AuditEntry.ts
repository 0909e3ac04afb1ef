import { Column, Entity, PrimaryGeneratedColumn } from 'typeorm';

/** Who changed what and when: one row per write. */
@Entity({ name: 'audit_log' })
export class AuditEntry {
  @PrimaryGeneratedColumn('increment', { type: 'bigint' }) id: string;
  @Column({ type: 'timestamptz', default: () => 'now()' }) at: Date;
  @Column({ type: 'uuid', name: 'user_id', nullable: true }) userId: string | null;
  @Column({ type: 'text' }) action: string;
  @Column({ type: 'text' }) entity: string;
  @Column({ type: 'text', name: 'entity_id' }) entityId: string;
  @Column({ type: 'jsonb', nullable: true }) changes: unknown;
}
