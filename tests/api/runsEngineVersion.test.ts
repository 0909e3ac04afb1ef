/**
 * Stored runs keep the engine version that rated them: a run stored by an earlier engine (0.2.0, in the
 * FRB2 results layout of that time, re-encoded by migration 1764750000000 as every such row is) still
 * opens, exports, and says which engine version rated it.
 */
import { readFileSync } from 'node:fs';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { RunResultsByName1764750000000 } from '../../server/db/migrations/1764750000000-RunResultsByName.js';
import { ENGINE_VERSION } from '../../server/engine/index.js';
import { runReportDoc } from '../../server/services/reports/runReportPdf.js';
import { setupApp, type TestContext } from '../helpers/app.js';
import { makePlant, twoRuns, type Plant } from './columnsFixture.js';

const frb2 = JSON.parse(readFileSync(new URL('../fixtures/run-results-frb2.json', import.meta.url), 'utf8')) as {
  stored: string;
  results: { engineVersion: string; trays: { tray: number }[] };
};

let ctx: TestContext;
let plant: Plant;

beforeAll(async () => {
  ctx = await setupApp();
  plant = await makePlant(ctx.ds);
});
afterAll(() => ctx.close());

describe('runs rated by an earlier engine version', () => {
  it('still open and report the version that rated them, beside runs of the current version', async () => {
    const { engineer, current, other: old } = await twoRuns(ctx, plant, 'Old');
    expect(frb2.results.engineVersion).toBe('0.2.0');
    expect(ENGINE_VERSION).not.toBe('0.2.0');
    // make the second row what engine 0.2.0 stored: its version and its results bytes as written then
    await ctx.ds.query('UPDATE rating_runs SET engine_version = $1, results = $2 WHERE id = $3', [
      '0.2.0',
      Buffer.from(frb2.stored, 'base64'),
      old.id,
    ]);
    const q = ctx.ds.createQueryRunner();
    try {
      await new RunResultsByName1764750000000().up(q);
    } finally {
      await q.release();
    }

    const a = await engineer.get(`/api/runs/${current.id}`);
    expect(a.status).toBe(200);
    expect(a.body.engineVersion).toBe(ENGINE_VERSION);
    const b = await engineer.get(`/api/runs/${old.id}`);
    expect(b.status).toBe(200);
    expect(b.body.engineVersion).toBe('0.2.0');
    expect(b.body.results.trays.map((t: { tray: number }) => t.tray)).toEqual(frb2.results.trays.map((t) => t.tray));
    const csv = await engineer.get(`/api/runs/${old.id}/export?format=csv`);
    expect(csv.status).toBe(200);
    expect(csv.text).toMatch(/engine 0\.2\.0/);
    // the printed report names the engine that rated it, and says the methods list is the current engine's
    const oldText = JSON.stringify(runReportDoc(b.body, null, 'SI'));
    expect(oldText).toContain('engine 0.2.0');
    expect(oldText).toContain(
      `This run was rated by engine 0.2.0; the methods below are described as in engine ${ENGINE_VERSION}`,
    );
    expect(JSON.stringify(runReportDoc(a.body, null, 'SI'))).not.toContain('This run was rated by engine');
    const list = await engineer.get(`/api/columns/${plant.columnId}`);
    expect(list.status).toBe(200);
    expect(list.body.runs.map((r: { id: string }) => r.id)).toEqual(expect.arrayContaining([current.id, old.id]));
  });
});
