import { Column, CreateDateColumn, Entity, PrimaryGeneratedColumn, UpdateDateColumn, VersionColumn } from 'typeorm';
import type { ReviewEntry, ReviewStatus, RunKind, RunResults, RunSnapshot } from '../../../shared/types/runs.js';
import type { CheckName } from '../../../shared/types/rating.js';
import { resultsTransformer, snapshotTransformer } from '../codec/index.js';

export interface RunSummaryColumns {
  controllingCheck: CheckName;
  controllingTray: number;
  maxPercentOfLimit: number;
  traysOver: number[];
  traysNear: number[];
}

/** A stored rating run: immutable snapshot and results; only label and review state change. */
@Entity({ name: 'rating_runs' })
export class RatingRun {
  @PrimaryGeneratedColumn('uuid') id: string;
  @Column({ type: 'uuid', name: 'column_id' }) columnId: string;
  @Column({ type: 'uuid', name: 'load_case_id', nullable: true }) loadCaseId: string | null;
  @Column({ type: 'text' }) label: string;
  @Column({ type: 'text' }) kind: RunKind;
  @Column({ type: 'text', default: 'draft' }) status: ReviewStatus;
  @Column({ type: 'text', name: 'engine_version' }) engineVersion: string;
  /** stored as compressed JSON in a bytea (db/codec) */
  @Column({ type: 'bytea', transformer: snapshotTransformer }) snapshot: RunSnapshot;
  /** the snapshot's load-case name, for lists (the snapshot itself is compressed) */
  @Column({ type: 'text', name: 'load_case_name', default: '' }) loadCaseName: string;
  /** stored packed and compressed as bytea (db/codec), read back as RunResults */
  @Column({ type: 'bytea', transformer: resultsTransformer }) results: RunResults;
  @Column({ type: 'jsonb' }) summary: RunSummaryColumns;
  @Column({ type: 'jsonb', default: () => `'[]'::jsonb` }) reviews: ReviewEntry[];
  @Column({ type: 'text', name: 'review_comment', nullable: true }) reviewComment: string | null;
  @Column({ type: 'uuid', name: 'author_id', nullable: true }) authorId: string | null;
  @Column({ type: 'uuid', name: 'reviewer_id', nullable: true }) reviewerId: string | null;
  @CreateDateColumn({ type: 'timestamptz', name: 'created_at' }) createdAt: Date;
  @UpdateDateColumn({ type: 'timestamptz', name: 'updated_at' }) updatedAt: Date;
  @VersionColumn({ type: 'integer' }) version: number;
}
