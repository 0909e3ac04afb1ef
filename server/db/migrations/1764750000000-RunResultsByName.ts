import { isDeepStrictEqual } from 'node:util';
import type { MigrationInterface, QueryRunner } from 'typeorm';
import { FRJ1, encodeFrj1 } from '../codec/jsonFrj1.js';
import { FRB4, decodeFrb4, encodeFrb4 } from '../codec/resultsFrb4.js';
import { decodeResultsBeforeFrb4 } from './frozen/resultsBeforeFrb4.js';
import { encodeFrb3, notFrb3, type Frb3Results } from './frozen/resultsFrb3.js';

const BATCH = 200;

/**
 * Rating-run results are re-encoded in the FRB4 layout, which names every check and field (db/codec/
 * resultsFrb4.ts): rows in FRB3, FRB2, the packed-1 JSON form or JSON text are read with the frozen readers
 * of that time (./frozen, with the check order of that time), written as FRB4 and checked to read back
 * equal; snapshots still stored as JSON text become FRJ1. Afterwards the application reads only FRB4 and
 * FRJ1. Down writes FRB4 rows back as FRB3 and refuses a run that FRB3 cannot hold (checks or fields it
 * has no place for), naming it. Imports only frozen database-layer code.
 */
export class RunResultsByName1764750000000 implements MigrationInterface {
  name = 'RunResultsByName1764750000000';

  async up(q: QueryRunner): Promise<void> {
    await reencode(q, 'results', `substring(results FROM 1 FOR 4) <> '\\x${FRB4.toString('hex')}'::bytea`, (id, b) => {
      const r = decodeResultsBeforeFrb4(b);
      const bytes = encodeFrb4(r);
      if (!isDeepStrictEqual(decodeFrb4(bytes), r)) throw new Error(`run ${id}: its results do not read back equal in FRB4`);
      return bytes;
    });
    await reencode(q, 'snapshot', `substring(snapshot FROM 1 FOR 4) <> '\\x${FRJ1.toString('hex')}'::bytea`, (_id, b) =>
      encodeFrj1(JSON.parse(b.toString('utf8'))),
    );
  }

  async down(q: QueryRunner): Promise<void> {
    await reencode(q, 'results', `substring(results FROM 1 FOR 4) = '\\x${FRB4.toString('hex')}'::bytea`, (id, b) => {
      const r = decodeFrb4(b)!;
      const why = notFrb3(r);
      if (why) throw new Error(`run ${id}: its results cannot be stored as FRB3 without loss (${why}); nothing was changed`);
      return encodeFrb3(r as Frb3Results);
    });
  }
}

/** Rewrites `column` of the rows matching `where`, a batch at a time; any failure names the run and rolls back. */
async function reencode(
  q: QueryRunner,
  column: 'results' | 'snapshot',
  where: string,
  convert: (id: string, b: Buffer) => Buffer,
): Promise<void> {
  let after = '00000000-0000-0000-0000-000000000000';
  for (;;) {
    const rows = (await q.query(
      `SELECT id, ${column} AS b FROM rating_runs WHERE id > $1 AND ${where} ORDER BY id LIMIT ${BATCH}`,
      [after],
    )) as { id: string; b: Buffer }[];
    if (rows.length === 0) return;
    const bytes = rows.map((r) => {
      try {
        return convert(r.id, r.b);
      } catch (err) {
        throw new Error(`rating run ${r.id}, ${column}: ${(err as Error).message}`, { cause: err });
      }
    });
    await q.query(`UPDATE rating_runs r SET ${column} = v.b FROM unnest($1::uuid[], $2::bytea[]) AS v(id, b) WHERE r.id = v.id`, [
      rows.map((r) => r.id),
      bytes,
    ]);
    after = rows[rows.length - 1]!.id;
  }
}
