import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { CHECK_NAMES } from '../../shared/types/rating.js';
import { setupApp, signedIn, type TestContext } from '../helpers/app.js';
import { loads, makePlant, section, type Plant } from './columnsFixture.js';

let ctx: TestContext;
let plant: Plant;
let lcNormal: string;
let lcHigh: string;
let sectionIds: string[];
type Agent = Awaited<ReturnType<typeof signedIn>>['agent'];
let engineer: Agent;
let specialist: Agent;

beforeAll(async () => {
  ctx = await setupApp();
  plant = await makePlant(ctx.ds);
  specialist = (await signedIn(ctx, 'internals-specialist', [plant.siteId])).agent;
  engineer = (await signedIn(ctx, 'process-engineer', [plant.siteId])).agent;
  sectionIds = [];
  for (const s of [section(1, 8, 'Top'), section(9, 16, 'Middle')])
    sectionIds.push((await specialist.post(`/api/columns/${plant.columnId}/sections`).send(s)).body.id);
  lcNormal = (
    await engineer
      .post(`/api/columns/${plant.columnId}/load-cases`)
      .send({ name: 'Normal', basis: 'normal', source: 'typed', loads: loads(1, 18) })
  ).body.id;
  lcHigh = (
    await engineer
      .post(`/api/columns/${plant.columnId}/load-cases`)
      .send({ name: 'High', basis: 'maximum', source: 'typed', loads: loads(1, 18, 1.35) })
  ).body.id;
});
afterAll(() => ctx.close());

/** POST /runs answers the summary; the full record comes from GET /runs/:id. */
async function rated(agent: Agent, body: object) {
  const res = await agent.post('/api/runs').send(body);
  expect(res.status).toBe(201);
  return (await agent.get(`/api/runs/${res.body.id}`)).body;
}

describe('rating runs', () => {
  it('rates every section covering loaded trays, merges by tray, snapshots geometry, loads, methods and engine version', async () => {
    const res = await engineer.post('/api/runs').send({ columnId: plant.columnId, loadCaseId: lcNormal, label: 'Base' });
    expect(res.status).toBe(201);
    expect(res.body.results).toBeUndefined();
    const run = (await engineer.get(`/api/runs/${res.body.id}`)).body;
    expect(res.body).toMatchObject({
      id: run.id,
      controllingCheck: run.results.controllingCheck,
      maxPercentOfLimit: run.results.maxPercentOfLimit,
    });
    expect(run).toMatchObject({
      status: 'draft',
      kind: 'rating',
      label: 'Base',
      loadCaseName: 'Normal',
      engineVersion: expect.any(String),
    });
    expect(run.results.trays.map((t: { tray: number }) => t.tray)).toEqual(Array.from({ length: 16 }, (_, i) => i + 1));
    expect(run.results.uncoveredTrays).toEqual([17, 18]);
    expect(run.snapshot.sections.map((s: { sectionId: string }) => s.sectionId)).toEqual(sectionIds);
    expect(run.snapshot.loads).toHaveLength(16);
    expect(run.snapshot.methods).toMatchObject({ jetFlood: 'fair', nearFraction: 0.9 });
    expect(run.results.trays[0].sectionId).toBe(sectionIds[0]);
    expect(run.results.trays[15].sectionId).toBe(sectionIds[1]);
    for (const c of CHECK_NAMES) expect(Number.isFinite(run.results.trays[0].checks[c].percentOfLimit)).toBe(true);

    // the snapshot does not follow later edits of the geometry
    const sec = (await specialist.get(`/api/columns/${plant.columnId}/sections`)).body.items[0];
    const changed = { ...sec, geometry: { ...sec.geometry, weirHeight_mm: 75 } };
    delete changed.id;
    delete changed.columnId;
    delete changed.updatedAt;
    expect((await specialist.put(`/api/sections/${sec.id}`).send(changed)).status).toBe(200);
    const again = await engineer.get(`/api/runs/${run.id}`);
    expect(again.body.snapshot.sections[0].geometry.weirHeight_mm).toBe(50);
    const detail = await engineer.get(`/api/columns/${plant.columnId}`);
    expect(detail.body.runs[0]).toMatchObject({ id: run.id, status: 'draft', controllingCheck: run.results.controllingCheck });
  });

  it('refuses a run when no section covers the loads, naming the field', async () => {
    const lc = (
      await engineer
        .post(`/api/columns/${plant.columnId}/load-cases`)
        .send({ name: 'Bottom only', basis: 'other', source: 'typed', loads: loads(19, 20) })
    ).body.id;
    const res = await engineer.post('/api/runs').send({ columnId: plant.columnId, loadCaseId: lc });
    expect(res.status).toBe(400);
    expect(res.body.details[0].path).toBe('loadCaseId');
  });

  it('returns the operating window of a rated tray and 404 for a tray not in the run', async () => {
    const run = await rated(engineer, { columnId: plant.columnId, loadCaseId: lcNormal });
    const w = await engineer.get(`/api/runs/${run.id}/window/3`);
    expect(w.status).toBe(200);
    expect(w.body.window.tray).toBe(3);
    expect(w.body.window.operatingPoint.vapour_kg_h).toBe(run.snapshot.loads[2].vapourMassFlow_kg_h);
    expect(w.body.window.curves.map((c: { limit: string }) => c.limit)).toContain('flood');
    expect((await engineer.get(`/api/runs/${run.id}/window/17`)).status).toBe(404);
  });

  it('compares two runs tray by tray and lists trays whose controlling check changed', async () => {
    const a = await rated(engineer, { columnId: plant.columnId, loadCaseId: lcNormal });
    const b = await rated(engineer, { columnId: plant.columnId, loadCaseId: lcHigh });
    const res = await engineer.get(`/api/runs/compare?a=${a.id}&b=${b.id}`);
    expect(res.status).toBe(200);
    expect(res.body.trays).toHaveLength(16);
    const t1 = res.body.trays[0];
    const ra = a.results.trays[0];
    const rb = b.results.trays[0];
    expect(t1.checks.jetFlood.a).toBeCloseTo(ra.checks.jetFlood.percentOfLimit, 9);
    expect(t1.checks.jetFlood.delta).toBeCloseTo(rb.checks.jetFlood.percentOfLimit - ra.checks.jetFlood.percentOfLimit, 9);
    expect(t1.checks.jetFlood.delta).toBeGreaterThan(0);
    const changed = a.results.trays
      .filter(
        (t: { tray: number; controllingCheck: string }, i: number) => t.controllingCheck !== b.results.trays[i].controllingCheck,
      )
      .map((t: { tray: number }) => t.tray);
    expect(res.body.controllingChanged).toEqual(changed);
    const bad = await engineer.get(`/api/runs/compare?a=${a.id}`);
    expect(bad.status).toBe(400);
  });

  it('exports run results as CSV with the cautions', async () => {
    const run = (await engineer.post('/api/runs').send({ columnId: plant.columnId, loadCaseId: lcNormal, label: 'Export me' }))
      .body;
    const csv = await engineer.get(`/api/runs/${run.id}/export?format=csv`);
    expect(csv.status).toBe(200);
    expect(csv.text).toMatch(/management-of-change/);
    const header = csv.text.split('\r\n').find((l) => l.startsWith('Tray,'))!;
    // the product's labels, never internal ids (jetFlood, liquidLoad)
    expect(header).toMatch(/^Tray,Section,Tray state,Controlling check,Jet flood \(%\),Jet flood limit \(%\),/);
    expect(header).not.toMatch(/jetFlood|liquidLoad|downcomerSeal/);
    expect(csv.text.split('\r\n').filter((l) => /^\d+,/.test(l))).toHaveLength(16);
  });
});

describe('review flow', () => {
  it('submit → return with comment → resubmit → approve; approved is read-only; notices queued', async () => {
    const { agent: author } = await signedIn(ctx, 'process-engineer', [plant.siteId]);
    const run = await rated(author, { columnId: plant.columnId, loadCaseId: lcNormal });
    const other = (await signedIn(ctx, 'process-engineer', [plant.siteId])).agent;
    expect((await other.post(`/api/runs/${run.id}/submit`).send({ version: run.version })).status).toBe(403);
    const sub = await author.post(`/api/runs/${run.id}/submit`).send({ version: run.version, comment: 'please check' });
    expect(sub.status).toBe(200);
    expect(sub.body.status).toBe('submitted');
    expect((await author.post(`/api/runs/${run.id}/submit`).send({ version: sub.body.version })).status).toBe(409);
    expect((await engineer.post(`/api/runs/${run.id}/approve`).send({ version: sub.body.version, comment: 'ok' })).status).toBe(
      403,
    );
    const noComment = await specialist.post(`/api/runs/${run.id}/return`).send({ version: sub.body.version });
    expect(noComment.status).toBe(400);
    expect(noComment.body.details).toContainEqual({ path: 'comment', message: 'is required' });
    const ret = await specialist
      .post(`/api/runs/${run.id}/return`)
      .send({ version: sub.body.version, comment: 'Use the winter densities' });
    expect(ret.body).toMatchObject({ status: 'returned', reviewComment: 'Use the winter densities' });
    const staleApprove = await specialist.post(`/api/runs/${run.id}/approve`).send({ version: sub.body.version, comment: 'ok' });
    expect(staleApprove.status).toBe(409);
    const sub2 = await author.post(`/api/runs/${run.id}/submit`).send({ version: ret.body.version });
    expect(sub2.body.status).toBe('submitted');
    const ok = await specialist.post(`/api/runs/${run.id}/approve`).send({ version: sub2.body.version, comment: 'Agreed' });
    expect(ok.body).toMatchObject({ status: 'approved', reviewComment: 'Agreed' });
    expect(ok.body.reviews.map((r: { action: string }) => r.action)).toEqual(['submit', 'return', 'submit', 'approve']);

    const relabel = await author.patch(`/api/runs/${run.id}`).send({ label: 'changed', version: ok.body.version });
    expect(relabel.status).toBe(409);
    expect(relabel.body.error).toMatch(/approved and read-only/);
    expect((await specialist.post(`/api/runs/${run.id}/return`).send({ version: ok.body.version, comment: 'x' })).status).toBe(
      409,
    );
    expect((await author.get(`/api/runs/${run.id}`)).body.label).toBe(run.label);

    const mails = await ctx.ds.query<
      {
        kind: string;
      }[]
    >(`SELECT kind FROM mail_outbox WHERE body LIKE $1 ORDER BY id`, [`%${run.label}%`]);
    expect(mails.map((m) => m.kind)).toEqual(['run.submitted', 'run.returned', 'run.submitted', 'run.approved']);
    const audits = await ctx.ds.query<
      {
        action: string;
      }[]
    >(`SELECT action FROM audit_log WHERE entity_id = $1 ORDER BY id`, [run.id]);
    expect(audits.map((a) => a.action)).toEqual(['create', 'submit', 'return', 'submit', 'approve']);
  });

  it('a reviewer cannot approve their own run; a non-member gets 404', async () => {
    const run = await rated(specialist, { columnId: plant.columnId, loadCaseId: lcNormal });
    const sub = await specialist.post(`/api/runs/${run.id}/submit`).send({ version: run.version });
    const own = await specialist.post(`/api/runs/${run.id}/approve`).send({ version: sub.body.version, comment: 'self' });
    expect(own.status).toBe(403);
    const { agent: outsider } = await signedIn(ctx, 'internals-specialist');
    expect((await outsider.get(`/api/runs/${run.id}`)).status).toBe(404);
    expect((await outsider.post(`/api/runs/${run.id}/approve`).send({ version: sub.body.version, comment: 'x' })).status).toBe(
      404,
    );
    expect((await outsider.post('/api/runs').send({ columnId: plant.columnId, loadCaseId: lcNormal })).status).toBe(404);
    const list = await outsider.get(`/api/runs?columnId=${plant.columnId}`);
    expect(list.body.total).toBe(0);
    const mine = await engineer.get(`/api/runs?columnId=${plant.columnId}&status=submitted`);
    expect(mine.body.items.map((r: { id: string }) => r.id)).toContain(run.id);
  });
});
