import { Column, CreateDateColumn, Entity, PrimaryGeneratedColumn, UpdateDateColumn, VersionColumn } from 'typeorm';
import type { Role } from '../../../shared/permissions.js';
import type { UnitSystem } from '../../../shared/types/api.js';
import type { PressureDropUnit } from '../../../shared/units.js';

@Entity({ name: 'users' })
export class User {
  @PrimaryGeneratedColumn('uuid') id: string;
  @Column({ type: 'text', unique: true }) email: string;
  @Column({ type: 'text' }) name: string;
  @Column({ type: 'text' }) role: Role;
  @Column({ type: 'text', name: 'password_hash' }) passwordHash: string;
  @Column({ type: 'boolean', default: true }) active: boolean;
  /** Set by an administrator's password reset: the user changes the temporary password before anything else. */
  @Column({ type: 'boolean', name: 'must_change_password', default: false }) mustChangePassword: boolean;
  @Column({ type: 'text', name: 'unit_system', default: 'SI' }) unitSystem: UnitSystem;
  /** tray ΔP unit; null: the unit system's default (shared/units.ts defaultPressureDropUnit) */
  @Column({ type: 'text', name: 'pressure_drop_unit', nullable: true }) pressureDropUnit: PressureDropUnit | null;
  @CreateDateColumn({ type: 'timestamptz', name: 'created_at' }) createdAt: Date;
  @UpdateDateColumn({ type: 'timestamptz', name: 'updated_at' }) updatedAt: Date;
  @VersionColumn({ type: 'integer' }) version: number;
}
