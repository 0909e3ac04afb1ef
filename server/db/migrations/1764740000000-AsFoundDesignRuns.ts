import type { MigrationInterface, QueryRunner } from 'typeorm';

/**
 * The design run that a rating as found makes beside its as-found run is a working copy for the comparison,
 * not a rating of its own: it gets the kind 'as-found-design', so run lists and the column profile can leave
 * it out. Existing ones are known by the label that code gave them.
 */
export class AsFoundDesignRuns1764740000000 implements MigrationInterface {
  name = 'AsFoundDesignRuns1764740000000';

  async up(q: QueryRunner): Promise<void> {
    await q.query(`ALTER TABLE rating_runs DROP CONSTRAINT IF EXISTS rating_runs_kind_check`);
    await q.query(
      `ALTER TABLE rating_runs ADD CONSTRAINT rating_runs_kind_check CHECK (kind IN ('rating','as-found','as-found-design'))`,
    );
    await q.query(
      `UPDATE rating_runs SET kind = 'as-found-design' WHERE kind = 'rating' AND label LIKE 'Design — for inspection %'`,
    );
  }

  async down(q: QueryRunner): Promise<void> {
    await q.query(`UPDATE rating_runs SET kind = 'rating' WHERE kind = 'as-found-design'`);
    await q.query(`ALTER TABLE rating_runs DROP CONSTRAINT IF EXISTS rating_runs_kind_check`);
    await q.query(`ALTER TABLE rating_runs ADD CONSTRAINT rating_runs_kind_check CHECK (kind IN ('rating','as-found'))`);
  }
}
