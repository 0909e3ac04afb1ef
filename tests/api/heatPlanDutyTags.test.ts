/** Pump-around duty tags of a load case (issue 17): stored, read back, refused with the field named, site-isolated. */
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { setupApp, signedIn, type TestContext } from '../helpers/app.js';
import { makeHeatPlanColumn, SIM_LATENT_HEAT, synthetic, type HeatPlanFixture } from './heatPlan-fixture.js';
import { EXAMPLE } from './study-fixture.js';

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

describe('duty tags given on import', () => {
  /** an invented "simulation" at other duties as a CSV tray profile (SI units, headers the import recognises) */
  const duties = [EXAMPLE.pumpAround.baseDuty_kW * 1.1, 4000 * 1.15];
  const csv = [
    'Tray,Vapour mass flow [kg/h],Liquid mass flow [kg/h],Vapour density [kg/m3],Liquid density [kg/m3],Surface tension [mN/m],Viscosity [mPa.s],Temperature [C],Pressure [kPa]',
    ...synthetic(duties).map((t) =>
      [
        t.tray,
        t.vapourMassFlow_kg_h,
        t.liquidMassFlow_kg_h,
        t.vapourDensity_kg_m3,
        t.liquidDensity_kg_m3,
        t.surfaceTension_mN_m,
        t.liquidViscosity_mPa_s,
        t.temperature_C,
        t.pressure_kPa,
      ].join(','),
    ),
  ].join('\n');

  it('are checked and stored with the imported case, which then calibrates a plan at once', async () => {
    const preview = await engineer
      .post(`/api/columns/${fx.columnId}/imports`)
      .attach('file', Buffer.from(csv), 'simulation-at-other-duties.csv');
    expect(preview.status, JSON.stringify(preview.body).slice(0, 300)).toBe(200);
    const p = preview.body as { token: string; mapping: object; units: object; numbering: object; errorCount: number };
    expect(p.errorCount).toBe(0);
    const commit = (pumpAroundDuties: unknown) =>
      engineer.post(`/api/columns/${fx.columnId}/imports/commit`).send({
        token: p.token,
        mapping: p.mapping,
        units: p.units,
        numbering: p.numbering,
        name: 'Simulation at +10 % / +15 % (invented)',
        basis: 'other',
        fileName: 'simulation-at-other-duties.csv',
        pumpAroundDuties,
      });
    const cases = async () =>
      Number(
        (await ctx.ds.query<{ n: string }[]>(`SELECT count(*) AS n FROM load_cases WHERE column_id = $1`, [fx.columnId]))[0]!.n,
      );
    const before = await cases();
    // another column's pump-around: refused naming the field, nothing stored, the preview kept for another try
    const foreign = await commit([{ pumpAroundId: other.pumpAroundId, duty_kW: duties[0] }]);
    expect(foreign.status).toBe(400);
    expect(foreign.body.details).toEqual([
      { path: 'pumpAroundDuties.0.pumpAroundId', message: 'is not a pump-around of this column' },
    ]);
    const negative = await commit([{ pumpAroundId: fx.pumpAroundId, duty_kW: -1 }]);
    expect(negative.status).toBe(400);
    expect(negative.body.details[0].path).toMatch(/^pumpAroundDuties\.0\.duty_kW/);
    expect(await cases()).toBe(before);
    const tags = [
      { pumpAroundId: fx.pumpAroundId, duty_kW: duties[0] },
      { pumpAroundId: fx.lowerPumpAroundId, duty_kW: duties[1] },
    ];
    const ok = await commit(tags);
    expect(ok.status, JSON.stringify(ok.body).slice(0, 300)).toBe(201);
    expect(ok.body.pumpAroundDuties).toEqual(tags);
    expect(await cases()).toBe(before + 1);
    // the tagged import calibrates a plan straight away, with one of the fixture's cases
    const plan = await engineer.post(`/api/columns/${fx.columnId}/heat-plans`).send({
      loadCaseId: fx.loadCaseId,
      pumpArounds: [
        {
          pumpAroundId: fx.pumpAroundId,
          sweep: { fromDuty_kW: 4000, toDuty_kW: 7000, steps: 3 },
          liquidHeatCapacity_kJ_kgK: EXAMPLE.pumpAround.liquidHeatCapacity_kJ_kgK,
          returnTemperatureDrop_K: EXAMPLE.pumpAround.returnTemperatureDrop_K,
        },
        {
          pumpAroundId: fx.lowerPumpAroundId,
          sweep: { fromDuty_kW: 3000, toDuty_kW: 6000, steps: 3 },
          liquidHeatCapacity_kJ_kgK: 2.6,
          returnTemperatureDrop_K: 60,
          drawTemperature_C: 221,
        },
      ],
      latentHeat_kJ_kg: EXAMPLE.latentHeat_kJ_kg,
      usefulAboveTemperature_C: 150,
      simulationCaseIds: [ok.body.id, fx.simulationCaseIds[0]],
      methods: EXAMPLE.methods,
    });
    expect(plan.status, JSON.stringify(plan.body).slice(0, 300)).toBe(201);
    expect(plan.body.inputs.source.simulationCases[0].duties_kW).toEqual(duties);
    // the imported case was made with the fixture's "true" latent heat: the fit finds it again (CSV rounding aside)
    for (const f of plan.body.result.calibration.fitted) expect(f.value / SIM_LATENT_HEAT).toBeCloseTo(1, 2);
  });
});
