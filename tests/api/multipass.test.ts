import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { setupApp, signedIn, type TestContext } from '../helpers/app.js';
import { loads, makePlant, section, type Plant } from './columnsFixture.js';

/** Sections with a pass layout (invented two-pass geometry on the demo's 5.5 m column) through the API. */
let ctx: TestContext;
let plant: Plant;
beforeAll(async () => {
  ctx = await setupApp();
  plant = await makePlant(ctx.ds);
});
afterAll(() => ctx.close());

const withLayout = (liquidSplit?: number[]) => {
  const s = section(1, 8, 'Two-pass top');
  s.geometry.passLayout = {
    sideDowncomerWidth_mm: 880,
    centreDowncomerWidth_mm: 520,
    oddTrayOutlets: 'side',
    ...(liquidSplit ? { liquidSplit } : {}),
  };
  return s;
};

describe('multipass sections', () => {
  it('refuses a layout that does not fit, naming the field, and stores nothing', async () => {
    const { agent } = await signedIn(ctx, 'internals-specialist', [plant.siteId]);
    const bad = await agent.post(`/api/columns/${plant.columnId}/sections`).send(withLayout([0.5, 0.6]));
    expect(bad.status).toBe(400);
    expect(bad.body.details).toContainEqual({
      path: 'geometry.passLayout.liquidSplit',
      message: 'liquidSplit: fractions must add up to 1 (they add up to 1.1)',
    });
    const unknown = withLayout();
    (unknown.geometry.passLayout as unknown as Record<string, unknown>).weirLengths = [1, 2];
    expect((await agent.post(`/api/columns/${plant.columnId}/sections`).send(unknown)).status).toBe(400);
    expect((await agent.get(`/api/columns/${plant.columnId}`)).body.sections).toEqual([]);
  });

  it('stores the layout and rates each pass: odd trays on the side weirs, even trays on the centre weirs', async () => {
    const { agent } = await signedIn(ctx, 'internals-specialist', [plant.siteId]);
    const created = await agent.post(`/api/columns/${plant.columnId}/sections`).send(withLayout([0.46, 0.54]));
    expect(created.status).toBe(201);
    expect(created.body.geometry.passLayout).toEqual({
      sideDowncomerWidth_mm: 880,
      centreDowncomerWidth_mm: 520,
      oddTrayOutlets: 'side',
      liquidSplit: [0.46, 0.54],
    });
    const lc = (
      await agent
        .post(`/api/columns/${plant.columnId}/load-cases`)
        .send({ name: 'Normal', basis: 'normal', source: 'typed', loads: loads(1, 8) })
    ).body.id;
    const res = await agent.post('/api/runs').send({ columnId: plant.columnId, loadCaseId: lc });
    expect(res.status).toBe(201);
    const run = (await agent.get(`/api/runs/${res.body.id}`)).body;
    const [odd, even] = [
      run.results.trays.find((t: { tray: number }) => t.tray === 1),
      run.results.trays.find((t: { tray: number }) => t.tray === 2),
    ];
    expect(odd.details.pass1OutletDowncomer).toBe(0); // side
    expect(even.details.pass1OutletDowncomer).toBe(1); // centre
    expect(odd.details.pass2LiquidFraction).toBe(0.54);
    // 54 % of the liquid on pass 2 controls the tray's weir loading
    expect(odd.checks.weirLoading.value).toBe(odd.details.pass2WeirLoading_m3_h_m);
    expect(even.details.pass1WeirLength_m).toBeGreaterThan(odd.details.pass1WeirLength_m);
    expect(run.results.engineVersion).toBe(run.engineVersion);
  });
});
