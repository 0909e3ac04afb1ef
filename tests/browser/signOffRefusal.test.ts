import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { FROTHLINE_URL, launch, shot, signInAs, type Browser } from '../helpers/browser.js';
import type { ColumnSummary } from '../../shared/types/columns.js';
import type { Page as ApiPage } from '../../shared/types/api.js';
import type { InspectionRecord } from '../../shared/types/inspections.js';

/**
 * Signing is refused while a before-box-up punch item is open: the reason shows in the card the inspector signed
 * from (not only in the console), and every signature first states what it attests. The inspection is made for
 * this test through the API (invented turnaround name and findings).
 */
let b: Browser;
let rec: InspectionRecord;
const turnaround = `TA-refusal-${Date.now().toString(36)}`;
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

async function call<T>(method: 'get' | 'post' | 'put', url: string, data?: unknown): Promise<T> {
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
    startDate: '2026-05-04',
    permitRef: 'CSE-26-0504',
    gasTestRef: 'GT-26-0504-02',
  });
  rec = await call<InspectionRecord>('put', `/inspections/${rec.id}/trays/3/1`, { findings, asFound: none, asLeft: none });
  rec = await call<InspectionRecord>('post', `/inspections/${rec.id}/punch`, {
    tray: 3,
    pass: null,
    finding: 'Two deck clamps missing',
    action: 'Fit new clamps',
    priority: 'before-box-up',
    owner: 'Crew B',
  });
});
afterAll(() => b?.close());

describe('signing an inspection', () => {
  it('states what the signature attests and can be called off', async () => {
    const p = b.page;
    await p.goto(`${FROTHLINE_URL}/inspections/${rec.id}`);
    await p.getByRole('tab', { name: 'Sign-off' }).click();
    await p.getByRole('button', { name: 'Sign as inspector' }).click();
    const dlg = p.locator('.q-dialog', { hasText: 'Sign as inspector?' });
    await dlg.getByText(/you attest that the trays, photos and punch items in this record are what you found/).waitFor();
    await dlg.getByRole('button', { name: 'Go back' }).click();
    await dlg.waitFor({ state: 'detached' });
    expect((await call<InspectionRecord>('get', `/inspections/${rec.id}`)).status).toBe('draft');
  });

  it('shows why it is refused beside the button while a before-box-up item is open', async () => {
    const p = b.page;
    await p.getByRole('button', { name: 'Sign as inspector' }).click();
    await p.locator('.q-dialog').getByRole('button', { name: 'Sign', exact: true }).click();
    const refusal = p.locator('[data-test="sign-refusal"]');
    await refusal.waitFor();
    expect(await refusal.textContent()).toMatch(/Not signed: Close the before-box-up punch items first: #1/);
    expect(await refusal.isVisible()).toBe(true);
    await shot(p, 'inspection-sign-refused');
  });

  it('signs once the item is closed', async () => {
    const p = b.page;
    await p.getByRole('tab', { name: /Punch list/ }).click();
    await p.getByRole('button', { name: 'Close', exact: true }).click();
    await p.getByRole('tab', { name: 'Punch list (0 open)' }).waitFor();
    await p.getByRole('tab', { name: 'Sign-off' }).click();
    await p.getByRole('button', { name: 'Sign as inspector' }).click();
    await p.locator('.q-dialog').getByRole('button', { name: 'Sign', exact: true }).click();
    await p.locator('[data-test="signature-inspector"]').waitFor();
    expect(await p.locator('[data-test="sign-refusal"]').count()).toBe(0);
  });
});
