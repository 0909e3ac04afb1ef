import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { FROTHLINE_URL, launch, signInAs, type Browser } from '../helpers/browser.js';
import type { Page as ApiPage } from '../../shared/types/api.js';
import type { ColumnDetail, ColumnSummary } from '../../shared/types/columns.js';

/** Unsaved grid edits on a load case are not lost silently: leaving asks first, and closing the tab is held. */
let b: Browser;
let col: ColumnDetail;

async function get<T>(url: string): Promise<T> {
  return (await (await b.page.request.get(`${FROTHLINE_URL}/api${url}`)).json()) as T;
}
/** what the page's beforeunload handlers answer (true: the browser would ask before closing) */
const holdsUnload = () =>
  b.page.evaluate(() => {
    const e = new Event('beforeunload', { cancelable: true });
    window.dispatchEvent(e);
    return e.defaultPrevented;
  });

beforeAll(async () => {
  b = await launch({ width: 1280, height: 820 });
  b.page.setDefaultTimeout(20000);
  await signInAs(b.page, 'process-engineer');
  const list = await get<ApiPage<ColumnSummary>>('/columns?q=T-701');
  col = await get<ColumnDetail>(`/columns/${list.items.find((c) => c.tag === 'T-701')!.id}`);
});
afterAll(() => b?.close());

describe('leaving a load case with unsaved edits', () => {
  it('leaves freely when only a unit was switched', async () => {
    const p = b.page;
    await p.goto(`${FROTHLINE_URL}/load-cases/${col.loadCases[0]!.id}`);
    const cell = p.getByLabel('Row 1 Vapour', { exact: true });
    await cell.waitFor();
    await p.getByLabel('Unit of Vapour').selectOption({ index: 1 });
    expect(await holdsUnload()).toBe(false);
    await p.getByRole('link', { name: 'T-701' }).click();
    await p.waitForURL(/\/columns\//);
  });

  it('asks before leaving after a cell is edited; Stay keeps the edit, Discard leaves', async () => {
    const p = b.page;
    await p.goBack();
    const cell = p.getByLabel('Row 1 Vapour', { exact: true });
    await cell.waitFor();
    await cell.fill('12345');
    expect(await holdsUnload()).toBe(true);
    await p.getByRole('link', { name: 'T-701' }).click();
    const dlg = p.locator('.q-dialog', { hasText: 'Leave without saving?' });
    await dlg.getByText('Your changes to the loads of this load case are not saved').waitFor();
    await dlg.getByRole('button', { name: 'Stay' }).click();
    await dlg.waitFor({ state: 'detached' });
    expect(p.url()).toMatch(/\/load-cases\//);
    expect(await cell.inputValue()).toBe('12345');
    await p.getByRole('link', { name: 'T-701' }).click();
    await p.locator('.q-dialog').getByRole('button', { name: 'Discard changes' }).click();
    await p.waitForURL(/\/columns\//);
    expect(await holdsUnload()).toBe(false);
  });
});
