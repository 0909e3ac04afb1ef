/**
 * Field evidence in the browser: an internals specialist imports a gamma-scan file of a throwaway column (made
 * with the engine's synthetic generator from our own model, trays 4 and 5 flooded, tray 9 without its peak),
 * compares it with a rating run and sees the flags written on the chart and in the tray table. Tags, geometry
 * and loads are invented for the test; the demo column is only read.
 */
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { frothHeightsFromRating, syntheticGammaScan, trayDeckElevations } from '../../server/engine/fieldEvidence/index.js';
import { FROTHLINE_URL, launch, shot, signInAs, type Browser } from '../helpers/browser.js';
import type { ColumnDetail, ColumnSummary, SectionBody } from '../../shared/types/columns.js';
import type { Page as ApiPage } from '../../shared/types/api.js';
import type { CreateLoadCaseBody, LoadCaseRecord } from '../../shared/types/loads.js';
import type { StudySection } from '../../shared/types/pumpAround.js';

let b: Browser;
const TAG = `T-9${Math.floor(10 + Math.random() * 90)}-${Date.now().toString(36).slice(-5)}`;
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
const loads: CreateLoadCaseBody['loads'] = Array.from({ length: 12 }, (_, i) => ({
  tray: i + 1,
  vapourMassFlow_kg_h: 31000 + 150 * i,
  liquidMassFlow_kg_h: 52000 - 200 * i,
  vapourDensity_kg_m3: 3.1,
  liquidDensity_kg_m3: 690,
  surfaceTension_mN_m: 19,
}));

async function call<T>(method: 'get' | 'post', url: string, data?: unknown): Promise<T> {
  const res = await b.page.request.fetch(`${FROTHLINE_URL}/api${url}`, { method, ...(data === undefined ? {} : { data }) });
  if (!res.ok()) throw new Error(`${method.toUpperCase()} ${url}: ${res.status()} ${await res.text()}`);
  return (await res.json()) as T;
}

/** The scan file: elevation in m, density in kg/m³, from our own model (never a real scan). */
function scanCsv(): string {
  const sections: StudySection[] = [{ ...geometry, name: 'All', fromTray: 1, toTray: 12 }];
  const decks = trayDeckElevations(sections, 'top-down', { tray: 12, elevation_m: 10 });
  const deck = (t: number) => decks.find((d) => d.tray === t)!.deckElevation_m;
  const pts = syntheticGammaScan({
    decks,
    frothHeights: frothHeightsFromRating(sections, loads, { 4: 'flooded', 5: 'flooded', 9: 'missing' }),
    defaultFrothHeight_mm: 150,
    vapourDensity_kg_m3: 3.1,
    liquidDensity_kg_m3: 690,
    frothDensity_kg_m3: 0.3 * 690,
    from_m: deck(11) - 0.1,
    to_m: deck(2) + 0.61 + 0.1,
    step_m: 0.025,
    noise_kg_m3: 8,
    seed: 11,
  });
  return [
    'Elevation (m),Density (kg/m3)',
    ...pts.map((p) => `${p.elevation_m},${Math.max(0, p.density_kg_m3!).toFixed(1)}`),
  ].join('\n');
}

beforeAll(async () => {
  b = await launch();
  await signInAs(b.page, 'internals-specialist');
  const cols = await call<ApiPage<ColumnSummary>>('get', '/columns?pageSize=200');
  const demo = cols.items.find((c) => c.tag === 'T-701')!;
  const unitId = (await call<ColumnDetail>('get', `/columns/${demo.id}`)).unitId;
  column = await call<ColumnDetail>('post', '/columns', {
    unitId,
    tag: TAG,
    service: 'scan test',
    numbering: 'top-down',
    trayCount: 12,
  });
  await call('post', `/columns/${column.id}/sections`, {
    name: 'All',
    firstTray: 1,
    lastTray: 12,
    geometry,
    provenance: 'design',
    provenanceDate: null,
  });
  const lc = await call<LoadCaseRecord>('post', `/columns/${column.id}/load-cases`, {
    name: 'Test case',
    basis: 'normal',
    source: 'typed',
    loads,
  });
  await call('post', '/runs', { columnId: column.id, loadCaseId: lc.id, label: 'Scan test run' });
}, 60_000);
afterAll(async () => {
  await b?.close();
});

describe('gamma-scan import and reading in the browser', () => {
  it('imports a scan file and shows the flooded trays and the missing tray on the chart', async () => {
    const p = b.page;
    await p.goto(`${FROTHLINE_URL}/columns/${column.id}`);
    await p.locator('[data-test="evidence-import"]').click();
    await p.waitForURL(/\/evidence\/import$/);
    await p.locator('input[type=file]').setInputFiles({
      name: 'scan-test.csv',
      mimeType: 'text/csv',
      buffer: Buffer.from(scanCsv()),
    });
    await p.locator('[data-test="scan-read"]').click();
    await p.locator('[data-test="scan-preview"]').waitFor();
    expect(await p.locator('[data-test="scan-errors"]').count()).toBe(0);
    await p.getByLabel('Datum tray').fill('12');
    await p.getByLabel(/Deck elevation of that tray/).fill('10');
    await p.getByLabel(/Liquid density/).fill('690');
    await p.getByLabel(/Vapour density/).fill('3.1');
    await p.locator('[data-test="scan-store"]').click();
    await p.waitForURL(/\/evidence\/[0-9a-f-]{36}$/);
    await p.locator('[data-test="evidence-run"]').click();
    await p.getByRole('option', { name: /Scan test run/ }).click();
    const chart = p.locator('[data-test="scan-chart"]');
    await chart.locator('text=Flooded (T4)').waitFor({ timeout: 20_000 });
    await expect.poll(() => chart.locator('text=Flooded (T5)').count()).toBe(1);
    await expect.poll(() => chart.locator('text=No tray peak (T9)').count()).toBe(1);
    // tray labels carry both numbers: tray 9 counted from the top is 4 from the bottom
    await expect.poll(() => chart.locator('text=T9 · 4↑').count()).toBe(1);
    const table = p.locator('[data-test="scan-findings"]');
    await expect.poll(() => table.locator('[data-finding="flooded"]').count()).toBe(2);
    await expect.poll(() => table.locator('[data-finding="missing-tray"]').count()).toBe(1);
    expect(await p.locator('[data-test="evidence-caution"]').innerText()).toMatch(/licensed contractors/);
    await shot(p, 'evidence-scan');
  }, 90_000);
});
