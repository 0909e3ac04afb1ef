import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { ColumnSummary } from '../../shared/types/columns.js';
import type { Page as ApiPage } from '../../shared/types/api.js';
import { FROTHLINE_URL, launch, shot, signInAs, type Browser } from '../helpers/browser.js';

/**
 * The new-study form asks whether the load case's zone liquid already includes the circulation, with no answer
 * chosen for the user, a sketch, and what the load case's numbers suggest (demo column T-701, whose invented
 * load cases carry the circulation on the zone trays).
 */
let b: Browser;
let t701Id: string;

beforeAll(async () => {
  b = await launch({ width: 1280, height: 900 });
  b.page.setDefaultTimeout(20000);
  await signInAs(b.page, 'process-engineer');
  // the checks below read kW and kg/h: SI, whatever another test left the demo user on
  await b.page.request.put(`${FROTHLINE_URL}/api/auth/preferences`, { data: { unitSystem: 'SI' } });
  const cols = (await (await b.page.request.get(`${FROTHLINE_URL}/api/columns?q=T-701`)).json()) as ApiPage<ColumnSummary>;
  t701Id = cols.items.find((c) => c.tag === 'T-701')!.id;
});
afterAll(() => b?.close());

describe('zone liquid question on a new study', () => {
  it('has no answer chosen, explains itself and reads the load case', async () => {
    const p = b.page;
    await p.goto(`${FROTHLINE_URL}/columns/${t701Id}/studies/new`);
    await p.getByLabel('Base load case').click();
    await p.getByRole('option', { name: /Summer normal/ }).click();
    await p.getByLabel('Pump-around to vary').click();
    await p.getByRole('option', { name: /Top PA/ }).click();
    const choice = p.locator('[data-test=zone-liquid-choice]');
    expect(await choice.getByRole('radio', { checked: true }).count()).toBe(0);
    await choice.getByRole('img', { name: 'Zone liquid with and without the circulation' }).waitFor();
    const hint = p.locator('[data-test=zone-liquid-hint]');
    expect(await hint.innerText()).toMatch(/on tray 1 just above the zone.*Enter the heat capacity/s);
    await p.getByLabel('Latent heat λ (kJ/kg)').fill('265');
    await p.getByLabel('Liquid heat capacity c_p (kJ/(kg·K))').fill('2.6');
    await p.getByLabel('Return temperature drop ΔT, held fixed (K)').fill('110');
    // a locator wait (polled by Playwright) rather than waitForFunction, whose animation-frame polling can stall
    await hint.filter({ hasText: 'most likely includes the circulation' }).waitFor({ timeout: 60000 });
    expect(await hint.innerText()).toMatch(/% of the base circulation/);
    await shot(p, 'study-zone-liquid-question');
  });

  it('refuses to run until the user answers, then runs with the answer given', async () => {
    const p = b.page;
    await p.getByRole('button', { name: 'Run and save the study' }).click();
    await p.getByText('Choose whether the zone liquid includes the circulation').waitFor();
    expect(p.url()).toMatch(/\/studies\/new$/);
    await p.getByRole('radio', { name: /Yes: it includes the circulation/ }).click();
    await p.getByRole('button', { name: 'Run and save the study' }).click();
    await p.waitForURL((u) => /\/studies\/[0-9a-f-]{36}$/.test(u.pathname), { timeout: 60000 }); // a 40-step sweep on a busy machine
    await p.getByText('What the sweep found').waitFor();
    expect(await p.locator('[data-test=recommended-duty]').innerText()).toMatch(/\d kW/);
    // condenser duties are changes against the base case, never shown as if absolute
    const slider = p.locator('[data-test=slider-condenser]');
    expect(await slider.innerText()).toMatch(/^−[\d,]+ kW against the base case$/);
    await p.getByRole('slider', { name: 'Pump-around duty' }).focus();
    await p.getByRole('slider', { name: 'Pump-around duty' }).press('Home'); // the sweep starts at the base duty
    await p.waitForFunction(() => document.querySelector('[data-test=slider-condenser]')?.textContent === 'none (the base case)');
    expect(await p.locator('[data-test=recommended-condenser]').innerText()).toMatch(/^−[\d,]+ kW against the base case$/);
    await p.getByText('Change in condenser duty there').waitFor();
  });
});
