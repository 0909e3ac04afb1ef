import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { runStudy, validateStudyInput } from '../../server/engine/pumpAround/index.js';
import type { StudyRecord } from '../../shared/types/studies.js';
import { setupApp, signedIn, type TestContext } from '../helpers/app.js';
import { EXAMPLE, exampleBody, makeStudyColumn, type StudyFixture } from './study-fixture.js';

let ctx: TestContext;
let fx: StudyFixture;
type Agent = Awaited<ReturnType<typeof signedIn>>['agent'];
let engineer: Agent;
let engineerId: string;

beforeAll(async () => {
  ctx = await setupApp();
  fx = await makeStudyColumn(ctx.ds);
  const e = await signedIn(ctx, 'process-engineer', [fx.siteId]);
  engineer = e.agent;
  engineerId = e.user.id;
});
afterAll(() => ctx.close());

describe('POST /columns/:id/studies stores a pump-around duty study', () => {
  let study: StudyRecord;
  beforeAll(async () => {
    const res = await engineer.post(`/api/columns/${fx.columnId}/studies`).send(exampleBody(fx));
    expect(res.status, JSON.stringify(res.body)).toBe(201);
    study = res.body as StudyRecord;
  });

  it('answers the stored study: draft, author, snapshot of the engine input', () => {
    expect(study.status).toBe('draft');
    expect(study.authorId).toBe(engineerId);
    expect(study.label).toBe('Top pump-around push');
    expect(study.inputs.input.pumpAround).toMatchObject({
      drawTray: 9,
      returnTray: 7,
      baseDuty_kW: 5200,
      returnTemperatureDrop_K: 65,
    });
    expect(study.inputs.input.trays).toEqual(EXAMPLE.trays);
    expect(study.inputs.input.margin).toBe(0.7);
    expect(study.inputs.source.loadCaseName).toBe('Base case');
  });

  it('keeps the solved duties exactly as the engine gives them for the same input', () => {
    const v = validateStudyInput(EXAMPLE);
    if (!v.ok) throw new Error('example invalid');
    const direct = runStudy(v.value);
    for (const k of [
      'dryOutDuty_kW',
      'dryOutTray',
      'minimumLiquidDuty_kW',
      'minimumLiquidTray',
      'zoneOverloadDuty_kW',
      'limitingDuty_kW',
      'limitingTray',
      'limitingCheck',
      'recommendedDuty_kW',
    ] as const)
      expect(study.result[k], k).toBe(direct[k]);
    expect(study.result.notes.slice(0, direct.notes.length)).toEqual(direct.notes);
    expect(study.result.points.map((p) => p.duty_kW)).toEqual(direct.points.map((p) => p.duty_kW));
  });

  it('condenser duty change = −(Q − Q0) and heat recovered = Q − Q0 at every stored point', () => {
    const q0 = study.result.baseDuty_kW;
    expect(study.result.points).toHaveLength(EXAMPLE.sweep.steps + 1);
    for (const p of [...study.result.points, ...study.result.keyPoints.map((k) => k.point)]) {
      // exact (===, so the JSON round trip of −0 at the base duty counts as 0)
      expect(p.condenserDutyChange_kW === -(p.duty_kW - q0), `${p.duty_kW} kW`).toBe(true);
      expect(p.heatRecovered_kW === p.duty_kW - q0, `${p.duty_kW} kW`).toBe(true);
    }
  });

  it('stores traffic: below the draw unchanged, above the zone V − L unchanged, liquid down by (Q − Q0)/λ', () => {
    const base = new Map(EXAMPLE.trays.map((t) => [t.tray, t]));
    const lambda = EXAMPLE.latentHeat_kJ_kg;
    for (const p of study.result.points) {
      const dm = ((p.duty_kW - study.result.baseDuty_kW) * 3600) / lambda;
      for (const t of p.trays) {
        const b = base.get(t.tray)!;
        if (t.region === 'below') {
          expect(t.vapourMassFlow_kg_h).toBe(b.vapourMassFlow_kg_h);
          expect(t.liquidMassFlow_kg_h).toBe(b.liquidMassFlow_kg_h);
        }
        if (t.region === 'above' && !t.dry) {
          expect(t.vapourMassFlow_kg_h - t.liquidMassFlow_kg_h).toBeCloseTo(b.vapourMassFlow_kg_h - b.liquidMassFlow_kg_h, 6);
          expect(t.liquidMassFlow_kg_h).toBeCloseTo(b.liquidMassFlow_kg_h - dm, 6);
        }
      }
    }
  });

  it('slims the per-tray ratings to percent, status and controlling check, and stays small', async () => {
    const t = study.result.points[0]!.trays[0]!;
    expect(t.percent).toHaveLength(study.result.checkNames.length);
    expect(t.status).toHaveLength(study.result.checkNames.length);
    expect(study.result.checkNames).toContain(t.controllingCheck);
    expect(JSON.stringify(study.result)).not.toMatch(/"details"|"warnings"/);
    const rows = await ctx.ds.query<{ bytes: number }[]>(
      `SELECT pg_column_size(results) AS bytes FROM pump_around_studies WHERE id = $1`,
      [study.id],
    );
    expect(rows[0]!.bytes).toBeLessThan(200_000);
    expect(study.result.keyPoints.map((k) => k.kind)).toEqual(['base', 'limiting', 'recommended']);
    expect(study.result.minimumLiquidLines.map((l) => l.tray)).toEqual([1, 2, 3, 4, 5, 6]);
  });

  it('lists and reads it back; the list is newest first', async () => {
    const list = await engineer.get(`/api/columns/${fx.columnId}/studies`);
    expect(list.status).toBe(200);
    expect(list.body[0]).toMatchObject({
      id: study.id,
      status: 'draft',
      pumpAroundName: EXAMPLE.pumpAround.name,
      recommendedDuty_kW: study.result.recommendedDuty_kW,
    });
    const one = await engineer.get(`/api/studies/${study.id}`);
    expect(one.status).toBe(200);
    expect(one.body.result.dryOutDuty_kW).toBe(study.result.dryOutDuty_kW);
  });
});
