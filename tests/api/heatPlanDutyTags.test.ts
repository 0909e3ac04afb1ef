/** Pump-around duty tags of a load case (issue 17): stored, read back, refused with the field named, site-isolated. */
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { setupApp, signedIn, type TestContext } from '../helpers/app.js';
import { makeHeatPlanColumn, type HeatPlanFixture } from './heatPlan-fixture.js';

let ctx: TestContext;
let fx: HeatPlanFixture;
let other: HeatPlanFixture;
type Agent = Awaited<ReturnType<typeof signedIn>>['agent'];
let engineer: Agent;
let outsider: Agent;
let viewer: Agent;

beforeAll(async () => {
  ctx = await setupApp();
  fx = await makeHeatPlanColumn(ctx.ds);
  other = await makeHeatPlanColumn(ctx.ds);
  engineer = (await signedIn(ctx, 'process-engineer', [fx.siteId])).agent;
  outsider = (await signedIn(ctx, 'process-engineer', [other.siteId])).agent;
  viewer = (await signedIn(ctx, 'viewer', [fx.siteId])).agent;
});
afterAll(() => ctx.close());

const put = (agent: Agent, id: string, body: object) => agent.put(`/api/load-cases/${id}/pump-around-duties`).send(body);
const version = async (id: string) => (await engineer.get(`/api/load-cases/${id}`)).body.version as number;

describe('load-case pump-around duty tags', () => {
  it('are stored, returned on the record and the column list, and cleared with an empty list', async () => {
    const duties = [
      { pumpAroundId: fx.pumpAroundId, duty_kW: 6100 },
      { pumpAroundId: fx.lowerPumpAroundId, duty_kW: 0 },
    ];
    const res = await put(engineer, fx.loadCaseId, { duties, version: await version(fx.loadCaseId) });
    expect(res.status, JSON.stringify(res.body)).toBe(200);
    expect(res.body.pumpAroundDuties).toEqual(duties);
    const list = await engineer.get(`/api/columns/${fx.columnId}/load-cases`);
    expect(list.body.items.find((l: { id: string }) => l.id === fx.loadCaseId).pumpAroundDuties).toEqual(duties);
    const cleared = await put(engineer, fx.loadCaseId, { duties: [], version: res.body.version });
    expect(cleared.status).toBe(200);
    expect(cleared.body.pumpAroundDuties).toEqual([]);
  });

  it("refuse another column's pump-around, a pump-around tagged twice and a negative duty, naming the field", async () => {
    const v = await version(fx.loadCaseId);
    const foreign = await put(engineer, fx.loadCaseId, {
      duties: [{ pumpAroundId: other.pumpAroundId, duty_kW: 10 }],
      version: v,
    });
    expect(foreign.status).toBe(400);
    expect(foreign.body.details).toEqual([{ path: 'duties.0.pumpAroundId', message: 'is not a pump-around of this column' }]);
    const twice = await put(engineer, fx.loadCaseId, {
      duties: [
        { pumpAroundId: fx.pumpAroundId, duty_kW: 10 },
        { pumpAroundId: fx.pumpAroundId, duty_kW: 20 },
      ],
      version: v,
    });
    expect(twice.status).toBe(400);
    expect(twice.body.details[0].path).toBe('duties.1.pumpAroundId');
    const negative = await put(engineer, fx.loadCaseId, { duties: [{ pumpAroundId: fx.pumpAroundId, duty_kW: -5 }], version: v });
    expect(negative.status).toBe(400);
    expect(JSON.stringify(negative.body.details)).toMatch(/duty_kW/);
    expect(await version(fx.loadCaseId)).toBe(v); // nothing written
  });

  it('a stale version answers 409; a viewer may not tag (403); another site sees 404', async () => {
    const v = await version(fx.loadCaseId);
    expect((await put(engineer, fx.loadCaseId, { duties: [], version: v + 7 })).status).toBe(409);
    expect((await put(viewer, fx.loadCaseId, { duties: [], version: v })).status).toBe(403);
    expect((await put(outsider, fx.loadCaseId, { duties: [], version: v })).status).toBe(404);
  });
});
