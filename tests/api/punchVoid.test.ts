/**
 * Voiding punch items: a reason is required, who and when are kept, the item stays on the list but no longer
 * counts as open (nor blocks the inspector's signature), an audit row is written, and nothing changes once
 * the inspection is signed or the item is void.
 */
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { inspectionDoc } from '../../server/services/reports/inspectionPdf.js';
import type { InspectionRecord } from '../../shared/types/inspections.js';
import { makeUser, setupApp, signedIn, type TestContext } from '../helpers/app.js';
import { cleanFindings, makeInspectionColumn, noMeasurements } from './inspection-fixture.js';

let ctx: TestContext;
type Agent = Awaited<ReturnType<typeof signedIn>>['agent'];
let inspector: Agent;
let viewer: Agent;
let id: string;
let rec: InspectionRecord;

const item = (n: number) => rec.punch.find((p) => p.itemNo === n)!;
const paths = (res: { body: { details?: { path: string }[] } }) => (res.body.details ?? []).map((d) => d.path);

beforeAll(async () => {
  ctx = await setupApp();
  const eng = await makeUser(ctx.ds, 'process-engineer');
  const fx = await makeInspectionColumn(ctx.ds, eng.id);
  inspector = (await signedIn(ctx, 'inspector', [fx.siteId])).agent;
  viewer = (await signedIn(ctx, 'viewer', [fx.siteId])).agent;
  const c = await inspector
    .post('/api/inspections')
    .send({ columnId: fx.columnId, turnaround: 'TA-void', startDate: '2026-03-02', permitRef: 'CSE-9', gasTestRef: 'GT-9' });
  expect(c.status, JSON.stringify(c.body)).toBe(201);
  id = c.body.id;
  const t = await inspector
    .put(`/api/inspections/${id}/trays/3/1`)
    .send({ findings: cleanFindings, asFound: noMeasurements, asLeft: noMeasurements });
  expect(t.status, JSON.stringify(t.body)).toBe(200);
  for (const finding of ['Weir 3 loose', 'Weir 3 loose (entered twice)'])
    rec = (
      await inspector
        .post(`/api/inspections/${id}/punch`)
        .send({ tray: 3, pass: 1, finding, action: 'Re-bolt weir', priority: 'before-box-up' })
    ).body;
  expect(rec.openPunchItems).toBe(2);
});
afterAll(() => ctx.close());

describe('voiding a punch item', () => {
  it('needs a reason: missing or blank gets a 400 naming reason, and the item stays open', async () => {
    const url = `/api/inspections/${id}/punch/${item(2).id}/void`;
    const missing = await inspector.post(url).send({ version: item(2).version });
    expect(missing.status).toBe(400);
    expect(paths(missing)).toEqual(['reason']);
    const blank = await inspector.post(url).send({ reason: '   ', version: item(2).version });
    expect(blank.status).toBe(400);
    expect(paths(blank)).toEqual(['reason']);
    expect((await inspector.get(`/api/inspections/${id}`)).body.punch[1].status).toBe('open');
  });

  it('a viewer may not void (403); a stale version answers 409', async () => {
    const url = `/api/inspections/${id}/punch/${item(2).id}/void`;
    expect((await viewer.post(url).send({ reason: 'duplicate', version: item(2).version })).status).toBe(403);
    expect((await inspector.post(url).send({ reason: 'duplicate', version: item(2).version + 5 })).status).toBe(409);
  });

  it('records who, when and why; the item is no longer open (record, list) and an audit row is written', async () => {
    const res = await inspector
      .post(`/api/inspections/${id}/punch/${item(2).id}/void`)
      .send({ reason: ' Duplicate of item 1 ', version: item(2).version });
    expect(res.status, JSON.stringify(res.body)).toBe(200);
    rec = res.body;
    expect(item(2).status).toBe('void');
    expect(item(2).voidReason).toBe('Duplicate of item 1');
    expect(item(2).voidedByName).toMatch(/inspector/);
    expect(Date.now() - Date.parse(item(2).voidedAt!)).toBeLessThan(60_000);
    expect(item(2).closedAt).toBeNull();
    expect(rec.openPunchItems).toBe(1);
    expect(rec.punch).toHaveLength(2); // kept on the list
    const list = (await inspector.get(`/api/inspections`)).body.items as { id: string; openPunchItems: number }[];
    expect(list.find((r) => r.id === id)!.openPunchItems).toBe(1);
    const [a] = await ctx.ds.query<{ action: string; changes: { reason: string; was: string } }[]>(
      `SELECT action, changes FROM audit_log WHERE entity = 'punch-item' AND entity_id = $1 AND action = 'void'`,
      [item(2).id],
    );
    expect(a?.changes).toEqual({ reason: 'Duplicate of item 1', was: 'open' });
  });

  it('a voided item can no longer be closed, reopened, edited or voided again (409)', async () => {
    const v = item(2).version;
    const patch = await inspector.patch(`/api/inspections/${id}/punch/${item(2).id}`).send({ status: 'closed', version: v });
    expect(patch.status).toBe(409);
    expect(patch.body.error).toMatch(/voided/);
    expect((await inspector.patch(`/api/inspections/${id}/punch/${item(2).id}`).send({ owner: 'x', version: v })).status).toBe(
      409,
    );
    expect(
      (await inspector.post(`/api/inspections/${id}/punch/${item(2).id}/void`).send({ reason: 'again', version: v })).status,
    ).toBe(409);
    // PATCH cannot set the void status itself (the reason would be missing)
    const direct = await inspector
      .patch(`/api/inspections/${id}/punch/${item(1).id}`)
      .send({ status: 'void', version: item(1).version });
    expect(direct.status).toBe(400);
    expect(paths(direct)).toEqual(['status']);
  });

  it('a voided before-box-up item does not block the signature; after signing nothing can be voided', async () => {
    const blocked = await inspector.post(`/api/inspections/${id}/sign/inspector`).send({ version: rec.version });
    expect(blocked.status).toBe(409);
    expect(blocked.body.error).toMatch(/#1\b/);
    expect(blocked.body.error).not.toMatch(/#2\b/);
    rec = (
      await inspector.patch(`/api/inspections/${id}/punch/${item(1).id}`).send({ status: 'closed', version: item(1).version })
    ).body;
    const s = await inspector.post(`/api/inspections/${id}/sign/inspector`).send({ version: rec.version });
    expect(s.status, JSON.stringify(s.body)).toBe(200);
    rec = s.body;
    const late = await inspector
      .post(`/api/inspections/${id}/punch/${item(1).id}/void`)
      .send({ reason: 'too late', version: item(1).version });
    expect(late.status).toBe(409);
    expect(late.body.error).toMatch(/read-only/);
  });

  it('the PDF strikes the voided item through and states who voided it, when and why', () => {
    const doc = JSON.stringify(inspectionDoc(rec, []).content);
    expect(doc).toMatch(/"text":"Weir 3 loose \(entered twice\)","decoration":"lineThrough"/);
    expect(doc).toMatch(/voided by [^"]*inspector[^"]*: Duplicate of item 1/);
    expect(doc).toMatch(/Voided items are struck through and do not count as open/);
    expect(doc).not.toMatch(/"text":"Weir 3 loose","decoration"/);
  });
});
