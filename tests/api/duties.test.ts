/**
 * Separation of duties: a column's engineer holds the engineer permission and the column's site; the
 * countersigner of an inspection is never its inspector; the approver of a run or study is never its author.
 */
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { makeUser, setupApp, signedIn, type TestContext } from '../helpers/app.js';
import { cleanFindings, makeInspectionColumn, noMeasurements, type InspectionFixture } from './inspection-fixture.js';
import { exampleBody, makeStudyColumn } from './study-fixture.js';

let ctx: TestContext;
let fx: InspectionFixture;
type Agent = Awaited<ReturnType<typeof signedIn>>['agent'];
let admin: Agent;
let specialist: Agent;

beforeAll(async () => {
  ctx = await setupApp();
  fx = await makeInspectionColumn(ctx.ds, null);
  admin = (await signedIn(ctx, 'admin')).agent;
  specialist = (await signedIn(ctx, 'internals-specialist', [fx.siteId])).agent;
});
afterAll(() => ctx.close());

const setRole = async (userId: string, role: string) => {
  const u = (await admin.get('/api/users')).body.items.find((x: { id: string }) => x.id === userId);
  const res = await admin.patch(`/api/users/${userId}`).send({ role, version: u.version });
  expect(res.status, JSON.stringify(res.body)).toBe(200);
};

describe("a column's engineer", () => {
  const putEngineer = async (engineerId: string | null) => {
    const col = await specialist.get(`/api/columns/${fx.columnId}`);
    return specialist.put(`/api/columns/${fx.columnId}`).send({ engineerId, version: col.body.version });
  };
  const refusal = (res: { status: number; body: { details?: { path: string; message: string }[] } }) => {
    expect(res.status).toBe(400);
    expect(res.body.details?.[0]?.path).toBe('engineerId');
    return res.body.details![0]!.message;
  };

  it('must be a user: a random or malformed id answers 400 naming engineerId, not 500', async () => {
    expect(refusal(await putEngineer('6f1c2a9e-3b4d-4e5f-8a7b-9c0d1e2f3a4b'))).toBe('no user has this id');
    const malformed = await putEngineer('urn:uuid:6f1c2a9e-3b4d-4e5f-8a7b-9c0d1e2f3a4b');
    refusal(malformed);
  });

  it('must hold the engineer permission, be active and see the site', async () => {
    const inspector = await makeUser(ctx.ds, 'inspector', [fx.siteId]);
    expect(refusal(await putEngineer(inspector.id))).toMatch(
      /is inspector; a column's engineer is a process engineer or internals specialist/,
    );
    const elsewhere = await makeUser(ctx.ds, 'process-engineer');
    expect(refusal(await putEngineer(elsewhere.id))).toMatch(/no access to this column's site/);
    const gone = await makeUser(ctx.ds, 'process-engineer', [fx.siteId]);
    await ctx.ds.query(`UPDATE users SET active = false WHERE id = $1`, [gone.id]);
    expect(refusal(await putEngineer(gone.id))).toMatch(/is deactivated/);
    const col = await specialist.get(`/api/columns/${fx.columnId}`);
    expect(col.body.engineerId).toBeNull();
  });

  it('an eligible engineer is assigned, and the assignment can be cleared', async () => {
    const eng = await makeUser(ctx.ds, 'process-engineer', [fx.siteId]);
    const ok = await putEngineer(eng.id);
    expect(ok.status, JSON.stringify(ok.body)).toBe(200);
    expect(ok.body.engineerId).toBe(eng.id);
    const cleared = await putEngineer(null);
    expect(cleared.status).toBe(200);
    expect(cleared.body.engineerId).toBeNull();
  });

  it('is checked when a column is created too', async () => {
    const [unit] = await ctx.ds.query<{ id: string }[]>(`SELECT id FROM process_units WHERE site_id = $1`, [fx.siteId]);
    const viewer = await makeUser(ctx.ds, 'viewer', [fx.siteId]);
    const res = await specialist
      .post('/api/columns')
      .send({ unitId: unit!.id, tag: `N-${Date.now() % 100000}`, numbering: 'top-down', trayCount: 10, engineerId: viewer.id });
    expect(refusal(res)).toMatch(/is viewer/);
  });
});

describe('inspection countersignature', () => {
  async function signedInspection(inspector: Agent): Promise<{ id: string; version: number }> {
    const c = await inspector
      .post('/api/inspections')
      .send({ columnId: fx.columnId, turnaround: 'TA-duties', startDate: '2026-04-01', permitRef: 'P', gasTestRef: 'G' });
    expect(c.status, JSON.stringify(c.body)).toBe(201);
    const t = await inspector
      .put(`/api/inspections/${c.body.id}/trays/1/1`)
      .send({ findings: cleanFindings, asFound: noMeasurements, asLeft: noMeasurements });
    const s = await inspector.post(`/api/inspections/${c.body.id}/sign/inspector`).send({ version: t.body.version });
    expect(s.status, JSON.stringify(s.body)).toBe(200);
    return { id: c.body.id, version: s.body.version };
  }

  it('is never given by the inspector who signed, even after a change of role (403, saying why)', async () => {
    const { agent: inspector, user } = await signedIn(ctx, 'inspector', [fx.siteId]);
    const insp = await signedInspection(inspector);
    await setRole(user.id, 'process-engineer');
    const own = await inspector.post(`/api/inspections/${insp.id}/sign/engineer`).send({ version: insp.version });
    expect(own.status).toBe(403);
    expect(own.body.error).toMatch(/signed this inspection as its inspector; another engineer must countersign/);
    const other = (await signedIn(ctx, 'process-engineer', [fx.siteId])).agent;
    const ok = await other.post(`/api/inspections/${insp.id}/sign/engineer`).send({ version: insp.version });
    expect(ok.status, JSON.stringify(ok.body)).toBe(200);
    expect(ok.body.status).toBe('engineer-signed');
  });

  it("the column's engineer who no longer holds the permission cannot countersign (403)", async () => {
    const insp = await signedInspection((await signedIn(ctx, 'inspector', [fx.siteId])).agent);
    const { agent: eng, user } = await signedIn(ctx, 'process-engineer', [fx.siteId]);
    const col = await specialist.get(`/api/columns/${fx.columnId}`);
    expect(
      (await specialist.put(`/api/columns/${fx.columnId}`).send({ engineerId: user.id, version: col.body.version })).status,
    ).toBe(200);
    await setRole(user.id, 'viewer');
    const res = await eng.post(`/api/inspections/${insp.id}/sign/engineer`).send({ version: insp.version });
    expect(res.status).toBe(403);
    expect(res.body.error).toMatch(/Only a process engineer or internals specialist may countersign/);
    const after = await specialist.get(`/api/columns/${fx.columnId}`);
    await specialist.put(`/api/columns/${fx.columnId}`).send({ engineerId: null, version: after.body.version });
  });
});

describe('review approval is never given by the author', () => {
  it('rating run: the author cannot approve or return it; another reviewer can', async () => {
    // a label of its own: other tests find their notices by run label
    const label = `Duties check ${Date.now().toString(36)}`;
    const created = await specialist.post('/api/runs').send({ columnId: fx.columnId, loadCaseId: fx.loadCaseId, label });
    expect(created.status, JSON.stringify(created.body)).toBe(201);
    const sub = await specialist.post(`/api/runs/${created.body.id}/submit`).send({ version: created.body.version });
    expect(sub.status).toBe(200);
    for (const action of ['approve', 'return']) {
      const own = await specialist
        .post(`/api/runs/${created.body.id}/${action}`)
        .send({ version: sub.body.version, comment: 'mine' });
      expect(own.status).toBe(403);
      expect(own.body.error).toMatch(/cannot review your own run/);
    }
    const other = (await signedIn(ctx, 'internals-specialist', [fx.siteId])).agent;
    const ok = await other.post(`/api/runs/${created.body.id}/approve`).send({ version: sub.body.version, comment: 'checked' });
    expect(ok.status).toBe(200);
    expect(ok.body.status).toBe('approved');
  });

  it('pump-around study: the author cannot approve it; another reviewer can', async () => {
    const sfx = await makeStudyColumn(ctx.ds);
    const author = (await signedIn(ctx, 'internals-specialist', [sfx.siteId])).agent;
    const s = await author
      .post(`/api/columns/${sfx.columnId}/studies`)
      .send({ ...exampleBody(sfx), label: `Duties study ${Date.now().toString(36)}` });
    expect(s.status, JSON.stringify(s.body)).toBe(201);
    const sub = await author.post(`/api/studies/${s.body.id}/submit`).send({ version: s.body.version });
    expect(sub.status).toBe(200);
    const own = await author.post(`/api/studies/${s.body.id}/approve`).send({ version: sub.body.version });
    expect(own.status).toBe(403);
    expect(own.body.error).toMatch(/reviewed by someone other than its author/);
    const reviewer = (await signedIn(ctx, 'internals-specialist', [sfx.siteId])).agent;
    const ok = await reviewer.post(`/api/studies/${s.body.id}/approve`).send({ version: sub.body.version });
    expect(ok.status, JSON.stringify(ok.body)).toBe(200);
    expect(ok.body.status).toBe('approved');
  });
});
