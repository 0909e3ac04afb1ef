import ExcelJS from 'exceljs';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it, vi } from 'vitest';
import { TEST_PASSWORD, setupApp, signedIn, type TestContext } from '../helpers/app.js';
import { deflatePart, partsOf, writeZip, type ZipPart } from '../helpers/zip.js';
import { makePlant, type Plant } from './columnsFixture.js';
import { IMPORT_LIMITS } from '../../shared/importLimits.js';
import type { User } from '../../server/db/entities/User.js';

let ctx: TestContext;
let plant: Plant;
type Agent = ReturnType<typeof request.agent>;
let agent: Agent;
let user: User;
beforeAll(async () => {
  ctx = await setupApp();
  plant = await makePlant(ctx.ds, 20);
  ({ agent, user } = await signedIn(ctx, 'process-engineer', [plant.siteId]));
});
afterAll(() => ctx.close());

const HEADER =
  'Tray,Vapour flow (kg/h),Liquid flow (kg/h),Vapour density (kg/m3),Liquid density (kg/m3),Surface tension (mN/m),Remarks';
const GOOD_ROWS = ['1,90000,120000,3.1,690,19,', '2,91000,121000,3.1,691,19,'];
const preview = (content: string | Buffer, name: string, a: Agent = agent) =>
  a
    .post(`/api/columns/${plant.columnId}/imports`)
    .attach('file', Buffer.isBuffer(content) ? content : Buffer.from(content), name);

const MB = 1024 * 1024;

/** Largest rise of heap and resident memory while `fn` runs (sampled every few ms, and at the end). */
async function memoryRise<T>(fn: () => Promise<T>): Promise<{ result: T; heapMB: number; rssMB: number }> {
  const base = process.memoryUsage();
  let [heap, rss] = [base.heapUsed, base.rss];
  const sample = () => {
    const m = process.memoryUsage();
    [heap, rss] = [Math.max(heap, m.heapUsed), Math.max(rss, m.rss)];
  };
  const timer = setInterval(sample, 2);
  try {
    const result = await fn();
    sample();
    return { result, heapMB: (heap - base.heapUsed) / MB, rssMB: (rss - base.rss) / MB };
  } finally {
    clearInterval(timer);
  }
}

/** A worksheet whose one cell holds `mb` MB of text, made and deflated a megabyte at a time (about 100 kB packed). */
function* hugeSheet(mb: number): Generator<Buffer> {
  yield Buffer.from(
    '<?xml version="1.0" encoding="UTF-8" standalone="yes"?>\n<worksheet xmlns="http://schemas.openxmlformats.org/spreadsheetml/2006/main"><sheetData><row r="1"><c r="A1" t="inlineStr"><is><t>',
  );
  const block = Buffer.alloc(MB, 'A');
  for (let i = 0; i < mb; i++) yield block;
  yield Buffer.from('</t></is></c></row></sheetData></worksheet>');
}

/** An exceljs workbook with its first sheet replaced by `sheet`. */
async function bombWorkbook(sheet: ZipPart): Promise<Buffer> {
  const wb = new ExcelJS.Workbook();
  wb.addWorksheet('Profile').addRow(['Tray']);
  const parts = await partsOf(Buffer.from(await wb.xlsx.writeBuffer()));
  return writeZip(parts.map((p) => (p.name === 'xl/worksheets/sheet1.xml' ? sheet : p)));
}

describe('spreadsheet bombs', () => {
  it('refuses a small workbook whose sheet unpacks to 100 MB, from its zip directory, with memory bounded', async () => {
    const bomb = await bombWorkbook(await deflatePart('xl/worksheets/sheet1.xml', hugeSheet(100)));
    expect(bomb.length).toBeLessThan(300 * 1024);
    const { result: res, heapMB, rssMB } = await memoryRise(() => preview(bomb, 'bomb.xlsx'));
    expect(res.status).toBe(413);
    expect(res.body.error).toBe('The workbook is too large when unpacked');
    expect(res.body.details[0]).toEqual({
      path: 'file',
      message: '"xl/worksheets/sheet1.xml" unpacks to 100 MB; at most 16 MB per part are read',
    });
    expect(heapMB).toBeLessThan(100);
    expect(rssMB).toBeLessThan(100);
  });

  it('refuses a part compressed a thousand times over', async () => {
    const bomb = await bombWorkbook(await deflatePart('xl/worksheets/sheet1.xml', hugeSheet(8)));
    const res = await preview(bomb, 'dense.xlsx');
    expect(res.status).toBe(413);
    expect(res.body.error).toBe('The workbook is compressed suspiciously far');
    expect(res.body.details[0].message).toMatch(
      /^"xl\/worksheets\/sheet1\.xml" unpacks to \d+ times its packed size; at most 200 times is read$/,
    );
  });

  it('refuses a bomb whose zip declares a small size, stopping the unpacking there (memory bounded)', async () => {
    const part = await deflatePart('xl/worksheets/sheet1.xml', hugeSheet(100));
    const bomb = await bombWorkbook({ ...part, declaredSize: 400 * 1024 });
    const { result: res, heapMB, rssMB } = await memoryRise(() => preview(bomb, 'liar.xlsx'));
    expect(res.status).toBe(422);
    expect(res.body.error).toBe('The XLSX file cannot be read');
    expect(res.body.details[0].path).toBe('file');
    expect(heapMB).toBeLessThan(100);
    expect(rssMB).toBeLessThan(100);
  });

  it('refuses a zip that is not a workbook, and a workbook with too many parts', async () => {
    const notBook = writeZip([await deflatePart('hello.txt', [Buffer.from('hi')])]);
    const res = await preview(notBook, 'x.xlsx');
    expect(res.status).toBe(422);
    expect(res.body.details[0].message).toBe('is not a readable workbook (no xl/workbook.xml)');
    const tiny = await deflatePart('a', [Buffer.from('a')]);
    const many = writeZip(Array.from({ length: 501 }, (_, i) => ({ ...tiny, name: `p${i}.xml` })));
    const res2 = await preview(many, 'many.xlsx');
    expect(res2.status).toBe(413);
    expect(res2.body.details[0].message).toBe('holds 501 files; at most 500 are read');
  });
});

describe('row, column and cell limits', () => {
  it('cuts a 100,000-row CSV at the row limit and says where; the answer stays small', async () => {
    const lines = [HEADER];
    for (let i = 1; i < 100_000; i++) lines.push(`${i},90000,120000,3.1,690,19,`);
    const res = await preview(lines.join('\n'), 'long.csv');
    expect(res.status).toBe(200);
    const p = res.body;
    expect(p.cutAfterRow).toBe(IMPORT_LIMITS.rows);
    expect(p.rowCount).toBe(IMPORT_LIMITS.rows - 1);
    expect(p.notes[0]).toMatch(/^Only the first 5000 rows were read; the file continues after row 5000 /);
    expect(p.rows).toHaveLength(IMPORT_LIMITS.previewRows);
    // trays 21 to 4999 are outside the 20-tray column: counted, the first ones listed
    expect(p.errorCount).toBe(4999 - 20);
    expect(p.errors).toHaveLength(IMPORT_LIMITS.listedErrors);
    expect(p.errors[0]).toEqual({ row: 22, column: 'Tray', message: 'tray 21 is outside the column (trays 1–20)' });
    expect(p.loads).toHaveLength(20);
    expect(res.text.length).toBeLessThan(200_000);
  });

  it('refuses a cell longer than the limit, naming its row and column', async () => {
    const csv = [HEADER, GOOD_ROWS[0], `2,91000,121000,3.1,691,19,${'x'.repeat(600)}`].join('\n');
    const res = await preview(csv, 'remark.csv');
    expect(res.status).toBe(422);
    expect(res.body).toEqual({
      error: 'A cell of the file is too long',
      details: [{ path: 'file', message: 'row 3, column 7 ("Remarks"): the cell holds 600 characters; at most 500 are read' }],
    });
  });

  it('refuses a row wider than the column limit', async () => {
    const csv = [HEADER, GOOD_ROWS[0], `${GOOD_ROWS[1]}${',x'.repeat(250)}`].join('\n');
    const res = await preview(csv, 'wide.csv');
    expect(res.status).toBe(422);
    expect(res.body.details[0]).toEqual({ path: 'file', message: 'row 3 has 257 columns; at most 200 are read' });
  });

  it('cuts an XLSX sheet at the row limit and refuses a long cell in one', async () => {
    const wb = new ExcelJS.Workbook();
    const ws = wb.addWorksheet('Profile');
    ws.addRow(HEADER.split(','));
    for (let i = 1; i <= 5100; i++) ws.addRow([i, 90000, 120000, 3.1, 690, 19]);
    const res = await preview(Buffer.from(await wb.xlsx.writeBuffer()), 'long.xlsx');
    expect(res.status).toBe(200);
    expect(res.body).toMatchObject({ format: 'xlsx', cutAfterRow: 5000, rowCount: 4999 });
    ws.getCell('G3').value = 'y'.repeat(501);
    const long = await preview(Buffer.from(await wb.xlsx.writeBuffer()), 'long-cell.xlsx');
    expect(long.status).toBe(422);
    expect(long.body.details[0].message).toBe('row 3, column 7 ("Remarks"): the cell holds 501 characters; at most 500 are read');
  });
});

describe('previews kept in the database', () => {
  const commitBody = (p: { token: string; mapping: unknown; units: unknown; numbering: unknown }, name: string) => ({
    token: p.token,
    mapping: p.mapping,
    units: p.units,
    numbering: p.numbering,
    name,
    basis: 'normal',
    fileName: 'p.csv',
  });

  it('a preview made by one server instance is committed through another', async () => {
    const p = (await preview([HEADER, ...GOOD_ROWS].join('\n'), 'p.csv')).body;
    // a second app over the same database, from freshly loaded modules: no memory shared with the first
    vi.resetModules();
    const { createApp } = await import('../../server/app.js');
    const { makeDataSource } = await import('../../server/db/data-source.js');
    const ds2 = makeDataSource(process.env.DATABASE_URL);
    await ds2.initialize();
    try {
      const other = request.agent(createApp({ ds: ds2, serveClient: false }));
      expect((await other.post('/api/auth/sign-in').send({ email: user.email, password: TEST_PASSWORD })).status).toBe(200);
      const res = await other.post(`/api/columns/${plant.columnId}/imports/commit`).send(commitBody(p, 'Via the second server'));
      expect(res.status).toBe(201);
      expect(res.body).toMatchObject({ name: 'Via the second server', trayCount: 2 });
      const left = await ctx.ds.query('SELECT count(*)::int AS n FROM import_previews WHERE id = $1', [p.token]);
      expect(left).toEqual([{ n: 0 }]);
    } finally {
      await ds2.destroy();
    }
  });

  it('refuses an expired preview with a clear message, and deletes expired previews', async () => {
    const p = (await preview([HEADER, ...GOOD_ROWS].join('\n'), 'p.csv')).body;
    await ctx.ds.query(`UPDATE import_previews SET expires_at = '2026-01-01T08:30:00Z' WHERE id = $1`, [p.token]);
    const res = await agent.post(`/api/columns/${plant.columnId}/imports/commit`).send(commitBody(p, 'Too late'));
    expect(res.status).toBe(400);
    expect(res.body).toEqual({
      error: 'Import preview expired',
      details: [
        {
          path: 'token',
          message: 'previews are kept for 30 minutes and this one expired at 08:30 UTC: upload the file again',
        },
      ],
    });
    await preview([HEADER, ...GOOD_ROWS].join('\n'), 'p.csv');
    expect(await ctx.ds.query('SELECT count(*)::int AS n FROM import_previews WHERE id = $1', [p.token])).toEqual([{ n: 0 }]);
  });

  it('a commit refused for row errors keeps the preview; another user cannot use the token', async () => {
    const p = (await preview([HEADER, GOOD_ROWS[0], '2,abc,121000,3.1,691,19,'].join('\n'), 'p.csv')).body;
    const bad = await agent.post(`/api/columns/${plant.columnId}/imports/commit`).send(commitBody(p, 'Bad'));
    expect(bad.status).toBe(400);
    expect(bad.body.errorCount).toBe(1);
    const check = await agent
      .post(`/api/columns/${plant.columnId}/imports/check`)
      .send({ token: p.token, mapping: p.mapping, units: p.units, numbering: p.numbering });
    expect(check.status).toBe(200);
    expect(check.body.errorCount).toBe(1);
    const { agent: colleague } = await signedIn(ctx, 'process-engineer', [plant.siteId]);
    const stolen = await colleague.post(`/api/columns/${plant.columnId}/imports/commit`).send(commitBody(p, 'Stolen'));
    expect(stolen.status).toBe(400);
    expect(stolen.body.error).toBe('Import preview not found');
  });
});
