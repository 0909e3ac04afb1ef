import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { FROTHLINE_URL, launch, shot, signInAs, type Browser } from '../helpers/browser.js';

let b: Browser;
beforeAll(async () => {
  b = await launch();
});
afterAll(() => b?.close());

describe('client shell in Chromium', () => {
  it('sends a visitor without a session to sign-in, and refuses a wrong password with a message', async () => {
    await b.page.goto(`${FROTHLINE_URL}/admin/users`);
    await b.page.waitForURL(/\/sign-in/);
    await b.page.getByLabel('E-mail').fill('admin@frothline.test');
    await b.page.getByLabel('Password').fill('not-the-password');
    await b.page.getByRole('button', { name: 'Sign in' }).click();
    const alert = b.page.getByRole('alert');
    await alert.waitFor();
    expect(await alert.textContent()).toMatch(/not correct/);
    await shot(b.page, 'shell-sign-in-refused');
  });

  it('the demo admin signs in, sees the columns home page and the user admin page', async () => {
    await signInAs(b.page, 'admin');
    await b.page.getByText('T-701').first().waitFor();
    await shot(b.page, 'shell-home');
    // a reload of the root address (and any deep link) is served the app, not a 404
    const root = await b.page.goto(`${FROTHLINE_URL}/`);
    expect(root?.status()).toBe(200);
    await b.page.getByText('T-701').first().waitFor();
    await b.page.goto(`${FROTHLINE_URL}/admin/users`);
    await b.page.getByText('engineer@frothline.test').waitFor();
    expect(await b.page.getByRole('row').count()).toBeGreaterThan(5);
    await shot(b.page, 'shell-users');
  });

  it('a viewer has no Users entry and is turned away from the admin page', async () => {
    await b.context.clearCookies();
    await signInAs(b.page, 'viewer');
    await b.page.getByText('T-701').first().waitFor();
    await b.page.getByRole('button', { name: 'Toggle navigation' }).click();
    expect(await b.page.getByRole('link', { name: 'Users' }).count()).toBe(0);
    await b.page.goto(`${FROTHLINE_URL}/admin/users`);
    await b.page.waitForURL((u) => u.pathname === '/');
  });

  it('a link to a record that is gone, or to no record at all, says so instead of loading for ever', async () => {
    const none = '00000000-0000-4000-8000-000000000000';
    const cases: [string, string][] = [
      [`/runs/${none}`, 'No rating run at this address'],
      ['/runs/not-a-run-id', 'This address does not name a rating run'],
      [`/inspections/${none}`, 'No inspection at this address'],
      [`/studies/${none}`, 'No pump-around study at this address'],
      [`/load-cases/${none}`, 'No load case at this address'],
      [`/columns/${none}`, 'No column at this address'],
    ];
    for (const [path, title] of cases) {
      await b.page.goto(`${FROTHLINE_URL}${path}`);
      await b.page.locator('[data-test="record-missing"]').getByText(title).waitFor();
      expect(await b.page.locator('.q-notification').count()).toBe(0); // the page says it; no toast as well
    }
    await shot(b.page, 'shell-record-missing');
    // a section id that is not one of the column's sections: no blank form for a new section
    await b.page.getByRole('link', { name: 'Columns' }).last().click();
    await b.page.getByText('T-701', { exact: true }).first().click();
    await b.page.waitForURL(/\/columns\/[0-9a-f-]{36}$/);
    await b.page.goto(`${b.page.url()}/sections/${none}`);
    await b.page.locator('[data-test="record-missing"]').getByText('No tray section at this address').waitFor();
    expect(await b.page.getByLabel('Section name').count()).toBe(0);
  });
});

describe('on a phone-sized screen (390 × 844)', () => {
  let m: Browser;
  beforeAll(async () => {
    m = await launch({ width: 390, height: 844 });
  });
  afterAll(() => m?.close());

  it('nothing runs off the side; the account menu names the user; runs list as items that open the run', async () => {
    await signInAs(m.page, 'process-engineer');
    await m.page.getByText('T-701', { exact: true }).click();
    await m.page.getByText('Rating runs', { exact: true }).waitFor();
    const widths = await m.page.evaluate(() => [document.documentElement.scrollWidth, window.innerWidth]);
    expect(widths[0]).toBeLessThanOrEqual(widths[1]!);
    const menu = m.page.getByRole('button', { name: /^Account:/ });
    expect(await menu.innerText()).not.toMatch(/Nandakumar|Engineer/i); // only the icon in the bar
    await menu.click();
    await m.page.getByText('Sign out').waitFor();
    await m.page.keyboard.press('Escape');
    const items = m.page.locator('.fl-run-item');
    expect(await items.count()).toBeGreaterThan(0);
    await shot(m.page, 'phone-column');
    await items.first().click();
    await m.page.waitForURL(/\/runs\/[0-9a-f-]{36}$/);
    await m.page.getByText('Screening estimates', { exact: false }).first().waitFor();
    await shot(m.page, 'phone-run');
  });
  it("a study's title keeps whole lines, with its chip and actions below it", async () => {
    await m.page.goto(`${FROTHLINE_URL}/`);
    await m.page.getByText('T-701', { exact: true }).first().click();
    await m.page
      .getByText(/how far can the duty go\?/)
      .first()
      .click();
    await m.page.waitForURL(/\/studies\/[0-9a-f-]{36}$/);
    const title = m.page.locator('[data-test="study-label"]');
    await title.waitFor();
    // squeezed beside the chip and buttons, the title was ~80 px wide with one word per line
    expect((await title.boundingBox())!.width).toBeGreaterThan(250);
    const widths = await m.page.evaluate(() => [document.documentElement.scrollWidth, window.innerWidth]);
    expect(widths[0]).toBeLessThanOrEqual(widths[1]!);
    await shot(m.page, 'phone-study');
  });

  it('the inspector lists inspections as items and opens one', async () => {
    await m.context.clearCookies();
    await signInAs(m.page, 'inspector');
    await m.page.goto(`${FROTHLINE_URL}/inspections`);
    const items = m.page.locator('.fl-inspection-item');
    await items.first().waitFor();
    expect(await items.first().innerText()).toMatch(/ · .*\n[\s\S]*from \d{4}-\d{2}-\d{2}/);
    const widths = await m.page.evaluate(() => [document.documentElement.scrollWidth, window.innerWidth]);
    expect(widths[0]).toBeLessThanOrEqual(widths[1]!);
    await shot(m.page, 'phone-inspections');
    await items.first().click();
    await m.page.waitForURL(/\/inspections\/[0-9a-f-]{36}$/);
  });
});
