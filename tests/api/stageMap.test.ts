import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { setupApp, signedIn, type TestContext } from '../helpers/app.js';
import { loads, makePlant, type Plant } from './columnsFixture.js';

/** Stage-to-tray maps stored with a load case (20-tray invented column); the rules are shared/stageMap.ts. */
let ctx: TestContext;
let plant: Plant;
type Agent = Awaited<ReturnType<typeof signedIn>>['agent'];
let agent: Agent;
beforeAll(async () => {
  ctx = await setupApp();
  plant = await makePlant(ctx.ds, 20);
  agent = (await signedIn(ctx, 'process-engineer', [plant.siteId])).agent;
});
afterAll(() => ctx.close());

const create = (name: string, stageMap?: unknown) =>
  agent
    .post(`/api/columns/${plant.columnId}/load-cases`)
    .send({ name, basis: 'other', source: 'typed', loads: loads(1, 6), ...(stageMap !== undefined ? { stageMap } : {}) });

describe('stage-to-tray map on a load case', () => {
  it('refuses a stage listed twice, naming the row', async () => {
    const res = await create('Twice', [
      { stage: 4, firstTray: 1, lastTray: 1 },
      { stage: 5, firstTray: 2, lastTray: 2 },
      { stage: 4, firstTray: 3, lastTray: 3 },
    ]);
    expect(res.status).toBe(400);
    expect(res.body.details).toEqual([{ path: 'stageMap.2.stage', message: 'stage 4 appears twice (also in row 1)' }]);
  });

  it('refuses an overlap with a long range that is not the neighbour in tray order', async () => {
    const res = await create('Overlap', [
      { stage: 1, firstTray: 1, lastTray: 10 },
      { stage: 2, firstTray: 2, lastTray: 3 },
      { stage: 3, firstTray: 5, lastTray: 6 },
    ]);
    expect(res.status).toBe(400);
    expect(res.body.details).toContainEqual({
      path: 'stageMap.2.firstTray',
      message: 'stage 3 (trays 5–6) overlaps stage 1 (trays 1–10)',
    });
  });

  it('stores a map with the loads, replaces it, keeps it when the grid alone is saved, and clears it with null', async () => {
    const c = await create('Mapped');
    expect(c.status).toBe(201);
    expect(c.body.stageMap).toBeNull();
    const map = [
      { stage: 2, firstTray: 1, lastTray: 2 },
      { stage: 3, firstTray: 3, lastTray: 6 },
    ];
    const put = await agent.put(`/api/load-cases/${c.body.id}/loads`).send({ loads: c.body.loads, stageMap: map, version: 1 });
    expect(put.status).toBe(200);
    expect(put.body).toMatchObject({ version: 2, stageMap: map });

    const grid = structuredClone(put.body.loads) as { liquidMassFlow_kg_h: number }[];
    grid[0]!.liquidMassFlow_kg_h += 100;
    const gridOnly = await agent.put(`/api/load-cases/${c.body.id}/loads`).send({ loads: grid, version: 2 });
    expect(gridOnly.body).toMatchObject({ version: 3, stageMap: map });

    const bad = await agent
      .put(`/api/load-cases/${c.body.id}/loads`)
      .send({ loads: grid, stageMap: [{ stage: 1, firstTray: 19, lastTray: 21 }], version: 3 });
    expect(bad.status).toBe(400);
    expect(bad.body.details).toEqual([
      { path: 'stageMap.0.lastTray', message: 'stage 1: tray 21 is outside the column (trays 1–20)' },
    ]);

    const cleared = await agent.put(`/api/load-cases/${c.body.id}/loads`).send({ loads: grid, stageMap: null, version: 3 });
    expect(cleared.body).toMatchObject({ version: 4, stageMap: null });
  });
});
