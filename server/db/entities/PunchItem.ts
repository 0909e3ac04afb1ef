import { Column, CreateDateColumn, Entity, PrimaryGeneratedColumn, UpdateDateColumn, VersionColumn } from 'typeorm';
import type { PunchPriority, PunchStatus } from '../../../shared/types/inspections.js';

/** One punch-list item of an inspection, closed (or voided, with a reason) by someone at a time. */
@Entity({ name: 'punch_items' })
export class PunchItemEntity {
  @PrimaryGeneratedColumn('uuid') id: string;
  @Column({ type: 'uuid', name: 'inspection_id' }) inspectionId: string;
  @Column({ type: 'integer', name: 'item_no' }) itemNo: number;
  @Column({ type: 'integer', nullable: true }) tray: number | null;
  @Column({ type: 'integer', nullable: true }) pass: number | null;
  @Column({ type: 'text' }) finding: string;
  @Column({ type: 'text' }) action: string;
  @Column({ type: 'text' }) priority: PunchPriority;
  @Column({ type: 'text', default: '' }) owner: string;
  @Column({ type: 'text', default: 'open' }) status: PunchStatus;
  @Column({ type: 'uuid', name: 'closed_by', nullable: true }) closedBy: string | null;
  @Column({ type: 'timestamptz', name: 'closed_at', nullable: true }) closedAt: Date | null;
  @Column({ type: 'uuid', name: 'voided_by', nullable: true }) voidedBy: string | null;
  @Column({ type: 'timestamptz', name: 'voided_at', nullable: true }) voidedAt: Date | null;
  @Column({ type: 'text', name: 'void_reason', default: '' }) voidReason: string;
  @CreateDateColumn({ type: 'timestamptz', name: 'created_at' }) createdAt: Date;
  @UpdateDateColumn({ type: 'timestamptz', name: 'updated_at' }) updatedAt: Date;
  @VersionColumn({ type: 'integer' }) version: number;
}
