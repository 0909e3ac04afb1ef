import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { StudyRecord } from '../../shared/types/studies.js';
import { setupApp, signedIn, type TestContext } from '../helpers/app.js';
import { exampleBody, makeStudyColumn, type StudyFixture } from './study-fixture.js';

let ctx: TestContext;
let fx: StudyFixture;
let other: StudyFixture;
type Agent = Awaited<ReturnType<typeof signedIn>>['agent'];
let author: Agent;
let authorEmail: string;
let colleague: Agent;
let reviewer: Agent;
let outsider: Agent;
let viewer: Agent;
let reviewerEmail: string;
let outsiderEmail: string;

beforeAll(async () => {
  ctx = await setupApp();
  fx = await makeStudyColumn(ctx.ds);
  other = await makeStudyColumn(ctx.ds);
  const a = await signedIn(ctx, 'process-engineer', [fx.siteId]);
  author = a.agent;
  authorEmail = a.user.email;
  colleague = (await signedIn(ctx, 'process-engineer', [fx.siteId])).agent;
  const r = await signedIn(ctx, 'internals-specialist', [fx.siteId]);
  reviewer = r.agent;
  reviewerEmail = r.user.email;
  const o = await signedIn(ctx, 'internals-specialist', [other.siteId]);
  outsider = o.agent;
  outsiderEmail = o.user.email;
  viewer = (await signedIn(ctx, 'viewer', [fx.siteId])).agent;
});
afterAll(() => ctx.close());

const create = (agent: Agent, body: Record<string, unknown>, columnId = fx.columnId) =>
  agent.post(`/api/columns/${columnId}/studies`).send(body);
const paths = (res: { body: { details?: { path: string }[] } }) => (res.body.details ?? []).map((d) => d.path);

describe('study input errors name the field', () => {
  it('a missing latent heat and a bad sweep: 400 naming latentHeat_kJ_kg and sweep.steps', async () => {
    const { latentHeat_kJ_kg: _drop, ...body } = exampleBody(fx);
    const res = await create(author, { ...body, sweep: { fromDuty_kW: 3000, toDuty_kW: 9600, steps: 101 } });
    expect(res.status).toBe(400);
    expect(paths(res)).toEqual(expect.arrayContaining(['latentHeat_kJ_kg', 'sweep.steps']));
  });

  it('both ΔT and circulation, and a sweep running downwards: the engine faults, mapped to the request fields', async () => {
    const res = await create(author, {
      ...exampleBody(fx),
      circulation_kg_h: 250000,
      sweep: { fromDuty_kW: 9000, toDuty_kW: 4000, steps: 10 },
    });
    expect(res.status).toBe(400);
    expect(paths(res)).toEqual(expect.arrayContaining(['circulation_kg_h', 'sweep.toDuty_kW']));
    expect(res.body.details.find((d: { path: string }) => d.path === 'circulation_kg_h').message).toMatch(
      /either returnTemperatureDrop_K or circulation_kg_h/,
    );
  });

  it('neither ΔT nor circulation: names returnTemperatureDrop_K', async () => {
    const { returnTemperatureDrop_K: _drop, ...body } = exampleBody(fx);
    const res = await create(author, body);
    expect(res.status).toBe(400);
    expect(paths(res)).toEqual(['returnTemperatureDrop_K']);
  });

  it('a pump-around or load case of another column: 400 naming pumpAroundId and loadCaseId', async () => {
    const res = await create(author, { ...exampleBody(fx), pumpAroundId: other.pumpAroundId, loadCaseId: other.loadCaseId });
    expect(res.status).toBe(400);
    expect(paths(res).sort()).toEqual(['loadCaseId', 'pumpAroundId']);
  });

  it('an unknown field is refused by name', async () => {
    const res = await create(author, { ...exampleBody(fx), dutyFactor: 2 });
    expect(res.status).toBe(400);
    expect(paths(res)).toEqual(['dutyFactor']);
  });
});

describe('visibility and roles', () => {
  let id: string;
  beforeAll(async () => {
    id = ((await create(author, exampleBody(fx))).body as StudyRecord).id;
  });

  it('a user of another site gets 404 for the column and the study', async () => {
    expect((await create(outsider, exampleBody(fx))).status).toBe(404);
    expect((await outsider.get(`/api/columns/${fx.columnId}/studies`)).status).toBe(404);
    const res = await outsider.get(`/api/studies/${id}`);
    expect(res.status).toBe(404);
    expect(res.body.error).toBe('Study not found');
    expect((await outsider.post(`/api/studies/${id}/approve`).send({ version: 1 })).status).toBe(404);
  });

  it('a viewer reads the study but may not create one', async () => {
    expect((await viewer.get(`/api/studies/${id}`)).status).toBe(200);
    expect((await create(viewer, exampleBody(fx))).status).toBe(403);
  });
});

describe('review: draft → submitted → returned → submitted → approved (read-only), with notices', () => {
  let s: StudyRecord;
  const outbox = async (kind: string) =>
    await ctx.ds.query<
      {
        recipients: string[];
      }[]
    >(`SELECT recipients FROM mail_outbox WHERE kind = $1 AND body LIKE $2`, [kind, `%/studies/${s.id}%`]);

  beforeAll(async () => {
    s = (await create(author, exampleBody(fx))).body as StudyRecord;
  });

  it('only the author submits; the reviewers who can see the site are notified, no others', async () => {
    expect((await colleague.post(`/api/studies/${s.id}/submit`).send({ version: s.version })).status).toBe(403);
    const res = await author.post(`/api/studies/${s.id}/submit`).send({ version: s.version });
    expect(res.status).toBe(200);
    expect(res.body.status).toBe('submitted');
    s = res.body;
    const mails = await outbox('study.submitted');
    expect(mails).toHaveLength(1);
    expect(mails[0]!.recipients).toContain(reviewerEmail);
    expect(mails[0]!.recipients).not.toContain(outsiderEmail);
  });

  it('the author may not approve (role), a stale version is 409, returning needs a comment', async () => {
    expect((await author.post(`/api/studies/${s.id}/approve`).send({ version: s.version })).status).toBe(403);
    expect((await reviewer.post(`/api/studies/${s.id}/approve`).send({ version: s.version - 1 })).status).toBe(409);
    const res = await reviewer.post(`/api/studies/${s.id}/return`).send({ version: s.version });
    expect(res.status).toBe(400);
    expect(paths(res)).toEqual(['comment']);
  });

  it('returned with a comment: the author is notified and resubmits', async () => {
    const res = await reviewer
      .post(`/api/studies/${s.id}/return`)
      .send({ version: s.version, comment: 'Check the latent heat against the overhead balance' });
    expect(res.status).toBe(200);
    expect(res.body).toMatchObject({ status: 'returned', reviewComment: 'Check the latent heat against the overhead balance' });
    expect((await outbox('study.returned'))[0]!.recipients).toEqual([authorEmail]);
    const again = await author.post(`/api/studies/${res.body.id}/submit`).send({ version: res.body.version });
    expect(again.status).toBe(200);
    s = again.body;
  });

  it('approved: the author is notified and the study is read-only', async () => {
    const res = await reviewer
      .post(`/api/studies/${s.id}/approve`)
      .send({ version: s.version, comment: 'Fine for the MOC package' });
    expect(res.status).toBe(200);
    expect(res.body.status).toBe('approved');
    expect(res.body.reviews.map((r: { action: string }) => r.action)).toEqual(['submit', 'return', 'submit', 'approve']);
    expect((await outbox('study.approved'))[0]!.recipients).toEqual([authorEmail]);
    const late = await author.post(`/api/studies/${s.id}/submit`).send({ version: res.body.version });
    expect(late.status).toBe(409);
    expect(late.body.error).toMatch(/read-only/);
  });
});

describe('POST /studies/latent-heat', () => {
  it('λ = condenser duty / overhead vapour: 2000 kW over 36 000 kg/h is 200 kJ/kg (2000 × 3600 / 36 000)', async () => {
    const res = await viewer.post('/api/studies/latent-heat').send({ condenserDuty_kW: 2000, overheadVapour_kg_h: 36000 });
    expect(res.status).toBe(200);
    expect(res.body.latentHeat_kJ_kg).toBeCloseTo(200, 10);
  });
  it('a zero flow is refused by name', async () => {
    const res = await viewer.post('/api/studies/latent-heat').send({ condenserDuty_kW: 2000, overheadVapour_kg_h: 0 });
    expect(res.status).toBe(400);
    expect(paths(res)).toEqual(['overheadVapour_kg_h']);
  });
});

describe('zone liquid that already carries the circulation', () => {
  it('has no default: a request without the flag gets a 400 naming zoneLiquidIncludesCirculation, and nothing is stored', async () => {
    const { zoneLiquidIncludesCirculation: _drop, ...body } = exampleBody(fx);
    const before = (await author.get(`/api/columns/${fx.columnId}/studies`)).body.length as number;
    const res = await create(author, body);
    expect(res.status).toBe(400);
    expect(paths(res)).toEqual(['zoneLiquidIncludesCirculation']);
    expect(res.body.details[0].message).toMatch(/required/);
    expect((await author.get(`/api/columns/${fx.columnId}/studies`)).body.length).toBe(before);
    // a wrong type is named too
    const bad = await create(author, { ...body, zoneLiquidIncludesCirculation: 'yes' });
    expect(bad.status).toBe(400);
    expect(paths(bad)).toEqual(['zoneLiquidIncludesCirculation']);
  });

  it('takes the base circulation m0 = Q0·3600/(c_p ΔT) off each zone tray before the study', async () => {
    // the fixture's zone trays 7–9 carry 60–68 t/h; ΔT = 130 K gives m0 = 5200 × 3600 / (2.55 × 130) = 56 471 kg/h, less than each
    const res = await create(author, { ...exampleBody(fx), returnTemperatureDrop_K: 130, zoneLiquidIncludesCirculation: true });
    expect(res.status, JSON.stringify(res.body)).toBe(201);
    const m0 = (5200 * 3600) / (2.55 * 130);
    const stored = new Map((res.body as StudyRecord).inputs.input.trays.map((t) => [t.tray, t.liquidMassFlow_kg_h]));
    const { EXAMPLE } = await import('./study-fixture.js');
    for (const t of EXAMPLE.trays)
      expect(stored.get(t.tray)).toBeCloseTo(t.tray >= 7 && t.tray <= 9 ? t.liquidMassFlow_kg_h - m0 : t.liquidMassFlow_kg_h, 6);
    expect((res.body as StudyRecord).result.notes.at(-1)).toMatch(/taken off each zone tray/);
  });

  it('a circulation larger than a zone tray’s liquid is refused, naming zoneLiquidIncludesCirculation', async () => {
    const res = await create(author, { ...exampleBody(fx), returnTemperatureDrop_K: 5, zoneLiquidIncludesCirculation: true });
    expect(res.status).toBe(400);
    expect(paths(res)).toEqual(['zoneLiquidIncludesCirculation']);
    expect(res.body.details[0].message).toMatch(/exceeds the liquid of zone trays 7/);
  });
});
