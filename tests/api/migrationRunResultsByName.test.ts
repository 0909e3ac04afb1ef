/**
 * Migration 1764750000000 re-encodes stored run results in the FRB4 layout. Each test works on a copy of
 * the rating_runs table in a schema of its own, inside a transaction that is rolled back.
 */
import { randomUUID } from 'node:crypto';
import type { QueryRunner } from 'typeorm';
import { afterAll, beforeAll, beforeEach, afterEach, describe, expect, it } from 'vitest';
import { decodeJson, decodeResults, encodeJson, encodeResults } from '../../server/db/codec/index.js';
import { RatingRun } from '../../server/db/entities/RatingRun.js';
import { RunResultsByName1764750000000 } from '../../server/db/migrations/1764750000000-RunResultsByName.js';
import { decodeFrb3 } from '../../server/db/migrations/frozen/resultsFrb3.js';
import type { RunResults } from '../../shared/types/runs.js';
import { setupApp, type TestContext } from '../helpers/app.js';
import { demoResults, demoSnapshots, storedFixture } from '../unit/db/demoResults.js';

let ctx: TestContext;
let q: QueryRunner;
const migration = new RunResultsByName1764750000000();

beforeAll(async () => {
  ctx = await setupApp();
});
afterAll(() => ctx.close());
beforeEach(async () => {
  q = ctx.ds.createQueryRunner();
  await q.connect();
  await q.startTransaction();
  await q.query(`CREATE SCHEMA migration_test`);
  await q.query(`CREATE TABLE migration_test.rating_runs (LIKE public.rating_runs INCLUDING ALL)`);
  await q.query(`SET LOCAL search_path = migration_test, public`);
});
afterEach(async () => {
  await q.rollbackTransaction();
  await q.release();
});

async function insert(results: Buffer, snapshot: Buffer): Promise<string> {
  const id = randomUUID();
  await q.query(
    `INSERT INTO rating_runs (id, column_id, label, kind, engine_version, snapshot, results, summary) VALUES ($1, $2, 'migration test', 'rating', '0.2.0', $3, $4, '{}')`,
    [id, randomUUID(), snapshot, results],
  );
  return id;
}
async function stored(id: string): Promise<{ results: Buffer; snapshot: Buffer }> {
  return (
    (await q.query(`SELECT results, snapshot FROM rating_runs WHERE id = $1`, [id])) as { results: Buffer; snapshot: Buffer }[]
  )[0]!;
}
const magic = (b: Buffer) => b.subarray(0, 4).toString('latin1');

describe('migration RunResultsByName (1764750000000)', () => {
  it('re-encodes FRB3, FRB2 and JSON-text rows as FRB4 that read back equal, and down writes FRB3 again', async () => {
    const [snapshot] = demoSnapshots();
    const textSnapshot = Buffer.from(JSON.stringify(snapshot));
    const [demo] = demoResults();
    const rows: { id: string; results: RunResults }[] = [];
    for (const f of ['frb3', 'frb2'] as const) {
      const { stored: bytes, results } = storedFixture(f);
      rows.push({ id: await insert(bytes, encodeJson(snapshot)), results });
    }
    rows.push({ id: await insert(Buffer.from(JSON.stringify(demo)), textSnapshot), results: demo! });
    const current = encodeResults(demo!);
    const fresh = await insert(current, encodeJson(snapshot));

    await migration.up(q);
    for (const r of rows) {
      const s = await stored(r.id);
      expect(magic(s.results)).toBe('FRB4');
      expect(decodeResults(s.results)).toEqual(r.results);
      expect(magic(s.snapshot)).toBe('FRJ1');
      expect(decodeJson(s.snapshot)).toEqual(snapshot);
      expect((await q.manager.getRepository(RatingRun).findOneByOrFail({ id: r.id })).results).toEqual(r.results);
    }
    expect((await stored(fresh)).results.equals(current)).toBe(true);

    await migration.down(q);
    for (const r of [...rows, { id: fresh, results: demo! }]) {
      const s = await stored(r.id);
      expect(magic(s.results)).toBe('FRB3');
      expect(decodeFrb3(s.results)).toEqual(r.results);
    }
  });

  it('refuses a row it cannot read, naming the run, and leaves it as it was', async () => {
    const bad = await insert(Buffer.from('FRB3not brotli'), encodeJson({}));
    await expect(migration.up(q)).rejects.toThrow(new RegExp(`rating run ${bad}, results: `));
    expect((await stored(bad)).results.toString('latin1')).toBe('FRB3not brotli');
  });

  it('refuses to go down when a run holds a check FRB3 has no place for, naming the run', async () => {
    const [r] = demoResults();
    (r!.trays[0]!.checks as unknown as Record<string, unknown>).passImbalance = {
      ...r!.trays[0]!.checks.jetFlood,
      method: 'passImbalanceTest',
    };
    const id = await insert(encodeResults(r!), encodeJson({}));
    await expect(migration.down(q)).rejects.toThrow(
      new RegExp(`rating run ${id}, results: run ${id}: .*cannot be stored as FRB3.*passImbalance`),
    );
    expect(decodeResults((await stored(id)).results)).toEqual(r);
  });
});
