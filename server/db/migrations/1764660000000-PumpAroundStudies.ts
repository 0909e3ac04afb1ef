import type { MigrationInterface, QueryRunner } from 'typeorm';

/**
 * Stored pump-around duty studies (issue 5). The load case and pump-around ids are kept without a
 * foreign key: the inputs snapshot (jsonb) is the record of what was studied, and it stays valid when
 * the load case or pump-around is later edited or deleted.
 */
export class PumpAroundStudies1764660000000 implements MigrationInterface {
  name = 'PumpAroundStudies1764660000000';

  async up(q: QueryRunner): Promise<void> {
    await q.query(`CREATE TABLE pump_around_studies (
      id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
      column_id uuid NOT NULL REFERENCES columns(id) ON DELETE CASCADE,
      load_case_id uuid NOT NULL,
      pump_around_id uuid NOT NULL,
      label text NOT NULL DEFAULT '',
      inputs jsonb NOT NULL,
      results jsonb NOT NULL,
      author_id uuid NOT NULL REFERENCES users(id) ON DELETE RESTRICT,
      status text NOT NULL DEFAULT 'draft' CHECK (status IN ('draft','submitted','approved','returned')),
      reviewer_id uuid REFERENCES users(id) ON DELETE SET NULL,
      review_comment text,
      reviews jsonb NOT NULL DEFAULT '[]'::jsonb,
      submitted_at timestamptz,
      reviewed_at timestamptz,
      created_at timestamptz NOT NULL DEFAULT now(),
      updated_at timestamptz NOT NULL DEFAULT now(),
      version integer NOT NULL DEFAULT 1)`);
    await q.query(`CREATE INDEX pump_around_studies_column ON pump_around_studies (column_id, created_at DESC)`);
  }

  async down(q: QueryRunner): Promise<void> {
    await q.query(`DROP TABLE IF EXISTS pump_around_studies`);
  }
}
