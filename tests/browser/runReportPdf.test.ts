import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { FROTHLINE_URL, launch, shot, signInAs, type Browser } from '../helpers/browser.js';
import type { Page as ApiPage } from '../../shared/types/api.js';
import type { RunSummary } from '../../shared/types/runs.js';

/** The run report page offers the server-made PDF (header, footer and page x of y on every page). */
let b: Browser;
beforeAll(async () => {
  b = await launch({ width: 1280, height: 860 });
  b.page.setDefaultTimeout(20000);
  await signInAs(b.page, 'viewer');
});
afterAll(() => b?.close());

describe('run report PDF', () => {
  it('the report page links a PDF of several pages', async () => {
    const p = b.page;
    const runs = (await (await p.request.get(`${FROTHLINE_URL}/api/runs?pageSize=50`)).json()) as ApiPage<RunSummary>;
    const run = runs.items.find((r) => r.label.startsWith('Winter maximum')) ?? runs.items[0]!;
    await p.goto(`${FROTHLINE_URL}/runs/${run.id}/report`);
    const link = p.locator('[data-test=run-report-pdf]');
    await link.waitFor();
    const href = await link.getAttribute('href');
    expect(href).toBe(`/api/runs/${run.id}/report.pdf`);
    const res = await p.request.get(`${FROTHLINE_URL}${href}`);
    expect(res.headers()['content-type']).toBe('application/pdf');
    const pdf = (await res.body()).toString('latin1');
    expect(pdf.startsWith('%PDF')).toBe(true);
    expect(Number(/\/Type \/Pages[\s\S]*?\/Count (\d+)/.exec(pdf)?.[1])).toBeGreaterThanOrEqual(4);
    await shot(p, 'run-report-page');
  });
});
