import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { FROTHLINE_URL, demoEmail, launch, signInAs, type Browser } from '../helpers/browser.js';
import type { Page as ApiPage } from '../../shared/types/api.js';
import type { ColumnSummary } from '../../shared/types/columns.js';

/** Small faults at 1280 px: a role changes only after a confirmation; run dates do not wrap. */
let b: Browser;
beforeAll(async () => {
  b = await launch({ width: 1280, height: 860 });
  b.page.setDefaultTimeout(20000);
});
afterAll(() => b?.close());

describe('small layout faults', () => {
  it('changing a role asks first; keeping it changes nothing', async () => {
    const p = b.page;
    await signInAs(p, 'admin');
    await p.goto(`${FROTHLINE_URL}/admin/users`);
    const viewer = demoEmail('viewer');
    await p.getByLabel(`Role of ${viewer}`).click();
    await p.getByRole('option', { name: 'Inspector' }).click();
    const dlg = p.locator('.q-dialog', { hasText: 'Change role?' });
    await dlg.getByText(/becomes Inspector instead of Viewer/).waitFor();
    await dlg.getByRole('button', { name: 'Keep the role' }).click();
    await dlg.waitFor({ state: 'detached' });
    const users = (await (await p.request.get(`${FROTHLINE_URL}/api/users`)).json()) as {
      items: { email: string; role: string }[];
    };
    expect(users.items.find((u) => u.email === viewer)?.role).toBe('viewer');
  });

  it('run dates on the column page stay on one line', async () => {
    const p = b.page;
    await b.context.clearCookies();
    await signInAs(p, 'viewer');
    const cols = (await (await p.request.get(`${FROTHLINE_URL}/api/columns?q=T-701`)).json()) as ApiPage<ColumnSummary>;
    await p.goto(`${FROTHLINE_URL}/columns/${cols.items.find((c) => c.tag === 'T-701')!.id}`);
    const cell = p.locator('td.fl-nowrap').first();
    await cell.waitFor();
    expect(await cell.evaluate((el) => getComputedStyle(el).whiteSpace)).toBe('nowrap');
  });
});
