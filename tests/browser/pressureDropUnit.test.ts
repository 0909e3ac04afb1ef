import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { FROTHLINE_URL, launch, shot, signInAs, type Browser } from '../helpers/browser.js';
import type { Page as ApiPage } from '../../shared/types/api.js';
import type { RunRecord, RunSummary } from '../../shared/types/runs.js';

/**
 * Tray ΔP is read as a head of the tray's liquid (mm in SI, in in US customary) unless the user picks mbar or
 * psi in the account menu; the choice is kept for the user (it survives a reload) and the tray table follows it.
 */
let b: Browser;
let run: RunRecord;
const prefs = (data: unknown) => b.page.request.put(`${FROTHLINE_URL}/api/auth/preferences`, { data });

beforeAll(async () => {
  b = await launch({ width: 1366, height: 860 });
  b.page.setDefaultTimeout(20000);
  await signInAs(b.page, 'viewer');
  await prefs({ unitSystem: 'SI', pressureDropUnit: null });
  const runs = (await (await b.page.request.get(`${FROTHLINE_URL}/api/runs?pageSize=50`)).json()) as ApiPage<RunSummary>;
  const id = (runs.items.find((r) => r.label.startsWith('Winter maximum')) ?? runs.items[0]!).id;
  run = (await (await b.page.request.get(`${FROTHLINE_URL}/api/runs/${id}`)).json()) as RunRecord;
});
afterAll(async () => {
  await prefs({ unitSystem: 'SI', pressureDropUnit: null }).catch(() => undefined);
  await b?.close();
});

const dpHeader = () => b.page.getByRole('columnheader', { name: /^ΔP \(/ }).first();
/** the first line (the value) of the tray's cell under the ΔP column of the tray table */
const dpCell = (tray: number): Promise<string> =>
  b.page.evaluate((t) => {
    const btn = document.querySelector(`[aria-label="Operating window of tray ${t}"]`)!;
    const table = btn.closest('table')!;
    const idx = [...table.querySelectorAll('thead th')].findIndex((th) => /^ΔP \(/.test(th.textContent?.trim() ?? ''));
    const cell = btn.closest('tr')!.querySelectorAll('td')[idx]!;
    return (cell.querySelector('.fl-cell > div')?.textContent ?? '').trim();
  }, tray);

describe('tray ΔP unit', () => {
  it('reads mm of liquid by default, from the tray’s own liquid density', async () => {
    await b.page.goto(`${FROTHLINE_URL}/runs/${run.id}`);
    await dpHeader().waitFor();
    expect(await dpHeader().innerText()).toMatch(/ΔP \(mm liquid\)/);
    const t = run.results.trays.find((x) => x.checks.pressureDrop?.status !== 'na')!;
    const rho = run.snapshot.loads.find((l) => l.tray === t.tray)!.liquidDensity_kg_m3;
    const mm = (t.checks.pressureDrop!.value / (rho * 9.81)) * 1000;
    expect(Number(await dpCell(t.tray))).toBeCloseTo(mm, mm < 100 ? 1 : 0);
  });

  it('mbar chosen in the account menu applies at once and is kept after a reload', async () => {
    const p = b.page;
    await p.getByRole('button', { name: /^Account:/ }).click();
    await p.locator('[data-test="dp-unit-mbar"]').click();
    await p
      .getByRole('columnheader', { name: /^ΔP \(mbar\)/ })
      .first()
      .waitFor();
    const t = run.results.trays.find((x) => x.checks.pressureDrop?.status !== 'na')!;
    expect(Number(await dpCell(t.tray))).toBeCloseTo(t.checks.pressureDrop!.value / 100, 1);
    await p.reload();
    await p
      .getByRole('columnheader', { name: /^ΔP \(mbar\)/ })
      .first()
      .waitFor();
    await shot(p, 'run-dp-mbar');
  });

  it('inches of liquid, chosen the same way, convert from the same head', async () => {
    const p = b.page;
    await p.getByRole('button', { name: /^Account:/ }).click();
    await p.locator('[data-test="dp-unit-in-liquid"]').click();
    await p
      .getByRole('columnheader', { name: /^ΔP \(in liquid\)/ })
      .first()
      .waitFor();
    const t = run.results.trays.find((x) => x.checks.pressureDrop?.status !== 'na')!;
    const rho = run.snapshot.loads.find((l) => l.tray === t.tray)!.liquidDensity_kg_m3;
    // the page shows inches of liquid to 0.1 in (shared/numberFormat.ts), so the check holds to that rounding
    expect(Number(await dpCell(t.tray))).toBeCloseTo(t.checks.pressureDrop!.value / (rho * 9.81) / 0.0254, 1);
  });
});
