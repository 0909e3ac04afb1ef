import { Column, CreateDateColumn, Entity, PrimaryGeneratedColumn, UpdateDateColumn, VersionColumn } from 'typeorm';
import type { ReviewEntry } from '../../../shared/types/runs.js';
import type { SlimStudyResult, StudyInputsSnapshot, StudyStatus } from '../../../shared/types/studies.js';

/** A stored pump-around duty study: inputs snapshot, slimmed result, author and review state. */
@Entity({ name: 'pump_around_studies' })
export class PumpAroundStudy {
  @PrimaryGeneratedColumn('uuid') id: string;
  @Column({ type: 'uuid', name: 'column_id' }) columnId: string;
  @Column({ type: 'uuid', name: 'load_case_id' }) loadCaseId: string;
  @Column({ type: 'uuid', name: 'pump_around_id' }) pumpAroundId: string;
  @Column({ type: 'text', default: '' }) label: string;
  @Column({ type: 'jsonb' }) inputs: StudyInputsSnapshot;
  @Column({ type: 'jsonb' }) results: SlimStudyResult;
  @Column({ type: 'uuid', name: 'author_id' }) authorId: string;
  @Column({ type: 'text', default: 'draft' }) status: StudyStatus;
  @Column({ type: 'uuid', name: 'reviewer_id', nullable: true }) reviewerId: string | null;
  @Column({ type: 'text', name: 'review_comment', nullable: true }) reviewComment: string | null;
  @Column({ type: 'jsonb', default: () => "'[]'::jsonb" }) reviews: ReviewEntry[];
  @Column({ type: 'timestamptz', name: 'submitted_at', nullable: true }) submittedAt: Date | null;
  @Column({ type: 'timestamptz', name: 'reviewed_at', nullable: true }) reviewedAt: Date | null;
  @CreateDateColumn({ type: 'timestamptz', name: 'created_at' }) createdAt: Date;
  @UpdateDateColumn({ type: 'timestamptz', name: 'updated_at' }) updatedAt: Date;
  @VersionColumn({ type: 'integer' }) version: number;
}
