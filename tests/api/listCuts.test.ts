/**
 * Lists cut at a fixed length say so: the inspections list and a column's field evidence carry the newest
 * items and the total of all of them. 503 of each on one column: copies of one record written straight into
 * the table, each a day older than the one before.
 */
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { setupApp, signedIn, type TestContext } from '../helpers/app.js';
import { makeInspectionColumn, type InspectionFixture } from './inspection-fixture.js';
import { INSPECTION_LIST_CUT } from '../../shared/contract/inspections.js';
import { EVIDENCE_LIST_CUT } from '../../shared/contract/evidence.js';

const N = 503;
let ctx: TestContext;
let fx: InspectionFixture;
type Agent = Awaited<ReturnType<typeof signedIn>>['agent'];
let member: Agent;
let outsider: Agent;

/** copies row $1 of a table N - 1 times, copy g with `changes` (SQL over r and g) in place of its columns */
async function copies(table: string, id: string, changes: Record<string, string>): Promise<void> {
  const cols = (
    await ctx.ds.query<{ column_name: string }[]>(
      `SELECT column_name FROM information_schema.columns WHERE table_name = $1 AND column_name <> 'id'`,
      [table],
    )
  ).map((c) => c.column_name);
  await ctx.ds.query(
    `INSERT INTO ${table} (${cols.join(', ')})
     SELECT ${cols.map((c) => changes[c] ?? `r.${c}`).join(', ')} FROM ${table} r, generate_series(1, $2::int) g WHERE r.id = $1`,
    [id, N - 1],
  );
}

beforeAll(async () => {
  ctx = await setupApp();
  fx = await makeInspectionColumn(ctx.ds, null);
  const inspector = (await signedIn(ctx, 'inspector', [fx.siteId])).agent;
  member = (await signedIn(ctx, 'viewer', [fx.siteId])).agent;
  outsider = (await signedIn(ctx, 'viewer')).agent;
  const i = await inspector
    .post('/api/inspections')
    .send({ columnId: fx.columnId, turnaround: 'TA 000', startDate: '2026-03-02', permitRef: 'CSE-1', gasTestRef: 'GT-1' });
  expect(i.status, JSON.stringify(i.body)).toBe(201);
  await copies('inspections', i.body.id as string, {
    turnaround: `'TA ' || lpad(g::text, 3, '0')`,
    start_date: `r.start_date - g`,
    end_date: `r.end_date - g`,
  });
  const e = await inspector.post(`/api/columns/${fx.columnId}/evidence`).send({
    kind: 'temperature-survey',
    title: 'Survey 000',
    takenOn: '2026-11-21',
    operatingCase: 'Normal',
    data: { instrument: 'contact thermometer on the shell', readings: [{ tray: 3, temperature_C: 121.5 }] },
  });
  expect(e.status, JSON.stringify(e.body)).toBe(201);
  await copies('field_evidence', e.body.id as string, {
    title: `'Survey ' || lpad(g::text, 3, '0')`,
    taken_on: `r.taken_on - g`,
  });
}, 120_000);
afterAll(() => ctx.close());

describe('lists cut at a fixed length give the total', () => {
  it('inspections: the newest 500 by start date, and the total of all the user may see', async () => {
    const res = await member.get('/api/inspections').query({ columnId: fx.columnId });
    expect(res.status, JSON.stringify(res.body)).toBe(200);
    const body = res.body as { items: { turnaround: string }[]; total: number };
    expect(body.total).toBe(N);
    expect(body.items).toHaveLength(INSPECTION_LIST_CUT);
    expect(body.items[0]!.turnaround).toBe('TA 000');
    expect(body.items.at(-1)!.turnaround).toBe(`TA ${String(INSPECTION_LIST_CUT - 1).padStart(3, '0')}`);
    const all = await member.get('/api/inspections');
    expect(all.body.total).toBe(N); // the member's one site holds only this column
    const none = await outsider.get('/api/inspections').query({ columnId: fx.columnId });
    expect(none.status).toBe(200);
    expect(none.body).toEqual({ items: [], total: 0 });
  });

  it('field evidence: the newest 500 by date taken, and the total (of one kind when asked)', async () => {
    const res = await member.get(`/api/columns/${fx.columnId}/evidence`);
    expect(res.status, JSON.stringify(res.body)).toBe(200);
    const body = res.body as { items: { title: string }[]; total: number };
    expect(body.total).toBe(N);
    expect(body.items).toHaveLength(EVIDENCE_LIST_CUT);
    expect(body.items[0]!.title).toBe('Survey 000');
    expect(body.items.at(-1)!.title).toBe(`Survey ${String(EVIDENCE_LIST_CUT - 1).padStart(3, '0')}`);
    const scans = await member.get(`/api/columns/${fx.columnId}/evidence`).query({ kind: 'gamma-scan' });
    expect(scans.body).toEqual({ items: [], total: 0 });
    expect((await outsider.get(`/api/columns/${fx.columnId}/evidence`)).status).toBe(404);
  });
});
