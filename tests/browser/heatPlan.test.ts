import type { Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { ColumnSummary } from '../../shared/types/columns.js';
import type { Page as ApiPage } from '../../shared/types/api.js';
import type { HeatPlanRecord, HeatPlanSummary } from '../../shared/types/heatPlans.js';
import { FROTHLINE_URL, launch, shot, signInAs, type Browser } from '../helpers/browser.js';

let b: Browser;
let planId: string;
let columnId: string;

beforeAll(async () => {
  b = await launch();
  await signInAs(b.page, 'process-engineer');
  const cols = (await (await b.page.request.get(`${FROTHLINE_URL}/api/columns?q=T-701`)).json()) as ApiPage<ColumnSummary>;
  const t701 = cols.items.find((c) => c.tag === 'T-701')!;
  columnId = t701.id;
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

  it('the new-plan form holds the circulation fixed instead of the return ΔT for a pump-around, validated', async () => {
    const page = b.page;
    await page.goto(`${FROTHLINE_URL}/columns/${columnId}/heat-plans/new`);
    await page.locator('[data-test=plan-form]').waitFor();
    await page.getByLabel('Plan name (optional)').fill('Diesel PA at a fixed circulation (browser test)');
    await page.getByLabel('Base load case').click();
    await page.getByRole('option').first().click();
    await page.locator('[data-test=plan-pumparounds]').click();
    await page.getByRole('option', { name: /^Top PA/ }).click();
    await page.getByRole('option', { name: /^Diesel PA/ }).click();
    await page.keyboard.press('Escape');
    for (const i of [0, 1]) {
      const pa = page.locator(`[data-test=plan-pa-${i}]`);
      await pa.getByLabel('Steps').fill('4');
      await pa.getByLabel('Liquid heat capacity (kJ/(kg·K))').fill(i ? '2.8' : '2.6');
    }
    await page.locator('[data-test=plan-pa-0]').getByLabel('Return temperature drop ΔT (K)').fill('85');
    const diesel = page.locator('[data-test=plan-pa-1]');
    await diesel.getByRole('button', { name: 'Circulation' }).click();
    // the ΔT field gives way to the circulation field, in the user's mass-flow unit
    expect(await diesel.getByLabel('Return temperature drop ΔT (K)').count()).toBe(0);
    const circulation = diesel.getByLabel(/^Circulation \((kg\/h|lb\/h)\)$/);
    const perKg = /lb\/h/.test((await diesel.innerText()).match(/Circulation \(([^)]+)\)/)?.[0] ?? '') ? 2.20462 : 1;
    await page.getByLabel('Latent heat (kJ/kg)').fill('265');
    await page.getByLabel(/^Useful above/).fill(perKg === 1 ? '150' : '302');
    await page.getByRole('button', { name: 'Rate and save the plan' }).click();
    // nothing entered: refused on the page, naming the pump-around and the field
    expect(await page.locator('[data-test=plan-form-error]').innerText()).toMatch(
      /Diesel PA: is required: enter the circulation held fixed/,
    );
    expect(await diesel.innerText()).toMatch(/is required: enter the circulation held fixed/);
    await circulation.fill('-5');
    await page.getByRole('button', { name: 'Rate and save the plan' }).click();
    expect(await page.locator('[data-test=plan-form-error]').innerText()).toMatch(
      /Diesel PA: the circulation must be above zero/,
    );
    await shot(page, 'heat-plan-form-circulation');
    await circulation.fill(String(Math.round(400000 * perKg)));
    await page.getByRole('button', { name: 'Rate and save the plan' }).click();
    await page.waitForURL((u) => /\/heat-plans\/[0-9a-f-]{36}$/.test(u.pathname), { timeout: 60_000 });
    const id = new URL(page.url()).pathname.split('/').at(-1)!;
    const plan = (await (await page.request.get(`${FROTHLINE_URL}/api/heat-plans/${id}`)).json()) as HeatPlanRecord;
    const [top, dsl] = plan.inputs.input.pumpArounds;
    expect(top!.returnTemperatureDrop_K).toBe(85);
    expect(top!.circulation_kg_h).toBeUndefined();
    expect(dsl!.circulation_kg_h).toBeCloseTo(400000, -1);
    expect(dsl!.returnTemperatureDrop_K).toBeUndefined();
    // the circulation is held at every duty of the sweep
    expect(new Set(plan.result.grid.map((g) => Math.round(g.heat[1]!.circulation_kg_h))).size).toBe(1);
    await page.locator('[data-test=plan-map]').waitFor();
    await shot(page, 'heat-plan-circulation-created');
  });

  it('“New plan from these inputs” fills the form from a stored plan', async () => {
    const page = b.page;
    await page.goto(`${FROTHLINE_URL}/heat-plans/${planId}`);
    await page.getByRole('link', { name: 'New plan from these inputs' }).click();
    await page.waitForURL((u) => u.pathname.endsWith('/heat-plans/new') && u.searchParams.get('from') === planId);
    const top = page.locator('[data-test=plan-pa-0]');
    await top.waitFor();
    await page.waitForFunction(() => document.querySelector<HTMLElement>('[data-test=plan-pa-1]') !== null);
    // the demo plan: 20 steps, c_p 2.6 and ΔT 85 K on the top pump-around, latent heat 265 kJ/kg, margin 80 %
    expect(await top.getByLabel('Steps').inputValue()).toBe('20');
    expect(await top.getByLabel('Liquid heat capacity (kJ/(kg·K))').inputValue()).toBe('2.6');
    expect(await top.getByLabel('Return temperature drop ΔT (K)').inputValue()).toBe('85');
    expect(await page.getByLabel('Latent heat (kJ/kg)').inputValue()).toBe('265');
    expect(await page.getByLabel('Margin (% of dry-out)').inputValue()).toBe('80');
    expect(await page.getByLabel('Plan name (optional)').inputValue()).toBe('');
    await shot(page, 'heat-plan-form-copied');
  });
});
