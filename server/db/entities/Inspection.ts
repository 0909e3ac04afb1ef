import { Column, CreateDateColumn, Entity, PrimaryGeneratedColumn, UpdateDateColumn, VersionColumn } from 'typeorm';
import type { InspectionRuleChoice, InspectionStatus, SignatureRecord } from '../../../shared/types/inspections.js';

/** A turnaround inspection of one column. Permit and gas-test references are recorded, never issued. */
@Entity({ name: 'inspections' })
export class Inspection {
  @PrimaryGeneratedColumn('uuid') id: string;
  @Column({ type: 'uuid', name: 'column_id' }) columnId: string;
  @Column({ type: 'text' }) turnaround: string;
  @Column({ type: 'date', name: 'start_date' }) startDate: string;
  @Column({ type: 'date', name: 'end_date', nullable: true }) endDate: string | null;
  @Column({ type: 'uuid', name: 'inspector_id', nullable: true }) inspectorId: string | null;
  @Column({ type: 'text', name: 'permit_ref', default: '' }) permitRef: string;
  @Column({ type: 'text', name: 'gas_test_ref', default: '' }) gasTestRef: string;
  @Column({ type: 'jsonb' }) rules: InspectionRuleChoice;
  @Column({ type: 'text', default: '' }) notes: string;
  @Column({ type: 'text', default: 'draft' }) status: InspectionStatus;
  @Column({ type: 'jsonb', name: 'inspector_signature', nullable: true }) inspectorSignature: SignatureRecord | null;
  @Column({ type: 'jsonb', name: 'engineer_signature', nullable: true }) engineerSignature: SignatureRecord | null;
  @Column({ type: 'uuid', name: 'as_found_run_ids', array: true, default: () => `'{}'` }) asFoundRunIds: string[];
  @Column({ type: 'uuid', name: 'created_by', nullable: true }) createdBy: string | null;
  @CreateDateColumn({ type: 'timestamptz', name: 'created_at' }) createdAt: Date;
  @UpdateDateColumn({ type: 'timestamptz', name: 'updated_at' }) updatedAt: Date;
  @VersionColumn({ type: 'integer' }) version: number;
}
