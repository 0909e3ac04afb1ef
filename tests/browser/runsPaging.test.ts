/**
 * The column page's run list is paged on the server: the table shows the server's total, asks for the next
 * page and orders on the server. A throwaway column (invented tag, geometry and loads) with 11 runs; the
 * demo columns are only read.
 */
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { FROTHLINE_URL, launch, shot, signInAs, type Browser } from '../helpers/browser.js';
import type { ColumnDetail, ColumnSummary, SectionBody } from '../../shared/types/columns.js';
import type { Page as ApiPage } from '../../shared/types/api.js';
import type { CreateLoadCaseBody, LoadCaseRecord } from '../../shared/types/loads.js';

let b: Browser;
const TAG = `T-8${Math.floor(10 + Math.random() * 90)}-${Date.now().toString(36).slice(-5)}`;
const RUNS = 11;
let column: ColumnDetail;
const geometry: SectionBody['geometry'] = {
  trayType: 'sieve',
  passes: 1,
  columnDiameter_m: 2.1,
  traySpacing_mm: 610,
  activeArea_m2: 2.7,
  downcomerTopArea_m2: 0.35,
  downcomerBottomArea_m2: 0.35,
  outletWeirLength_m: 1.6,
  weirHeight_mm: 50,
  downcomerClearance_mm: 40,
  holeArea_m2: 0.3,
  holeDiameter_mm: 12.7,
  deckThickness_mm: 3,
  systemFactor: 1,
  foaming: 'moderate',
};
const loads: CreateLoadCaseBody['loads'] = Array.from({ length: 6 }, (_, i) => ({
  tray: i + 1,
  vapourMassFlow_kg_h: 30000 + 100 * i,
  liquidMassFlow_kg_h: 50000 - 100 * i,
  vapourDensity_kg_m3: 3,
  liquidDensity_kg_m3: 700,
  surfaceTension_mN_m: 20,
}));

async function call<T>(method: 'get' | 'post', url: string, data?: unknown): Promise<T> {
  const res = await b.page.request.fetch(`${FROTHLINE_URL}/api${url}`, { method, ...(data === undefined ? {} : { data }) });
  if (!res.ok()) throw new Error(`${method.toUpperCase()} ${url}: ${res.status()} ${await res.text()}`);
  return (await res.json()) as T;
}

beforeAll(async () => {
  b = await launch();
  b.page.setDefaultTimeout(20000);
  await signInAs(b.page, 'internals-specialist');
  const cols = await call<ApiPage<ColumnSummary>>('get', '/columns?pageSize=200');
  const demo = cols.items.find((c) => c.tag === 'T-701')!;
  const unitId = (await call<ColumnDetail>('get', `/columns/${demo.id}`)).unitId;
  column = await call<ColumnDetail>('post', '/columns', {
    unitId,
    tag: TAG,
    service: 'paging test',
    numbering: 'top-down',
    trayCount: 6,
  });
  await call('post', `/columns/${column.id}/sections`, {
    name: 'All',
    firstTray: 1,
    lastTray: 6,
    geometry,
    provenance: 'design',
    provenanceDate: null,
  });
  const lc = await call<LoadCaseRecord>('post', `/columns/${column.id}/load-cases`, {
    name: 'Paging test',
    basis: 'normal',
    source: 'typed',
    loads,
  });
  for (let i = 1; i <= RUNS; i++)
    await call('post', '/runs', { columnId: column.id, loadCaseId: lc.id, label: `Paging run ${String(i).padStart(2, '0')}` });
}, 120_000);
afterAll(async () => {
  await b?.close();
});

describe('column run list', () => {
  it('shows 8 of the server’s 11 runs, newest first, and the next page the other 3', async () => {
    const p = b.page;
    await p.goto(`${FROTHLINE_URL}/columns/${column.id}`);
    const table = p.locator('[data-test=column-runs]');
    await table.getByText(new RegExp(`^1.8 of ${RUNS}$`)).waitFor();
    const labels = () => table.locator('tbody tr td:nth-child(2)').allInnerTexts();
    expect((await labels()).map((t) => t.trim())).toEqual(
      Array.from({ length: 8 }, (_, i) => `Paging run ${String(RUNS - i).padStart(2, '0')}`),
    );
    await table.getByRole('button', { name: /next page/i }).click();
    await table.getByText(new RegExp(`^9.11 of ${RUNS}$`)).waitFor();
    expect((await labels()).map((t) => t.trim())).toEqual(['Paging run 03', 'Paging run 02', 'Paging run 01']);
    await shot(p, 'column-runs-paged');
  });

  it('ordering by run label asks the server, across all pages', async () => {
    const table = b.page.locator('[data-test=column-runs]');
    await table.getByRole('columnheader', { name: /^Run/ }).click();
    await table.getByText(new RegExp(`^1.8 of ${RUNS}$`)).waitFor();
    await expect
      .poll(async () => (await table.locator('tbody tr td:nth-child(2)').first().innerText()).trim())
      .toBe('Paging run 01');
  });
});
