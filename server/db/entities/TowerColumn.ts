import { Column, CreateDateColumn, Entity, PrimaryGeneratedColumn, UpdateDateColumn, VersionColumn } from 'typeorm';
import type { TrayMark } from '../../../shared/types/columns.js';

export type TrayNumbering = 'top-down' | 'bottom-up';

/** A distillation column (named TowerColumn to keep clear of TypeORM's @Column decorator). */
@Entity({ name: 'columns' })
export class TowerColumn {
  @PrimaryGeneratedColumn('uuid') id: string;
  @Column({ type: 'uuid', name: 'unit_id' }) unitId: string;
  @Column({ type: 'text' }) tag: string;
  @Column({ type: 'text', default: '' }) service: string;
  @Column({ type: 'text', default: 'top-down' }) numbering: TrayNumbering;
  @Column({ type: 'integer', name: 'tray_count' }) trayCount: number;
  @Column({ type: 'uuid', name: 'engineer_id', nullable: true }) engineerId: string | null;
  /** feed, side-draw, pump-around and note flags per tray (migration 1764640000000) */
  @Column({ type: 'jsonb', name: 'tray_marks', default: () => `'[]'::jsonb` }) trayMarks: TrayMark[];
  @CreateDateColumn({ type: 'timestamptz', name: 'created_at' }) createdAt: Date;
  @UpdateDateColumn({ type: 'timestamptz', name: 'updated_at' }) updatedAt: Date;
  @VersionColumn({ type: 'integer' }) version: number;
}
