import { Column, CreateDateColumn, Entity, PrimaryGeneratedColumn, UpdateDateColumn, VersionColumn } from 'typeorm';
import type { EvidenceDataByKind, EvidenceKind, InspectionTiming } from '../../../shared/types/evidence.js';

/** One piece of field evidence of a column: a gamma scan, a ΔP survey or a temperature survey (data as jsonb). */
@Entity({ name: 'field_evidence' })
export class FieldEvidence {
  @PrimaryGeneratedColumn('uuid') id: string;
  @Column({ type: 'uuid', name: 'column_id' }) columnId: string;
  @Column({ type: 'text' }) kind: EvidenceKind;
  @Column({ type: 'text' }) title: string;
  @Column({ type: 'date', name: 'taken_on' }) takenOn: string;
  @Column({ type: 'text', name: 'operating_case', default: '' }) operatingCase: string;
  @Column({ type: 'uuid', name: 'run_id', nullable: true }) runId: string | null;
  @Column({ type: 'uuid', name: 'inspection_id', nullable: true }) inspectionId: string | null;
  @Column({ type: 'text', name: 'inspection_timing', nullable: true }) inspectionTiming: InspectionTiming | null;
  @Column({ type: 'jsonb' }) data: EvidenceDataByKind[EvidenceKind];
  @Column({ type: 'text', default: '' }) notes: string;
  @Column({ type: 'text', name: 'source_file', nullable: true }) sourceFile: string | null;
  @Column({ type: 'uuid', name: 'author_id', nullable: true }) authorId: string | null;
  @CreateDateColumn({ type: 'timestamptz', name: 'created_at' }) createdAt: Date;
  @UpdateDateColumn({ type: 'timestamptz', name: 'updated_at' }) updatedAt: Date;
  @VersionColumn({ type: 'integer' }) version: number;
}
