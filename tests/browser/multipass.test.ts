import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { FROTHLINE_URL, launch, shot, signInAs, type Browser } from '../helpers/browser.js';
import type { Page as ApiPage } from '../../shared/types/api.js';
import type { ColumnDetail, ColumnSummary, SectionBody, TraySectionRecord } from '../../shared/types/columns.js';
import type { CreateLoadCaseBody } from '../../shared/types/loads.js';

/**
 * A two-pass section gets its pass layout on the section page, and the run page shows each pass. Made on a
 * throwaway column of its own (the demo column T-701 is not touched); tags, geometry and loads are invented.
 */
let b: Browser;
const TAG = `T-9${Math.floor(10 + Math.random() * 90)}-${Date.now().toString(36).slice(-5)}`;
let column: ColumnDetail;
let twoPass: TraySectionRecord;

const geometry: SectionBody['geometry'] = {
  trayType: 'sieve',
  passes: 2,
  columnDiameter_m: 2.8,
  traySpacing_mm: 610,
  activeArea_m2: 4.4,
  downcomerTopArea_m2: 0.75,
  downcomerBottomArea_m2: 0.7,
  outletWeirLength_m: 4,
  weirHeight_mm: 50,
  downcomerClearance_mm: 40,
  holeArea_m2: 0.5,
  holeDiameter_mm: 12.7,
  deckThickness_mm: 3,
  systemFactor: 1,
  foaming: 'moderate',
};
const loads: CreateLoadCaseBody['loads'] = Array.from({ length: 6 }, (_, i) => ({
  tray: i + 1,
  vapourMassFlow_kg_h: 52000 + 300 * i,
  liquidMassFlow_kg_h: 98000 - 400 * i,
  vapourDensity_kg_m3: 3.4,
  liquidDensity_kg_m3: 700,
  surfaceTension_mN_m: 17,
}));

async function call<T>(method: 'get' | 'post', url: string, data?: unknown): Promise<T> {
  const res = await b.page.request.fetch(`${FROTHLINE_URL}/api${url}`, { method, ...(data === undefined ? {} : { data }) });
  if (!res.ok()) throw new Error(`${method.toUpperCase()} ${url}: ${res.status()} ${await res.text()}`);
  return (await res.json()) as T;
}

beforeAll(async () => {
  b = await launch({ width: 1440, height: 900 });
});
afterAll(() => b?.close());

describe('multipass trays in Chromium', () => {
  it('the section form enters the pass layout and an uneven liquid split', async () => {
    await signInAs(b.page, 'internals-specialist');
    const t701 = (await call<ApiPage<ColumnSummary>>('get', '/columns?q=T-701')).items[0]!;
    column = await call<ColumnDetail>('post', '/columns', {
      unitId: t701.unitId,
      tag: TAG,
      service: 'Throwaway splitter (multipass test)',
      numbering: 'top-down',
      trayCount: 6,
    });
    twoPass = await call<TraySectionRecord>('post', `/columns/${column.id}/sections`, {
      name: 'Two-pass trays',
      firstTray: 1,
      lastTray: 6,
      provenance: 'design',
      geometry,
    });
    await b.page.goto(`${FROTHLINE_URL}/columns/${column.id}/sections/${twoPass.id}`);
    await b.page.getByRole('heading', { name: 'Two-pass trays' }).waitFor();
    // every pass count stays on offer; four passes in a 2.8 m column is marked unusual
    await b.page.getByLabel('Passes', { exact: true }).click();
    await b.page.getByRole('option', { name: '4 (unusual below 3 m diameter)' }).waitFor();
    await b.page.keyboard.press('Escape');
    await b.page.getByText('Rate each pass from the tray layout').click();
    await b.page.getByLabel(/Side downcomer width, each/).fill('420');
    await b.page.getByLabel(/Centre downcomer width/).fill('330');
    await b.page.getByText('Equal liquid split').click();
    await b.page.getByLabel('Pass 1 (%)').fill('45');
    await b.page.getByLabel('Pass 2 (%)').fill('55');
    await b.page.getByText('Total 100 %').waitFor();
    await shot(b.page, 'section-pass-layout');
    await b.page.getByRole('button', { name: 'Save section' }).click();
    await b.page.waitForURL(new RegExp(`/columns/${column.id}$`));
    const saved = (await call<ColumnDetail>('get', `/columns/${column.id}`)).sections[0]!;
    expect(saved.geometry.passLayout).toEqual({
      sideDowncomerWidth_mm: 420,
      centreDowncomerWidth_mm: 330,
      oddTrayOutlets: 'side',
      liquidSplit: [0.45, 0.55],
    });
  });

  it('the run page lists each pass of each tray, with where it drains', async () => {
    const lc = await call<{ id: string }>('post', `/columns/${column.id}/load-cases`, {
      name: 'Trial',
      basis: 'normal',
      source: 'typed',
      loads,
    });
    const run = await call<{ id: string }>('post', '/runs', { columnId: column.id, loadCaseId: lc.id });
    await b.page.goto(`${FROTHLINE_URL}/runs/${run.id}`);
    await b.page.getByRole('tab', { name: 'Per pass' }).click();
    const table = b.page.locator('[data-test="tray-passes"]');
    await table.waitFor();
    expect(await table.locator('tbody tr').count()).toBe(12);
    expect(await table.locator('tbody tr').nth(0).textContent()).toContain('side downcomer');
    expect(await table.locator('tbody tr').nth(2).textContent()).toContain('centre downcomer');
    await shot(b.page, 'run-per-pass');
    // the printable report carries the same per-pass table, and the imbalance limit in its limits list
    await b.page.goto(`${FROTHLINE_URL}/runs/${run.id}/report`);
    await b.page.locator('[data-test="tray-passes"]').waitFor();
    expect(await b.page.locator('[data-test="tray-passes"] tbody tr').count()).toBe(12);
    await b.page.getByRole('cell', { name: 'Pass L/V imbalance (multipass layouts)' }).waitFor();
    await b.page.locator('[data-test="tray-passes"]').scrollIntoViewIfNeeded();
    await shot(b.page, 'run-report-per-pass');
  });
});
