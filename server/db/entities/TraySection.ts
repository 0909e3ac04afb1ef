import { Column, CreateDateColumn, Entity, PrimaryGeneratedColumn, UpdateDateColumn, VersionColumn } from 'typeorm';
import type { GeometryProvenance } from '../../../shared/types/columns.js';
import type { SectionGeometry } from '../../../shared/types/rating.js';

/** A range of trays of one column sharing one geometry (engine SectionGeometry as jsonb). */
@Entity({ name: 'tray_sections' })
export class TraySection {
  @PrimaryGeneratedColumn('uuid') id: string;
  @Column({ type: 'uuid', name: 'column_id' }) columnId: string;
  @Column({ type: 'text' }) name: string;
  @Column({ type: 'integer', name: 'first_tray' }) firstTray: number;
  @Column({ type: 'integer', name: 'last_tray' }) lastTray: number;
  @Column({ type: 'jsonb' }) geometry: SectionGeometry;
  @Column({ type: 'text' }) provenance: GeometryProvenance;
  @Column({ type: 'date', name: 'provenance_date', nullable: true }) provenanceDate: string | null;
  @Column({ type: 'text', default: '' }) notes: string;
  @Column({ type: 'uuid', name: 'created_by', nullable: true }) createdBy: string | null;
  @CreateDateColumn({ type: 'timestamptz', name: 'created_at' }) createdAt: Date;
  @UpdateDateColumn({ type: 'timestamptz', name: 'updated_at' }) updatedAt: Date;
  @VersionColumn({ type: 'integer' }) version: number;
}
