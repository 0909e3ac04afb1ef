import { Column, CreateDateColumn, Entity, PrimaryGeneratedColumn, UpdateDateColumn, VersionColumn } from 'typeorm';

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
  @CreateDateColumn({ type: 'timestamptz', name: 'created_at' }) createdAt: Date;
  @UpdateDateColumn({ type: 'timestamptz', name: 'updated_at' }) updatedAt: Date;
  @VersionColumn({ type: 'integer' }) version: number;
}
