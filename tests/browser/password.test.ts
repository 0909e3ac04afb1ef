import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { FROTHLINE_URL, launch, shot, signInAs, type Browser } from '../helpers/browser.js';

/**
 * An administrator resets a user's password from the Users page; the user signs in with the temporary
 * password, must choose their own in the dialog (a weak one is refused with the reason), then finds
 * "Change password" in the account menu. The user is made for this test (invented name).
 */
let b: Browser;
const email = `pw-${Date.now().toString(36)}@frothline.test`;
const temporary = 'Kettle-Grommet-93-Ledger';
const chosen = 'Sieve Lantern Orchard 58';

beforeAll(async () => {
  b = await launch({ width: 1366, height: 860 });
  b.page.setDefaultTimeout(20000);
  await signInAs(b.page, 'admin');
  const res = await b.page.request.post(`${FROTHLINE_URL}/api/users`, {
    data: { email, name: 'Morwenna Test-Pryce', role: 'viewer', password: 'Initial Baffle Otter 27' },
  });
  expect(res.status()).toBe(201);
});
afterAll(() => b?.close());

describe('passwords in the browser', () => {
  it('the administrator sets a temporary password from the Users page', async () => {
    const p = b.page;
    await p.goto(`${FROTHLINE_URL}/admin/users`);
    await p.getByRole('button', { name: `Reset password of ${email}` }).click();
    const dlg = p.locator('.q-dialog');
    await dlg.getByLabel('Temporary password').fill(temporary);
    await dlg.getByRole('button', { name: 'Reset password' }).click();
    await p.getByText(`Temporary password set for ${email}`).waitFor();
  });

  it('the user must choose their own password first; a weak one is refused with the reason', async () => {
    const p = b.page;
    await b.context.clearCookies();
    await p.goto(`${FROTHLINE_URL}/sign-in`);
    await p.getByLabel('E-mail').fill(email);
    await p.getByLabel('Password').fill(temporary);
    await p.getByRole('button', { name: 'Sign in' }).click();
    const dlg = p.locator('.q-dialog', { hasText: 'Choose your own password' });
    await dlg.waitFor();
    expect(await dlg.getByRole('button', { name: 'Cancel' }).count()).toBe(0);
    await dlg.getByLabel('Temporary password').fill(temporary);
    await dlg.getByLabel('New password', { exact: true }).fill('password12345');
    await dlg.getByLabel('New password again').fill('password12345');
    await dlg.getByRole('button', { name: 'Change password' }).click();
    await dlg.getByText(/The new password is too easy to guess/).waitFor();
    await shot(p, 'password-change-refused');
    await dlg.getByLabel('New password', { exact: true }).fill(chosen);
    await dlg.getByLabel('New password again').fill(chosen);
    await dlg.getByRole('button', { name: 'Change password' }).click();
    await p.getByText('Password changed; your other sessions were signed out').waitFor();
    await dlg.waitFor({ state: 'detached' });
    expect(await p.getByRole('button', { name: 'Choose password' }).count()).toBe(0);
  });

  it('the account menu offers Change password, and the new password signs in', async () => {
    const p = b.page;
    await p.getByRole('button', { name: /^Account:/ }).click();
    await p
      .getByRole('menuitem', { name: 'Change password' })
      .or(p.getByText('Change password', { exact: true }))
      .first()
      .click();
    const dlg = p.locator('.q-dialog', { hasText: 'Current password' });
    await dlg.waitFor();
    await shot(p, 'password-change-dialog');
    await dlg.getByRole('button', { name: 'Cancel' }).click();
    await dlg.waitFor({ state: 'detached' });
    await b.context.clearCookies();
    const res = await p.request.post(`${FROTHLINE_URL}/api/auth/sign-in`, { data: { email, password: chosen } });
    expect(res.status()).toBe(200);
    expect((await res.json()).user.mustChangePassword).toBe(false);
  });
});
