/**
 * Run creation reuses the column, section and load-case rows it read for earlier runs (server/services/
 * runsStore.ts) and the session user of earlier requests (services/sessionCache.ts). Every run must still
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
