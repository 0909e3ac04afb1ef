import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { FROTHLINE_URL, launch, shot, signInAs, type Browser } from '../helpers/browser.js';
import type { ColumnSummary } from '../../shared/types/columns.js';
import type { Page as ApiPage } from '../../shared/types/api.js';
import type { InspectionRecord } from '../../shared/types/inspections.js';

/**
 * A punch item entered twice is voided with a reason from the punch list at 1280 px: it stays on the list
 * struck through, says who voided it and why, and the open count drops. The status column (buttons and the
 * "closed by … / voided by …" text) stays inside the table. Invented turnaround and findings, made through the API.
 */
let b: Browser;
let rec: InspectionRecord;
const turnaround = `TA-void-${Date.now().toString(36)}`;
const none = { weirHeight_mm: [], downcomerClearance_mm: [], levelness_mm: null, traySpacing_mm: null };
const findings = {
  fouling: false,
  blockedPercent: 0,
  corrosion: false,
  damage: 'none',
  valvesMissing: 0,
  valvesStuck: 0,
  looseFasteners: false,
  manwayInstalled: true,
  closureWitnessed: true,
  debris: false,
};

async function call<T>(method: 'get' | 'post' | 'put' | 'patch', url: string, data?: unknown): Promise<T> {
  const res = await b.page.request.fetch(`${FROTHLINE_URL}/api${url}`, { method, ...(data === undefined ? {} : { data }) });
  if (!res.ok()) throw new Error(`${method.toUpperCase()} ${url}: ${res.status()} ${await res.text()}`);
  return (await res.json()) as T;
}

beforeAll(async () => {
  b = await launch({ width: 1280, height: 820 });
  b.page.setDefaultTimeout(20000);
  await signInAs(b.page, 'inspector');
  const cols = await call<ApiPage<ColumnSummary>>('get', '/columns?q=T-701');
  const col = cols.items.find((c) => c.tag === 'T-701')!;
  rec = await call<InspectionRecord>('post', '/inspections', {
    columnId: col.id,
    turnaround,
    startDate: '2026-05-11',
    permitRef: 'CSE-26-0511',
    gasTestRef: 'GT-26-0511-01',
  });
  rec = await call<InspectionRecord>('put', `/inspections/${rec.id}/trays/4/1`, { findings, asFound: none, asLeft: none });
  for (const finding of ['Inlet weir bolt missing', 'Inlet weir bolt missing, tray 4'])
    rec = await call<InspectionRecord>('post', `/inspections/${rec.id}/punch`, {
      tray: 4,
      pass: null,
      finding,
      action: 'Fit new bolt and check the other weir bolts on tray 4',
      priority: 'before-box-up',
      owner: 'Mechanical contractor crew B',
    });
  // item 1 closed: its status text is the long "closed by … date" form
  rec = await call<InspectionRecord>('patch', `/inspections/${rec.id}/punch/${rec.punch[0]!.id}`, {
    status: 'closed',
    version: rec.punch[0]!.version,
  });
});
afterAll(() => b?.close());

/** Elements of `sel` whose box runs past the right edge of their table's scroll container. */
const clipped = (sel: string) =>
  b.page.evaluate((s) => {
    return [...document.querySelectorAll(s)]
      .filter((el) => {
        const box = el.closest('.q-table__middle') ?? document.documentElement;
        const r = el.getBoundingClientRect();
        const c = box.getBoundingClientRect();
        return r.right > c.right + 0.5 || box.scrollWidth > box.clientWidth + 1;
      })
      .map((el) => el.textContent);
  }, sel);

describe('voiding a punch item', () => {
  it('asks for a reason, strikes the item through and stops counting it as open', async () => {
    const p = b.page;
    await p.goto(`${FROTHLINE_URL}/inspections/${rec.id}`);
    await p.getByRole('tab', { name: 'Punch list (1 open)' }).click();
    await p.getByRole('button', { name: 'Void item 2' }).click();
    const dlg = p.locator('.q-dialog', { hasText: 'Void punch item 2' });
    await dlg.getByText(/stays on the list, struck through/).waitFor();
    expect(await dlg.getByRole('button', { name: 'Void item' }).isDisabled()).toBe(true); // no reason yet
    await dlg.locator('textarea').fill('Entered twice; same bolt as item 1');
    await dlg.getByRole('button', { name: 'Void item' }).click();
    await p.getByRole('tab', { name: 'Punch list (0 open)' }).waitFor();
    const row = p.locator('[data-test="punch-row-2"]');
    await row.getByText(/voided by .*: Entered twice; same bolt as item 1/).waitFor();
    const finding = row.getByRole('cell', { name: 'Inlet weir bolt missing, tray 4' });
    expect(await finding.evaluate((el) => getComputedStyle(el).textDecorationLine)).toBe('line-through');
    expect(await row.getByRole('button', { name: /Void item|Close|Reopen/ }).count()).toBe(0);
    const first = p.locator('[data-test="punch-row-1"]').getByRole('cell', { name: 'Inlet weir bolt missing', exact: true });
    expect(await first.evaluate((el) => getComputedStyle(el).textDecorationLine)).toBe('none');
    await shot(p, 'punch-void');
  });

  it('at 1280 px the status column (buttons, closed-by and voided-by text) is not clipped', async () => {
    await b.page.reload();
    await b.page.getByRole('tab', { name: /Punch list/ }).click();
    await b.page.locator('[data-test="punch-row-1"]').waitFor();
    expect(await clipped('.punch-status')).toEqual([]);
  });
});
