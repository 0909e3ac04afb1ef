import type { MigrationInterface, QueryRunner } from 'typeorm';

/**
 * Heat-recovery plans (issue 17): two or three pump-arounds of a column rated together over a grid of duty
 * pairs, stored and reviewed like pump-around studies. Load cases get their pump-around duty tags (a
 * simulation case says at which duties it was made), used to calibrate a plan's traffic model.
 * The inputs snapshot is jsonb (what was planned, valid when the load cases or pump-arounds are later edited
 * or deleted, so no foreign keys to them); the result is compressed JSON by field name (bytea, db/codec FRJ1)
 * with the suggestion in plain columns for lists; each grid point's trays are a row of heat_plan_points.
 */
export class HeatPlans1764830000000 implements MigrationInterface {
  name = 'HeatPlans1764830000000';

  async up(q: QueryRunner): Promise<void> {
    await q.query(`ALTER TABLE load_cases ADD COLUMN pump_around_duties jsonb NOT NULL DEFAULT '[]'::jsonb`);
    await q.query(`CREATE TABLE heat_plans (
      id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
      column_id uuid NOT NULL REFERENCES columns(id) ON DELETE CASCADE,
      load_case_id uuid NOT NULL,
      pump_around_ids uuid[] NOT NULL,
      label text NOT NULL DEFAULT '',
      inputs jsonb NOT NULL,
      results bytea NOT NULL,
      suggested_duties_kw float8[],
      recovered_above_kw float8,
      author_id uuid NOT NULL REFERENCES users(id) ON DELETE RESTRICT,
      status text NOT NULL DEFAULT 'draft' CHECK (status IN ('draft','submitted','approved','returned')),
      reviewer_id uuid REFERENCES users(id) ON DELETE SET NULL,
      review_comment text,
      reviews jsonb NOT NULL DEFAULT '[]'::jsonb,
      submitted_at timestamptz,
      reviewed_at timestamptz,
      created_at timestamptz NOT NULL DEFAULT now(),
      updated_at timestamptz NOT NULL DEFAULT now(),
      version integer NOT NULL DEFAULT 1,
      CHECK (cardinality(pump_around_ids) BETWEEN 2 AND 3))`);
    await q.query(`CREATE INDEX heat_plans_column ON heat_plans (column_id, created_at DESC)`);
    // each grid point's trays (traffic and percent of limit per check), read one point at a time
    await q.query(`CREATE TABLE heat_plan_points (
      plan_id uuid NOT NULL REFERENCES heat_plans(id) ON DELETE CASCADE,
      idx integer NOT NULL CHECK (idx >= 0),
      trays bytea NOT NULL,
      PRIMARY KEY (plan_id, idx))`);
  }

  async down(q: QueryRunner): Promise<void> {
    await q.query(`DROP TABLE IF EXISTS heat_plan_points`);
    await q.query(`DROP TABLE IF EXISTS heat_plans`);
    await q.query(`ALTER TABLE load_cases DROP COLUMN IF EXISTS pump_around_duties`);
  }
}
