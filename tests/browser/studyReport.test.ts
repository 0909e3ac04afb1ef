import ExcelJS from 'exceljs';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { ColumnSummary } from '../../shared/types/columns.js';
import type { Page as ApiPage } from '../../shared/types/api.js';
import type { StudySummary } from '../../shared/types/studies.js';
import { FROTHLINE_URL, launch, shot, signInAs, type Browser } from '../helpers/browser.js';

/** A pump-around study offers a printable report and CSV/XLSX exports of what a reviewer signs. */
let b: Browser;
let studyId: string;

beforeAll(async () => {
  b = await launch({ width: 1280, height: 860 });
  b.page.setDefaultTimeout(20000);
  await signInAs(b.page, 'viewer');
  const cols = (await (await b.page.request.get(`${FROTHLINE_URL}/api/columns?q=T-701`)).json()) as ApiPage<ColumnSummary>;
  const t701 = cols.items.find((c) => c.tag === 'T-701')!;
  const studies = (await (await b.page.request.get(`${FROTHLINE_URL}/api/columns/${t701.id}/studies`)).json()) as StudySummary[];
  studyId = studies.filter((s) => s.pumpAroundName === 'Top PA').at(-1)!.id;
});
afterAll(() => b?.close());

const fetchLink = async (name: string) => {
  const href = await b.page.locator('[data-test=study-downloads]').getByRole('link', { name }).getAttribute('href');
  const res = await b.page.request.get(`${FROTHLINE_URL}${href}`);
  expect(res.status()).toBe(200);
  return res;
};

describe('study report and exports', () => {
  it('the PDF report opens from the study page', async () => {
    await b.page.goto(`${FROTHLINE_URL}/studies/${studyId}`);
    await b.page.getByText('What the sweep found').waitFor();
    const res = await fetchLink('PDF report');
    expect(res.headers()['content-type']).toBe('application/pdf');
    const pdf = (await res.body()).toString('latin1');
    expect(Number(/\/Type \/Pages[\s\S]*?\/Count (\d+)/.exec(pdf)?.[1])).toBeGreaterThanOrEqual(2);
    await shot(b.page, 'study-downloads');
  });

  it('the CSV holds inputs, duties found, traffic at the base duty and the cautions', async () => {
    const csv = await (await fetchLink('CSV')).text();
    expect(csv).toMatch(/^Inputs\r\nColumn,T-701\r\n/);
    expect(csv).toMatch(/Zone liquid in the load case,includes the circulation/);
    expect(csv).toMatch(/\r\nSuggested duty,"[\d,]+ kW",lower of 70 %/);
    expect(csv).toMatch(/\r\nLimiting duty,"[\d,]+ kW","tray \d+, /);
    expect(csv).toMatch(
      /Traffic at the base duty\r\nTray,Where,Vapour \(kg\/h\),Liquid \(kg\/h\),Controlling check,% of limit\r\n1,above the zone,\d+,\d+,/,
    );
    expect(csv).toMatch(/management-of-change review/);
  });

  it('the XLSX has one sheet per part', async () => {
    const wb = new ExcelJS.Workbook();
    const body = await (await fetchLink('XLSX')).body();
    await wb.xlsx.load(body.buffer.slice(body.byteOffset, body.byteOffset + body.byteLength) as ArrayBuffer);
    expect(wb.worksheets.map((w) => w.name)).toEqual(['Inputs', 'Duties found', 'Traffic at base', 'Cautions']);
    expect(wb.getWorksheet('Traffic at base')!.rowCount).toBeGreaterThan(10);
  });
});
