import ExcelJS from 'exceljs';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { config } from '../../server/config.js';
import { setupApp, signedIn, type TestContext } from '../helpers/app.js';
import { makePlant, type Plant } from './columnsFixture.js';

let ctx: TestContext;
let plant: Plant;
type Agent = Awaited<ReturnType<typeof signedIn>>['agent'];
let agent: Agent;
beforeAll(async () => {
  ctx = await setupApp();
  plant = await makePlant(ctx.ds, 20);
  agent = (await signedIn(ctx, 'process-engineer', [plant.siteId])).agent;
});
afterAll(() => ctx.close());

/** US-unit tray profile numbered bottom-up (pressure falls as the tray number rises). Invented numbers. */
const GOOD = [
  'Tray,Vapour flow (lb/h),Liquid flow (lb/h),Vapour density (lb/ft3),Liquid density (lb/ft3),Surface tension (dyn/cm),Viscosity (cP),Temperature (F),Pressure (psia),Remarks',
  '1,100000,150000,0.20,45.0,18,0.5,300,26.0,bottom',
  '2,101000,151000,0.20,44.9,18,0.5,295,25.9,',
  '3,102000,152000,0.19,44.8,18,0.5,290,25.8,',
  '4,103000,153000,0.19,44.7,17.5,0.5,285,25.7,top',
].join('\n');

const BAD = [
  'Stage;Tray;Vapour mass flow [kg/h];Liquid mass flow [kg/h];Vapour density [kg/m3];Liquid density [kg/m3];Surface tension [mN/m]',
  '1;1;90000;120000;3.1;690;19',
  '2;2;abc;120000;3.1;690;19',
  '3;3;90000;-5;3.1;690;19',
  '4;4;90000;120000;800;690;19',
  '5;25;90000;120000;3.1;690;19',
].join('\n');

const count = async (): Promise<number> =>
  Number(
    (await ctx.ds.query<{ n: string }[]>('SELECT count(*) AS n FROM load_cases WHERE column_id = $1', [plant.columnId]))[0]!.n,
  );

const preview = (content: string | Buffer, name: string) =>
  agent
    .post(`/api/columns/${plant.columnId}/imports`)
    .attach('file', Buffer.isBuffer(content) ? content : Buffer.from(content), name);

describe('tray-profile import', () => {
  it('previews a US-unit CSV: mapping, units, numbering direction, SI values (NIST SP 811 factors)', async () => {
    const res = await preview(GOOD, 'profile-us.csv');
    expect(res.status).toBe(200);
    const p = res.body;
    expect(p).toMatchObject({ format: 'csv', headerRow: 1, errors: [] });
    expect(p.mapping).toEqual({
      tray: 0,
      vapourMassFlow: 1,
      liquidMassFlow: 2,
      vapourDensity: 3,
      liquidDensity: 4,
      surfaceTension: 5,
      liquidViscosity: 6,
      temperature: 7,
      pressure: 8,
    });
    expect(p.units).toEqual({
      vapourMassFlow: 'lb/h',
      liquidMassFlow: 'lb/h',
      vapourDensity: 'lb/ft3',
      liquidDensity: 'lb/ft3',
      surfaceTension: 'dyn/cm',
      liquidViscosity: 'cP',
      temperature: 'F',
      pressure: 'psia',
    });
    expect(p.numbering).toMatchObject({ key: 'tray', direction: 'bottom-up' });
    expect(p.notes.join(' ')).toMatch(/Remarks/);
    // file tray 1 (bottom-up) is column tray 20 (top-down, 20 trays)
    const t20 = p.loads.find((l: { tray: number }) => l.tray === 20);
    // 1 lb = 0.45359237 kg exactly; 1 lb/ft³ = 16.01846 kg/m³; 1 psi = 6.894757 kPa; °C = (°F − 32)/1.8 (NIST SP 811, App. B.9)
    expect(t20.vapourMassFlow_kg_h).toBeCloseTo(100000 * 0.45359237, 6);
    expect(t20.liquidDensity_kg_m3).toBeCloseTo(45 * 16.01846, 3);
    expect(t20.pressure_kPa).toBeCloseTo(26 * 6.894757, 4);
    expect(t20.temperature_C).toBeCloseTo((300 - 32) / 1.8, 9);
    expect(t20.surfaceTension_mN_m).toBe(18);
    expect(p.loads.map((l: { tray: number }) => l.tray)).toEqual([17, 18, 19, 20]);
  });

  it('refuses a bad file row by row and stores nothing; the fixed file is stored', async () => {
    const before = await count();
    const p = (await preview(BAD, 'bad.csv')).body;
    expect(p.numbering.key).toBe('tray');
    expect(p.errors).toEqual([
      { row: 3, column: 'Vapour mass flow [kg/h]', message: '"abc" is not a number' },
      { row: 4, column: 'Liquid mass flow [kg/h]', message: 'must be >= 0' },
      {
        row: 5,
        column: 'Vapour density [kg/m3]',
        message: 'vapour density (800 kg/m³) must be below the liquid density (690 kg/m³)',
      },
      { row: 6, column: 'Tray', message: 'tray 25 is outside the column (trays 1–20)' },
    ]);
    const commit = await agent.post(`/api/columns/${plant.columnId}/imports/commit`).send({
      token: p.token,
      mapping: p.mapping,
      units: p.units,
      numbering: p.numbering,
      name: 'Bad import',
      basis: 'normal',
      fileName: 'bad.csv',
    });
    expect(commit.status).toBe(400);
    expect(commit.body.error).toMatch(/4 errors; nothing was stored/);
    expect(commit.body.rowErrors).toEqual(p.errors);
    expect(commit.body.details[0]).toEqual({ path: 'row 3, Vapour mass flow [kg/h]', message: '"abc" is not a number' });
    expect(await count()).toBe(before);

    // the user fixes the rows and commits them (rows sent back instead of the token)
    const fixed = BAD.split('\n').map((l) => l.split(';'));
    fixed[2]![2] = '91000';
    fixed[3]![3] = '121000';
    fixed[4]![4] = '3.2';
    fixed[5]![1] = '5';
    const ok = await agent.post(`/api/columns/${plant.columnId}/imports/commit`).send({
      headers: fixed[0],
      rows: fixed.slice(1),
      mapping: p.mapping,
      units: p.units,
      numbering: p.numbering,
      name: 'Good import',
      basis: 'normal',
      fileName: 'fixed.csv',
    });
    expect(ok.status).toBe(201);
    expect(ok.body).toMatchObject({ name: 'Good import', source: 'imported', sourceFile: 'fixed.csv', trayCount: 5 });
    expect(await count()).toBe(before + 1);
    const audit = await ctx.ds.query<{ action: string }[]>(`SELECT action FROM audit_log WHERE entity_id = $1`, [ok.body.id]);
    expect(audit).toEqual([{ action: 'create' }]);
  });

  it('commits a preview by token, maps stages to trays with a stage map, and refuses an expired token', async () => {
    const csv = [
      'Stage,Vapour (kg/h),Liquid (kg/h),Vapour density (kg/m3),Liquid density (kg/m3),Surface tension (mN/m)',
      '2,90000,120000,3.1,690,19',
      '3,95000,125000,3.2,695,18.5',
    ].join('\n');
    const p = (await preview(csv, 'stages.csv')).body;
    expect(p.numbering.key).toBe('stage');
    const numbering = {
      key: 'stage',
      direction: 'top-down',
      stageMap: [
        { stage: 2, firstTray: 1, lastTray: 2 },
        { stage: 3, firstTray: 3, lastTray: 5 },
      ],
    };
    const res = await agent.post(`/api/columns/${plant.columnId}/imports/commit`).send({
      token: p.token,
      mapping: p.mapping,
      units: p.units,
      numbering,
      name: 'Staged',
      basis: 'other',
      fileName: 'stages.csv',
    });
    expect(res.status).toBe(201);
    expect(res.body.loads.map((l: { tray: number }) => l.tray)).toEqual([1, 2, 3, 4, 5]);
    expect(res.body.loads[4].vapourMassFlow_kg_h).toBe(95000);
    expect(res.body.stageMap).toEqual(numbering.stageMap);
    const again = await agent.post(`/api/columns/${plant.columnId}/imports/commit`).send({
      token: p.token,
      mapping: p.mapping,
      units: p.units,
      numbering,
      name: 'Again',
      basis: 'other',
      fileName: 'stages.csv',
    });
    expect(again.status).toBe(400);
    expect(again.body.details[0].path).toBe('token');
  });

  it('reads XLSX workbooks with a unit row under the header', async () => {
    const wb = new ExcelJS.Workbook();
    const ws = wb.addWorksheet('Profile');
    ws.addRow(['Invented tray profile']);
    ws.addRow(['Tray', 'Vapour flow', 'Liquid flow', 'Vapour density', 'Liquid density', 'Surface tension', 'Pressure']);
    ws.addRow(['', 't/h', 't/h', 'kg/m3', 'kg/m3', 'mN/m', 'bar']);
    ws.addRow([5, 90, 120, 3.1, 690, 19, 1.7]);
    ws.addRow([6, 91, 121, 3.1, 691, 19, 1.71]);
    const buf = Buffer.from(await wb.xlsx.writeBuffer());
    const res = await preview(buf, 'profile.xlsx');
    expect(res.status).toBe(200);
    expect(res.body).toMatchObject({ format: 'xlsx', sheet: 'Profile', headerRow: 2, errors: [] });
    expect(res.body.units).toMatchObject({ vapourMassFlow: 't/h', pressure: 'bar' });
    expect(res.body.loads[0]).toMatchObject({ tray: 5, vapourMassFlow_kg_h: 90000, pressure_kPa: 170 });
  });

  it('refuses a missing file, a file without a header, and an oversize upload', async () => {
    const none = await agent.post(`/api/columns/${plant.columnId}/imports`).send({});
    expect(none.status).toBe(400);
    expect(none.body.details[0].path).toBe('file');
    const noHeader = await preview('a,b\n1,2\n', 'x.csv');
    expect(noHeader.status).toBe(400);
    expect(noHeader.body.error).toBe('No header row found');
    const big = await preview(Buffer.alloc(config.importMaxBytes + 10, 'a'), 'big.csv');
    expect(big.status).toBe(413);
  });

  it('a user outside the site cannot preview or commit (404)', async () => {
    const { agent: outsider } = await signedIn(ctx, 'process-engineer');
    const res = await outsider.post(`/api/columns/${plant.columnId}/imports`).attach('file', Buffer.from(GOOD), 'p.csv');
    expect(res.status).toBe(404);
  });
});
