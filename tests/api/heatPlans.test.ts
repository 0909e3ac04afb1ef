/**
 * Stored heat-recovery plans (issue 17): built from the stored column, read back with the map and one grid
 * point's trays, reviewed with separation of duties, hidden from other sites, bad input named by field.
 */
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { planReportDoc } from '../../server/services/reports/heatPlanReportFiles.js';
import { setupApp, signedIn, type TestContext } from '../helpers/app.js';
import { EXAMPLE } from './study-fixture.js';
import { addUpperPumpAround, makeHeatPlanColumn, SIM_LATENT_HEAT, UPPER_PA, type HeatPlanFixture } from './heatPlan-fixture.js';
import type { HeatPlanRecord, SlimPlanPoint } from '../../shared/types/heatPlans.js';

let ctx: TestContext;
let fx: HeatPlanFixture;
let other: HeatPlanFixture;
type Agent = Awaited<ReturnType<typeof signedIn>>['agent'];
let author: Agent;
let reviewer: Agent;
let outsider: Agent;
let viewer: Agent;

beforeAll(async () => {
  ctx = await setupApp();
  fx = await makeHeatPlanColumn(ctx.ds);
  other = await makeHeatPlanColumn(ctx.ds);
  author = (await signedIn(ctx, 'process-engineer', [fx.siteId])).agent;
  reviewer = (await signedIn(ctx, 'internals-specialist', [fx.siteId])).agent;
  outsider = (await signedIn(ctx, 'internals-specialist', [other.siteId])).agent;
  viewer = (await signedIn(ctx, 'viewer', [fx.siteId])).agent;
});
afterAll(() => ctx.close());

/** invented plan inputs on the test column: 6 × 6 grid around both base duties */
function planBody(f: HeatPlanFixture): Record<string, unknown> {
  const top = EXAMPLE.pumpAround;
  return {
    label: 'Split between the two pump-arounds',
    loadCaseId: f.loadCaseId,
    pumpArounds: [
      {
        pumpAroundId: f.pumpAroundId,
        sweep: { fromDuty_kW: 3000, toDuty_kW: 9000, steps: 5 },
        liquidHeatCapacity_kJ_kgK: top.liquidHeatCapacity_kJ_kgK,
        returnTemperatureDrop_K: top.returnTemperatureDrop_K,
      },
      {
        pumpAroundId: f.lowerPumpAroundId,
        sweep: { fromDuty_kW: 2000, toDuty_kW: 8000, steps: 5 },
        liquidHeatCapacity_kJ_kgK: 2.6,
        returnTemperatureDrop_K: 60,
        drawTemperature_C: 221,
      },
    ],
    latentHeat_kJ_kg: EXAMPLE.latentHeat_kJ_kg,
    usefulAboveTemperature_C: 150,
    baseCondenserDuty_kW: 30000,
    methods: EXAMPLE.methods,
  };
}
const create = (agent: Agent, body: Record<string, unknown>, columnId = fx.columnId) =>
  agent.post(`/api/columns/${columnId}/heat-plans`).send(body);
const paths = (res: { body: { details?: { path: string }[] } }) => (res.body.details ?? []).map((d) => d.path);

describe('a stored heat-recovery plan', () => {
  let plan: HeatPlanRecord;

  it('is rated from the stored column and read back with its map, boundary and suggestion', async () => {
    const res = await create(author, planBody(fx));
    expect(res.status, JSON.stringify(res.body).slice(0, 500)).toBe(201);
    plan = res.body;
    expect(plan.status).toBe('draft');
    expect(plan.pumpAroundNames).toEqual([EXAMPLE.pumpAround.name, 'Lower PA (invented)']);
    const r = plan.result;
    expect(r.axes.map((a) => a.length)).toEqual([6, 6]);
    expect(r.grid).toHaveLength(36);
    expect(r.axes[0]![0]).toBe(3000);
    expect(r.axes[1]![5]).toBe(8000);
    // grid order: the first pump-around's duty varies slowest
    expect(r.grid[7]!.duties_kW).toEqual([r.axes[0]![1], r.axes[1]![1]]);
    // the condenser takes what the pump-arounds no longer take, point by point
    for (const p of r.grid) expect(p.condenserDutyChange_kW).toBeCloseTo(-(p.duties_kW[0]! - 5200) - (p.duties_kW[1]! - 4000), 6);
    // draw temperature of the top pump-around taken from the base case's draw tray (tray 9: 180 °C)
    expect(plan.inputs.input.pumpArounds[0]!.drawTemperature_C).toBe(180);
    expect(plan.inputs.input.pumpArounds[1]!.drawTemperature_C).toBe(221);
    // the current operation is rated at its own duties, between the grid nodes (3000, 4200, 5400 … kW)
    const base = r.keyPoints.find((k) => k.kind === 'base')!.point;
    expect(base.duties_kW).toEqual([5200, 4000]);
    expect(base.trays.find((t) => t.tray === 16)!.vapourMassFlow_kg_h).toBeCloseTo(
      EXAMPLE.trays.find((t) => t.tray === 16)!.vapourMassFlow_kg_h,
      6,
    );
    if (r.suggestion) expect(r.keyPoints.find((k) => k.kind === 'suggestion')!.point.duties_kW).toEqual(r.suggestion.duties_kW);
    const listed = await author.get(`/api/columns/${fx.columnId}/heat-plans`);
    expect(listed.body.map((p: { id: string }) => p.id)).toContain(plan.id);
  });

  it('serves one grid point with every tray: traffic and percent of limit per check', async () => {
    const res = await author.get(`/api/heat-plans/${plan.id}/points/7`);
    expect(res.status).toBe(200);
    const p = res.body as SlimPlanPoint;
    expect(p.duties_kW).toEqual(plan.result.grid[7]!.duties_kW);
    expect(p.trays.map((t) => t.tray)).toEqual(EXAMPLE.trays.map((t) => t.tray));
    expect(p.trays[0]!.percent).toHaveLength(plan.result.checkNames.length);
    // the worst percent of the summary is the highest applicable percent over the trays
    const worst = Math.max(...p.trays.flatMap((t) => t.percent.filter((_, i) => t.status[i] !== 'na')));
    expect(plan.result.grid[7]!.worstPercent).toBeCloseTo(worst, 6);
    // trays below the lower draw keep their base traffic
    const below = p.trays.find((t) => t.tray === 16)!;
    expect(below.vapourMassFlow_kg_h).toBeCloseTo(EXAMPLE.trays.find((t) => t.tray === 16)!.vapourMassFlow_kg_h, 6);
    const out = await author.get(`/api/heat-plans/${plan.id}/points/36`);
    expect(out.status).toBe(400);
    expect(out.body.details).toEqual([{ path: 'index', message: "is 36; the plan's grid has points 0 to 35" }]);
  });

  it('is reviewed by someone other than its author; approved is read-only', async () => {
    expect((await reviewer.post(`/api/heat-plans/${plan.id}/submit`).send({ version: plan.version })).status).toBe(403);
    const sub = await author
      .post(`/api/heat-plans/${plan.id}/submit`)
      .send({ version: plan.version, comment: 'Please check the lower zone' });
    expect(sub.status).toBe(200);
    expect(sub.body.status).toBe('submitted');
    expect((await author.post(`/api/heat-plans/${plan.id}/approve`).send({ version: sub.body.version })).status).toBe(403);
    const noComment = await reviewer.post(`/api/heat-plans/${plan.id}/return`).send({ version: sub.body.version });
    expect(noComment.status).toBe(400);
    expect(paths(noComment)).toEqual(['comment']);
    const stale = await reviewer.post(`/api/heat-plans/${plan.id}/approve`).send({ version: sub.body.version - 1 });
    expect(stale.status).toBe(409);
    const ok = await reviewer.post(`/api/heat-plans/${plan.id}/approve`).send({ version: sub.body.version });
    expect(ok.status).toBe(200);
    expect(ok.body.status).toBe('approved');
    expect(ok.body.reviews.map((r: { action: string }) => r.action)).toEqual(['submit', 'approve']);
    expect(
      (await reviewer.post(`/api/heat-plans/${plan.id}/return`).send({ version: ok.body.version, comment: 'x' })).status,
    ).toBe(409);
  });

  it("is hidden from another site's users (404) and a viewer cannot create one (403)", async () => {
    expect((await outsider.get(`/api/heat-plans/${plan.id}`)).status).toBe(404);
    expect((await outsider.get(`/api/heat-plans/${plan.id}/points/0`)).status).toBe(404);
    expect((await outsider.get(`/api/columns/${fx.columnId}/heat-plans`)).status).toBe(404);
    expect((await viewer.get(`/api/heat-plans/${plan.id}`)).status).toBe(200);
    expect((await create(viewer, planBody(fx))).status).toBe(403);
    expect((await create(outsider, planBody(fx))).status).toBe(404);
  });
});

describe('a plan of three pump-arounds', () => {
  it('rates every duty triple with the identities: condenser change = −(sum of duty changes), trays below the lowest draw unchanged', async () => {
    const upper = await addUpperPumpAround(ctx.ds, fx.columnId);
    const body = planBody(fx) as { pumpArounds: Record<string, unknown>[] };
    body.pumpArounds[0]!.sweep = { fromDuty_kW: 4000, toDuty_kW: 6000, steps: 2 };
    body.pumpArounds[1]!.sweep = { fromDuty_kW: 3000, toDuty_kW: 5000, steps: 2 };
    // the third with a fixed circulation instead of a fixed return temperature drop
    body.pumpArounds.push({
      pumpAroundId: upper,
      sweep: { fromDuty_kW: 1000, toDuty_kW: 2000, steps: 2 },
      liquidHeatCapacity_kJ_kgK: 2.5,
      circulation_kg_h: 40000,
      drawTemperature_C: 150,
    });
    const res = await create(author, body);
    expect(res.status, JSON.stringify(res.body).slice(0, 500)).toBe(201);
    const plan = res.body as HeatPlanRecord;
    const r = plan.result;
    expect(plan.pumpAroundNames).toEqual([EXAMPLE.pumpAround.name, 'Lower PA (invented)', UPPER_PA.name]);
    expect(r.axes.map((a) => a.length)).toEqual([3, 3, 3]);
    expect(r.grid).toHaveLength(27);
    expect(r.grid[1]!.duties_kW).toEqual([4000, 3000, 1500]);
    expect(r.grid[3]!.duties_kW).toEqual([4000, 4000, 1000]);
    const base = [EXAMPLE.pumpAround.baseDuty_kW, 4000, UPPER_PA.baseDuty_kW];
    for (const g of r.grid) {
      const sum = g.duties_kW.reduce((s, q, i) => s + q - base[i]!, 0);
      expect(g.condenserDutyChange_kW).toBeCloseTo(-sum, 6);
      expect(g.heat.map((h) => h.name)).toEqual(plan.pumpAroundNames);
    }
    // the fixed circulation: ΔT = Q·3600/(m c_p) at each duty
    const heat = r.grid[2]!.heat[2]!;
    expect(heat.circulation_kg_h).toBe(40000);
    expect(heat.drawTemperature_C - heat.returnTemperature_C).toBeCloseTo((2000 * 3600) / (40000 * 2.5), 9);
    // below the lowest draw (tray 14) trays 15 and 16 keep the base case's traffic at every point
    for (let i = 0; i < r.grid.length; i++) {
      const p = (await author.get(`/api/heat-plans/${plan.id}/points/${i}`)).body as SlimPlanPoint;
      for (const tray of [15, 16]) {
        const t = p.trays.find((x) => x.tray === tray)!;
        const b = EXAMPLE.trays.find((x) => x.tray === tray)!;
        expect(t.vapourMassFlow_kg_h).toBe(b.vapourMassFlow_kg_h);
        expect(t.liquidMassFlow_kg_h).toBe(b.liquidMassFlow_kg_h);
      }
    }
    for (const b of r.boundary) expect(b.duties_kW).toHaveLength(3);
    if (r.suggestion) expect(r.suggestion.duties_kW).toHaveLength(3);
    // the report names all three (its map shows the first two)
    expect(readerText(planReportDoc(plan, 'SI').content).join('\n')).toContain(`Pump-around 3`);
    await ctx.ds.query(`DELETE FROM heat_plans WHERE id = $1`, [plan.id]);
    await ctx.ds.query(`DELETE FROM pump_arounds WHERE id = $1`, [upper]);
  });
});

describe('a plan calibrated against simulation cases', () => {
  it('fits the latent heat the cases were made with, rates on the calibrated model and states the fit quality', async () => {
    const res = await create(author, { ...planBody(fx), simulationCaseIds: fx.simulationCaseIds });
    expect(res.status, JSON.stringify(res.body).slice(0, 400)).toBe(201);
    const plan = res.body as HeatPlanRecord;
    const cal = plan.result.calibration!;
    expect(cal.cases.map((c) => c.loadCaseId)).toEqual(fx.simulationCaseIds);
    expect(plan.inputs.source.simulationCases.map((c) => c.name)).toEqual(['Simulation case 1', 'Simulation case 2']);
    // the synthetic cases were made with a latent heat 10 % above the plan's: the fit finds it again
    for (const f of cal.fitted) expect(f.value / SIM_LATENT_HEAT).toBeCloseTo(1, 3);
    for (const pa of plan.inputs.input.pumpArounds) expect(pa.latentHeat_kJ_kg! / SIM_LATENT_HEAT).toBeCloseTo(1, 3);
    expect(cal.rmsRelative).toBeLessThan(1e-3);
    expect(cal.summary).toMatch(/^Fitted to 2 simulation cases/);
    // model against simulation, tray by tray: the same traffic once fitted
    const t = cal.cases[0]!.trays.find((x) => x.tray === 8)!;
    expect(t.modelVapour_kg_h).toBeCloseTo(t.simVapour_kg_h, 0);
    expect(readerText(planReportDoc(plan, 'SI').content).join('\n')).toContain(cal.summary);
  });

  it('rates grid points at a case on its loads and between two cases on interpolated loads, and says so everywhere', async () => {
    // grid nodes on both cases (fixture: 4160/5200 kW and 6240/3200 kW) and on the midpoint between them
    const body = planBody(fx) as { pumpArounds: { sweep: unknown }[] };
    body.pumpArounds[0]!.sweep = { fromDuty_kW: 4160, toDuty_kW: 6240, steps: 2 };
    body.pumpArounds[1]!.sweep = { fromDuty_kW: 3200, toDuty_kW: 5200, steps: 2 };
    const res = await create(author, { ...body, simulationCaseIds: fx.simulationCaseIds });
    expect(res.status, JSON.stringify(res.body).slice(0, 400)).toBe(201);
    const plan = res.body as HeatPlanRecord;
    const g = plan.result.grid;
    const index = (duties: number[]) => g.findIndex((p) => p.duties_kW.every((d, i) => Math.abs(d - duties[i]!) < 1e-6));
    expect(g[index([4160, 5200])]!.loads).toEqual({ source: 'case', cases: ['Simulation case 1'], fraction: null });
    expect(g[index([6240, 3200])]!.loads).toEqual({ source: 'case', cases: ['Simulation case 2'], fraction: null });
    const mid = g[index([5200, 4200])]!.loads!;
    expect(mid.source).toBe('interpolated');
    expect(mid.cases).toEqual(['Simulation case 1', 'Simulation case 2']);
    expect(mid.fraction).toBeCloseTo(0.5, 9);
    expect(g[index([4160, 3200])]!.loads?.source).toBe('model');
    // the point's trays are the case's stored loads (vapour as stored; zone liquid plus the circulation)
    const [stored] = await ctx.ds.query<
      {
        loads: { tray: number; vapourMassFlow_kg_h: number }[];
      }[]
    >(`SELECT loads FROM load_cases WHERE id = $1`, [fx.simulationCaseIds[0]]);
    const pt = (await author.get(`/api/heat-plans/${plan.id}/points/${index([4160, 5200])}`)).body as SlimPlanPoint;
    expect(pt.loads?.source).toBe('case');
    for (const t of pt.trays)
      expect(t.vapourMassFlow_kg_h).toBeCloseTo(stored!.loads.find((l) => l.tray === t.tray)!.vapourMassFlow_kg_h, 6);
    // the report and the export say which loads each point used
    const text = readerText(planReportDoc(plan, 'SI').content).join('\n');
    expect(text).toContain('3 of the 9 grid points are rated on simulated loads');
    expect(text).toContain('interpolated between simulation cases “Simulation case 1” and “Simulation case 2” (50 % of the way)');
    expect(text).toContain(plan.result.calibration!.summary);
    const csv = await author.get(`/api/heat-plans/${plan.id}/export?format=csv`);
    expect(csv.text).toContain('Loads rated');
    expect(csv.text).toContain('simulation case “Simulation case 2”');
    expect(csv.text).toContain('model calibrated against the simulation cases');
  });

  it('a case without the load of every tray is refused, naming the case', async () => {
    const lc = await ctx.ds.query<
      {
        loads: unknown[];
      }[]
    >(`SELECT loads FROM load_cases WHERE id = $1`, [fx.simulationCaseIds[1]]);
    const [extra] = await ctx.ds.query<{ id: string }[]>(
      `INSERT INTO load_cases (column_id, name, basis, source, loads, pump_around_duties)
       SELECT column_id, 'Simulation case, short', basis, source, $2, pump_around_duties FROM load_cases WHERE id = $1 RETURNING id`,
      [fx.simulationCaseIds[1], JSON.stringify(lc[0]!.loads.slice(0, 10))],
    );
    const res = await create(author, { ...planBody(fx), simulationCaseIds: [fx.simulationCaseIds[0], extra!.id] });
    expect(res.status).toBe(400);
    expect(paths(res)).toEqual(['simulationCaseIds.1 (trays)']);
    expect(res.body.details[0].message).toMatch(/no load for trays 11, 12/);
  });
});

/** The text a PDF's reader reads: strings under text, lists, stacks and table bodies (not styles or charts). */
function readerText(node: unknown): string[] {
  if (typeof node === 'string') return [node];
  if (Array.isArray(node)) return node.flatMap(readerText);
  if (node && typeof node === 'object') {
    const o = node as Record<string, unknown>;
    return ['text', 'ul', 'ol', 'stack', 'columns', 'table', 'body'].flatMap((k) => (k in o ? readerText(o[k]) : []));
  }
  return [];
}
/** GET a binary answer (PDF, XLSX) as a Buffer. */
const getBinary = (agent: Agent, url: string) =>
  agent
    .get(url)
    .buffer(true)
    .parse((r, cb) => {
      const chunks: Buffer[] = [];
      r.on('data', (c: Buffer) => chunks.push(c));
      r.on('end', () => cb(null, Buffer.concat(chunks)));
    });

describe('the plan report and export', () => {
  let plan: HeatPlanRecord;
  beforeAll(async () => {
    // a load-case name that a spreadsheet would run as a formula
    await ctx.ds.query(`UPDATE load_cases SET name = '=HYPERLINK("http://x.test")' WHERE id = $1`, [fx.loadCaseId]);
    plan = (await create(author, planBody(fx))).body;
  });

  it('is a PDF with the cautions, the suggestion, the fit, methods with their sources; no drafting notes or internal ids', async () => {
    const res = await getBinary(viewer, `/api/heat-plans/${plan.id}/report.pdf`);
    expect(res.status).toBe(200);
    expect(res.headers['content-type']).toBe('application/pdf');
    expect((res.body as Buffer).subarray(0, 4).toString('latin1')).toBe('%PDF');
    const text = readerText(planReportDoc(plan, 'SI').content);
    const all = text.join('\n');
    expect(all).toMatch(/management-of-change review/);
    expect(all).toMatch(/internals vendor and licensed engineers/);
    expect(all).toMatch(/Screening estimate/);
    expect(all).toMatch(/No simulation cases were used/);
    expect(all).toMatch(/after Lieberman/); // the traffic model's source, stated once
    expect(all.match(/after Lieberman/g)).toHaveLength(1);
    expect(all).toMatch(/Fair/); // the jet-flood correlation's source in the methods table
    for (const re of [/from memory/i, /to confirm/i, /\brecalled\b/i, /\[seen/i, /\.md\b/i]) expect(all).not.toMatch(re);
    // internal ids such as jetFlood or downcomerBackup (units such as kJ or kW are not ids)
    expect(text.filter((t) => /\b[a-z]{2,}[A-Z][a-z]+/.test(t))).toEqual([]);
  });

  it('exports CSV with formulas escaped and XLSX, both with the cautions', async () => {
    const csv = await viewer.get(`/api/heat-plans/${plan.id}/export?format=csv`);
    expect(csv.status).toBe(200);
    expect(csv.headers['content-type']).toMatch(/text\/csv/);
    expect(csv.text).toContain(`"'=HYPERLINK(""http://x.test"")"`);
    expect(csv.text).toMatch(/management-of-change review/);
    expect(csv.text).toMatch(/As the margin changes/);
    const xlsx = await getBinary(viewer, `/api/heat-plans/${plan.id}/export?format=xlsx`);
    expect(xlsx.status).toBe(200);
    expect((xlsx.body as Buffer).subarray(0, 2).toString('latin1')).toBe('PK');
    const bad = await viewer.get(`/api/heat-plans/${plan.id}/export?format=pdf`);
    expect(bad.status).toBe(400);
    expect(bad.body.details[0].path).toBe('format');
  });
});

describe('bad plan input is refused naming the field; nothing is stored', () => {
  const count = async () =>
    Number(
      (await ctx.ds.query<{ count: string }[]>(`SELECT count(*) FROM heat_plans WHERE column_id = $1`, [fx.columnId]))[0]!.count,
    );

  it('one pump-around, a missing useful temperature, more than 40 steps; 41 × 41 points is stored', async () => {
    const before = await count();
    const body = planBody(fx);
    const one = await create(author, { ...body, pumpArounds: (body.pumpArounds as unknown[]).slice(0, 1) });
    expect(one.status).toBe(400);
    expect(paths(one)).toContain('pumpArounds');
    const { usefulAboveTemperature_C: _u, ...noUseful } = body;
    expect(paths(await create(author, noUseful))).toContain('usefulAboveTemperature_C');
    const pas = body.pumpArounds as { sweep: object }[];
    const steps = (n: number) => pas.map((p) => ({ ...p, sweep: { fromDuty_kW: 1000, toDuty_kW: 9000, steps: n } }));
    const tooMany = await create(author, { ...body, pumpArounds: steps(41) });
    expect(tooMany.status).toBe(400);
    expect(paths(tooMany)).toEqual(['pumpArounds.0.sweep.steps', 'pumpArounds.1.sweep.steps']);
    expect(await count()).toBe(before);
    const big = await create(author, { ...body, pumpArounds: steps(40) });
    expect(big.status).toBe(201); // 41 × 41 is the largest stored grid of two pump-arounds
    expect(big.body.result.grid).toHaveLength(1681);
    expect(await count()).toBe(before + 1);
  });

  it("another column's pump-around or load case, an untagged simulation case, both ΔT and circulation", async () => {
    const before = await count();
    const body = planBody(fx);
    const pas = body.pumpArounds as Record<string, unknown>[];
    const foreign = await create(author, { ...body, pumpArounds: [pas[0], { ...pas[1], pumpAroundId: other.pumpAroundId }] });
    expect(foreign.status).toBe(400);
    expect(foreign.body.details).toEqual([
      { path: 'pumpArounds.1.pumpAroundId', message: 'is not a pump-around of this column' },
    ]);
    const lc = await create(author, { ...body, loadCaseId: other.loadCaseId });
    expect(paths(lc)).toEqual(['loadCaseId']);
    const untagged = await create(author, { ...body, simulationCaseIds: [fx.simulationCaseIds[0], other.simulationCaseIds[0]] });
    expect(paths(untagged)).toEqual(['simulationCaseIds.1']);
    await ctx.ds.query(`UPDATE load_cases SET pump_around_duties = '[]' WHERE id = $1`, [fx.simulationCaseIds[1]]);
    const notTagged = await create(author, { ...body, simulationCaseIds: fx.simulationCaseIds });
    expect(notTagged.body.details[0].message).toMatch(/is not tagged with the duty of/);
    const both = await create(author, { ...body, pumpArounds: [{ ...pas[0], circulation_kg_h: 200000 }, pas[1]] });
    expect(both.status).toBe(400);
    expect(paths(both).some((p) => p.startsWith('pumpArounds.0.'))).toBe(true);
    expect(await count()).toBe(before);
  });
});
