import { Column, CreateDateColumn, Entity, PrimaryGeneratedColumn, UpdateDateColumn, VersionColumn } from 'typeorm';

/** A pump-around of a column: liquid drawn from drawTray, cooled, returned to returnTray. */
@Entity({ name: 'pump_arounds' })
export class PumpAround {
  @PrimaryGeneratedColumn('uuid') id: string;
  @Column({ type: 'uuid', name: 'column_id' }) columnId: string;
  @Column({ type: 'text' }) name: string;
  @Column({ type: 'integer', name: 'draw_tray' }) drawTray: number;
  @Column({ type: 'integer', name: 'return_tray' }) returnTray: number;
  @Column({ type: 'double precision', name: 'base_duty_kw' }) baseDuty_kW: number;
  @CreateDateColumn({ type: 'timestamptz', name: 'created_at' }) createdAt: Date;
  @UpdateDateColumn({ type: 'timestamptz', name: 'updated_at' }) updatedAt: Date;
  @VersionColumn({ type: 'integer' }) version: number;
}
