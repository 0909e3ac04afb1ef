import type { Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { ColumnSummary } from '../../shared/types/columns.js';
import type { Page as ApiPage } from '../../shared/types/api.js';
import type { HeatPlanSummary } from '../../shared/types/heatPlans.js';
import { FROTHLINE_URL, launch, shot, signInAs, type Browser } from '../helpers/browser.js';

let b: Browser;
let planId: string;

beforeAll(async () => {
  b = await launch();
  await signInAs(b.page, 'process-engineer');
  const cols = (await (await b.page.request.get(`${FROTHLINE_URL}/api/columns?q=T-701`)).json()) as ApiPage<ColumnSummary>;
  const t701 = cols.items.find((c) => c.tag === 'T-701')!;
  const plans = (await (
    await b.page.request.get(`${FROTHLINE_URL}/api/columns/${t701.id}/heat-plans`)
  ).json()) as HeatPlanSummary[];
  planId = plans.filter((p) => p.label.startsWith('Top and diesel')).at(-1)!.id;
});
afterAll(() => b?.close());

/** The liquid trace drawn in the point panel's traffic chart (Plotly keeps the drawn data on the element). */
async function pointLiquid(page: Page): Promise<number[]> {
  return page.locator('[data-test=plan-point] [data-test=chart-traffic]').evaluate((el) => {
    const data = (el as unknown as { data?: { name: string; x: number[] }[] }).data ?? [];
    return data.find((d) => d.name === 'Liquid')?.x ?? [];
  });
}

describe('heat-recovery plan page in Chromium', () => {
  it('opens the demo plan: cautions, the duty map with its limit lines and the suggestion, trays at the chosen point', async () => {
    await b.page.goto(`${FROTHLINE_URL}/heat-plans/${planId}`);
    await b.page.locator('[data-test=plan-label]').waitFor();
    expect(await b.page.locator('[data-test=plan-caution]').innerText()).toMatch(/management-of-change review/);
    expect(await b.page.locator('[data-test=plan-caution]').innerText()).toMatch(/internals vendor and licensed engineers/);
    await b.page.waitForFunction(
      () => ((document.querySelector('[data-test=plan-map]') as unknown as { data?: unknown[] })?.data?.length ?? 0) >= 4,
    );
    const names = await b.page
      .locator('[data-test=plan-map]')
      .evaluate((el) => ((el as unknown as { data: { name?: string }[] }).data ?? []).map((d) => d.name ?? ''));
    expect(names).toContain('Current operation');
    expect(names).toContain('Suggestion');
    // limit lines are named by tray and check
    expect(names.some((n) => /^Tray \d+ · /.test(n))).toBe(true);
    expect(await b.page.locator('[data-test=plan-suggestion]').innerText()).toMatch(/Top PA \S+ kW/);
    await b.page.waitForFunction(() => {
      const el = document.querySelector('[data-test=plan-point] [data-test=chart-traffic]') as unknown as {
        data?: unknown[];
      } | null;
      return (el?.data?.length ?? 0) >= 2;
    });
    expect((await pointLiquid(b.page)).length).toBeGreaterThan(20);
    await shot(b.page, 'heat-plan-page');
  });

  it('a click on the map redraws the tray traffic and percent of limit at the point clicked', async () => {
    const before = await pointLiquid(b.page);
    const dutiesBefore = await b.page.locator('[data-test=plan-point-duties]').innerText();
    const area = b.page.locator('[data-test=plan-map] .nsewdrag').first();
    await b.page.locator('[data-test=plan-map]').scrollIntoViewIfNeeded();
    const box = (await area.boundingBox())!;
    // near the low-duty corner of the map: far from where the page opened (the suggestion)
    await b.page.mouse.click(box.x + box.width * 0.04, box.y + box.height * 0.96);
    await b.page.waitForFunction(
      (prev) => document.querySelector('[data-test=plan-point-duties]')?.textContent?.trim() !== prev.trim(),
      dutiesBefore,
    );
    await b.page.waitForFunction((prev) => {
      const el = document.querySelector('[data-test=plan-point] [data-test=chart-traffic]') as unknown as {
        data?: { name: string; x: number[] }[];
      } | null;
      const x = el?.data?.find((d) => d.name === 'Liquid')?.x ?? [];
      return x.length > 0 && JSON.stringify(x) !== JSON.stringify(prev);
    }, before);
    const after = await pointLiquid(b.page);
    expect(after).not.toEqual(before);
    const chosen = await b.page
      .locator('[data-test=plan-map]')
      .evaluate(
        (el) => (el as unknown as { data: { name?: string; x: number[] }[] }).data.find((d) => d.name === 'Chosen point')?.x[0],
      );
    const axis = await b.page
      .locator('[data-test=plan-map]')
      .evaluate(
        (el) => (el as unknown as { data: { type?: string; x: number[] }[] }).data.find((d) => d.type === 'heatmap')?.x ?? [],
      );
    expect(chosen).toBe(axis[0]); // the lowest duty of the first pump-around
    await b.page.locator('[data-test=plan-point] [data-test=chart-percent] .main-svg').first().waitFor();
    await shot(b.page, 'heat-plan-clicked');
  });
});
