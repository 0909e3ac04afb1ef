import type { MigrationInterface, QueryRunner } from 'typeorm';

/** Issue 4: tray marks on columns, tray sections, pump-arounds, load cases and rating runs. */
export class ColumnsLoadsRuns1764640000000 implements MigrationInterface {
  name = 'ColumnsLoadsRuns1764640000000';

  async up(q: QueryRunner): Promise<void> {
    await q.query(`CREATE EXTENSION IF NOT EXISTS btree_gist`);
    await q.query(`ALTER TABLE columns ADD COLUMN tray_marks jsonb NOT NULL DEFAULT '[]'::jsonb`);
    await q.query(`CREATE TABLE tray_sections (
      id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
      column_id uuid NOT NULL REFERENCES columns(id) ON DELETE CASCADE,
      name text NOT NULL,
      first_tray integer NOT NULL CHECK (first_tray >= 1),
      last_tray integer NOT NULL,
      geometry jsonb NOT NULL,
      provenance text NOT NULL CHECK (provenance IN ('design','as-left','as-found')),
      provenance_date date,
      notes text NOT NULL DEFAULT '',
      created_by uuid REFERENCES users(id) ON DELETE SET NULL,
      created_at timestamptz NOT NULL DEFAULT now(),
      updated_at timestamptz NOT NULL DEFAULT now(),
      version integer NOT NULL DEFAULT 1,
      CHECK (last_tray >= first_tray),
      CHECK (provenance = 'design' OR provenance_date IS NOT NULL),
      EXCLUDE USING gist (column_id WITH =, int4range(first_tray, last_tray, '[]') WITH &&))`);
    await q.query(`CREATE TABLE pump_arounds (
      id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
      column_id uuid NOT NULL REFERENCES columns(id) ON DELETE CASCADE,
      name text NOT NULL,
      draw_tray integer NOT NULL CHECK (draw_tray >= 1),
      return_tray integer NOT NULL CHECK (return_tray >= 1),
      base_duty_kw double precision NOT NULL CHECK (base_duty_kw >= 0),
      created_at timestamptz NOT NULL DEFAULT now(),
      updated_at timestamptz NOT NULL DEFAULT now(),
      version integer NOT NULL DEFAULT 1,
      UNIQUE (column_id, name))`);
    await q.query(`CREATE TABLE load_cases (
      id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
      column_id uuid NOT NULL REFERENCES columns(id) ON DELETE CASCADE,
      name text NOT NULL,
      basis text NOT NULL CHECK (basis IN ('normal','maximum','minimum','alternative-feed','pump-around-study','other')),
      source text NOT NULL CHECK (source IN ('typed','pasted','imported')),
      source_file text,
      notes text NOT NULL DEFAULT '',
      loads jsonb NOT NULL DEFAULT '[]'::jsonb,
      stage_map jsonb,
      created_by uuid REFERENCES users(id) ON DELETE SET NULL,
      created_at timestamptz NOT NULL DEFAULT now(),
      updated_at timestamptz NOT NULL DEFAULT now(),
      version integer NOT NULL DEFAULT 1,
      UNIQUE (column_id, name))`);
    await q.query(`CREATE TABLE rating_runs (
      id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
      column_id uuid NOT NULL REFERENCES columns(id) ON DELETE CASCADE,
      load_case_id uuid REFERENCES load_cases(id) ON DELETE SET NULL,
      label text NOT NULL,
      kind text NOT NULL CHECK (kind IN ('rating','as-found')),
      status text NOT NULL DEFAULT 'draft' CHECK (status IN ('draft','submitted','approved','returned')),
      engine_version text NOT NULL,
      snapshot jsonb COMPRESSION lz4 NOT NULL,
      results jsonb COMPRESSION lz4 NOT NULL,
      summary jsonb NOT NULL,
      reviews jsonb NOT NULL DEFAULT '[]'::jsonb,
      review_comment text,
      author_id uuid REFERENCES users(id) ON DELETE SET NULL,
      reviewer_id uuid REFERENCES users(id) ON DELETE SET NULL,
      created_at timestamptz NOT NULL DEFAULT now(),
      updated_at timestamptz NOT NULL DEFAULT now(),
      version integer NOT NULL DEFAULT 1)`);
    // results are ~150 kB per 60-tray run: lz4 compresses them several times faster than the default pglz
    await q.query(`CREATE INDEX rating_runs_column ON rating_runs (column_id, created_at DESC)`);
    await q.query(`CREATE INDEX load_cases_column ON load_cases (column_id)`);
  }

  async down(q: QueryRunner): Promise<void> {
    for (const t of ['rating_runs', 'load_cases', 'pump_arounds', 'tray_sections']) await q.query(`DROP TABLE IF EXISTS ${t}`);
    await q.query(`ALTER TABLE columns DROP COLUMN IF EXISTS tray_marks`);
  }
}
