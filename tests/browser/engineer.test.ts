import { mkdtempSync, writeFileSync } from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { launch, shot, signInAs, type Browser } from '../helpers/browser.js';

/**
 * The engineer's path through issue 4 in Chromium: open the demo column, import a tray profile (a bad file
 * refused row by row, a good one stored), rate, read the flagged trays, charts and operating window, compare,
 * submit; then the specialist approves. Tray loads below are invented for the test (US customary units, as a
 * simulation export might give them).
 */
let b: Browser;
const dir = mkdtempSync(path.join(os.tmpdir(), 'frothline-import-'));
const HEADER =
  'Tray,Vapour flow (lb/h),Liquid flow (lb/h),Vapour density (lb/ft3),Liquid density (lb/ft3),Surface tension (dyn/cm),Viscosity (cP),Temperature (F),Pressure (psia)';
function profileRow(t: number): string[] {
  const lower = t > 40;
  return [
    String(t),
    String(lower ? 110000 - 800 * (t - 40) : 560000 - 3000 * t),
    String(lower ? 650000 : t < 9 ? 320000 : 220000 - 2500 * t),
    (lower ? 0.13 : 0.19 + 0.0025 * t).toFixed(3),
    (lower ? 52 : 43 + 0.17 * t).toFixed(2),
    (lower ? 11.5 : 19.5 - 0.18 * t).toFixed(2),
    (lower ? 1.1 : 0.45 + 0.009 * t).toFixed(3),
    String(Math.round(245 + 11 * t)),
    (24.4 + 0.08 * t).toFixed(2),
  ];
}
const good = [HEADER, ...Array.from({ length: 46 }, (_, i) => profileRow(i + 1).join(','))].join('\n');
const badRows = Array.from({ length: 46 }, (_, i) => profileRow(i + 1));
badRows[4]![1] = 'lots'; // row 6 in the file: not a number
badRows[11]![3] = '60'; // row 13: vapour denser than the liquid
badRows[19]![2] = '-500'; // row 21: negative liquid flow
const bad = [HEADER, ...badRows.map((r) => r.join(','))].join('\n');
const goodFile = path.join(dir, 't701-spring-test.csv');
const badFile = path.join(dir, 't701-broken.csv');
writeFileSync(goodFile, good);
writeFileSync(badFile, bad);

let runUrl = '';

beforeAll(async () => {
  b = await launch({ width: 1440, height: 900 });
});
afterAll(() => b?.close());

async function countLoadCases(): Promise<number> {
  const col = (await b.page.evaluate(async () => {
    const list = (await (await fetch('/api/columns?q=T-701')).json()) as { items: { id: string }[] };
    return (await fetch(`/api/columns/${list.items[0]!.id}`)).json();
  })) as { loadCases: unknown[] };
  return col.loadCases.length;
}

async function importFile(file: string, name: string): Promise<void> {
  await b.page.getByRole('link', { name: 'Import tray profile' }).click();
  await b.page.waitForURL(/\/import$/);
  await b.page.locator('input[type=file]').setInputFiles(file);
  await b.page.getByLabel('Load case name').fill(name);
  await b.page.getByRole('button', { name: 'Read the file' }).click();
  await b.page.locator('[data-test="import-mapping"]').waitFor();
}

describe('engineer path in Chromium', () => {
  it('the demo engineer opens T-701 and sees sections, pump-arounds, load cases and runs', async () => {
    await signInAs(b.page, 'process-engineer');
    await b.page.locator('[data-test="column-T-701"]').click();
    await b.page.waitForURL(/\/columns\//);
    await b.page.getByText('Tray sections').waitFor();
    await b.page.getByText('Diesel PA', { exact: true }).first().waitFor();
    expect(await b.page.getByRole('heading', { name: 'T-701' }).count()).toBe(1);
    await shot(b.page, 'engineer-column');
  });

  it('a file with bad rows is refused row by row and nothing is stored', async () => {
    const before = await countLoadCases();
    await importFile(badFile, 'Broken profile');
    // detected units are shown for confirmation
    expect(await b.page.locator('[data-test="import-mapping"]').textContent()).toContain('lb/h');
    await shot(b.page, 'engineer-import-mapping');
    await b.page.getByRole('button', { name: 'Check the rows' }).click();
    const errors = b.page.locator('[data-test="import-errors"]');
    await errors.waitFor();
    const rows = await errors.locator('tbody tr').allInnerTexts();
    const cells = rows.map((r) => r.split('\t').map((c) => c.trim()));
    expect(cells.map((c) => c[0])).toEqual(['6', '13', '21']);
    expect(cells[0]![1]).toBe('Vapour flow (lb/h)');
    expect(cells[1]![2]).toMatch(/vapour density .* below the liquid density/i);
    // storing is not offered while any row is wrong, and the page says why beside the button
    expect(await b.page.getByRole('button', { name: 'Store load case' }).isDisabled()).toBe(true);
    expect(await b.page.locator('[data-test="import-store-blocked"]').textContent()).toBe(
      'Fix the 3 problem(s) listed first: nothing is stored while any row is wrong.',
    );
    expect(await b.page.locator('[data-test="import-converted"]').count()).toBe(0);
    await shot(b.page, 'engineer-import-refused');
    expect(await countLoadCases()).toBe(before);
  });

  it('a good file is stored as a load case, converted from US units', async () => {
    await b.page.getByRole('link', { name: 'T-701' }).first().click();
    await b.page.waitForURL(/\/columns\/[^/]+$/);
    await importFile(goodFile, `Spring test profile ${Date.now().toString(36)}`);
    // the file says psia: absolute; read as gauge, a standard atmosphere would be added
    const basis = b.page.locator('[data-test="import-pressure-basis"]');
    await basis.getByRole('button', { name: 'Gauge' }).click();
    await b.page.getByRole('button', { name: 'Check the rows' }).click();
    const converted = b.page.locator('[data-test="import-converted"]');
    await converted.waitFor();
    await b.page.locator('[data-test="import-gauge-note"]').waitFor();
    await converted.getByRole('button', { name: 'US customary' }).click();
    const firstRow = async () => (await converted.locator('tbody tr').first().innerText()).split('\t').map((c) => c.trim());
    // tray 1: 557,000 lb/h; 24.48 psig + 14.696 psi (NIST SP 811: 101.325 kPa) = 39.18 psia
    expect(await converted.locator('thead').innerText()).toContain('Pressure, absolute (psia)');
    expect((await firstRow())[1]).toBe('557,000');
    expect((await firstRow())[8]).toBe('39.18');
    await shot(b.page, 'engineer-import-converted');
    await b.page.getByRole('button', { name: 'Change the mapping' }).click();
    await basis.getByRole('button', { name: 'Absolute' }).click();
    await b.page.getByRole('button', { name: 'Check the rows' }).click();
    await b.page.locator('[data-test="import-clean"]').waitFor();
    await converted.getByRole('button', { name: 'SI' }).click();
    // 557,000 lb/h × 0.453 592 37 kg/lb = 252,651 kg/h; 24.48 psia × 6.894 757 kPa/psi = 168.8 kPa
    expect((await firstRow())[1]).toBe('252,651');
    expect((await firstRow())[8]).toBe('168.8');
    expect(await b.page.locator('[data-test="import-gauge-note"]').count()).toBe(0);
    expect(await b.page.locator('[data-test="import-store-blocked"]').count()).toBe(0);
    await b.page.getByRole('button', { name: 'Store load case' }).click();
    await b.page.waitForURL(/\/load-cases\//);
    await b.page.locator('[data-test="load-grid"]').waitFor();
    expect(await b.page.locator('[data-test="load-grid"] tbody tr').count()).toBe(46);
    // tray 1 vapour 557,000 lb/h is stored as 252,651 kg/h and shown in kg/h for an SI user
    expect(Number(await b.page.getByLabel('Row 1 Vapour').inputValue())).toBeCloseTo(557000 * 0.45359237, 0);
    await shot(b.page, 'engineer-load-grid');
  });

  it('pastes a block of cells from a spreadsheet into the grid, saves, and refuses a stale save with a reload offer', async () => {
    const cell = b.page.getByLabel('Row 2 Vapour');
    await cell.click();
    // two rows of vapour and liquid flow copied from a spreadsheet (tab-separated, in the column units kg/h)
    await cell.evaluate((el) => {
      const data = new DataTransfer();
      data.setData('text/plain', '250000\t140000\n249000\t139500\n');
      el.dispatchEvent(new ClipboardEvent('paste', { clipboardData: data, bubbles: true, cancelable: true }));
    });
    expect(await b.page.getByLabel('Row 2 Liquid').inputValue()).toBe('140000');
    expect(await b.page.getByLabel('Row 3 Vapour').inputValue()).toBe('249000');
    await b.page.getByRole('button', { name: 'Save loads' }).click();
    await b.page.getByText('version 2').first().waitFor();

    // someone else saves meanwhile: the page still holds version 2
    const id = b.page.url().split('/').pop()!;
    const status = await b.page.evaluate(async (lcId) => {
      const lc = (await (await fetch(`/api/load-cases/${lcId}`)).json()) as {
        loads: { vapourMassFlow_kg_h: number }[];
        version: number;
      };
      lc.loads[0]!.vapourMassFlow_kg_h += 1000;
      const res = await fetch(`/api/load-cases/${lcId}/loads`, {
        method: 'PUT',
        headers: { 'Content-Type': 'application/json' },
        body: JSON.stringify({ loads: lc.loads, version: lc.version }),
      });
      return res.status;
    }, id);
    expect(status).toBe(200);
    await b.page.getByLabel('Row 4 Vapour').fill('248000');
    await b.page.getByRole('button', { name: 'Save loads' }).click();
    await b.page.locator('[data-test="conflict"]').waitFor();
    await shot(b.page, 'engineer-load-conflict');
    await b.page.getByRole('button', { name: 'Load the latest version' }).click();
    await b.page.getByText('version 3').first().waitFor();
    expect(await b.page.locator('[data-test="conflict"]').count()).toBe(0);
  });

  it('rates the winter maximum case and shows the flagged trays, charts and operating window', async () => {
    await b.page.getByRole('link', { name: 'T-701' }).first().click();
    await b.page.waitForURL(/\/columns\/[^/]+$/);
    await b.page.getByRole('button', { name: 'Rate' }).click();
    await b.page.getByLabel('Load case').click();
    await b.page.getByRole('option', { name: /Winter maximum/ }).click();
    await b.page.getByLabel('Run label').fill('Winter maximum — browser check');
    await b.page.getByRole('dialog').getByRole('button', { name: 'Rate' }).click();
    await b.page.waitForURL(/\/runs\/[0-9a-f-]{36}$/);
    runUrl = b.page.url();
    await b.page.locator('[data-test="run-caution"]').waitFor();
    const over = Number(await b.page.locator('[data-test="trays-over"]').textContent());
    expect(over).toBeGreaterThan(0);
    const flagged = ['over', 'flooded', 'dry'].map((s) => `[data-test="tray-table"] tr.fl-row-${s}`).join(', ');
    expect(await b.page.locator(flagged).count()).toBe(over);
    // the top trays are past flood: named flooded and controlled by jet flood (not "entrainment 615 %")
    await b.page.locator('[data-test="run-flooded"]').waitFor();
    expect(await b.page.locator('[data-test="verdict-1"]').textContent()).toMatch(/Jet flood · flooded/);
    expect(await b.page.locator('[data-test="trays-over-list"]').textContent()).toMatch(/flooded: 1/);
    expect(await b.page.locator('[data-test="run-coverage"]').textContent()).toMatch(
      /all trays of the 4 rated sections have loads/,
    );
    // "at least" limits in words; a seal check that does not apply is not shown with a "≥ 0" limit
    const table = (await b.page.locator('[data-test="tray-table"]').textContent()) ?? '';
    expect(table).toMatch(/at least/);
    expect(table).toMatch(/not applicable/);
    expect(table).not.toMatch(/≥ 0\b/);
    await shot(b.page, 'engineer-run-trays');

    // the demo top section has moving valves: Klein's balance points and the valve state per tray
    await b.page.getByRole('tab', { name: 'Moving valves' }).click();
    const valveRows = b.page.locator('[data-test="tray-valves"] tbody tr');
    await valveRows.first().waitFor();
    expect(await valveRows.count()).toBeGreaterThan(0);
    expect(await valveRows.first().locator('td').nth(4).textContent()).toMatch(/^(closed|partly open|all open)$/);
    await shot(b.page, 'engineer-run-valves');

    await b.page.getByRole('tab', { name: 'Charts' }).click();
    await b.page.locator('[data-test="chart-percent"] .main-svg').first().waitFor({ timeout: 30000 });
    await b.page.locator('[data-test="chart-traffic"] .main-svg').first().waitFor();
    await shot(b.page, 'engineer-run-charts');

    await b.page.getByRole('tab', { name: 'Operating window' }).click();
    await b.page.locator('[data-test="chart-window"] .main-svg').first().waitFor({ timeout: 30000 });
    expect(await b.page.locator('[data-test="chart-window"] .scatterlayer .trace').count()).toBeGreaterThan(3);
    await shot(b.page, 'engineer-run-window');
  });

  it('compares with another run: per-tray differences and controlling-check changes', async () => {
    await b.page.getByRole('button', { name: 'Compare with' }).click();
    await b.page.getByRole('menu').or(b.page.locator('.q-menu')).getByText('Summer normal — base rating').click();
    await b.page.waitForURL(/\/runs\/compare\?/);
    await b.page.locator('[data-test="compare-table"] tbody tr').first().waitFor();
    expect(await b.page.locator('[data-test="compare-table"] tbody tr').count()).toBeGreaterThan(40);
    await b.page.locator('[data-test="controlling-changed"]').waitFor();
    await shot(b.page, 'engineer-compare');
  });

  it('submits the run for review', async () => {
    await b.page.goto(runUrl);
    await b.page.getByRole('button', { name: 'Submit for review' }).click();
    await b.page
      .getByRole('dialog')
      .locator('textarea')
      .fill('Winter maximum with the current trays: flood on the flagged trays.');
    await b.page.getByRole('dialog').getByRole('button', { name: 'Submit' }).click();
    await b.page.locator('[data-test="review-submitted"]').waitFor();
    expect(await b.page.getByRole('button', { name: 'Approve' }).count()).toBe(0);
  });

  it('the specialist approves it with a comment; the printable report carries cautions and sources', async () => {
    await b.context.clearCookies();
    await signInAs(b.page, 'internals-specialist');
    await b.page.goto(runUrl);
    await b.page.getByRole('button', { name: 'Approve' }).click();
    await b.page
      .getByRole('dialog')
      .locator('textarea')
      .fill('Agreed as a screening result; vendor to confirm the downcomer changes.');
    await b.page.getByRole('dialog').getByRole('button', { name: 'Approve' }).click();
    await b.page.locator('[data-test="review-approved"]').waitFor();
    await shot(b.page, 'engineer-run-approved');

    await b.page.getByRole('link', { name: 'Report' }).click();
    await b.page.waitForURL(/\/report$/);
    await b.page.getByText('Methods and sources').waitFor();
    const body = (await b.page.locator('.fl-report').textContent()) ?? '';
    expect(body).toMatch(/management-of-change/);
    expect(body).toMatch(/licensed engineers/);
    expect(body).toMatch(/Kister/);
    // a signed document: no drafting notes, no internal ids, statuses in words
    // (the reviewer's own comment above says "vendor to confirm": user text, not a drafting note)
    expect(body).not.toMatch(/from memory|recalled, to confirm|not yet confirmed|recalled|\.md\b/i);
    expect(body).not.toMatch(/\b(jetFlood|liquidLoad|weirLoadingVolumetric|passImbalance)\b/);
    expect(body).toMatch(/Jet flood: flooded/);
    expect(body).toMatch(/at most/);
    await b.page.emulateMedia({ media: 'print' });
    await shot(b.page, 'engineer-report-print');
    await b.page.emulateMedia({ media: 'screen' });
  });

  it('US customary units apply to the run page when the user switches', async () => {
    await b.page.goto(runUrl);
    await b.page.locator('[data-test="tray-table"]').waitFor();
    await b.page.getByRole('button', { name: 'US', exact: true }).click();
    // tray ΔP reads as a head of the tray's liquid: inches in US customary, mm in SI (no ΔP unit chosen)
    await b.page.getByText('ΔP (in liquid)').waitFor();
    await shot(b.page, 'engineer-run-us');
    await b.page.getByRole('button', { name: 'SI', exact: true }).click();
    await b.page.getByText('ΔP (mm liquid)').waitFor();
  });

  it('the specialist edits section geometry in US units; out-of-range input is named before saving', async () => {
    await b.page.getByRole('link', { name: 'T-701' }).first().click();
    await b.page.getByRole('cell', { name: 'Top (above top PA)', exact: true }).click();
    await b.page.waitForURL(/\/sections\//);
    await b.page.getByRole('button', { name: 'US', exact: true }).click();
    const weir = b.page.getByLabel('Outlet weir height (in)');
    await weir.waitFor();
    expect(Number(await weir.inputValue())).toBeCloseTo(50 / 25.4, 2); // 50 mm shown in inches (1 in = 25.4 mm exactly)
    await weir.fill('20');
    await b.page.getByRole('button', { name: 'Save section' }).click();
    await b.page.getByText(/Between 0 and 11\.8\d? in/).waitFor();
    await b.page.evaluate(() => window.scrollTo(0, 0));
    await shot(b.page, 'engineer-section-us');
    await b.page.getByRole('button', { name: 'SI', exact: true }).click();
  });
});
