import { Column, Entity, PrimaryColumn } from 'typeorm';
import { compressedJsonTransformer } from '../codec/index.js';
import type { SlimPlanTray } from '../../../shared/types/heatPlans.js';

/** The trays of one grid point of a stored heat-recovery plan (compressed JSON by field name). */
@Entity({ name: 'heat_plan_points' })
export class HeatPlanPoint {
  @PrimaryColumn({ type: 'uuid', name: 'plan_id' }) planId: string;
  @PrimaryColumn({ type: 'integer' }) idx: number;
  @Column({ type: 'bytea', transformer: compressedJsonTransformer }) trays: SlimPlanTray[];
}
