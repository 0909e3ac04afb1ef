import { Column, CreateDateColumn, Entity, PrimaryGeneratedColumn, UpdateDateColumn, VersionColumn } from 'typeorm';
import type { LoadBasis, LoadSource, PumpAroundDutyTag, StageMapEntry } from '../../../shared/types/loads.js';
import type { TrayLoad } from '../../../shared/types/rating.js';

/** A load case: per-tray loads (jsonb array of engine TrayLoad rows, SI) on one column. */
@Entity({ name: 'load_cases' })
export class LoadCase {
  @PrimaryGeneratedColumn('uuid') id: string;
  @Column({ type: 'uuid', name: 'column_id' }) columnId: string;
  @Column({ type: 'text' }) name: string;
  @Column({ type: 'text' }) basis: LoadBasis;
  @Column({ type: 'text' }) source: LoadSource;
  @Column({ type: 'text', name: 'source_file', nullable: true }) sourceFile: string | null;
  @Column({ type: 'text', default: '' }) notes: string;
  @Column({ type: 'jsonb', default: () => `'[]'::jsonb` }) loads: TrayLoad[];
  @Column({ type: 'jsonb', name: 'stage_map', nullable: true }) stageMap: StageMapEntry[] | null;
  /** the pump-around duties a simulation case was made at (issue 17); empty when not tagged */
  @Column({ type: 'jsonb', name: 'pump_around_duties', default: () => `'[]'::jsonb` }) pumpAroundDuties: PumpAroundDutyTag[];
  @Column({ type: 'uuid', name: 'created_by', nullable: true }) createdBy: string | null;
  @CreateDateColumn({ type: 'timestamptz', name: 'created_at' }) createdAt: Date;
  @UpdateDateColumn({ type: 'timestamptz', name: 'updated_at' }) updatedAt: Date;
  @VersionColumn({ type: 'integer' }) version: number;
}
