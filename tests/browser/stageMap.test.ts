import { mkdtempSync, writeFileSync } from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { FROTHLINE_URL, launch, shot, signInAs, type Browser } from '../helpers/browser.js';

/**
 * The demo engineer gives a load case a stage-to-tray map on the load-case page (an overlap is named as it is typed,
 * the fixed map is saved, survives a reload, and a stale save is refused with the server's message), then uses a
 * map in the import wizard, whose row check re-runs as the numbering changes. The load case is made on T-701 for
 * this test with invented loads (and deleted after it); the stage file is invented; nothing is imported.
 */
let b: Browser;
let lcId = '';
const NAME = `Stage map check ${Date.now().toString(36)}`;
const dir = mkdtempSync(path.join(os.tmpdir(), 'frothline-stages-'));
const stageFile = path.join(dir, 'stages.csv');
writeFileSync(
  stageFile,
  [
    'Stage,Vapour (kg/h),Liquid (kg/h),Vapour density (kg/m3),Liquid density (kg/m3),Surface tension (mN/m)',
    '1,90000,120000,3.1,690,19',
    '2,91000,121000,3.1,691,19',
    '3,92000,122000,3.2,692,18.5',
  ].join('\n'),
);

beforeAll(async () => {
  b = await launch({ width: 1440, height: 900 });
});
afterAll(async () => {
  if (lcId)
    await b.page.evaluate(async (id) => {
      const lc = (await (await fetch(`/api/load-cases/${id}`)).json()) as { version: number };
      await fetch(`/api/load-cases/${id}?version=${lc.version}`, { method: 'DELETE' });
    }, lcId);
  await b?.close();
});

const section = () => b.page.locator('[data-test="stage-map-section"]');
const mapErrors = () => section().locator('[data-test="stage-map-errors"]');

describe('stage-to-tray map in Chromium', () => {
  it('the engineer opens a new load case on T-701; it has no map yet', async () => {
    await signInAs(b.page, 'process-engineer');
    lcId = await b.page.evaluate(async (name) => {
      const list = (await (await fetch('/api/columns?q=T-701')).json()) as { items: { id: string; trayCount: number }[] };
      const { id: colId, trayCount } = list.items[0]!;
      // invented, smoothly varying loads for every tray (SI, properties at tray conditions)
      const loads = Array.from({ length: trayCount }, (_, i) => ({
        tray: i + 1,
        vapourMassFlow_kg_h: 240000 - 1500 * i,
        liquidMassFlow_kg_h: 140000 - 800 * i,
        vapourDensity_kg_m3: 3.4 + 0.02 * i,
        liquidDensity_kg_m3: 700 + 1.5 * i,
        surfaceTension_mN_m: 18 - 0.1 * i,
      }));
      const res = await fetch(`/api/columns/${colId}/load-cases`, {
        method: 'POST',
        headers: { 'Content-Type': 'application/json' },
        body: JSON.stringify({ name, basis: 'other', source: 'typed', loads }),
      });
      const body = (await res.json()) as { id?: string };
      return body.id ?? `refused ${res.status}: ${JSON.stringify(body)}`;
    }, NAME);
    expect(lcId).toMatch(/^[0-9a-f-]{36}$/);
    await b.page.goto(`${FROTHLINE_URL}/load-cases/${lcId}`);
    await section().waitFor();
    expect(await section().textContent()).toContain('No stage-to-tray map');
  });

  it('names an overlap as it is typed, refuses to save it, and saves the fixed map', async () => {
    await section().getByText('Stage-to-tray map', { exact: true }).click();
    await section().getByRole('button', { name: 'Fill 1:1' }).click();
    await section().getByLabel('Last tray, row 2', { exact: true }).waitFor();
    expect(await section().locator('[data-test="stage-map-summary"]').textContent()).toBe('46 stages → trays 1–46');
    // stage 2 now also takes tray 3, which stage 3 still holds
    await section().getByLabel('Last tray, row 2', { exact: true }).fill('3');
    await mapErrors().waitFor();
    expect(await mapErrors().textContent()).toContain('stage 3 (tray 3) overlaps stage 2 (trays 2–3)');
    expect(await section().getByRole('button', { name: 'Save map' }).isDisabled()).toBe(true);
    await shot(b.page, 'stage-map-overlap');

    await section().getByRole('button', { name: 'Remove row 3', exact: true }).click();
    await mapErrors().waitFor({ state: 'detached' });
    expect(await section().locator('[data-test="stage-map-summary"]').textContent()).toBe(
      '45 stages → trays 1–46; trays 2–3 share stage 2',
    );
    await section().getByRole('button', { name: 'Save map' }).click();
    await b.page.getByText('Stage-to-tray map saved (version 2)').waitFor();
    await b.page.getByText('version 2').first().waitFor();
  });

  it('shows the stored map after a reload', async () => {
    await b.page.reload();
    await section().waitFor();
    expect(await section().textContent()).toContain('45 stages → trays 1–46; trays 2–3 share stage 2');
    await section().getByText('Stage-to-tray map', { exact: true }).click();
    await section().getByLabel('Stage, row 3', { exact: true }).waitFor();
    expect(await section().getByLabel('Stage, row 3', { exact: true }).inputValue()).toBe('4');
    expect(await section().getByLabel('First tray, row 2', { exact: true }).inputValue()).toBe('2');
    expect(await section().getByLabel('Last tray, row 2', { exact: true }).inputValue()).toBe('3');
    await shot(b.page, 'stage-map-saved');
  });

  it('a save on a stale version is refused with the server message and succeeds after loading the latest', async () => {
    await section().getByLabel('Last tray, row 1', { exact: true }).fill('2');
    await section().getByLabel('First tray, row 2', { exact: true }).fill('3');
    // someone else saves the loads meanwhile (version 2 → 3)
    const status = await b.page.evaluate(async (id) => {
      const lc = (await (await fetch(`/api/load-cases/${id}`)).json()) as {
        loads: { vapourMassFlow_kg_h: number }[];
        version: number;
      };
      lc.loads[0]!.vapourMassFlow_kg_h += 1000; // an unchanged grid would not make a new version
      const res = await fetch(`/api/load-cases/${id}/loads`, {
        method: 'PUT',
        headers: { 'Content-Type': 'application/json' },
        body: JSON.stringify({ loads: lc.loads, version: lc.version }),
      });
      return res.status;
    }, lcId);
    expect(status).toBe(200);
    await section().getByRole('button', { name: 'Save map' }).click();
    const failure = section().locator('[data-test="stage-map-failure"]');
    await failure.waitFor();
    expect(await failure.textContent()).toMatch(/changed by someone else since you loaded it \(your version 2, current 3\)/);
    await shot(b.page, 'stage-map-stale');
    await failure.getByRole('button', { name: 'Load the latest version' }).click();
    await failure.waitFor({ state: 'detached' });
    // the stored map did not change, so the edit is kept for the retry
    expect(await section().getByLabel('First tray, row 2', { exact: true }).inputValue()).toBe('3');
    await section().getByRole('button', { name: 'Save map' }).click();
    await b.page.getByText('Stage-to-tray map saved (version 4)').waitFor();
    expect(await section().textContent()).toContain('trays 1–2 share stage 1');
  });

  it('in the import wizard the row check re-runs as the numbering changes, and a map can replace the offset', async () => {
    await b.page.getByRole('link', { name: 'T-701' }).first().click();
    await b.page.waitForURL(/\/columns\/[^/]+$/);
    await b.page.getByRole('link', { name: 'Import tray profile' }).click();
    await b.page.waitForURL(/\/import$/);
    await b.page.locator('input[type=file]').setInputFiles(stageFile);
    await b.page.getByLabel('Load case name').fill(`Stages ${Date.now().toString(36)}`);
    await b.page.getByRole('button', { name: 'Read the file' }).click();
    const status = b.page.locator('[data-test="import-check-status"]');
    await status.waitFor();
    expect(await status.textContent()).toContain('3 trays read without errors');

    // stages 1–3 with 2 stages before tray 1 give trays −1, 0 and 1: two rows fall outside the column
    await b.page.getByLabel('Stages before tray 1').fill('2');
    await b.page.getByText('2 problem(s) with these choices').waitFor();

    await b.page.getByText('Give a stage-to-tray table').click();
    const editor = b.page.locator('[data-test="import-numbering"] [data-test="stage-map-editor"]');
    await editor.getByLabel('Last tray, row 1', { exact: true }).waitFor();
    // the table starts from the offset: stage 3 → tray 1, so stages 1 and 2 are not in it
    await b.page.getByText('2 problem(s) with these choices').waitFor();
    await editor.getByRole('button', { name: 'Clear the table' }).click();
    for (let i = 0; i < 3; i++) await editor.getByRole('button', { name: 'Add stage' }).click();
    await editor.getByLabel('Last tray, row 3', { exact: true }).fill('5');
    await editor.getByLabel('Last tray, row 1', { exact: true }).fill('3');
    await editor.locator('[data-test="stage-map-errors"]').waitFor();
    await b.page.getByText('The stage-to-tray map has faults').waitFor();
    await editor.getByLabel('Last tray, row 1', { exact: true }).fill('1');
    await b.page.getByText('5 trays read without errors with these choices').waitFor();
    expect(await editor.locator('[data-test="stage-map-summary"]').textContent()).toBe(
      '3 stages → trays 1–5; trays 3–5 share stage 3',
    );
    await shot(b.page, 'stage-map-import');
  });
});
