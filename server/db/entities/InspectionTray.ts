import { Column, Entity, PrimaryGeneratedColumn, UpdateDateColumn, VersionColumn } from 'typeorm';
import type { TrayFindings, TrayMeasurements } from '../../../shared/types/inspections.js';

/** Findings and measurements (as found, as left) of one tray and pass. */
@Entity({ name: 'inspection_trays' })
export class InspectionTray {
  @PrimaryGeneratedColumn('uuid') id: string;
  @Column({ type: 'uuid', name: 'inspection_id' }) inspectionId: string;
  @Column({ type: 'integer' }) tray: number;
  @Column({ type: 'integer', default: 1 }) pass: number;
  @Column({ type: 'jsonb' }) findings: TrayFindings;
  @Column({ type: 'jsonb', name: 'as_found' }) asFound: TrayMeasurements;
  @Column({ type: 'jsonb', name: 'as_left' }) asLeft: TrayMeasurements;
  @Column({ type: 'uuid', name: 'updated_by', nullable: true }) updatedBy: string | null;
  @UpdateDateColumn({ type: 'timestamptz', name: 'updated_at' }) updatedAt: Date;
  @VersionColumn({ type: 'integer' }) version: number;
}
