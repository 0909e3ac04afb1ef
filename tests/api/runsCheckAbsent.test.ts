/**
 * A run stored before a check existed reads back without that check (stored runs decode by name): the run
 * page's API, the export, the comparison and the printed report still answer, the check left empty.
 * Simulated by storing a run whose trays lack downcomerSeal, as a run rated before it was added would.
 */
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { encodeResults } from '../../server/db/codec/index.js';
import { RatingRun } from '../../server/db/entities/RatingRun.js';
import { setupApp, type TestContext } from '../helpers/app.js';
import { makePlant, twoRuns, type Plant } from './columnsFixture.js';

let ctx: TestContext;
let plant: Plant;

beforeAll(async () => {
  ctx = await setupApp();
  plant = await makePlant(ctx.ds);
});
afterAll(() => ctx.close());

describe('a run stored before a check existed', () => {
  it('opens, exports, compares and prints with that check absent', async () => {
    const { engineer, current, other: older } = await twoRuns(ctx, plant, 'Older');
    const run = await ctx.ds.getRepository(RatingRun).findOneByOrFail({ id: older.id });
    for (const t of run.results.trays) delete t.checks.downcomerSeal;
    await ctx.ds.query('UPDATE rating_runs SET results = $1 WHERE id = $2', [encodeResults(run.results), older.id]);

    const got = await engineer.get(`/api/runs/${older.id}`);
    expect(got.status).toBe(200);
    expect(got.body.results.trays[0].checks.downcomerSeal).toBeUndefined();
    expect(got.body.results.trays[0].checks.jetFlood).toEqual(run.results.trays[0]!.checks.jetFlood);

    const csv = await engineer.get(`/api/runs/${older.id}/export?format=csv`);
    expect(csv.status).toBe(200);
    const [head, firstRow] = csv.text.split(/\r?\n/).filter((l) => /^(Tray|1),/.test(l));
    const seal = head!.split(',').findIndex((h) => h.startsWith('Downcomer seal (')); // the product's label, not the id
    expect(seal).toBeGreaterThan(0);
    expect(firstRow!.split(',').slice(seal, seal + 4)).toEqual(['', '', '', '']);

    const cmp = await engineer.get(`/api/runs/compare?a=${current.id}&b=${older.id}`);
    expect(cmp.status).toBe(200);
    expect(cmp.body.trays[0].checks.downcomerSeal.b).toBeNull();
    expect(cmp.body.trays[0].checks.downcomerSeal.delta).toBeNull();
    expect(cmp.body.trays[0].checks.jetFlood.delta).toBe(0);

    const pdf = await engineer.get(`/api/runs/${older.id}/report.pdf`);
    expect(pdf.status).toBe(200);
    expect(pdf.headers['content-type']).toMatch(/application\/pdf/);
  });
});
