import { Column, CreateDateColumn, Entity, PrimaryGeneratedColumn, VersionColumn } from 'typeorm';

/** A process unit on a site (e.g. a crude unit). */
@Entity({ name: 'process_units' })
export class ProcessUnit {
  @PrimaryGeneratedColumn('uuid') id: string;
  @Column({ type: 'uuid', name: 'site_id' }) siteId: string;
  @Column({ type: 'text' }) name: string;
  @CreateDateColumn({ type: 'timestamptz', name: 'created_at' }) createdAt: Date;
  @VersionColumn({ type: 'integer' }) version: number;
}
