/**
 * The run list is paged on the server: page and pageSize (at most 200) with the total of all pages, ordered
 * by sortBy. 205 runs of one column: copies of one rated run written straight into the table, each with
 * its own label, time and highest percent of limit.
 */
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { setupApp, signedIn, type TestContext } from '../helpers/app.js';
import { makeInspectionColumn, type InspectionFixture } from './inspection-fixture.js';
import type { RunSummary } from '../../shared/types/runs.js';
import { COLUMN_RUNS_CUT, type ColumnDetail } from '../../shared/contract/columns.js';

const N = 205;
let ctx: TestContext;
let fx: InspectionFixture;
let agent: Awaited<ReturnType<typeof signedIn>>['agent'];

interface PageBody {
  items: RunSummary[];
  total: number;
  page: number;
  pageSize: number;
}
const list = async (query: Record<string, string | number | boolean>): Promise<PageBody> => {
  const res = await agent.get('/api/runs').query({ columnId: fx.columnId, ...query });
  expect(res.status, JSON.stringify(res.body)).toBe(200);
  return res.body as PageBody;
};

beforeAll(async () => {
  ctx = await setupApp();
  fx = await makeInspectionColumn(ctx.ds, null);
  agent = (await signedIn(ctx, 'process-engineer', [fx.siteId])).agent;
  const first = await agent.post('/api/runs').send({ columnId: fx.columnId, loadCaseId: fx.loadCaseId, label: 'Run 000' });
  expect(first.status, JSON.stringify(first.body)).toBe(201);
  const cols = (
    await ctx.ds.query<{ column_name: string }[]>(
      `SELECT column_name FROM information_schema.columns WHERE table_name = 'rating_runs' AND column_name NOT IN ('id', 'label', 'created_at', 'summary')`,
    )
  ).map((c) => c.column_name);
  // run g: label 'Run ggg', g minutes older than the first, highest percent of limit 10 + g
  await ctx.ds.query(
    `INSERT INTO rating_runs (${cols.join(', ')}, label, created_at, summary)
     SELECT ${cols.map((c) => `r.${c}`).join(', ')}, 'Run ' || lpad(g::text, 3, '0'), r.created_at - g * interval '1 minute',
            jsonb_set(r.summary, '{maxPercentOfLimit}', to_jsonb(10 + g))
       FROM rating_runs r, generate_series(1, $2::int) g WHERE r.id = $1`,
    [first.body.id, N - 1],
  );
}, 120_000);
afterAll(() => ctx.close());

describe('GET /runs pages on the server', () => {
  it('more than 200 runs: the first page holds 200, the second the rest, the total counts all of them', async () => {
    const p1 = await list({ pageSize: 200 });
    expect(p1.total).toBe(N);
    expect(p1.items).toHaveLength(200);
    const p2 = await list({ pageSize: 200, page: 2 });
    expect(p2.total).toBe(N);
    expect(p2.items).toHaveLength(N - 200);
    const ids = new Set([...p1.items, ...p2.items].map((r) => r.id));
    expect(ids.size).toBe(N);
    // newest first by default: Run 000 is the newest, Run 204 the oldest
    expect(p1.items[0]!.label).toBe('Run 000');
    expect(p2.items.at(-1)!.label).toBe('Run 204');
  });

  it('a page past the end is empty and still gives the total', async () => {
    const p = await list({ pageSize: 100, page: 4 });
    expect(p.items).toEqual([]);
    expect(p.total).toBe(N);
  });

  it('orders by label or by the highest percent of limit, either way', async () => {
    expect((await list({ pageSize: 3, sortBy: 'label', descending: false })).items.map((r) => r.label)).toEqual([
      'Run 000',
      'Run 001',
      'Run 002',
    ]);
    const worst = (await list({ pageSize: 3, sortBy: 'maxPercentOfLimit', descending: true })).items;
    expect(worst.map((r) => r.label)).toEqual(['Run 204', 'Run 203', 'Run 202']);
    expect(worst.map((r) => r.maxPercentOfLimit)).toEqual([214, 213, 212]);
    const oldest = await list({ pageSize: 5, page: 41, sortBy: 'createdAt', descending: false });
    expect(oldest.items.map((r) => r.label)).toEqual(['Run 004', 'Run 003', 'Run 002', 'Run 001', 'Run 000']);
  });

  it('the column answer carries the newest 200 ratings and says how many there are in all', async () => {
    const res = await agent.get(`/api/columns/${fx.columnId}`);
    expect(res.status, JSON.stringify(res.body)).toBe(200);
    const body = res.body as ColumnDetail;
    expect(body.runs).toHaveLength(COLUMN_RUNS_CUT);
    expect(body.runsTotal).toBe(N);
    expect(body.runs[0]!.label).toBe('Run 000');
    expect(body.runs.at(-1)!.label).toBe('Run 199');
  });

  it('a page size over 200 or an unknown order is refused, naming the field', async () => {
    const big = await agent.get('/api/runs').query({ columnId: fx.columnId, pageSize: 201 });
    expect(big.status).toBe(400);
    expect(big.body.details.map((d: { path: string }) => d.path)).toEqual(['pageSize']);
    const bad = await agent.get('/api/runs').query({ columnId: fx.columnId, sortBy: 'snapshot' });
    expect(bad.status).toBe(400);
    expect(bad.body.details.map((d: { path: string }) => d.path)).toEqual(['sortBy']);
  });
});
