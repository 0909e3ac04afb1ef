import { existsSync, readdirSync, readFileSync } from 'node:fs';
import path from 'node:path';
import sharp from 'sharp';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { config } from '../../server/config.js';
import { deliverPending } from '../../server/mail/sender.js';
import { toleranceTable } from '../../server/services/reports/inspectionPdf.js';
import { makeUser, setupApp, signedIn, TEST_PASSWORD, type TestContext } from '../helpers/app.js';
import { cleanFindings, makeInspectionColumn, noMeasurements, type InspectionFixture } from './inspection-fixture.js';

let ctx: TestContext;
let fx: InspectionFixture;
type Agent = Awaited<ReturnType<typeof signedIn>>['agent'];
let inspector: Agent;
let engineer: Agent;
let engineerEmail: string;
let inspectionId: string;
let version: number;
let png: Buffer;

async function mailTo(address: string, timeoutMs = 8000): Promise<{ to: string[]; subject: string }[]> {
  const t0 = Date.now();
  for (;;) {
    await deliverPending(ctx.ds);
    const found = existsSync(config.mailboxDir)
      ? readdirSync(config.mailboxDir)
          .filter((n) => n.endsWith('.json'))
          .map((f) => JSON.parse(readFileSync(path.join(config.mailboxDir, f), 'utf8')) as { to: string[]; subject: string })
          .filter((m) => m.to.includes(address))
      : [];
    if (found.length || Date.now() - t0 > timeoutMs) return found;
    await new Promise((r) => setTimeout(r, 150));
  }
}

beforeAll(async () => {
  ctx = await setupApp();
  const eng = await makeUser(ctx.ds, 'process-engineer');
  engineerEmail = eng.email;
  fx = await makeInspectionColumn(ctx.ds, eng.id);
  await ctx.ds.query(`INSERT INTO site_members (site_id, user_id) VALUES ($1, $2)`, [fx.siteId, eng.id]);
  inspector = (await signedIn(ctx, 'inspector', [fx.siteId])).agent;
  engineer = request.agent(ctx.app);
  expect((await engineer.post('/api/auth/sign-in').send({ email: eng.email, password: TEST_PASSWORD })).status).toBe(200);
  png = await sharp({ create: { width: 64, height: 48, channels: 3, background: '#8a6d3b' } })
    .png()
    .toBuffer();
});
afterAll(() => ctx.close());

describe('inspections: records and tolerance checks', () => {
  it('an inspector starts an inspection and records a tray; measurements are checked against the section design (PIP VEFV1102)', async () => {
    const c = await inspector
      .post('/api/inspections')
      .send({ columnId: fx.columnId, turnaround: 'TA-test', startDate: '2026-03-02', permitRef: 'CSE-1', gasTestRef: 'GT-1' });
    expect(c.status, JSON.stringify(c.body)).toBe(201);
    inspectionId = c.body.id;
    const t = await inspector.put(`/api/inspections/${inspectionId}/trays/3/1`).send({
      findings: { ...cleanFindings, fouling: true, blockedPercent: 30 },
      asFound: { weirHeight_mm: [51.0, 52.0], downcomerClearance_mm: [38.5], levelness_mm: 4, traySpacing_mm: 612 },
      asLeft: noMeasurements,
    });
    expect(t.status, JSON.stringify(t.body)).toBe(200);
    const tray = t.body.trays[0];
    expect(tray.design).toMatchObject({
      weirHeight_mm: 50,
      downcomerClearance_mm: 38,
      traySpacing_mm: 610,
      columnDiameter_mm: 2000,
    });
    // design weir 50 mm ±1.6 mm: 51.0 passes, 52.0 fails; clearance 38.5 passes; levelness 4 mm ≤ 5 mm (class A, 1500–3000 mm); spacing +2 ≤ 3
    expect(tray.checks.asFound.map((x: { item: string; pass: boolean }) => `${x.item}:${x.pass}`)).toEqual([
      'weirHeight:true',
      'weirHeight:false',
      'downcomerClearance:true',
      'traySpacing:true',
      'levelness:true',
    ]);
    expect(t.body.failedChecks).toBe(1);
    version = t.body.version;
  });

  it('bad measurements are refused naming the field', async () => {
    const r = await inspector.put(`/api/inspections/${inspectionId}/trays/4/1`).send({
      findings: cleanFindings,
      asFound: { ...noMeasurements, weirHeight_mm: [-3] },
      asLeft: noMeasurements,
    });
    expect(r.status).toBe(400);
    expect(r.body.details[0].path).toMatch(/asFound\.weirHeight_mm/);
    const r2 = await inspector
      .put(`/api/inspections/${inspectionId}/trays/40/1`)
      .send({ findings: cleanFindings, asFound: noMeasurements, asLeft: noMeasurements });
    expect(r2.status).toBe(400);
    expect(r2.body.details[0]).toMatchObject({ path: 'tray' });
  });

  it('a pass the tray does not have is refused naming the field (the fixture column has one pass)', async () => {
    const t = await inspector
      .put(`/api/inspections/${inspectionId}/trays/4/2`)
      .send({ findings: cleanFindings, asFound: noMeasurements, asLeft: noMeasurements });
    expect(t.status).toBe(400);
    expect(t.body.details).toEqual([{ path: 'pass', message: 'tray 4 has one pass: the pass is 1' }]);
    const p = await inspector
      .post(`/api/inspections/${inspectionId}/punch`)
      .send({ tray: 4, pass: 2, finding: 'Loose clamp', action: 'Tighten', priority: 'before-box-up' });
    expect(p.status).toBe(400);
    expect(p.body.details[0].path).toBe('pass');
    const ph = await inspector.post(`/api/inspections/${inspectionId}/photos`).field('pass', '3').attach('photo', png, 'x.png');
    expect(ph.status).toBe(400);
    expect(ph.body.details[0]).toMatchObject({ path: 'pass', message: expect.stringMatching(/more than one pass/) });
    const rec = (await inspector.get(`/api/inspections/${inspectionId}`)).body;
    expect(rec.trays.some((x: { tray: number }) => x.tray === 4)).toBe(false);
    expect(rec.punch.some((x: { finding: string }) => x.finding === 'Loose clamp')).toBe(false);
    expect(rec.designSections[0].passes).toBe(1);
  });
});

describe('inspection photos', () => {
  let photoId: string;
  it('accepts a PNG, stores it with a thumbnail and streams both back', async () => {
    const r = await inspector
      .post(`/api/inspections/${inspectionId}/photos`)
      .field('tray', '3')
      .field('finding', 'fouling')
      .attach('photo', png, 'deck.png');
    expect(r.status, JSON.stringify(r.body)).toBe(201);
    expect(r.body).toMatchObject({ contentType: 'image/png', width: 64, height: 48, tray: 3 });
    photoId = r.body.id;
    const o = await inspector.get(`/api/inspections/${inspectionId}/photos/${photoId}`).buffer(true);
    expect(o.status).toBe(200);
    expect(o.headers['content-type']).toBe('image/png');
    expect(Buffer.compare(o.body as Buffer, png)).toBe(0);
    const th = await inspector.get(`/api/inspections/${inspectionId}/photos/${photoId}?size=thumb`).buffer(true);
    expect(th.headers['content-type']).toBe('image/jpeg');
    expect((th.body as Buffer).subarray(0, 3)).toEqual(Buffer.from([0xff, 0xd8, 0xff]));
  });

  it('refuses a file that is not JPEG, PNG or WebP by content, whatever its name and declared type', async () => {
    const r = await inspector
      .post(`/api/inspections/${inspectionId}/photos`)
      .attach('photo', Buffer.from('%PDF-1.7 not a photo'), { filename: 'x.jpg', contentType: 'image/jpeg' });
    expect(r.status).toBe(400);
    expect(r.body.error).toBe('Unsupported photo type');
    expect(r.body.details[0]).toMatchObject({ path: 'photo' });
    expect(r.body.details[0].message).toMatch(/JPEG, PNG or WebP/);
  });

  it('refuses a form field the contract does not declare, naming it', async () => {
    const odd = await inspector
      .post(`/api/inspections/${inspectionId}/photos`)
      .field('colour', 'red')
      .attach('photo', png, 'deck.png');
    expect(odd.status).toBe(400);
    expect(odd.body.details).toEqual([{ path: 'colour', message: 'is not an allowed field' }]);
  });

  it('refuses an oversize photo with 413 naming the field and the limit', async () => {
    const big = Buffer.alloc(config.photoMaxBytes + 1, 0);
    big.set([0xff, 0xd8, 0xff], 0);
    const r = await inspector.post(`/api/inspections/${inspectionId}/photos`).attach('photo', big, 'big.jpg');
    expect(r.status).toBe(413);
    expect(r.body.error).toMatch(/"photo".*MB/);
    expect(r.body.details[0].path).toBe('photo');
  });

  it('a request without a photo is refused naming the field', async () => {
    const r = await inspector.post(`/api/inspections/${inspectionId}/photos`).field('tray', '3');
    expect(r.status).toBe(400);
    expect(r.body.details).toEqual([{ path: 'photo', message: 'is required (multipart field "photo")' }]);
  });

  it('a viewer without access to the site cannot read the photo (404); one with access can', async () => {
    const outsider = (await signedIn(ctx, 'viewer')).agent;
    const r = await outsider.get(`/api/inspections/${inspectionId}/photos/${photoId}`);
    expect(r.status).toBe(404);
    expect(r.headers['content-type']).toMatch(/json/);
    expect((await outsider.get(`/api/inspections/${inspectionId}`)).status).toBe(404);
    const member = (await signedIn(ctx, 'viewer', [fx.siteId])).agent;
    expect((await member.get(`/api/inspections/${inspectionId}/photos/${photoId}?size=thumb`)).status).toBe(200);
  });
});

describe('rating as found', () => {
  it('plugged holes give a higher dry pressure drop than design on the same load case', async () => {
    const r = await engineer
      .post(`/api/inspections/${inspectionId}/as-found`)
      .send({ loadCaseId: fx.loadCaseId, combine: 'average' });
    expect(r.status, JSON.stringify(r.body)).toBe(201);
    const g = r.body.geometry[fx.sectionId];
    expect(g.blockedPercent).toBe(30);
    expect(g.holeArea_m2).toBeCloseTo(0.25 * 0.7, 6);
    expect(g.weirHeight_mm).toBeCloseTo(51.5, 6);
    const t3 = r.body.trays.find((t: { tray: number }) => t.tray === 3);
    // orifice dry head scales with (hole velocity)²: 30 % fewer holes → about (1/0.7)² ≈ 2× the dry drop
    expect(t3.dryPressureDrop_mm.asFound).toBeGreaterThan(t3.dryPressureDrop_mm.design * 1.5);
    expect(t3.liquidDensity_kg_m3).toBe(700); // the fixture's load case: the page shows the head in the user's ΔP unit
    expect(r.body.asFoundRunId).not.toBe(r.body.designRunId);
    const rec = await engineer.get(`/api/inspections/${inspectionId}`);
    expect(rec.body.asFoundRunIds).toContain(r.body.asFoundRunId);
  });

  it('its two runs stay out of the column page and the run list unless asked for', async () => {
    const col = await engineer.get(`/api/columns/${fx.columnId}`);
    const ids = (xs: { id: string; kind: string }[]) => xs.map((x) => x.id);
    const kinds = async (q: string) =>
      (await engineer.get(`/api/runs?columnId=${fx.columnId}${q}`)).body.items as { id: string; kind: string }[];
    const everything = await kinds('&inspection=true');
    const design = everything.find((x) => x.kind === 'as-found-design');
    const asFound = everything.find((x) => x.kind === 'as-found');
    expect(design && asFound).toBeTruthy();
    expect(ids(col.body.runs)).not.toContain(design!.id);
    expect(ids(col.body.runs)).not.toContain(asFound!.id);
    expect(col.body.runsTotal).toBe(col.body.runs.length); // ratings only
    expect((await kinds('')).every((x) => x.kind === 'rating')).toBe(true);
  });
});

describe('punch list and sign-off', () => {
  let itemId: string;
  it('an open before-box-up punch item blocks the inspector signature (409)', async () => {
    const p = await inspector.post(`/api/inspections/${inspectionId}/punch`).send({
      tray: 3,
      pass: 1,
      finding: 'Deck 30 % plugged',
      action: 'Hydro-blast deck',
      priority: 'before-box-up',
      owner: 'Contractor',
    });
    expect(p.status).toBe(201);
    itemId = p.body.punch[0].id;
    const s = await inspector.post(`/api/inspections/${inspectionId}/sign/inspector`).send({ version: p.body.version });
    expect(s.status).toBe(409);
    expect(s.body.error).toMatch(/before-box-up.*#1/);
  });

  it('the engineer cannot sign before the inspector', async () => {
    const cur = await inspector.get(`/api/inspections/${inspectionId}`);
    const s = await engineer.post(`/api/inspections/${inspectionId}/sign/engineer`).send({ version: cur.body.version });
    expect(s.status).toBe(409);
  });

  it('closing the item records who and when; the inspector signs and the column engineer is e-mailed', async () => {
    const cur = await inspector.get(`/api/inspections/${inspectionId}`);
    const c = await inspector
      .patch(`/api/inspections/${inspectionId}/punch/${itemId}`)
      .send({ status: 'closed', version: cur.body.punch[0].version });
    expect(c.status).toBe(200);
    expect(c.body.punch[0].closedAt).toBeTruthy();
    expect(c.body.punch[0].closedByName).toMatch(/inspector/);
    const s = await inspector.post(`/api/inspections/${inspectionId}/sign/inspector`).send({ version: c.body.version });
    expect(s.status, JSON.stringify(s.body)).toBe(200);
    expect(s.body.status).toBe('inspector-signed');
    const mails = await mailTo(engineerEmail);
    expect(mails.length).toBe(1);
    expect(mails[0]!.subject).toBe(`Inspection of ${fx.tag} (TA-test) signed by the inspector — your sign-off is due`);
    version = s.body.version;
  });

  it('a signed record is read-only: tray, header, punch and photo edits answer 409', async () => {
    const t = await inspector
      .put(`/api/inspections/${inspectionId}/trays/5/1`)
      .send({ findings: cleanFindings, asFound: noMeasurements, asLeft: noMeasurements });
    expect(t.status).toBe(409);
    expect(t.body.error).toMatch(/read-only/);
    expect((await inspector.patch(`/api/inspections/${inspectionId}`).send({ notes: 'x', version })).status).toBe(409);
    expect(
      (
        await inspector
          .post(`/api/inspections/${inspectionId}/punch`)
          .send({ finding: 'f', action: 'a', priority: 'next-turnaround' })
      ).status,
    ).toBe(409);
    expect((await inspector.post(`/api/inspections/${inspectionId}/photos`).attach('photo', png, 'late.png')).status).toBe(409);
  });

  it("another engineer may not countersign (403); the column's engineer does", async () => {
    const other = (await signedIn(ctx, 'internals-specialist', [fx.siteId])).agent;
    expect((await other.post(`/api/inspections/${inspectionId}/sign/engineer`).send({ version })).status).toBe(403);
    const s = await engineer.post(`/api/inspections/${inspectionId}/sign/engineer`).send({ version });
    expect(s.status, JSON.stringify(s.body)).toBe(200);
    expect(s.body.status).toBe('engineer-signed');
    expect(s.body.engineerSignature.name).toMatch(/process-engineer/);
  });
});

describe('PDF report', () => {
  it('renders a PDF with the shipped font for a signed inspection', async () => {
    const r = await inspector
      .get(`/api/inspections/${inspectionId}/report.pdf`)
      .buffer(true)
      .parse((res, cb) => {
        const chunks: Buffer[] = [];
        res.on('data', (c: Buffer) => chunks.push(c));
        res.on('end', () => cb(null, Buffer.concat(chunks)));
      });
    expect(r.status).toBe(200);
    expect(r.headers['content-type']).toBe('application/pdf');
    const pdf = r.body as Buffer;
    expect(pdf.subarray(0, 5).toString()).toBe('%PDF-');
    expect(pdf.toString('latin1')).toMatch(/NotoSans/);
    expect(pdf.length).toBeGreaterThan(10000);
  });

  it('says in a sentence that nothing was checked when no measurement was entered, instead of an empty table', async () => {
    const c = await inspector
      .post('/api/inspections')
      .send({ columnId: fx.columnId, turnaround: 'TA-no-measure', startDate: '2026-03-03' });
    expect(c.status, JSON.stringify(c.body)).toBe(201);
    const t = await inspector
      .put(`/api/inspections/${c.body.id}/trays/5/1`)
      .send({ findings: cleanFindings, asFound: noMeasurements, asLeft: noMeasurements });
    expect(t.status, JSON.stringify(t.body)).toBe(200);
    const none = JSON.stringify(toleranceTable(t.body));
    expect(none).not.toContain('"table"');
    expect(none).toMatch(/nothing is checked against the tolerances/);
    const measured = JSON.stringify(toleranceTable((await inspector.get(`/api/inspections/${inspectionId}`)).body));
    expect(measured).toContain('"table"');
    expect(measured).toContain('Outlet weir height, point 1');
  });
});

describe('project rule set', () => {
  it('an inspection may check against a user-entered project set; an empty project set is refused naming the field', async () => {
    const bad = await inspector.post('/api/inspections').send({
      columnId: fx.columnId,
      turnaround: 'TA-project',
      startDate: '2026-03-02',
      rules: {
        kind: 'project',
        levelnessClass: 'A',
        project: { id: 'p', name: 'Project sheet', source: 'project spec', rules: [] },
      },
    });
    expect(bad.status).toBe(400);
    expect(bad.body.details[0].path).toBe('rules.project');
    const c = await inspector.post('/api/inspections').send({
      columnId: fx.columnId,
      turnaround: 'TA-project',
      startDate: '2026-03-02',
      rules: {
        kind: 'project',
        levelnessClass: 'A',
        project: {
          id: 'p',
          name: 'Project sheet',
          source: 'project spec rev B',
          rules: [{ item: 'weirHeight', label: 'Weir ±', plusMinus_mm: 1, source: 'project spec rev B' }],
        },
      },
    });
    expect(c.status).toBe(201);
    const t = await inspector
      .put(`/api/inspections/${c.body.id}/trays/2/1`)
      .send({ findings: cleanFindings, asFound: { ...noMeasurements, weirHeight_mm: [51.5] }, asLeft: noMeasurements });
    // 1.5 mm high passes PIP (±1.6 mm) but fails the project's ±1 mm
    expect(t.body.trays[0].checks.asFound[0]).toMatchObject({ pass: false, tolerance: 1, source: 'project spec rev B' });
    expect(t.body.ruleSet.name).toBe('Project sheet');
  });
});

describe('draft edits with optimistic locking', () => {
  it('the header is edited with its version; a stale version or a stale tray record answers 409', async () => {
    const c = await inspector
      .post('/api/inspections')
      .send({ columnId: fx.columnId, turnaround: 'TA-lock', startDate: '2026-03-02' });
    const e = await inspector
      .patch(`/api/inspections/${c.body.id}`)
      .send({ permitRef: 'CSE-9', endDate: '2026-03-20', version: c.body.version });
    expect(e.status, JSON.stringify(e.body)).toBe(200);
    expect(e.body).toMatchObject({ permitRef: 'CSE-9', endDate: '2026-03-20' });
    const stale = await inspector.patch(`/api/inspections/${c.body.id}`).send({ notes: 'x', version: c.body.version });
    expect(stale.status).toBe(409);
    expect(stale.body.details[0].path).toBe('version');
    const before = await inspector
      .patch(`/api/inspections/${c.body.id}`)
      .send({ endDate: '2026-02-01', version: e.body.version });
    expect(before.status).toBe(400);
    expect(before.body.details[0].path).toBe('endDate');

    const body = { findings: cleanFindings, asFound: noMeasurements, asLeft: noMeasurements };
    const t1 = await inspector.put(`/api/inspections/${c.body.id}/trays/1/1`).send(body);
    expect(t1.status).toBe(200);
    const again = await inspector.put(`/api/inspections/${c.body.id}/trays/1/1`).send(body);
    expect(again.status).toBe(409);
    const v = t1.body.trays[0].version;
    expect((await inspector.put(`/api/inspections/${c.body.id}/trays/1/1`).send({ ...body, version: v })).status).toBe(200);
    expect((await inspector.put(`/api/inspections/${c.body.id}/trays/1/1`).send({ ...body, version: v })).status).toBe(409);
  });
});
