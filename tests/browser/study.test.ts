import type { Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { ColumnDetail, ColumnSummary } from '../../shared/types/columns.js';
import type { Page as ApiPage } from '../../shared/types/api.js';
import type { StudySummary } from '../../shared/types/studies.js';
import { FROTHLINE_URL, launch, shot, signInAs, type Browser } from '../helpers/browser.js';

let b: Browser;
let studyId: string;
let copyUrl: string;
let t701Id: string;

beforeAll(async () => {
  b = await launch();
  await signInAs(b.page, 'process-engineer');
  const cols = (await (await b.page.request.get(`${FROTHLINE_URL}/api/columns?q=T-701`)).json()) as ApiPage<ColumnSummary>;
  const t701 = cols.items.find((c) => c.tag === 'T-701')!;
  t701Id = t701.id;
  const studies = (await (await b.page.request.get(`${FROTHLINE_URL}/api/columns/${t701.id}/studies`)).json()) as StudySummary[];
  // the seeded demo study (oldest), not copies made by earlier runs of this test
  studyId = studies.filter((s) => s.pumpAroundName === 'Top PA').at(-1)!.id;
});
afterAll(() => b?.close());

/** The slider's liquid trace of the traffic chart (Plotly keeps the drawn data on the element). */
async function sliderLiquid(page: Page): Promise<number[]> {
  return page.locator('[data-test=traffic-chart]').evaluate((el) => {
    const data = (el as unknown as { data?: { name: string; x: number[] }[] }).data ?? [];
    return data.find((d) => d.name.startsWith('Liquid, slider'))?.x ?? [];
  });
}
const selectedDuty = (page: Page) => page.locator('[data-test=selected-duty]').innerText();
/** Wait until the chart's slider liquid trace differs from `before` (Plotly redraws asynchronously). */
async function chartChanged(page: Page, before: number[]): Promise<void> {
  await page.waitForFunction((b) => {
    const data =
      (document.querySelector('[data-test=traffic-chart]') as unknown as { data?: { name: string; x: number[] }[] } | null)
        ?.data ?? [];
    const x = data.find((d) => d.name.startsWith('Liquid, slider'))?.x ?? [];
    return x.length > 0 && JSON.stringify(x) !== JSON.stringify(b);
  }, before);
}

describe('pump-around study page in Chromium', () => {
  it('opens the demo study: summary, caution and the three charts', async () => {
    await b.page.goto(`${FROTHLINE_URL}/studies/${studyId}`);
    await b.page.getByText('What the sweep found').waitFor();
    await b.page.waitForFunction(
      () => ((document.querySelector('[data-test=traffic-chart]') as unknown as { data?: unknown[] })?.data?.length ?? 0) >= 6,
    );
    expect(await b.page.locator('[data-test=study-caution]').innerText()).toMatch(/management-of-change/);
    expect(await b.page.locator('[data-test=dry-out-duty]').innerText()).toMatch(/\d kW/);
    expect(await b.page.locator('[data-test=recommended-duty]').innerText()).toMatch(/\d kW/);
    // what "watched" means is said on the card itself, not only in the engine notes
    expect(await b.page.locator('[data-test=watched-explained]').innerText()).toMatch(/guards when it suggests a duty/);
    for (const chart of ['min-liquid-chart', 'percent-chart'])
      await b.page.locator(`[data-test=${chart}] .main-svg`).first().waitFor();
    await shot(b.page, 'study-page');
  });

  it('moving the duty slider redraws the tray traffic at once (no server round trip)', async () => {
    const dutyBefore = await selectedDuty(b.page);
    const liquidBefore = await sliderLiquid(b.page);
    expect(liquidBefore.length).toBeGreaterThan(10);
    let requests = 0;
    b.page.on('request', (r) => {
      if (r.url().includes('/api/')) requests++;
    });
    const textBefore = await b.page.locator('[data-test=selected-duty]').textContent();
    const slider = b.page.getByRole('slider', { name: 'Pump-around duty' });
    await slider.focus();
    await slider.press('End');
    await b.page.waitForFunction(
      (before) => document.querySelector('[data-test=selected-duty]')?.textContent !== before,
      textBefore,
    );
    await chartChanged(b.page, liquidBefore);
    const dutyAfter = await selectedDuty(b.page);
    const liquidAfter = await sliderLiquid(b.page);
    expect(dutyAfter).not.toBe(dutyBefore);
    expect(liquidAfter).not.toEqual(liquidBefore);
    // more duty condenses more vapour in the pump-around: less liquid on the top tray
    expect(liquidAfter[0]!).toBeLessThan(liquidBefore[0]!);
    expect(requests).toBe(0);
    // the demo sweep ends past the dry-out duty: the dry trays are flagged next to the readout
    expect(await b.page.locator('[data-test=slider-dry]').innerText()).toMatch(/Trays above the return run dry.*reflux 0 kg\/h/s);
    expect(await b.page.locator('[data-test=slider-above-suggested]').count()).toBe(1);
    await b.page.evaluate(() => window.scrollTo(0, 0)); // a clean full-page shot under the fixed header
    await shot(b.page, 'study-slider-at-top-duty');
    const textAtTop = await b.page.locator('[data-test=selected-duty]').textContent();
    await slider.press('Home');
    await b.page.waitForFunction(
      (before) => document.querySelector('[data-test=selected-duty]')?.textContent !== before,
      textAtTop,
    );
    await chartChanged(b.page, liquidAfter);
    expect((await sliderLiquid(b.page))[0]!).toBeGreaterThan(liquidAfter[0]!);
    // back at the base duty, below the suggested one: no flags
    expect(await b.page.locator('[data-test=slider-dry]').count()).toBe(0);
    expect(await b.page.locator('[data-test=slider-above-suggested]').count()).toBe(0);
  });

  it('a base duty already above the suggested duty is flagged, and every limit over is listed on the card', async () => {
    // demo column T-701, Diesel PA on the summer case: at 21,800 kW it already runs past 70 % of its dry-out duty
    const col = await (await b.page.request.get(`${FROTHLINE_URL}/api/columns/${t701Id}`)).json();
    const pa = (col as ColumnDetail).pumpArounds.find((p) => p.name === 'Diesel PA')!;
    const lc = (col as ColumnDetail).loadCases.find((l) => l.name === 'Summer normal')!;
    const res = await b.page.request.post(`${FROTHLINE_URL}/api/columns/${t701Id}/studies`, {
      data: {
        label: 'Diesel PA at its summer duty',
        loadCaseId: lc.id,
        pumpAroundId: pa.id,
        latentHeat_kJ_kg: 274.3,
        liquidHeatCapacity_kJ_kgK: 2.7,
        returnTemperatureDrop_K: 95,
        baseDuty_kW: 21800,
        zoneLiquidIncludesCirculation: false,
        sweep: { fromDuty_kW: 21800, toDuty_kW: 40000, steps: 40 },
      },
    });
    expect(res.status()).toBe(201);
    const made = (await res.json()) as StudySummary;
    expect(made.recommendedDuty_kW!).toBeLessThan(21800);
    await b.page.goto(`${FROTHLINE_URL}/studies/${made.id}`);
    await b.page.getByText('What the sweep found').waitFor();
    expect(await b.page.locator('[data-test=base-above-suggested]').innerText()).toMatch(
      /already above the suggested duty[\s\S]*less than today/,
    );
    expect(await b.page.locator('[data-test=recommended-recovered]').innerText()).toMatch(/less than today/);
    expect(await b.page.locator('[data-test=recommended-recovered]').innerText()).not.toMatch(/−/);
    // limits over at the base or suggested duty are on the card, watched or not
    const over = await b.page.locator('[data-test^=over-at-]').allInnerTexts();
    expect(over.join('\n')).toMatch(/Entrainment on trays? [\d, –and]+ — not watched/);
    // the slider starts at the base duty, above the suggested one
    expect(await b.page.locator('[data-test=slider-above-suggested]').innerText()).toMatch(/Above the suggested duty/);
    await shot(b.page, 'study-base-above-suggested');
    await b.page.goto(`${FROTHLINE_URL}/studies/${studyId}`);
    await b.page.getByText('What the sweep found').waitFor();
  });

  it('a new study from these inputs: a missing λ is named at its field, then the study runs and opens', async () => {
    await b.page.getByRole('link', { name: 'New study from these inputs' }).click();
    await b.page.waitForURL(/\/studies\/new/);
    const lambda = b.page.getByLabel('Latent heat λ (kJ/kg)');
    await b.page.waitForFunction(
      () => document.querySelector<HTMLInputElement>('input[aria-label="Latent heat λ (kJ/kg)"]')?.value !== '',
    );
    const value = await lambda.inputValue();
    await lambda.fill('');
    await b.page.getByRole('button', { name: 'Run and save the study' }).click();
    // the server's error for latentHeat_kJ_kg is shown at the λ field itself
    await b.page.locator('.q-field--error').filter({ hasText: 'Latent heat λ' }).getByText('is required').waitFor();
    // the copy keeps the earlier study's answer to the zone-liquid question
    expect(await b.page.getByRole('radio', { name: /Yes: it includes the circulation/ }).getAttribute('aria-checked')).toBe(
      'true',
    );
    await b.page.waitForTimeout(400); // let the field's error message finish its entrance
    await shot(b.page, 'study-new-error');
    await lambda.fill(value);
    await b.page.getByRole('button', { name: 'Run and save the study' }).click();
    await b.page.waitForURL((u) => /\/studies\/[0-9a-f-]{36}$/.test(u.pathname) && !u.pathname.endsWith(studyId));
    await b.page.getByText('What the sweep found').waitFor();
    expect(await b.page.locator('[data-test=study-label]').innerText()).toMatch(/\(copy\)/);
    copyUrl = b.page.url();
  });

  it('the author submits the copy for review; a specialist returns it, then approves it', async () => {
    await b.page.getByRole('button', { name: 'Submit for review' }).click();
    await b.page.getByRole('dialog').getByLabel('Note for the reviewer (optional)').fill('Copy on the summer case; see tray 3');
    await b.page.getByRole('dialog').getByRole('button', { name: 'Submit', exact: true }).click();
    await b.page.locator('[data-test=review-submitted]').waitFor();
    expect(await b.page.locator('[data-test=study-reviews]').innerText()).toMatch(/Submitted by[\s\S]*summer case; see tray 3/);
    await b.context.clearCookies();
    await signInAs(b.page, 'internals-specialist');
    await b.page.goto(copyUrl);
    await b.page.getByRole('button', { name: 'Return' }).click();
    const dialogSendBack = b.page.getByRole('dialog').getByRole('button', { name: 'Return' });
    expect(await dialogSendBack.isDisabled()).toBe(true); // a comment is required
    await b.page.getByRole('dialog').getByLabel('What should change (required)').fill('Use the winter case as the base');
    await dialogSendBack.click();
    await b.page.locator('[data-test=review-returned]').waitFor();
    expect(await b.page.locator('[data-test=study-review-comment]').innerText()).toMatch(/winter case/);
    await b.context.clearCookies();
    await signInAs(b.page, 'process-engineer');
    await b.page.goto(copyUrl);
    await b.page.getByRole('button', { name: 'Submit for review' }).click();
    await b.page.getByRole('dialog').getByRole('button', { name: 'Submit', exact: true }).click();
    await b.page.locator('[data-test=review-submitted]').waitFor();
    await b.context.clearCookies();
    await signInAs(b.page, 'internals-specialist');
    await b.page.goto(copyUrl);
    await b.page.getByRole('button', { name: 'Approve' }).click();
    await b.page.getByRole('dialog').getByRole('button', { name: 'Approve' }).click();
    await b.page.locator('[data-test=review-approved]').waitFor();
    expect(await b.page.getByRole('button', { name: 'Return' }).count()).toBe(0);
    expect(await b.page.locator('[data-test=study-reviews]').innerText()).toMatch(
      /Returned by .*\n[\s\S]*winter case[\s\S]*Approved by/,
    );
    await shot(b.page, 'study-approved');
  });
});
