/**
 * Run creation reuses the column, section and load-case rows it read for earlier runs (server/services/runs/
 * runsStore.ts) and the session user of earlier requests (services/auth/sessionCache.ts). Every run must still
 * be rated on the rows as they are when it is stored, and access changes must apply at once.
 */
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { setupApp, signedIn, type TestContext } from '../helpers/app.js';
import { loads, makePlant, section, type Plant } from './columnsFixture.js';

let ctx: TestContext;
let plant: Plant;
type Agent = Awaited<ReturnType<typeof signedIn>>['agent'];
let engineer: Agent;
let engineerId: string;
let specialist: Agent;
let admin: Agent;
let lc: string;
let top: { id: string; version: number };
let middle: { id: string; version: number };

beforeAll(async () => {
  ctx = await setupApp();
  plant = await makePlant(ctx.ds);
  specialist = (await signedIn(ctx, 'internals-specialist', [plant.siteId])).agent;
  const e = await signedIn(ctx, 'process-engineer', [plant.siteId]);
  engineer = e.agent;
  engineerId = e.user.id;
  admin = (await signedIn(ctx, 'admin')).agent;
  top = (await specialist.post(`/api/columns/${plant.columnId}/sections`).send(section(1, 8, 'Top'))).body;
  middle = (await specialist.post(`/api/columns/${plant.columnId}/sections`).send(section(9, 16, 'Middle'))).body;
  lc = (
    await engineer
      .post(`/api/columns/${plant.columnId}/load-cases`)
      .send({ name: 'Fresh check', basis: 'normal', source: 'typed', loads: loads(1, 16) })
  ).body.id;
});
afterAll(() => ctx.close());

async function run(agent: Agent = engineer) {
  const res = await agent.post('/api/runs').send({ columnId: plant.columnId, loadCaseId: lc, label: 'fresh' });
  return { status: res.status, record: res.status === 201 ? (await agent.get(`/api/runs/${res.body.id}`)).body : res.body };
}

describe('run creation after edits', () => {
  it('rates the geometry as edited since the previous run', async () => {
    const first = await run();
    expect(first.status).toBe(201);
    expect(first.record.snapshot.sections[0].geometry.weirHeight_mm).toBe(section(1, 8).geometry.weirHeight_mm);

    const edited = section(1, 8, 'Top');
    edited.geometry.weirHeight_mm = 38;
    const put = await specialist.put(`/api/sections/${top.id}`).send({ ...edited, version: top.version });
    expect(put.status).toBe(200);
    top = put.body;

    const second = await run();
    expect(second.status).toBe(201);
    expect(second.record.snapshot.sections[0].geometry.weirHeight_mm).toBe(38);
    expect(second.record.results.trays[0].details.crestOverWeir_mm).toBeCloseTo(
      first.record.results.trays[0].details.crestOverWeir_mm,
      6,
    );
    expect(second.record.results.trays[0].details.clearLiquidHeight_mm).not.toBeCloseTo(
      first.record.results.trays[0].details.clearLiquidHeight_mm,
      3,
    );
  });

  it('rates the loads as saved since the previous run, and drops a deleted section', async () => {
    const current = (await engineer.get(`/api/load-cases/${lc}`)).body;
    const heavier = loads(1, 16, 1.2);
    const put = await engineer.put(`/api/load-cases/${lc}/loads`).send({ loads: heavier, version: current.version });
    expect(put.status).toBe(200);
    const withLoads = await run();
    expect(withLoads.record.snapshot.loads[0].vapourMassFlow_kg_h).toBe(heavier[0]!.vapourMassFlow_kg_h);
    expect(withLoads.record.snapshot.loadCase.version).toBe(put.body.version);

    const del = await specialist.delete(`/api/sections/${middle.id}?version=${middle.version}`);
    expect(del.status).toBe(204);
    const withoutMiddle = await run();
    expect(withoutMiddle.status).toBe(201);
    expect(withoutMiddle.record.snapshot.sections.map((s: { name: string }) => s.name)).toEqual(['Top']);
    expect(withoutMiddle.record.results.uncoveredTrays).toEqual([9, 10, 11, 12, 13, 14, 15, 16]);
  });

  it('refuses a user who lost access to the site (404) and a deactivated user (401) at once', async () => {
    expect((await run()).status).toBe(201);
    const sites = await admin.put(`/api/users/${engineerId}/sites`).send({ siteIds: [] });
    expect(sites.status).toBe(200);
    expect((await run()).status).toBe(404);

    await admin.put(`/api/users/${engineerId}/sites`).send({ siteIds: [plant.siteId] });
    expect((await run()).status).toBe(201);
    const users = (await admin.get('/api/users')).body.items as { id: string; version: number }[];
    const me = users.find((u) => u.id === engineerId)!;
    const off = await admin.patch(`/api/users/${engineerId}`).send({ active: false, version: me.version });
    expect(off.status).toBe(200);
    expect((await run()).status).toBe(401);
  });
});

describe('runs created at the same moment', () => {
  it('are each stored once with their own audit row, when they share one statement (db/writeBatcher.ts)', async () => {
    const e = await signedIn(ctx, 'process-engineer', [plant.siteId]);
    const labels = Array.from({ length: 12 }, (_, i) => `together ${i}`);
    const answers = await Promise.all(
      labels.map((label) => e.agent.post('/api/runs').send({ columnId: plant.columnId, loadCaseId: lc, label })),
    );
    expect(answers.map((a) => a.status)).toEqual(labels.map(() => 201));
    const ids = answers.map((a) => a.body.id as string);
    expect(new Set(ids).size).toBe(labels.length);
    expect(answers.map((a) => a.body.label)).toEqual(labels);
    const stored = await ctx.ds.query<
      {
        id: string;
        label: string;
      }[]
    >(`SELECT id, label FROM rating_runs WHERE id = ANY($1::uuid[])`, [ids]);
    expect(new Map(stored.map((r) => [r.id, r.label]))).toEqual(new Map(ids.map((id, i) => [id, labels[i]])));
    const audits = await ctx.ds.query<{ entity_id: string; user_id: string }[]>(
      `SELECT entity_id, user_id FROM audit_log WHERE entity = 'rating-run' AND action = 'create' AND entity_id = ANY($1::text[])`,
      [ids],
    );
    expect(audits.map((a) => a.entity_id).sort()).toEqual([...ids].sort());
    expect(new Set(audits.map((a) => a.user_id))).toEqual(new Set([e.user.id]));
    const one = (await e.agent.get(`/api/runs/${ids[5]}`)).body;
    expect(one.results.trays.length).toBeGreaterThan(0);
    expect(one.label).toBe(labels[5]);
  });

  it('a run refused by its guard in a shared statement does not stop the others', async () => {
    const post = (agent: Agent, label: string) =>
      agent.post('/api/runs').send({ columnId: plant.columnId, loadCaseId: lc, label });
    const leaving = await signedIn(ctx, 'process-engineer', [plant.siteId]);
    const staying = (await signedIn(ctx, 'process-engineer', [plant.siteId])).agent;
    expect((await post(leaving.agent, 'before')).status).toBe(201); // its read of the inputs is now cached
    const sites = await admin.put(`/api/users/${leaving.user.id}/sites`).send({ siteIds: [] });
    expect(sites.status).toBe(200);
    // the leaving user's run reaches the insert on the cached read, fails its guard there and is then refused
    const answers = await Promise.all(['s1', 'l1', 's2', 's3'].map((l) => post(l[0] === 'l' ? leaving.agent : staying, l)));
    expect(answers.map((a) => a.status)).toEqual([201, 404, 201, 201]);
    const labels = await ctx.ds.query<{ label: string }[]>(
      `SELECT label FROM rating_runs WHERE column_id = $1 AND label = ANY($2::text[])`,
      [plant.columnId, ['s1', 'l1', 's2', 's3']],
    );
    expect(labels.map((r) => r.label).sort()).toEqual(['s1', 's2', 's3']);
  });
});
