import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { setupApp, signedIn, type TestContext } from '../helpers/app.js';
import { loads, makePlant, section, type Plant } from './columnsFixture.js';

let ctx: TestContext;
let plant: Plant;
beforeAll(async () => {
  ctx = await setupApp();
  plant = await makePlant(ctx.ds);
});
afterAll(() => ctx.close());

const auditCount = async (entityId: string): Promise<number> =>
  Number((await ctx.ds.query<{ n: string }[]>('SELECT count(*) AS n FROM audit_log WHERE entity_id = $1', [entityId]))[0]!.n);

describe('columns, sections and pump-arounds', () => {
  it('a specialist creates a column in a unit of their site; the admin route does the same; the column lists and filters', async () => {
    const { agent } = await signedIn(ctx, 'internals-specialist', [plant.siteId]);
    const res = await agent
      .post('/api/columns')
      .send({ unitId: plant.unitId, tag: 'T-NEW', numbering: 'bottom-up', trayCount: 30 });
    expect(res.status).toBe(201);
    expect(res.body).toMatchObject({
      tag: 'T-NEW',
      numbering: 'bottom-up',
      trayCount: 30,
      sections: [],
      loadCases: [],
      runs: [],
      runsTotal: 0,
    });
    expect(await auditCount(res.body.id)).toBe(1);
    const dup = await agent
      .post('/api/columns')
      .send({ unitId: plant.unitId, tag: 'T-NEW', numbering: 'top-down', trayCount: 5 });
    expect(dup.status).toBe(409);
    const { agent: admin } = await signedIn(ctx, 'admin');
    const a = await admin
      .post('/api/admin/columns')
      .send({ unitId: plant.unitId, tag: 'T-ADM', numbering: 'top-down', trayCount: 12 });
    expect(a.status).toBe(201);
    const list = await agent.get(`/api/columns?unitId=${plant.unitId}&q=T-&pageSize=2`);
    expect(list.status).toBe(200);
    expect(list.body.total).toBe(3);
    expect(list.body.items).toHaveLength(2);
  });

  it('a user without membership of the site gets 404 for the column and its children', async () => {
    const { agent } = await signedIn(ctx, 'internals-specialist');
    expect((await agent.get(`/api/columns/${plant.columnId}`)).status).toBe(404);
    expect((await agent.post(`/api/columns/${plant.columnId}/sections`).send(section(1, 4))).status).toBe(404);
    const list = await agent.get(`/api/columns?unitId=${plant.unitId}`);
    expect(list.body.total).toBe(0);
    const { agent: member } = await signedIn(ctx, 'viewer', [plant.siteId]);
    expect((await member.get(`/api/columns/${plant.columnId}`)).status).toBe(200);
  });

  it('creates sections, refuses overlaps and bad geometry naming the field, and 409s a stale edit without overwriting', async () => {
    const { agent } = await signedIn(ctx, 'internals-specialist', [plant.siteId]);
    const s = await agent.post(`/api/columns/${plant.columnId}/sections`).send(section(1, 8, 'Top'));
    expect(s.status).toBe(201);
    const overlap = await agent.post(`/api/columns/${plant.columnId}/sections`).send(section(8, 12));
    expect(overlap.status).toBe(400);
    expect(overlap.body.details).toContainEqual({ path: 'firstTray', message: 'trays 8–12 overlap section "Top" (trays 1–8)' });
    const bad = section(9, 12);
    bad.geometry.weirHeight_mm = 700;
    const badRes = await agent.post(`/api/columns/${plant.columnId}/sections`).send(bad);
    expect(badRes.status).toBe(400);
    expect(badRes.body.details.map((d: { path: string }) => d.path)).toContain('geometry.weirHeight_mm');
    const outside = await agent.post(`/api/columns/${plant.columnId}/sections`).send(section(15, 25));
    expect(outside.body.details).toContainEqual({ path: 'lastTray', message: 'tray 25 is outside the column (trays 1–20)' });
    const asLeft = { ...section(13, 14), provenance: 'as-left' };
    expect((await agent.post(`/api/columns/${plant.columnId}/sections`).send(asLeft)).body.details).toContainEqual({
      path: 'provenanceDate',
      message: 'is required for as-left geometry (the date it was measured)',
    });

    const first = await agent
      .put(`/api/sections/${s.body.id}`)
      .send({ ...section(1, 8, 'Top renamed'), version: s.body.version });
    expect(first.status).toBe(200);
    expect(first.body.version).toBe(s.body.version + 1);
    const stale = await agent.put(`/api/sections/${s.body.id}`).send({ ...section(1, 6, 'Stale'), version: s.body.version });
    expect(stale.status).toBe(409);
    expect(stale.body.error).toMatch(/changed by someone else/);
    const detail = await agent.get(`/api/columns/${plant.columnId}`);
    expect(detail.body.sections[0]).toMatchObject({ name: 'Top renamed', firstTray: 1, lastTray: 8 });
    expect(await auditCount(s.body.id)).toBe(2);
  });

  it('pump-arounds: the return must be above the draw; the column detail lists them', async () => {
    const { agent } = await signedIn(ctx, 'internals-specialist', [plant.siteId]);
    const wrong = await agent
      .post(`/api/columns/${plant.columnId}/pump-arounds`)
      .send({ name: 'PA', drawTray: 2, returnTray: 4, baseDuty_kW: 5000 });
    expect(wrong.status).toBe(400);
    expect(wrong.body.details[0].path).toBe('returnTray');
    const ok = await agent
      .post(`/api/columns/${plant.columnId}/pump-arounds`)
      .send({ name: 'PA', drawTray: 4, returnTray: 2, baseDuty_kW: 5000 });
    expect(ok.status).toBe(201);
    const stale = await agent
      .put(`/api/pump-arounds/${ok.body.id}`)
      .send({ name: 'PA', drawTray: 4, returnTray: 2, baseDuty_kW: 6000, version: ok.body.version + 1 });
    expect(stale.status).toBe(409);
    const detail = await agent.get(`/api/columns/${plant.columnId}`);
    expect(detail.body.pumpArounds).toEqual([{ ...ok.body }]);
  });

  it('load cases: create, 409 on a stale grid edit with nothing overwritten, export CSV and XLSX', async () => {
    const { agent } = await signedIn(ctx, 'process-engineer', [plant.siteId]);
    const c = await agent
      .post(`/api/columns/${plant.columnId}/load-cases`)
      .send({ name: 'Case A', basis: 'normal', source: 'typed', loads: loads(1, 8) });
    expect(c.status).toBe(201);
    expect(c.body).toMatchObject({ trayCount: 8, firstTray: 1, lastTray: 8, version: 1 });
    const edited = loads(1, 8);
    edited[0]!.liquidMassFlow_kg_h = 123456;
    const put = await agent.put(`/api/load-cases/${c.body.id}/loads`).send({ loads: edited, source: 'pasted', version: 1 });
    expect(put.status).toBe(200);
    expect(put.body.version).toBe(2);
    const stale = await agent.put(`/api/load-cases/${c.body.id}/loads`).send({ loads: loads(1, 3), version: 1 });
    expect(stale.status).toBe(409);
    const now = await agent.get(`/api/load-cases/${c.body.id}`);
    expect(now.body.loads).toHaveLength(8);
    expect(now.body.loads[0].liquidMassFlow_kg_h).toBe(123456);
    const staleRename = await agent.patch(`/api/load-cases/${c.body.id}`).send({ name: 'Renamed', version: 1 });
    expect(staleRename.status).toBe(409);

    const dupTray = loads(1, 2);
    dupTray[1]!.tray = 1;
    const bad = await agent.put(`/api/load-cases/${c.body.id}/loads`).send({ loads: dupTray, version: 2 });
    expect(bad.status).toBe(400);
    expect(bad.body.details).toContainEqual({ path: 'loads.1.tray', message: 'tray 1 appears twice (also in row 1)' });

    const csv = await agent.get(`/api/load-cases/${c.body.id}/export?format=csv`);
    expect(csv.status).toBe(200);
    expect(csv.headers['content-type']).toMatch(/text\/csv/);
    const lines = csv.text.trim().split('\r\n');
    expect(lines[0]).toBe(
      'Tray,Vapour mass flow (kg/h),Liquid mass flow (kg/h),Vapour density (kg/m³),Liquid density (kg/m³),Surface tension (mN/m),Liquid viscosity (mPa·s),Temperature (°C),Pressure (kPa)',
    );
    expect(lines).toHaveLength(9);
    expect(lines[1]!.split(',')[2]).toBe('123456');
    const xlsx = await agent
      .get(`/api/load-cases/${c.body.id}/export?format=xlsx`)
      .buffer(true)
      .parse((res, cb) => {
        const chunks: Buffer[] = [];
        res.on('data', (d: Buffer) => chunks.push(d));
        res.on('end', () => cb(null, Buffer.concat(chunks)));
      });
    expect(xlsx.status).toBe(200);
    expect((xlsx.body as Buffer).subarray(0, 2).toString('latin1')).toBe('PK');
  });
});

describe('column edits', () => {
  it('edits a column with its version, 409s a stale edit, and keeps stored tray numbers meaningful', async () => {
    const p = await makePlant(ctx.ds);
    const { agent } = await signedIn(ctx, 'internals-specialist', [p.siteId]);
    const col = (await agent.get(`/api/columns/${p.columnId}`)).body;
    const ok = await agent
      .put(`/api/columns/${p.columnId}`)
      .send({ service: 'Vacuum column', trayMarks: [{ tray: 3, kind: 'side-draw', label: 'LVGO' }], version: col.version });
    expect(ok.status).toBe(200);
    expect(ok.body).toMatchObject({
      service: 'Vacuum column',
      trayMarks: [{ tray: 3, kind: 'side-draw', label: 'LVGO' }],
      version: col.version + 1,
    });
    const stale = await agent.put(`/api/columns/${p.columnId}`).send({ service: 'Stale', version: col.version });
    expect(stale.status).toBe(409);
    expect((await agent.get(`/api/columns/${p.columnId}`)).body.service).toBe('Vacuum column');
    await agent.post(`/api/columns/${p.columnId}/sections`).send(section(1, 12));
    const flip = await agent.put(`/api/columns/${p.columnId}`).send({ numbering: 'bottom-up', version: ok.body.version });
    expect(flip.status).toBe(400);
    expect(flip.body.details[0].path).toBe('numbering');
    const cut = await agent.put(`/api/columns/${p.columnId}`).send({ trayCount: 10, version: ok.body.version });
    expect(cut.body.details).toEqual([
      { path: 'trayCount', message: 'is below tray 12, used by a section, pump-around or load case; change those first' },
    ]);
    const mark = await agent
      .put(`/api/columns/${p.columnId}`)
      .send({ trayMarks: [{ tray: 30, kind: 'note', label: 'x' }], version: ok.body.version });
    expect(mark.body.details).toEqual([{ path: 'trayMarks.0.tray', message: 'tray 30 is outside the column (trays 1–20)' }]);
  });
});

describe('deletes', () => {
  it('deletes a section, pump-around and load case only with the current version; stored runs keep their snapshot', async () => {
    const p = await makePlant(ctx.ds);
    const { agent: spec } = await signedIn(ctx, 'internals-specialist', [p.siteId]);
    const s = (await spec.post(`/api/columns/${p.columnId}/sections`).send(section(1, 8))).body;
    const pa = (
      await spec
        .post(`/api/columns/${p.columnId}/pump-arounds`)
        .send({ name: 'PA', drawTray: 4, returnTray: 2, baseDuty_kW: 1000 })
    ).body;
    const lc = (
      await spec
        .post(`/api/columns/${p.columnId}/load-cases`)
        .send({ name: 'L', basis: 'normal', source: 'typed', loads: loads(1, 8) })
    ).body;
    const run = (await spec.post('/api/runs').send({ columnId: p.columnId, loadCaseId: lc.id })).body;
    expect((await spec.delete(`/api/sections/${s.id}?version=${s.version + 1}`)).status).toBe(409);
    expect((await spec.delete(`/api/sections/${s.id}?version=${s.version}`)).status).toBe(204);
    expect((await spec.delete(`/api/pump-arounds/${pa.id}?version=${pa.version}`)).status).toBe(204);
    expect((await spec.delete(`/api/load-cases/${lc.id}`)).status).toBe(400);
    expect((await spec.delete(`/api/load-cases/${lc.id}?version=${lc.version}`)).status).toBe(204);
    const detail = (await spec.get(`/api/columns/${p.columnId}`)).body;
    expect(detail).toMatchObject({ sections: [], pumpArounds: [], loadCases: [] });
    const stored = (await spec.get(`/api/runs/${run.id}`)).body;
    expect(stored).toMatchObject({ loadCaseId: null, loadCaseName: 'L' });
    expect(stored.snapshot.sections[0].sectionId).toBe(s.id);
    const audits = await ctx.ds.query<unknown[]>(`SELECT action FROM audit_log WHERE entity_id = ANY($1) AND action = 'delete'`, [
      [s.id, pa.id, lc.id],
    ]);
    expect(audits).toHaveLength(3);
  });
});
