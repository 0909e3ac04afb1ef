import type { MigrationInterface, QueryRunner } from 'typeorm';

/**
 * Field evidence per column (issue 16): gamma scans, pressure-drop surveys and temperature surveys, each with
 * its date, operating case and author, optionally linked to a rating run and to an inspection (taken before or
 * after its turnaround). The kind-specific data (scan lines and points, datum, readings) is one jsonb document,
 * written and read whole.
 */
export class FieldEvidence1764820000000 implements MigrationInterface {
  name = 'FieldEvidence1764820000000';

  async up(q: QueryRunner): Promise<void> {
    await q.query(`CREATE TABLE field_evidence (
      id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
      column_id uuid NOT NULL REFERENCES columns(id) ON DELETE CASCADE,
      kind text NOT NULL CHECK (kind IN ('gamma-scan', 'dp-survey', 'temperature-survey')),
      title text NOT NULL,
      taken_on date NOT NULL,
      operating_case text NOT NULL DEFAULT '',
      run_id uuid REFERENCES rating_runs(id) ON DELETE SET NULL,
      inspection_id uuid REFERENCES inspections(id) ON DELETE SET NULL,
      inspection_timing text CHECK (inspection_timing IN ('before', 'after')),
      data jsonb NOT NULL,
      notes text NOT NULL DEFAULT '',
      source_file text,
      author_id uuid REFERENCES users(id) ON DELETE SET NULL,
      created_at timestamptz NOT NULL DEFAULT now(),
      updated_at timestamptz NOT NULL DEFAULT now(),
      version integer NOT NULL DEFAULT 1)`);
    await q.query(`CREATE INDEX field_evidence_column ON field_evidence (column_id, taken_on DESC)`);
    await q.query(`CREATE INDEX field_evidence_run ON field_evidence (run_id) WHERE run_id IS NOT NULL`);
    await q.query(`CREATE INDEX field_evidence_inspection ON field_evidence (inspection_id) WHERE inspection_id IS NOT NULL`);
  }

  async down(q: QueryRunner): Promise<void> {
    await q.query(`DROP TABLE IF EXISTS field_evidence`);
  }
}
