import sharp from 'sharp';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { FROTHLINE_URL, launch, shot, signInAs, type Browser } from '../helpers/browser.js';

let b: Browser;
let inspectionUrl = '';
const turnaround = `TA-browser-${Date.now().toString(36)}`;

beforeAll(async () => {
  // tablet in landscape
  b = await launch({ width: 1180, height: 820 });
  b.page.setDefaultTimeout(20000);
});
afterAll(() => b?.close());

describe('turnaround inspection on a tablet', () => {
  it('an inspector starts an inspection of T-701 and sees the safety cautions', async () => {
    await signInAs(b.page, 'inspector');
    await b.page.goto(`${FROTHLINE_URL}/inspections`);
    await b.page.getByText('Marrowby TA-2025 (autumn)').waitFor();
    expect(await b.page.locator('[data-test="inspection-safety"]').textContent()).toMatch(
      /permit-required confined-space.*rescue plan.*Hydrogen sulfide.*Pyrophoric iron sulfide.*fall protection/s,
    );
    await shot(b.page, 'inspection-list');
    await b.page.getByRole('button', { name: 'New inspection' }).click();
    await b.page.getByLabel('Column').click();
    await b.page.getByRole('option', { name: /T-701/ }).click();
    await b.page.getByLabel('Turnaround').fill(turnaround);
    await b.page.getByLabel('Start date').fill('2026-04-13');
    await b.page.getByLabel('Entry permit reference').fill('CSE-26-0413');
    await b.page.getByLabel('Gas-test reference').fill('GT-26-0413-01');
    await b.page.getByRole('button', { name: 'Start inspection' }).click();
    await b.page.waitForURL(/\/inspections\/[0-9a-f-]{36}$/);
    inspectionUrl = b.page.url();
    await b.page.getByText(`T-701 · ${turnaround}`).waitFor();
  });

  it('records tray 5 with checklist toggles and gets tolerance feedback while typing', async () => {
    const p = b.page;
    await p.getByLabel('Tray', { exact: true }).fill('5');
    await p.getByText('Design: weir 50 mm').waitFor();
    await p.getByRole('switch', { name: 'Fouling / plugging' }).click();
    await p.getByLabel('Holes/valves blocked (%)').fill('20');
    await p.getByRole('switch', { name: 'Manway installed' }).click();
    await p.getByRole('switch', { name: 'Closure witnessed' }).click();
    await p.getByLabel('As found Outlet weir height (mm) point 1').fill('52.5');
    await p.getByText(/Out of tolerance: \+2\.5 mm from design 50 mm \(±1\.6 mm\)/).waitFor();
    await p.getByLabel('As found Outlet weir height (mm) point 2').fill('50.4');
    await p.getByText(/Within tolerance: \+0\.4 mm/).waitFor();
    await p.getByLabel('As found Downcomer clearance (mm) point 1').fill('44.1');
    await p.getByLabel('As found levelness').fill('4');
    await shot(p, 'inspection-tray-entry');
    await p.getByRole('button', { name: 'Save tray 5 pass 1' }).click();
    await p.getByText('Tray 5 pass 1 saved').waitFor();
    await p.getByText('Tray 5 · pass 1').waitFor();
    await p.setViewportSize({ width: 820, height: 1180 }); // tablet in portrait
    await shot(p, 'inspection-tray-portrait');
    await p.setViewportSize({ width: 1180, height: 820 });
  });

  it('attaches a photo through the camera-capable file field and shows its thumbnail', async () => {
    const p = b.page;
    await p.getByRole('tab', { name: /Photos/ }).click();
    const input = p.locator('input[type=file]');
    expect(await input.getAttribute('capture')).toBe('environment');
    expect(await input.getAttribute('accept')).toBe('image/*');
    const png = await sharp({ create: { width: 400, height: 300, channels: 3, background: '#6b5b3e' } })
      .png()
      .toBuffer();
    await input.setInputFiles({ name: 'tray5-deck.png', mimeType: 'image/png', buffer: png });
    await p.getByLabel('Finding').fill('fouling');
    await p.getByLabel('Caption').fill('Tray 5 deck, inlet side');
    await p.getByRole('button', { name: 'Upload photo' }).click();
    await p.getByText('Photo stored').waitFor();
    const img = p.getByRole('img', { name: 'Tray 5 deck, inlet side' });
    await img.waitFor();
    await p.waitForFunction(() =>
      [...document.querySelectorAll('img')].some((i) => i.alt === 'Tray 5 deck, inlet side' && i.complete && i.naturalWidth > 0),
    );
    await p.locator('.q-img__loading').waitFor({ state: 'detached' });
    await shot(p, 'inspection-photo');
  });

  it('the inspector signs; the record becomes read-only', async () => {
    const p = b.page;
    await p.getByRole('tab', { name: 'Sign-off' }).click();
    await p.getByRole('button', { name: 'Sign as inspector' }).click();
    await p.locator('.q-dialog').getByRole('button', { name: 'Sign', exact: true }).click();
    await p.locator('[data-test="signature-inspector"]').waitFor();
    await p.getByText('Signed records are read-only.', { exact: true }).waitFor();
    expect(await p.getByRole('button', { name: 'Sign as inspector' }).count()).toBe(0);
    await shot(p, 'inspection-inspector-signed');
  });

  it("the column's engineer countersigns and the notice reaches the development mailbox", async () => {
    const p = b.page;
    await b.context.clearCookies();
    await signInAs(p, 'process-engineer');
    await p.goto(inspectionUrl);
    await p.getByRole('tab', { name: 'Sign-off' }).click();
    await p.getByRole('button', { name: 'Countersign as engineer' }).click();
    await p
      .locator('.q-dialog', { hasText: 'you have reviewed the tray records' })
      .getByRole('button', { name: 'Countersign', exact: true })
      .click();
    await p.locator('[data-test="signature-engineer"]').waitFor();
    await p.getByText('Signed off', { exact: true }).waitFor();
    await shot(p, 'inspection-engineer-signed');

    // as-found rating of the signed record: tray 5 was 20 % plugged, so its dry pressure drop rises
    await p.getByRole('tab', { name: 'Rating as found' }).click();
    await p.getByRole('button', { name: 'Rate as found' }).click();
    await p.getByText(/Design controls at tray \d+/).waitFor();
    const row = p
      .getByRole('row')
      .filter({ has: p.getByRole('cell', { name: '5', exact: true }) })
      .first();
    const cells = await row.getByRole('cell').allTextContents();
    expect(Number(cells[2])).toBeGreaterThan(Number(cells[1]));
    await shot(p, 'inspection-as-found');

    // the two runs it made do not clutter the column's run list or drive its profile
    const cols = (await (await p.request.get(`${FROTHLINE_URL}/api/columns?q=T-701`)).json()) as {
      items: { id: string; tag: string }[];
    };
    await p.goto(`${FROTHLINE_URL}/columns/${cols.items.find((c) => c.tag === 'T-701')!.id}`);
    await p.getByText('Rating runs').waitFor();
    const designLabel = `Design — for inspection ${turnaround}`;
    expect(await p.getByText(/^Flags from /).innerText()).not.toMatch(/inspection|As found/);
    expect(await p.getByText(designLabel).count()).toBe(0);
    await p.locator('[data-test=runs-inspection-toggle]').click();
    await p.getByRole('cell', { name: new RegExp(`^${designLabel} design copy for as found$`) }).waitFor();

    await b.context.clearCookies();
    await signInAs(p, 'admin');
    const subject = `Inspection of T-701 (${turnaround}) signed by the inspector — your sign-off is due`;
    for (let i = 0; i < 20; i++) {
      await p.goto(`${FROTHLINE_URL}/admin/mail`);
      await p.locator('[data-test="outbox"]').waitFor();
      if ((await p.locator('[data-test="mailbox"]').getByText(subject).count()) > 0) break;
      await p.waitForTimeout(1000);
    }
    await p.locator('[data-test="mailbox"]').getByText(subject).waitFor({ timeout: 2000 });
    await shot(p, 'inspection-mailbox');
  });
});
