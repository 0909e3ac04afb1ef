import type { MigrationInterface, QueryRunner } from 'typeorm';

/**
 * Import previews kept in the database (not in one server process's memory), so that any server process can
 * commit a preview another made; each row expires (services/imports/importsStash.ts deletes expired rows).
 */
export class ImportPreviews1764690000000 implements MigrationInterface {
  name = 'ImportPreviews1764690000000';

  async up(q: QueryRunner): Promise<void> {
    await q.query(`CREATE TABLE import_previews (
      id uuid PRIMARY KEY,
      user_id uuid NOT NULL REFERENCES users(id) ON DELETE CASCADE,
      column_id uuid NOT NULL REFERENCES columns(id) ON DELETE CASCADE,
      file_name text NOT NULL,
      first_data_row integer NOT NULL,
      table_data bytea NOT NULL,
      created_at timestamptz NOT NULL DEFAULT now(),
      expires_at timestamptz NOT NULL)`);
    await q.query(`CREATE INDEX import_previews_expires ON import_previews (expires_at)`);
    await q.query(`CREATE INDEX import_previews_user ON import_previews (user_id, created_at)`);
  }

  async down(q: QueryRunner): Promise<void> {
    await q.query(`DROP TABLE IF EXISTS import_previews`);
  }
}
