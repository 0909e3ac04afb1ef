/**
 * What users read and sign carries no drafting notes and no internal ids (issue 13): the methods list,
 * a run's report data (a Kister & Haas run with flooded, dry and unloaded trays), a run export's headers
 * and statuses, and the inspection PDF's text. Also: one verdict per tray and the section coverage, over the API.
 */
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { inspectionDoc } from '../../server/services/reports/inspectionPdf.js';
import { runReportDoc } from '../../server/services/reports/runReportPdf.js';
import { CHECK_NAMES } from '../../shared/types/rating.js';
import type { MethodsPayload } from '../../shared/types/methods.js';
import type { RunRecord } from '../../shared/types/runs.js';
import type { InspectionRecord } from '../../shared/types/inspections.js';
import { coverageSentence, sectionCoverage, trayState } from '../../shared/verdict.js';
import { LIMIT_LABELS } from '../../shared/labels.js';
import { setupApp, signedIn, type TestContext } from '../helpers/app.js';
import { loads, makePlant, section } from './columnsFixture.js';
import { cleanFindings, makeInspectionColumn, noMeasurements } from './inspection-fixture.js';

/** Drafting notes, our notes files and provenance tags: never in what users read. */
const DRAFTING = [
  /from memory/i,
  /to confirm/i,
  /not yet confirmed/i,
  /\brecalled\b/i,
  /\[seen/i,
  /\[S\d+\]/,
  /\.md\b/i,
  /reference sheet/i,
];
/** Internal ids: camelCase identifiers (jetFlood, weirLoadingVolumetric) and bare engine statuses. */
const CAMEL_ID = /\b[a-z]+[A-Z][A-Za-z]*\b/;

/** The text a PDF's reader reads: strings under text, lists, stacks, columns and table bodies (not styles or charts). */
function readerText(node: unknown): string[] {
  if (typeof node === 'string') return [node];
  if (Array.isArray(node)) return node.flatMap(readerText);
  if (node && typeof node === 'object') {
    const o = node as Record<string, unknown>;
    return ['text', 'ul', 'ol', 'stack', 'columns', 'table', 'body'].flatMap((k) => (k in o ? readerText(o[k]) : []));
  }
  return [];
}

function drafting(texts: string[]): string[] {
  return texts.filter((t) => DRAFTING.some((re) => re.test(t)));
}

let ctx: TestContext;
type Agent = Awaited<ReturnType<typeof signedIn>>['agent'];
let specialist: Agent;
let run: RunRecord;

beforeAll(async () => {
  ctx = await setupApp();
  const plant = await makePlant(ctx.ds);
  specialist = (await signedIn(ctx, 'internals-specialist', [plant.siteId])).agent;
  for (const s of [section(1, 8, 'Top'), section(9, 20, 'Lower')])
    expect((await specialist.post(`/api/columns/${plant.columnId}/sections`).send(s)).status).toBe(201);
  // invented loads: trays 1–3 pushed past flood, tray 5 with no liquid, no loads for trays 15–20
  const l = loads(1, 14).map((x) =>
    x.tray <= 3
      ? { ...x, vapourMassFlow_kg_h: x.vapourMassFlow_kg_h * 1.6 }
      : x.tray === 5
        ? { ...x, liquidMassFlow_kg_h: 0 }
        : x,
  );
  const lc = await specialist
    .post(`/api/columns/${plant.columnId}/load-cases`)
    .send({ name: 'Stress', basis: 'maximum', source: 'typed', loads: l });
  expect(lc.status).toBe(201);
  const res = await specialist
    .post('/api/runs')
    .send({ columnId: plant.columnId, loadCaseId: lc.body.id, label: 'Kister & Haas', methods: { jetFlood: 'kister-haas' } });
  expect(res.status, JSON.stringify(res.body)).toBe(201);
  run = (await specialist.get(`/api/runs/${res.body.id}`)).body;
});
afterAll(() => ctx.close());

describe('one verdict per tray, over the API', () => {
  it('flooded trays are flooded and controlled by jet flood; the dry tray is dry; the section says it was rated on fewer trays', () => {
    const byTray = new Map(run.results.trays.map((t) => [t.tray, t]));
    for (const n of [1, 2, 3]) {
      const t = byTray.get(n)!;
      expect(trayState(t), `tray ${n}`).toBe('flooded');
      expect(t.controllingCheck).toBe('jetFlood');
      expect(t.checks.entrainment!.status).toBe('na');
    }
    expect(trayState(byTray.get(5)!)).toBe('dry');
    expect(byTray.get(5)!.checks.liquidLoad!.status).toBe('na');
    expect(run.results.traysOver).toEqual(expect.arrayContaining([1, 2, 3, 5]));
    const lower = run.results.sections.find((s) => s.name === 'Lower')!;
    const c = sectionCoverage(
      lower.firstTray,
      lower.lastTray,
      run.results.trays.map((t) => t.tray),
    );
    expect(coverageSentence(c)).toBe('rated 6 of 12 trays; no loads for trays 15–20');
  });

  it('a check that does not apply (downcomer seal with the clearance below the weir) is reported so', () => {
    const t = run.results.trays.find((x) => x.tray === 8)!;
    expect(t.checks.downcomerSeal!.status).toBe('na');
  });
});

describe('no drafting notes and no internal ids in what users read', () => {
  it('the methods list: published sources, uncertainty in plain words, no drafting notes', async () => {
    const m = (await specialist.get('/api/methods')).body as MethodsPayload;
    const texts = [
      ...m.methods.flatMap((x) => [x.label, x.source, x.uncertainty ?? '']),
      ...m.limits.flatMap((l) => [l.note, l.source]),
      ...m.cautions,
    ];
    expect(drafting(texts)).toEqual([]);
    expect(m.limits.map((l) => l.note).filter((n) => /'(near|over|ok)'/.test(n))).toEqual([]);
    // every row of the default-limits table has the product's label (its key is an id)
    expect(m.limits.filter((l) => !LIMIT_LABELS[l.check]).map((l) => l.check)).toEqual([]);
    // every method names its source; the Kister & Haas transition height states its uncertainty once, here
    for (const x of m.methods) expect(x.source.length, x.id).toBeGreaterThan(10);
    const hct = m.methods.find((x) => x.id === 'transitionClearLiquidHeightKisterHaas')!;
    expect(`${hct.source} ${hct.uncertainty ?? ''}`).toMatch(/uncertain/i);
    expect(m.methods.find((x) => x.id === 'kisterHaasFloodCapacity')!.uses).toContain(hct.id);
  });

  it("a run's report data: warnings without drafting notes, the method uncertainty not repeated on every tray", () => {
    const warnings = [...run.results.trays.flatMap((t) => t.warnings), ...run.results.sections.flatMap((s) => s.warnings)];
    expect(warnings.length).toBeGreaterThan(0);
    expect(drafting(warnings.map((w) => w.message))).toEqual([]);
    expect(warnings.filter((w) => /\b(over|near)\b.*status|status '?(over|near)/.test(w.message))).toEqual([]);
    // no warning text is carried by every tray of the run (section-wide notes are said once, per section)
    const perTray = run.results.trays.map((t) => new Set(t.warnings.filter((w) => w.tray !== undefined).map((w) => w.message)));
    const onEvery = [...perTray[0]!].filter((msg) => perTray.every((s) => s.has(msg)));
    expect(onEvery).toEqual([]);
  });

  it("a run export: the product's labels in the headers and words for the statuses", async () => {
    const csv = (await specialist.get(`/api/runs/${run.id}/export?format=csv`)).text;
    const lines = csv.split('\r\n');
    const header = lines.find((l) => l.startsWith('Tray,'))!;
    expect(header.split(',').filter((h) => CAMEL_ID.test(h))).toEqual([]);
    for (const c of CHECK_NAMES) expect(header).not.toContain(c);
    const cells = lines.filter((l) => /^\d+,/.test(l)).flatMap((l) => l.split(','));
    expect(cells.filter((c) => ['ok', 'near', 'over', 'na'].includes(c) || CAMEL_ID.test(c))).toEqual([]);
    expect(cells).toEqual(expect.arrayContaining(['flooded', 'dry (no liquid)', 'not applicable', 'Jet flood']));
    expect(drafting(lines)).toEqual([]);
  });

  it('the rating report PDF text: verdicts in words, sources without drafting notes, uncertainty once', () => {
    const doc = runReportDoc(run, null, 'SI');
    const text = [doc.header, doc.footer, ...readerText(doc.content)];
    expect(drafting(text)).toEqual([]);
    // equations keep their symbols (rhoL, dH); every other text is words
    expect(text.filter((t) => CAMEL_ID.test(t) && !/[=^]/.test(t))).toEqual([]);
    const all = text.join('\n');
    expect(all).toMatch(/Flooded: trays 1–3 past jet flood/);
    expect(all).toMatch(/dry \(no liquid\): trays 5/);
    expect(all).toMatch(/Lower: rated 6 of 12 trays; no loads for trays 15–20/);
    expect(all).toMatch(/at least/);
    // the transition-height uncertainty: once, in the methods table, not per tray
    expect(all.match(/uncertain/gi)?.length ?? 0).toBeGreaterThan(0);
    expect(text.filter((t) => /Kister & Haas.*transition/i.test(t)).length).toBeLessThanOrEqual(2);
  });

  it('the inspection PDF text: the tolerance standard as source, no notes files, labels instead of ids', async () => {
    const { makeUser } = await import('../helpers/app.js');
    const eng = await makeUser(ctx.ds, 'process-engineer');
    const fx = await makeInspectionColumn(ctx.ds, eng.id);
    const inspector = (await signedIn(ctx, 'inspector', [fx.siteId])).agent;
    const c = await inspector
      .post('/api/inspections')
      .send({ columnId: fx.columnId, turnaround: 'TA-text', startDate: '2026-03-02', permitRef: 'P-1', gasTestRef: 'G-1' });
    expect(c.status).toBe(201);
    const t = await inspector.put(`/api/inspections/${c.body.id}/trays/3/1`).send({
      findings: { ...cleanFindings, damage: 'uplift' },
      asFound: { weirHeight_mm: [51.0], downcomerClearance_mm: [38.5], levelness_mm: 4, traySpacing_mm: 612 },
      asLeft: noMeasurements,
    });
    expect(t.status).toBe(200);
    const rec = (await inspector.get(`/api/inspections/${c.body.id}`)).body as InspectionRecord;
    const doc = inspectionDoc(rec, []);
    const text = [doc.header, doc.footer, ...readerText(doc.content)];
    expect(text.join('\n')).toMatch(/Source: PIP VEFV1102/);
    expect(drafting(text)).toEqual([]);
    expect(text.filter((s) => CAMEL_ID.test(s))).toEqual([]);
    // the PDF itself still renders
    const pdf = await inspector.get(`/api/inspections/${c.body.id}/report.pdf`);
    expect(pdf.status).toBe(200);
  });
});
