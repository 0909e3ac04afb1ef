import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { FROTHLINE_URL, launch, shot, signInAs, type Browser } from '../helpers/browser.js';
import type { Page as ApiPage } from '../../shared/types/api.js';
import type { ColumnDetail, ColumnSummary, SectionBody, TraySectionRecord } from '../../shared/types/columns.js';
import type { CreateLoadCaseBody, LoadCaseRecord } from '../../shared/types/loads.js';

/**
 * Deleting tray sections and load cases from the client: from their own pages (with a stale version refused
 * and retried) and from the rows on the column page. Everything deleted is first created through the API on a
 * throwaway column with a tag of its own, so the demo column T-701 that other tests read is never touched
 * (the engineer only looks at it). Tags, trays, geometry and loads are invented for the test.
 */
let b: Browser;
const TAG = `T-8${Math.floor(10 + Math.random() * 90)}-${Date.now().toString(36).slice(-5)}`;
let column: ColumnDetail;
let upper: TraySectionRecord;
let lower: TraySectionRecord;
let winter: LoadCaseRecord;
let summer: LoadCaseRecord;
let spare: LoadCaseRecord;

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
const loads = (n: number): CreateLoadCaseBody['loads'] =>
  Array.from({ length: n }, (_, i) => ({
    tray: i + 1,
    vapourMassFlow_kg_h: 31000 + 150 * i,
    liquidMassFlow_kg_h: 52000 - 200 * i,
    vapourDensity_kg_m3: 3.1,
    liquidDensity_kg_m3: 690,
    surfaceTension_mN_m: 19,
  }));

async function call<T>(method: 'get' | 'post' | 'patch', url: string, data?: unknown): Promise<T> {
  const res = await b.page.request.fetch(`${FROTHLINE_URL}/api${url}`, { method, ...(data === undefined ? {} : { data }) });
  if (!res.ok()) throw new Error(`${method.toUpperCase()} ${url}: ${res.status()} ${await res.text()}`);
  return (await res.json()) as T;
}
const status = async (url: string) => (await b.page.request.get(`${FROTHLINE_URL}/api${url}`)).status();
const fresh = () => call<ColumnDetail>('get', `/columns/${column.id}`);
/** the Quasar dialog showing this text (a closing one can linger in the page while the next opens) */
const dialog = (text: string) => b.page.locator('.q-dialog', { hasText: text });

async function confirmDelete(title: string, button: string): Promise<void> {
  await dialog(title).waitFor();
  await dialog(title).getByRole('button', { name: button }).click();
  await dialog(title).waitFor({ state: 'hidden' });
}

beforeAll(async () => {
  b = await launch({ width: 1440, height: 900 });
});
afterAll(() => b?.close());

describe('deleting sections and load cases in Chromium', () => {
  it('the specialist gets a throwaway column with two sections and three load cases (made through the API)', async () => {
    await signInAs(b.page, 'internals-specialist');
    const t701 = (await call<ApiPage<ColumnSummary>>('get', '/columns?q=T-701')).items[0]!;
    column = await call<ColumnDetail>('post', '/columns', {
      unitId: t701.unitId,
      tag: TAG,
      service: 'Throwaway splitter (delete test)',
      numbering: 'top-down',
      trayCount: 20,
    });
    const section = (name: string, firstTray: number, lastTray: number) =>
      call<TraySectionRecord>('post', `/columns/${column.id}/sections`, {
        name,
        firstTray,
        lastTray,
        provenance: 'design',
        geometry,
      });
    upper = await section('Upper trays', 1, 10);
    lower = await section('Lower trays', 11, 20);
    const loadCase = (name: string) =>
      call<LoadCaseRecord>('post', `/columns/${column.id}/load-cases`, {
        name,
        basis: 'normal',
        source: 'typed',
        loads: loads(4),
      });
    winter = await loadCase('Winter trial');
    summer = await loadCase('Summer trial');
    spare = await loadCase('Spare trial');
    column = await fresh();
    expect(column.sections.map((s) => s.name)).toEqual(['Upper trays', 'Lower trays']);
    expect(column.loadCases).toHaveLength(3);
  });

  it('deletes a section from its page after a confirmation that names it and says stored runs keep their copy', async () => {
    await b.page.goto(`${FROTHLINE_URL}/columns/${column.id}/sections/${upper.id}`);
    await b.page.getByRole('heading', { name: 'Upper trays' }).waitFor();
    await b.page.getByRole('button', { name: 'Delete', exact: true }).click();
    const text = await dialog('Delete tray section “Upper trays”?').textContent();
    expect(text).toContain(`Trays 1–10 of ${TAG}`);
    expect(text).toContain('Rating runs already stored keep their own copy of the tray geometry');
    await b.page.waitForTimeout(400); // let the dialog finish its entry transition before the screenshot
    await shot(b.page, 'delete-section-confirm');
    await confirmDelete('Delete tray section “Upper trays”?', 'Delete tray section');
    await b.page.waitForURL(new RegExp(`/columns/${column.id}$`));
    await b.page.getByText('Tray section “Upper trays” deleted').waitFor();
    await b.page.getByRole('cell', { name: 'Lower trays', exact: true }).waitFor();
    expect(await b.page.getByRole('cell', { name: 'Upper trays', exact: true }).count()).toBe(0);
    expect((await fresh()).sections.map((s) => s.id)).toEqual([lower.id]);
  });

  it('a load case changed by someone else is not deleted; the latest version is loaded and deleted on the retry', async () => {
    await b.page.goto(`${FROTHLINE_URL}/load-cases/${winter.id}`);
    await b.page.getByRole('heading', { name: 'Winter trial' }).waitFor();
    // someone else edits the notes meanwhile (version 1 → 2)
    await call('patch', `/load-cases/${winter.id}`, { notes: 'checked against the spring test run', version: winter.version });
    await b.page.getByRole('button', { name: 'Delete', exact: true }).click();
    await confirmDelete('Delete load case “Winter trial”?', 'Delete load case');
    const refused = dialog('“Winter trial” was not deleted');
    expect(await refused.textContent()).toMatch(/changed by someone else since you loaded it \(your version 1, current 2\)/);
    expect(await status(`/load-cases/${winter.id}`)).toBe(200);
    await b.page.waitForTimeout(400);
    await shot(b.page, 'delete-load-case-stale');
    await refused.getByRole('button', { name: 'Load the latest version' }).click();
    await b.page.getByText(/version 2$/).waitFor();

    await b.page.getByRole('button', { name: 'Delete', exact: true }).click();
    await confirmDelete('Delete load case “Winter trial”?', 'Delete load case');
    await b.page.waitForURL(new RegExp(`/columns/${column.id}$`));
    await b.page.getByText('Load case “Winter trial” deleted').waitFor();
    expect(await status(`/load-cases/${winter.id}`)).toBe(404);
  });

  it('deletes the remaining section and load case from their rows on the column page', async () => {
    await b.page.getByRole('button', { name: 'Delete Lower trays' }).click();
    const ask = dialog('Delete tray section “Lower trays”?');
    await ask.getByRole('button', { name: 'Keep it' }).click(); // cancelling leaves it in place
    await ask.waitFor({ state: 'hidden' });
    expect((await fresh()).sections).toHaveLength(1);

    await b.page.getByRole('button', { name: 'Delete Lower trays' }).click();
    await confirmDelete('Delete tray section “Lower trays”?', 'Delete tray section');
    await b.page.getByText('No tray sections described yet').waitFor();
    await b.page.getByRole('button', { name: 'Delete Summer trial' }).click();
    await confirmDelete('Delete load case “Summer trial”?', 'Delete load case');
    await b.page.getByRole('cell', { name: 'Summer trial', exact: true }).waitFor({ state: 'detached' });

    // someone else deletes the last case meanwhile: the row's delete reports it and the list catches up
    const gone = await b.page.request.delete(`${FROTHLINE_URL}/api/load-cases/${spare.id}?version=${spare.version}`);
    expect(gone.status()).toBe(204);
    await b.page.getByRole('button', { name: 'Delete Spare trial' }).click();
    await confirmDelete('Delete load case “Spare trial”?', 'Delete load case');
    await b.page.getByText(/Load case .*not found/i).waitFor();
    await b.page.getByText('No load cases yet').waitFor();
    expect(b.page.url()).toMatch(new RegExp(`/columns/${column.id}$`));
    const after = await fresh();
    expect(after.sections).toHaveLength(0);
    expect(after.loadCases).toHaveLength(0);
    expect(await status(`/load-cases/${summer.id}`)).toBe(404);
  });

  it('the engineer may delete load cases but not sections (looks only; the demo column is left as it is)', async () => {
    await b.context.clearCookies();
    await signInAs(b.page, 'process-engineer');
    const found = await call<ApiPage<ColumnSummary>>('get', '/columns?q=T-701');
    const t701 = await call<ColumnDetail>('get', `/columns/${found.items[0]!.id}`);
    const [section, loadCase] = [t701.sections[0]!, t701.loadCases[0]!];
    await b.page.goto(`${FROTHLINE_URL}/columns/${t701.id}`);
    await b.page.getByRole('cell', { name: section.name, exact: true }).waitFor();
    expect(await b.page.getByRole('button', { name: `Delete ${loadCase.name}` }).count()).toBe(1);
    expect(await b.page.getByRole('button', { name: `Delete ${section.name}` }).count()).toBe(0);
    await b.page.goto(`${FROTHLINE_URL}/columns/${t701.id}/sections/${section.id}`);
    await b.page.getByRole('link', { name: 'Back to column' }).waitFor();
    expect(await b.page.getByRole('button', { name: 'Delete', exact: true }).count()).toBe(0);
    await b.page.goto(`${FROTHLINE_URL}/load-cases/${loadCase.id}`);
    await b.page.getByRole('heading', { name: loadCase.name }).waitFor();
    expect(await b.page.getByRole('button', { name: 'Delete', exact: true }).count()).toBe(1);
  });
});
