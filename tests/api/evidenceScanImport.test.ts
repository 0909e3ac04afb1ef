/** Gamma-scan import: CSV/XLSX preview with units detected, row errors, all-or-nothing commit. */
import ExcelJS from 'exceljs';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { setupApp, signedIn, type TestContext } from '../helpers/app.js';
import { makePlant, type Plant } from './columnsFixture.js';

let ctx: TestContext;
let plant: Plant;
type Agent = Awaited<ReturnType<typeof signedIn>>['agent'];
let agent: Agent;
let outsider: Agent;
beforeAll(async () => {
  ctx = await setupApp();
  plant = await makePlant(ctx.ds, 20);
  agent = (await signedIn(ctx, 'internals-specialist', [plant.siteId])).agent;
  outsider = (await signedIn(ctx, 'inspector', [(await makePlant(ctx.ds, 5)).siteId])).agent;
});
afterAll(() => ctx.close());

/** Invented count-rate scan in feet, two lines. */
const FEET = [
  'Scan line,Elevation (ft),Count rate (cps)',
  'A,60.0,5200',
  'A,60.5,1800',
  'A,61.0,5100',
  'B,60.0,5300',
  'B,60.5,1900',
].join('\n');

const BAD = ['Elevation [m];Density [kg/m3]', '20.0;5', '20.1;abc', '20.2;-3', '20.0;9', '20.3;'].join('\n');

const header = {
  title: 'Imported scan',
  takenOn: '2026-11-20',
  operatingCase: 'Normal',
  chord: '0°–180°',
  orientation_deg: 0,
  pass: null,
  datum: { tray: 10, elevation_m: 18.3 },
  calibration: { vapourCountRate: 5400, liquidCountRate: 900, unit: 'cps' },
  liquidDensity_kg_m3: 650,
  vapourDensity_kg_m3: 3,
};

const count = async (): Promise<number> =>
  Number(
    (await ctx.ds.query<{ n: string }[]>('SELECT count(*) AS n FROM field_evidence WHERE column_id = $1', [plant.columnId]))[0]!
      .n,
  );
const preview = (a: Agent, content: string | Buffer, name: string) =>
  a
    .post(`/api/columns/${plant.columnId}/evidence/scan-imports`)
    .attach('file', Buffer.isBuffer(content) ? content : Buffer.from(content), name);
const commit = (body: object) => agent.post(`/api/columns/${plant.columnId}/evidence/scan-imports/commit`).send(body);

describe('gamma-scan import', () => {
  it('previews a count-rate CSV in feet with two lines (ft to m: NIST SP 811, 1 ft = 0.3048 m exactly)', async () => {
    const res = await preview(agent, FEET, 'scan-ft.csv');
    expect(res.status, JSON.stringify(res.body)).toBe(200);
    expect(res.body).toMatchObject({ format: 'csv', headerRow: 1, errorCount: 0, units: { elevation: 'ft' } });
    expect(res.body.mapping).toEqual({ line: 0, elevation: 1, countRate: 2 });
    expect(res.body.lines.map((l: { label: string }) => l.label)).toEqual(['A', 'B']);
    expect(res.body.lines[0].measure).toBe('count-rate');
    expect(res.body.lines[0].points[1].elevation_m).toBeCloseTo(60.5 * 0.3048, 9);
    expect(res.body.lines[0].points[1].value).toBe(1800);
  });

  it('commits the preview as one gamma-scan record with both lines; the token is used up', async () => {
    const before = await count();
    const p = (await preview(agent, FEET, 'scan-ft.csv')).body;
    const res = await commit({ ...header, token: p.token, mapping: p.mapping, units: p.units });
    expect(res.status, JSON.stringify(res.body)).toBe(201);
    expect(res.body).toMatchObject({ kind: 'gamma-scan', sourceFile: 'scan-ft.csv', itemCount: 2 });
    expect(res.body.data.lines[1]).toMatchObject({ label: 'B', chord: '0°–180°', calibration: header.calibration });
    expect(await count()).toBe(before + 1);
    const again = await commit({ ...header, token: p.token, mapping: p.mapping, units: p.units });
    expect(again.status).toBe(400);
    expect(again.body.details[0].path).toBe('token');
    expect(await count()).toBe(before + 1);
  });

  it('lists every row error and stores nothing; the preview is kept for a corrected commit', async () => {
    const before = await count();
    const p = (await preview(agent, BAD, 'bad.csv')).body;
    expect(p.units).toEqual({ elevation: 'm', density: 'kg/m3' });
    expect(p.errors).toEqual([
      { row: 3, column: 'Density [kg/m3]', message: '"abc" is not a number' },
      { row: 4, column: 'Density [kg/m3]', message: 'must not be negative' },
      { row: 5, column: 'Elevation [m]', message: 'repeats the elevation of row 2 on Line 1' },
      { row: 6, column: 'Density [kg/m3]', message: 'is empty' },
      { row: 1, column: 'Elevation [m]', message: 'Line 1 has 1 point(s); a scan line needs at least 2' },
    ]);
    const res = await commit({ ...header, calibration: null, token: p.token, mapping: p.mapping, units: p.units });
    expect(res.status).toBe(400);
    expect(res.body.errorCount).toBe(5);
    expect(res.body.rowErrors[0]).toEqual({ row: 3, column: 'Density [kg/m3]', message: '"abc" is not a number' });
    expect(await count()).toBe(before);
    // the refused commit kept the preview: the same token is refused again for the same rows, not as unknown
    const again = await commit({ ...header, calibration: null, token: p.token, mapping: p.mapping, units: p.units });
    expect(again.status).toBe(400);
    expect(again.body.errorCount).toBe(5);
  });

  it('refuses a count-rate scan without calibration naming the field, and keeps the preview', async () => {
    const p = (await preview(agent, FEET, 'scan-ft.csv')).body;
    const res = await commit({ ...header, calibration: null, token: p.token, mapping: p.mapping, units: p.units });
    expect(res.status).toBe(400);
    expect(res.body.details[0]).toEqual({
      path: 'data.lines.0.calibration',
      message: 'is required for a count-rate line (vapour and liquid count rates)',
    });
    expect((await commit({ ...header, token: p.token, mapping: p.mapping, units: p.units })).status).toBe(201);
  });

  it('reads an XLSX with a unit row (lb/ft³ to kg/m³: NIST SP 811, 16.01846)', async () => {
    const wb = new ExcelJS.Workbook();
    const ws = wb.addWorksheet('Scan');
    ws.addRow(['Elevation', 'Density']);
    ws.addRow(['m', 'lb/ft3']);
    ws.addRow([20, 0.2]);
    ws.addRow([20.1, 30]);
    const buf = Buffer.from(await wb.xlsx.writeBuffer());
    const res = await preview(agent, buf, 'scan.xlsx');
    expect(res.status, JSON.stringify(res.body)).toBe(200);
    expect(res.body).toMatchObject({
      format: 'xlsx',
      sheet: 'Scan',
      units: { elevation: 'm', density: 'lb/ft3' },
      errorCount: 0,
    });
    expect(res.body.lines[0].points[1].value).toBeCloseTo(30 * 16.01846, 3);
  });

  it('answers 400 for a file without the needed columns, 404 for another site, 400 naming the field of a bad body', async () => {
    const r = await preview(agent, 'Tray,Temperature\n1,100\n', 'x.csv');
    expect(r.status).toBe(400);
    expect(r.body.details[0].path).toBe('file');
    expect((await preview(outsider, FEET, 'scan.csv')).status).toBe(404);
    const none = await agent.post(`/api/columns/${plant.columnId}/evidence/scan-imports`);
    expect(none.status).toBe(400);
    expect(none.body.details[0].path).toBe('file');
    const b = await commit({ ...header, token: 'nope' });
    expect(b.status).toBe(400);
    expect(b.body.details.map((d: { path: string }) => d.path)).toEqual(expect.arrayContaining(['token', 'mapping', 'units']));
  });
});
