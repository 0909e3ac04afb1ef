import type { MigrationInterface, QueryRunner } from 'typeorm';

/**
 * Each user's unit for tray pressure drop: head of liquid (mm or in) or pressure (mbar, psi). NULL means the
 * default of their unit system (mm liquid in SI, in liquid in US customary).
 */
export class PressureDropUnit1764840000001 implements MigrationInterface {
  name = 'PressureDropUnit1764840000001';

  async up(q: QueryRunner): Promise<void> {
    await q.query(`ALTER TABLE users ADD COLUMN pressure_drop_unit text
      CHECK (pressure_drop_unit IN ('mm-liquid','in-liquid','mbar','psi'))`);
  }

  async down(q: QueryRunner): Promise<void> {
    await q.query(`ALTER TABLE users DROP COLUMN pressure_drop_unit`);
  }
}
