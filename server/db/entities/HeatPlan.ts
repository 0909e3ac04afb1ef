import { Column, CreateDateColumn, Entity, PrimaryGeneratedColumn, UpdateDateColumn, VersionColumn } from 'typeorm';
import { compressedJsonTransformer } from '../codec/index.js';
import type { ReviewEntry } from '../../../shared/types/runs.js';
import type { HeatPlanInputsSnapshot, HeatPlanStatus, StoredHeatPlanResult } from '../../../shared/types/heatPlans.js';

/** A stored heat-recovery plan (issue 17): inputs snapshot, result by field name (compressed), review state. */
@Entity({ name: 'heat_plans' })
export class HeatPlan {
  @PrimaryGeneratedColumn('uuid') id: string;
  @Column({ type: 'uuid', name: 'column_id' }) columnId: string;
  @Column({ type: 'uuid', name: 'load_case_id' }) loadCaseId: string;
  @Column({ type: 'uuid', name: 'pump_around_ids', array: true }) pumpAroundIds: string[];
  @Column({ type: 'text', default: '' }) label: string;
  @Column({ type: 'jsonb' }) inputs: HeatPlanInputsSnapshot;
  /** stored as compressed JSON in a bytea (db/codec FRJ1) */
  @Column({ type: 'bytea', transformer: compressedJsonTransformer }) results: StoredHeatPlanResult;
  @Column({ type: 'float8', name: 'suggested_duties_kw', array: true, nullable: true }) suggestedDuties_kW: number[] | null;
  @Column({ type: 'float8', name: 'recovered_above_kw', nullable: true }) recoveredAbove_kW: number | null;
  @Column({ type: 'uuid', name: 'author_id' }) authorId: string;
  @Column({ type: 'text', default: 'draft' }) status: HeatPlanStatus;
  @Column({ type: 'uuid', name: 'reviewer_id', nullable: true }) reviewerId: string | null;
  @Column({ type: 'text', name: 'review_comment', nullable: true }) reviewComment: string | null;
  @Column({ type: 'jsonb', default: () => "'[]'::jsonb" }) reviews: ReviewEntry[];
  @Column({ type: 'timestamptz', name: 'submitted_at', nullable: true }) submittedAt: Date | null;
  @Column({ type: 'timestamptz', name: 'reviewed_at', nullable: true }) reviewedAt: Date | null;
  @CreateDateColumn({ type: 'timestamptz', name: 'created_at' }) createdAt: Date;
  @UpdateDateColumn({ type: 'timestamptz', name: 'updated_at' }) updatedAt: Date;
  @VersionColumn({ type: 'integer' }) version: number;
}
