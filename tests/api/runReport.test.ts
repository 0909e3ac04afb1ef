import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { runReportDoc, trayRanges, valveTable } from '../../server/services/reports/runReportPdf.js';
import { pageFrame } from '../../server/services/reports/pdfEngine.js';
import { config } from '../../server/config.js';
import { setupApp, signedIn, type TestContext } from '../helpers/app.js';
import { loads, makePlant, section, type Plant } from './columnsFixture.js';
import type { RunRecord, RunWindow } from '../../shared/types/runs.js';

/** The printed rating report (PDF): review record, engine version, charts, notes once, header and footer. */
let ctx: TestContext;
let plant: Plant;
type Agent = Awaited<ReturnType<typeof signedIn>>['agent'];
let engineer: Agent;
let specialist: Agent;
let run: RunRecord;
let reviewer: string;

beforeAll(async () => {
  ctx = await setupApp();
  plant = await makePlant(ctx.ds);
  const s = await signedIn(ctx, 'internals-specialist', [plant.siteId]);
  [specialist, reviewer] = [s.agent, (await s.agent.get('/api/auth/me')).body.user.name];
  engineer = (await signedIn(ctx, 'process-engineer', [plant.siteId])).agent;
  for (const sec of [section(1, 8, 'Top'), section(9, 16, 'Middle')])
    await specialist.post(`/api/columns/${plant.columnId}/sections`).send(sec);
  const lc = (
    await engineer
      .post(`/api/columns/${plant.columnId}/load-cases`)
      .send({ name: 'Normal', basis: 'normal', source: 'typed', loads: loads(1, 16) })
  ).body.id;
  const made = (await engineer.post('/api/runs').send({ columnId: plant.columnId, loadCaseId: lc, label: 'Report check' })).body;
  const sub = await engineer.post(`/api/runs/${made.id}/submit`).send({ version: made.version, comment: 'please check tray 3' });
  const ok = await specialist
    .post(`/api/runs/${made.id}/approve`)
    .send({ version: sub.body.version, comment: 'Agreed for the MOC file' });
  expect(ok.status).toBe(200);
  run = (await engineer.get(`/api/runs/${made.id}`)).body;
});
afterAll(() => ctx.close());

/** The run's PDF as the engineer gets it, as bytes. */
const getPdf = () =>
  engineer
    .get(`/api/runs/${run.id}/report.pdf`)
    .buffer(true)
    .parse((r, cb) => {
      const chunks: Buffer[] = [];
      r.on('data', (c: Buffer) => chunks.push(c));
      r.on('end', () => cb(null, Buffer.concat(chunks)));
    });
/** Page sizes (width height, in points) of an uncompressed-dictionary PDF such as pdfmake writes. */
const mediaBoxes = (pdf: Buffer) =>
  new Set(
    [...pdf.toString('latin1').matchAll(/\/MediaBox \[\s*0 0 ([\d.]+) ([\d.]+)\s*\]/g)].map(
      (m) => `${Math.round(+m[1]!)} ${Math.round(+m[2]!)}`,
    ),
  );

describe('rating report PDF', () => {
  it('is a PDF of several A4 pages with header and footer naming column, run and page x of y', async () => {
    const res = await getPdf();
    expect(res.status).toBe(200);
    expect(res.headers['content-type']).toBe('application/pdf');
    const pdf = (res.body as Buffer).toString('latin1');
    expect(pdf.startsWith('%PDF')).toBe(true);
    expect(Number(/\/Type \/Pages[\s\S]*?\/Count (\d+)/.exec(pdf)?.[1])).toBeGreaterThanOrEqual(4);
    const doc = runReportDoc(run, null, 'SI', new Date('2026-05-04T09:12:30.123Z'));
    const frame = pageFrame(doc);
    const header = JSON.stringify(frame.header());
    expect(header).toContain(`${run.snapshot.column.tag} · Report check · tray rating report`);
    expect(header).not.toMatch(/page \d/); // "page x of y" once per page, in the footer
    expect(JSON.stringify(frame.footer(5, 5))).toMatch(/engine \d+\.\d+\.\d+ · printed 2026-05-04 09:12 UTC.*page 5 of 5/);
    expect(mediaBoxes(res.body as Buffer)).toEqual(new Set(['842 595'])); // A4 landscape for an SI user
  });

  it('is printed on US Letter for a user working in US customary units', async () => {
    expect((await engineer.put('/api/auth/preferences').send({ unitSystem: 'US' })).status).toBe(200);
    try {
      const res = await getPdf();
      expect(res.status).toBe(200);
      expect(mediaBoxes(res.body as Buffer)).toEqual(new Set(['792 612'])); // Letter landscape, 11 × 8.5 in
    } finally {
      await engineer.put('/api/auth/preferences').send({ unitSystem: 'SI' });
    }
  });

  it('says who approved it and when, with the review comment, and prints each kind of warning once', () => {
    const text = JSON.stringify(runReportDoc(run, null, 'SI').content);
    expect(text).toMatch(new RegExp(`Approved: approved by ${reviewer} on \\d{4}-\\d\\d-\\d\\d \\d\\d:\\d\\d UTC`));
    expect(text).toContain('Review comment: “Agreed for the MOC file”');
    expect(text).toContain('please check tray 3');
    expect(text).toContain('<svg'); // the percent-of-limit chart
    expect(text).not.toMatch(/\d{2}:\d{2}:\d{2}\.\d{3}Z/); // no raw timestamps
    const codes = run.results.trays.flatMap((t) => t.warnings.map((w) => w.code));
    const notes = /"ol":\[(.*?)\]/.exec(text)?.[1] ?? '';
    if (codes.length) expect(notes.split('","').length).toBe(new Set(codes).size);
  });

  it('draws the operating window of the controlling tray when given', async () => {
    const w = (await engineer.get(`/api/runs/${run.id}/window/${run.results.controllingTray}`)).body as RunWindow;
    const text = JSON.stringify(runReportDoc(run, w, 'US').content);
    expect(text).toContain(`Operating window of the controlling tray ${run.results.controllingTray}`);
    expect(text).toContain('Liquid (lb/h)');
  });

  it("lists the moving-valve trays with Klein's balance points and the valve state", () => {
    // the fixture section is the demo's moving-valve geometry
    const text = JSON.stringify(runReportDoc(run, null, 'SI').content);
    expect(text).toContain('Moving valves (Klein)');
    const t = run.results.trays[0]!;
    expect(t.details.valvesStartOpenVelocity_m_s).toBeGreaterThan(0);
    expect(t.details.valvesAllOpenVelocity_m_s).toBeGreaterThan(t.details.valvesStartOpenVelocity_m_s!);
    const rows = valveTable(run, 'SI')[1] as { table: { body: unknown[][] } };
    expect(rows.table.body).toHaveLength(run.results.trays.length + 1);
    expect(rows.table.body[1]![4]).toMatch(/^(closed|partly open|all open)$/);
  });

  it('the review notices end with the full address of the run', async () => {
    const rows = await ctx.ds.query<{ kind: string; body: string }[]>(
      `SELECT kind, body FROM mail_outbox WHERE body LIKE $1 ORDER BY created_at`,
      [`%${run.id}%`],
    );
    expect(rows.map((r) => r.kind)).toEqual(['run.submitted', 'run.approved']);
    for (const r of rows) expect(r.body).toMatch(new RegExp(`Open it in Frothline: ${config.appUrl}/runs/${run.id}$`));
    expect(config.appUrl).toMatch(/^https?:\/\/[^/]+(\/.*[^/])?$/);
  });

  it('tray ranges read as people write them', () => {
    expect(trayRanges([9, 3, 4, 5, 12, 11])).toBe('3–5, 9, 11–12');
  });
});
