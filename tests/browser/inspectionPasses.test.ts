import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { FROTHLINE_URL, launch, shot, signInAs, type Browser } from '../helpers/browser.js';
import type { ColumnDetail, ColumnSummary } from '../../shared/types/columns.js';
import type { Page as ApiPage } from '../../shared/types/api.js';
import type { AsFoundResult, InspectionRecord } from '../../shared/types/inspections.js';

/**
 * An inspection offers only the passes a tray has (the demo column's trays are all two-pass), the API refuses
 * another naming the field, and the as-found dry ΔP reads in the user's ΔP unit. Invented turnaround, made
 * through the API.
 */
let b: Browser;
let rec: InspectionRecord;
let col: ColumnDetail;
const none = { weirHeight_mm: [], downcomerClearance_mm: [], levelness_mm: null, traySpacing_mm: null };
const findings = {
  fouling: true,
  blockedPercent: 20,
  corrosion: false,
  damage: 'none',
  valvesMissing: 0,
  valvesStuck: 0,
  looseFasteners: false,
  manwayInstalled: true,
  closureWitnessed: true,
  debris: false,
};

beforeAll(async () => {
  b = await launch({ width: 1280, height: 860 });
  b.page.setDefaultTimeout(20000);
  await signInAs(b.page, 'inspector');
  const cols = (await (await b.page.request.get(`${FROTHLINE_URL}/api/columns?q=T-701`)).json()) as ApiPage<ColumnSummary>;
  const id = cols.items.find((c) => c.tag === 'T-701')!.id;
  col = (await (await b.page.request.get(`${FROTHLINE_URL}/api/columns/${id}`)).json()) as ColumnDetail;
  const made = await b.page.request.post(`${FROTHLINE_URL}/api/inspections`, {
    data: { columnId: id, turnaround: `TA-pass-${Date.now().toString(36)}`, startDate: '2026-06-01' },
  });
  expect(made.status()).toBe(201);
  rec = (await made.json()) as InspectionRecord;
  const t = await b.page.request.put(`${FROTHLINE_URL}/api/inspections/${rec.id}/trays/4/1`, {
    data: { findings, asFound: none, asLeft: none },
  });
  expect(t.status()).toBe(200);
});
afterAll(() => b?.close());

describe('passes of a tray', () => {
  it('the tray form offers only the passes the tray has', async () => {
    const p = b.page;
    const sec = col.sections.find((s) => 4 >= Math.min(s.firstTray, s.lastTray) && 4 <= Math.max(s.firstTray, s.lastTray))!;
    expect(sec.geometry.passes).toBe(2);
    await p.goto(`${FROTHLINE_URL}/inspections/${rec.id}`);
    await p.getByLabel('Tray', { exact: true }).first().fill('4');
    await p.locator('[data-test=tray-pass]').click();
    const opts = await p.locator('.q-menu .q-item').allTextContents();
    expect(opts.map((o) => o.trim())).toEqual(['1', '2']);
    await shot(p, 'inspection-pass-choices-1280');
    await p.keyboard.press('Escape');
  });

  it('the API refuses a pass the tray does not have, naming the field', async () => {
    const r = await b.page.request.put(`${FROTHLINE_URL}/api/inspections/${rec.id}/trays/4/3`, {
      data: { findings, asFound: none, asLeft: none },
    });
    expect(r.status()).toBe(400);
    expect(((await r.json()) as { details: { path: string; message: string }[] }).details).toEqual([
      { path: 'pass', message: 'tray 4 has 2 passes: give a pass from 1 to 2' },
    ]);
  });
});

describe('as-found rating', () => {
  it('shows the dry ΔP in the ΔP unit the user chose (inches of liquid here)', async () => {
    const p = b.page;
    await b.context.clearCookies();
    await signInAs(p, 'process-engineer');
    const pref = (unit: string | null) =>
      p.request.put(`${FROTHLINE_URL}/api/auth/preferences`, { data: { pressureDropUnit: unit } });
    expect((await pref('in-liquid')).status()).toBe(200);
    try {
      await p.goto(`${FROTHLINE_URL}/inspections/${rec.id}`);
      await p.getByRole('tab', { name: 'Rating as found' }).click();
      const answer = p.waitForResponse((r) => r.url().endsWith(`/inspections/${rec.id}/as-found`) && r.status() === 201);
      await p.getByRole('button', { name: 'Rate as found' }).click();
      const result = (await (await answer).json()) as AsFoundResult;
      await p.getByText(/Design controls at tray \d+/).waitFor();
      await p.getByRole('columnheader', { name: 'Dry ΔP as found (in liquid)' }).waitFor();
      const t4 = result.trays.find((t) => t.tray === 4)!;
      const row = p
        .getByRole('row')
        .filter({ has: p.getByRole('cell', { name: '4', exact: true }) })
        .first();
      const cells = await row.getByRole('cell').allTextContents();
      // a head in mm of the tray's liquid shown in inches (25.4 mm/in), three significant figures
      expect(Number(cells[2])).toBeCloseTo(t4.dryPressureDrop_mm.asFound / 25.4, 1);
      expect(Number(cells[2])).toBeGreaterThan(Number(cells[1])); // 20 % plugged: a higher dry ΔP
      await shot(p, 'inspection-as-found-inches');
    } finally {
      await pref(null);
    }
  });
});
