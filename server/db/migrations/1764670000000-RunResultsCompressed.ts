import type { MigrationInterface, QueryRunner } from 'typeorm';
import { decodeFrj1 } from '../codec/jsonFrj1.js';
import { decodeResultsBeforeFrb4 } from './frozen/resultsBeforeFrb4.js';

/**
 * Rating-run results and snapshots become bytea holding Brotli-compressed data (then services/runsPack.ts):
 * about 10 kB + 2 kB instead of ~80 kB + 14 kB of jsonb per 60-tray run, which is most of what creating a
 * run costs. Existing rows keep their JSON as UTF-8 text (read back unchanged). STORAGE EXTERNAL: the bytes
 * are already compressed, so PostgreSQL should not try again. The load-case name that run lists show moves
 * to its own column.
 */
export class RunResultsCompressed1764670000000 implements MigrationInterface {
  name = 'RunResultsCompressed1764670000000';

  async up(q: QueryRunner): Promise<void> {
    await q.query(`ALTER TABLE rating_runs ADD COLUMN load_case_name text NOT NULL DEFAULT ''`);
    await q.query(`UPDATE rating_runs SET load_case_name = coalesce(snapshot->'loadCase'->>'name', '')`);
    for (const c of ['results', 'snapshot']) {
      await q.query(`ALTER TABLE rating_runs ALTER COLUMN ${c} TYPE bytea USING convert_to(${c}::text, 'UTF8')`);
      await q.query(`ALTER TABLE rating_runs ALTER COLUMN ${c} SET STORAGE EXTERNAL`);
    }
  }

  async down(q: QueryRunner): Promise<void> {
    const rows = (await q.query(
      `SELECT id, results FROM rating_runs WHERE substring(results FROM 1 FOR 1) <> '\\x7b'::bytea`,
    )) as {
      id: string;
      results: Buffer;
    }[];
    for (const r of rows)
      await q.query(`UPDATE rating_runs SET results = $2 WHERE id = $1`, [
        r.id,
        Buffer.from(JSON.stringify(decodeResultsBeforeFrb4(r.results))),
      ]);
    const snaps = (await q.query(
      `SELECT id, snapshot FROM rating_runs WHERE substring(snapshot FROM 1 FOR 1) <> '\\x7b'::bytea`,
    )) as {
      id: string;
      snapshot: Buffer;
    }[];
    for (const r of snaps)
      await q.query(`UPDATE rating_runs SET snapshot = $2 WHERE id = $1`, [
        r.id,
        Buffer.from(JSON.stringify(decodeFrj1(r.snapshot) ?? JSON.parse(r.snapshot.toString('utf8')))),
      ]);
    for (const c of ['results', 'snapshot']) {
      await q.query(`ALTER TABLE rating_runs ALTER COLUMN ${c} SET STORAGE EXTENDED`);
      await q.query(`ALTER TABLE rating_runs ALTER COLUMN ${c} TYPE jsonb USING convert_from(${c}, 'UTF8')::jsonb`);
    }
    await q.query(`ALTER TABLE rating_runs DROP COLUMN load_case_name`);
  }
}
