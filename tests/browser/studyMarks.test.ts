import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { ColumnSummary } from '../../shared/types/columns.js';
import type { Page as ApiPage } from '../../shared/types/api.js';
import type { StudyRecord, StudySummary } from '../../shared/types/studies.js';
import { FROTHLINE_URL, launch, shot, signInAs, type Browser } from '../helpers/browser.js';

/** The study page's per-tray charts mark the section boundaries and the pump-around's draw and return. */
let b: Browser;
let study: StudyRecord;

interface PlotEl {
  layout: { shapes?: { name?: string; y0: number }[]; annotations?: { text: string }[] };
}
const layoutOf = (sel: string) =>
  b.page.evaluate((s) => (document.querySelector(s) as unknown as PlotEl | null)?.layout ?? null, sel);

beforeAll(async () => {
  b = await launch({ width: 1280, height: 860 });
  b.page.setDefaultTimeout(20000);
  await signInAs(b.page, 'viewer');
  const cols = (await (await b.page.request.get(`${FROTHLINE_URL}/api/columns?q=T-701`)).json()) as ApiPage<ColumnSummary>;
  const t701 = cols.items.find((c) => c.tag === 'T-701')!;
  const studies = (await (await b.page.request.get(`${FROTHLINE_URL}/api/columns/${t701.id}/studies`)).json()) as StudySummary[];
  const id = studies.filter((s) => s.pumpAroundName === 'Top PA').at(-1)!.id;
  study = (await (await b.page.request.get(`${FROTHLINE_URL}/api/studies/${id}`)).json()) as StudyRecord;
});
afterAll(() => b?.close());

describe('study charts', () => {
  it('mark section boundaries and the draw and return trays on the traffic and percent-of-limit charts', async () => {
    const p = b.page;
    await p.goto(`${FROTHLINE_URL}/studies/${study.id}`);
    for (const sel of ['[data-test=traffic-chart]', '[data-test=percent-chart]'])
      await expect.poll(async () => (await layoutOf(sel))?.shapes?.length ?? 0, { timeout: 30000 }).toBeGreaterThan(0);
    const s = [...study.inputs.input.sections].sort((a, c) => a.fromTray - c.fromTray);
    const pa = study.inputs.input.pumpAround;
    const boundary = `section: ${s[0]!.name} | ${s[1]!.name}`;
    for (const sel of ['[data-test=traffic-chart]', '[data-test=percent-chart]']) {
      const lay = (await layoutOf(sel))!;
      const names = (lay.shapes ?? []).map((x) => x.name ?? '');
      expect(names).toContain(boundary);
      expect(names).toContain(`pump-around: ${pa.name} draw`);
      expect(names).toContain(`pump-around: ${pa.name} return`);
      expect(lay.shapes!.find((x) => x.name === boundary)!.y0).toBe(Math.max(s[0]!.fromTray, s[0]!.toTray) + 0.5);
      expect((lay.annotations ?? []).map((a) => a.text)).toContain(`${pa.name} return`);
    }
    await p.locator('[data-test=traffic-chart]').scrollIntoViewIfNeeded();
    await shot(p, 'study-marks-1280');
    await p.setViewportSize({ width: 390, height: 844 });
    await p.locator('[data-test=percent-chart]').scrollIntoViewIfNeeded();
    await shot(p, 'study-marks-390');
  });
});
