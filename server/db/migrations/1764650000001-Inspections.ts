import type { MigrationInterface, QueryRunner } from 'typeorm';

/** Issue 6: turnaround inspections, per tray/pass records, photos and punch list. */
export class Inspections1764650000001 implements MigrationInterface {
  name = 'Inspections1764650000001';

  async up(q: QueryRunner): Promise<void> {
    await q.query(`CREATE TABLE inspections (
      id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
      column_id uuid NOT NULL REFERENCES columns(id) ON DELETE CASCADE,
      turnaround text NOT NULL,
      start_date date NOT NULL,
      end_date date,
      inspector_id uuid REFERENCES users(id) ON DELETE SET NULL,
      permit_ref text NOT NULL DEFAULT '',
      gas_test_ref text NOT NULL DEFAULT '',
      rules jsonb NOT NULL,
      notes text NOT NULL DEFAULT '',
      status text NOT NULL DEFAULT 'draft' CHECK (status IN ('draft','inspector-signed','engineer-signed')),
      inspector_signature jsonb,
      engineer_signature jsonb,
      as_found_run_ids uuid[] NOT NULL DEFAULT '{}',
      created_by uuid REFERENCES users(id) ON DELETE SET NULL,
      created_at timestamptz NOT NULL DEFAULT now(),
      updated_at timestamptz NOT NULL DEFAULT now(),
      version integer NOT NULL DEFAULT 1,
      CHECK (end_date IS NULL OR end_date >= start_date))`);
    await q.query(`CREATE INDEX inspections_column ON inspections (column_id, start_date DESC)`);
    await q.query(`CREATE TABLE inspection_trays (
      id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
      inspection_id uuid NOT NULL REFERENCES inspections(id) ON DELETE CASCADE,
      tray integer NOT NULL CHECK (tray >= 1),
      pass integer NOT NULL DEFAULT 1 CHECK (pass BETWEEN 1 AND 4),
      findings jsonb NOT NULL,
      as_found jsonb NOT NULL,
      as_left jsonb NOT NULL,
      updated_by uuid REFERENCES users(id) ON DELETE SET NULL,
      updated_at timestamptz NOT NULL DEFAULT now(),
      version integer NOT NULL DEFAULT 1,
      UNIQUE (inspection_id, tray, pass))`);
    await q.query(`CREATE TABLE inspection_photos (
      id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
      inspection_id uuid NOT NULL REFERENCES inspections(id) ON DELETE CASCADE,
      tray integer,
      pass integer,
      finding text NOT NULL DEFAULT '',
      caption text NOT NULL DEFAULT '',
      content_type text NOT NULL CHECK (content_type IN ('image/jpeg','image/png','image/webp')),
      bytes integer NOT NULL,
      width integer,
      height integer,
      object_key text NOT NULL,
      thumb_key text NOT NULL,
      uploaded_by uuid REFERENCES users(id) ON DELETE SET NULL,
      uploaded_at timestamptz NOT NULL DEFAULT now())`);
    await q.query(`CREATE INDEX inspection_photos_inspection ON inspection_photos (inspection_id)`);
    await q.query(`CREATE TABLE punch_items (
      id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
      inspection_id uuid NOT NULL REFERENCES inspections(id) ON DELETE CASCADE,
      item_no integer NOT NULL,
      tray integer,
      pass integer,
      finding text NOT NULL,
      action text NOT NULL,
      priority text NOT NULL CHECK (priority IN ('before-box-up','if-time-allows','next-turnaround')),
      owner text NOT NULL DEFAULT '',
      status text NOT NULL DEFAULT 'open' CHECK (status IN ('open','closed')),
      closed_by uuid REFERENCES users(id) ON DELETE SET NULL,
      closed_at timestamptz,
      created_at timestamptz NOT NULL DEFAULT now(),
      updated_at timestamptz NOT NULL DEFAULT now(),
      version integer NOT NULL DEFAULT 1,
      UNIQUE (inspection_id, item_no),
      CHECK ((status = 'closed') = (closed_at IS NOT NULL)))`);
  }

  async down(q: QueryRunner): Promise<void> {
    for (const t of ['punch_items', 'inspection_photos', 'inspection_trays', 'inspections'])
      await q.query(`DROP TABLE IF EXISTS ${t}`);
  }
}
