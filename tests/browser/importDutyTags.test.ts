import { mkdtempSync, writeFileSync } from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { FROTHLINE_URL, launch, shot, signInAs, type Browser } from '../helpers/browser.js';
import type { LoadCaseRecord } from '../../shared/types/loads.js';

/**
 * The demo engineer imports a tray profile on T-701 as a simulation case and tags it, in the wizard, with the
 * pump-around duties it was made at, so that a heat-recovery plan can calibrate against it at once. The file
 * is invented (three trays); the load case is deleted after the test.
 */
let b: Browser;
let lcId = '';
const NAME = `Simulation with duties ${Date.now().toString(36)}`;
const dir = mkdtempSync(path.join(os.tmpdir(), 'frothline-duty-tags-'));
const file = path.join(dir, 'simulation.csv');
writeFileSync(
  file,
  [
    'Tray,Vapour (kg/h),Liquid (kg/h),Vapour density (kg/m3),Liquid density (kg/m3),Surface tension (mN/m)',
    '1,90000,120000,3.1,690,19',
    '2,91000,121000,3.1,691,19',
    '3,92000,122000,3.2,692,18.5',
  ].join('\n'),
);

beforeAll(async () => {
  b = await launch({ width: 1280, height: 900 });
  await signInAs(b.page, 'process-engineer');
});
afterAll(async () => {
  if (lcId)
    await b.page.evaluate(async (id) => {
      const lc = (await (await fetch(`/api/load-cases/${id}`)).json()) as { version: number };
      await fetch(`/api/load-cases/${id}?version=${lc.version}`, { method: 'DELETE' });
    }, lcId);
  await b?.close();
});

describe('duty tags in the import wizard', () => {
  it('tags the imported case with the duties of the pump-arounds it was run at', async () => {
    const page = b.page;
    const cols = (await (await page.request.get(`${FROTHLINE_URL}/api/columns?q=T-701`)).json()) as {
      items: { id: string; tag: string }[];
    };
    const colId = cols.items.find((c) => c.tag === 'T-701')!.id;
    await page.goto(`${FROTHLINE_URL}/columns/${colId}/import`);
    await page.locator('input[type=file]').setInputFiles(file);
    await page.getByLabel('Load case name').fill(NAME);
    await page.getByRole('button', { name: 'Read the file' }).click();
    await page.locator('[data-test="import-check-status"]').waitFor();
    await page.getByRole('button', { name: 'Check the rows' }).click();
    const tags = page.locator('[data-test=import-duty-tags]');
    await tags.waitFor();
    await tags.getByLabel('Top PA duty (kW)').fill('15275');
    await tags.getByLabel('Diesel PA duty (kW)').fill('20710');
    await shot(page, 'import-duty-tags');
    await page.getByRole('button', { name: 'Store load case' }).click();
    await page.waitForURL(/\/load-cases\/[0-9a-f-]{36}$/);
    lcId = new URL(page.url()).pathname.split('/').at(-1)!;
    const lc = (await (await page.request.get(`${FROTHLINE_URL}/api/load-cases/${lcId}`)).json()) as LoadCaseRecord;
    expect(lc.name).toBe(NAME);
    const column = (await (await page.request.get(`${FROTHLINE_URL}/api/columns/${colId}`)).json()) as {
      pumpArounds: { id: string; name: string }[];
    };
    const byName = (n: string) =>
      lc.pumpAroundDuties.find((d) => d.pumpAroundId === column.pumpArounds.find((p) => p.name === n)!.id);
    expect(byName('Top PA')?.duty_kW).toBe(15275);
    expect(byName('Diesel PA')?.duty_kW).toBe(20710);
  });
});
