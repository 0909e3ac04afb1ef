import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { launch, shot, signInAs, type Browser } from '../helpers/browser.js';

/**
 * The internals specialist describes a new column from the UI: creates it on the demo site, adds a pump-around,
 * edits it (a stale save is refused and the latest values reloaded), and edits the column details. Everything
 * happens on a column of its own with a unique tag, so the demo column T-701 that other tests count is untouched.
 * Tags, trays and duties are invented for the test.
 */
let b: Browser;
const TAG = `T-9${Math.floor(10 + Math.random() * 90)}-${Date.now().toString(36).slice(-5)}`;

beforeAll(async () => {
  b = await launch({ width: 1440, height: 900 });
});
afterAll(() => b?.close());

async function pickOption(label: string, option: string): Promise<void> {
  await b.page.getByLabel(label, { exact: true }).click();
  await b.page.getByRole('option', { name: option }).click();
}

describe('column editing in Chromium', () => {
  it('the specialist is refused a tag already used in the unit, with the message beside the field', async () => {
    await signInAs(b.page, 'internals-specialist');
    // this test enters SI values: make sure the specialist works in SI whatever an earlier run left
    await b.page.getByRole('button', { name: 'SI', exact: true }).click();
    await b.page.getByRole('button', { name: 'New column' }).click();
    const dialog = b.page.locator('[data-test="column-create"]');
    await dialog.waitFor();
    await pickOption('Site', 'Marrowby Point Refinery');
    await pickOption('Unit', 'CU-7 Crude Unit');
    await dialog.getByLabel('Tag').fill('T-701');
    await dialog.getByLabel('Service').fill('Test splitter');
    await dialog.getByRole('button', { name: 'Create column' }).click();
    await dialog.getByText('is already taken in this unit').waitFor();
    await b.page.waitForTimeout(400); // let the field message finish fading in before the screenshot
    await shot(b.page, 'column-create-refused');
    expect(b.page.url()).not.toMatch(/\/columns\//);
  });

  it('creates a column with its own tag and lands on its page', async () => {
    const dialog = b.page.locator('[data-test="column-create"]');
    await dialog.getByLabel('Tag').fill(TAG);
    await dialog.getByLabel('Service').fill('Naphtha splitter (test)');
    await pickOption('Tray numbering', 'Bottom-up (tray 1 at the bottom)');
    await dialog.getByLabel('Number of trays').fill('24');
    await dialog.getByRole('button', { name: 'Create column' }).click();
    await b.page.waitForURL(/\/columns\/[^/]+$/);
    await b.page.getByRole('heading', { name: TAG }).waitFor();
    expect(await b.page.getByText('24 trays').count()).toBe(1);
    expect(await b.page.getByText('numbered bottom-up').count()).toBe(1);
    expect(await b.page.getByText('No pump-arounds on this column').count()).toBe(1);
  });

  it('adds a pump-around; a return tray equal to the draw tray is named beside the field', async () => {
    await b.page.getByRole('button', { name: 'Pump-around', exact: true }).click();
    const form = b.page.locator('[data-test="pump-around-form"]');
    await form.getByLabel('Name').fill('Naphtha PA');
    await form.getByLabel('Draw tray').fill('14');
    await form.getByLabel('Return tray').fill('14');
    await form.getByLabel('Base duty (kW)').fill('4200');
    await form.getByRole('button', { name: 'Add pump-around' }).click();
    await form.getByText('must differ from the draw tray').waitFor();
    // bottom-up numbering: the return tray above the draw is the higher number
    await form.getByLabel('Return tray').fill('17');
    await form.getByRole('button', { name: 'Add pump-around' }).click();
    await form.waitFor({ state: 'hidden' });
    const item = b.page.locator('[data-test="pump-around-Naphtha PA"]');
    await item.waitFor();
    expect(await item.textContent()).toContain('drawn from tray 14, returned to tray 17');
    expect(await item.textContent()).toContain('4,200 kW');
  });

  it('edits the pump-around; a stale save is refused, the latest values reloaded, and the retry saved', async () => {
    await b.page.getByRole('button', { name: 'Edit Naphtha PA' }).click();
    const form = b.page.locator('[data-test="pump-around-form"]');
    await form.getByLabel('Base duty (kW)').fill('5100');
    // someone else renames it meanwhile (straight through the API, version 1 → 2)
    await b.page.evaluate(async (tag) => {
      const list = (await (await fetch(`/api/columns?q=${tag}`)).json()) as { items: { id: string }[] };
      const col = (await (await fetch(`/api/columns/${list.items[0]!.id}`)).json()) as {
        pumpArounds: { id: string; name: string; drawTray: number; returnTray: number; baseDuty_kW: number; version: number }[];
      };
      const { id, version, drawTray, returnTray, baseDuty_kW } = col.pumpArounds[0]!;
      await fetch(`/api/pump-arounds/${id}`, {
        method: 'PUT',
        headers: { 'Content-Type': 'application/json' },
        body: JSON.stringify({ name: 'Naphtha PA (lower)', drawTray, returnTray, baseDuty_kW, version }),
      });
    }, TAG);
    await form.getByRole('button', { name: 'Save pump-around' }).click();
    const banner = form.locator('[data-test="pump-around-error"]');
    await banner.waitFor();
    expect(await banner.textContent()).toMatch(/changed this since you opened it/);
    expect(await form.getByLabel('Name').inputValue()).toBe('Naphtha PA (lower)');
    expect(Number(await form.getByLabel('Base duty (kW)').inputValue())).toBe(4200);
    await shot(b.page, 'column-pump-around-stale');

    await form.getByLabel('Return tray').fill('18');
    await form.getByLabel('Base duty (kW)').fill('5100');
    await form.getByRole('button', { name: 'Save pump-around' }).click();
    await form.waitFor({ state: 'hidden' });
    const item = b.page.locator('[data-test="pump-around-Naphtha PA (lower)"]');
    await item.waitFor();
    await b.page.getByText('drawn from tray 14, returned to tray 18').waitFor();
    expect(await item.textContent()).toContain('5,100 kW');
    expect(await b.page.locator('[data-test^="pump-around-Naphtha"]').count()).toBe(1);
  });

  it('edits the column service; a numbering flip is refused now that a pump-around uses the trays', async () => {
    await b.page.getByRole('button', { name: 'Edit column' }).click();
    const dialog = b.page.locator('[data-test="column-edit"]');
    await pickOption('Tray numbering', 'Top-down (tray 1 at the top)');
    await dialog.getByRole('button', { name: 'Save column' }).click();
    await dialog.getByText(/cannot change while sections, pump-arounds or load cases use tray numbers/).waitFor();
    await pickOption('Tray numbering', 'Bottom-up (tray 1 at the bottom)');
    await dialog.getByLabel('Service').fill('Naphtha splitter, revamp case (test)');
    await dialog.getByLabel('Number of trays').fill('26');
    await dialog.getByRole('button', { name: 'Save column' }).click();
    await dialog.waitFor({ state: 'hidden' });
    await b.page.getByText('Naphtha splitter, revamp case (test)').waitFor();
    expect(await b.page.getByText('26 trays').count()).toBe(1);
    await shot(b.page, 'column-edit');
  });
});
