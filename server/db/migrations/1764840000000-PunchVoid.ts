import type { MigrationInterface, QueryRunner } from 'typeorm';

/**
 * Punch items can be voided (a duplicate, a finding entered on the wrong tray): the item stays on the list,
 * struck through, with who voided it, when and why; it no longer counts as open. `down` refuses while a
 * voided item exists, since the old table cannot hold one (nothing is silently reopened or deleted).
 */
export class PunchVoid1764840000000 implements MigrationInterface {
  name = 'PunchVoid1764840000000';

  async up(q: QueryRunner): Promise<void> {
    await q.query(`ALTER TABLE punch_items
      ADD COLUMN voided_by uuid REFERENCES users(id) ON DELETE SET NULL,
      ADD COLUMN voided_at timestamptz,
      ADD COLUMN void_reason text NOT NULL DEFAULT ''`);
    await q.query(`ALTER TABLE punch_items DROP CONSTRAINT IF EXISTS punch_items_status_check`);
    await q.query(`ALTER TABLE punch_items ADD CONSTRAINT punch_items_status_check CHECK (status IN ('open','closed','void'))`);
    await q.query(`ALTER TABLE punch_items ADD CONSTRAINT punch_items_void_check
      CHECK ((status = 'void') = (voided_at IS NOT NULL) AND (status <> 'void' OR length(btrim(void_reason)) > 0))`);
  }

  async down(q: QueryRunner): Promise<void> {
    const [row] = (await q.query(`SELECT count(*)::int AS n FROM punch_items WHERE status = 'void'`)) as { n: number }[];
    if ((row?.n ?? 0) > 0)
      throw new Error(`${row!.n} voided punch item(s) exist; the earlier schema cannot hold them. Delete them first.`);
    await q.query(`ALTER TABLE punch_items DROP CONSTRAINT IF EXISTS punch_items_void_check`);
    await q.query(`ALTER TABLE punch_items DROP CONSTRAINT IF EXISTS punch_items_status_check`);
    await q.query(`ALTER TABLE punch_items ADD CONSTRAINT punch_items_status_check CHECK (status IN ('open','closed'))`);
    await q.query(`ALTER TABLE punch_items DROP COLUMN void_reason, DROP COLUMN voided_at, DROP COLUMN voided_by`);
  }
}
