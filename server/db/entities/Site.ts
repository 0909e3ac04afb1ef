import { Column, CreateDateColumn, Entity, PrimaryGeneratedColumn, VersionColumn } from 'typeorm';

/** A plant site (refinery); users are granted access per site. */
@Entity({ name: 'sites' })
export class Site {
  @PrimaryGeneratedColumn('uuid') id: string;
  @Column({ type: 'text', unique: true }) name: string;
  @Column({ type: 'text', default: '' }) location: string;
  @CreateDateColumn({ type: 'timestamptz', name: 'created_at' }) createdAt: Date;
  @VersionColumn({ type: 'integer' }) version: number;
}
