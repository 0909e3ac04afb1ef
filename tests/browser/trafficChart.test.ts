import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { FROTHLINE_URL, launch, shot, signInAs, type Browser } from '../helpers/browser.js';
import type { ColumnDetail } from '../../shared/types/columns.js';
import type { Page as ApiPage } from '../../shared/types/api.js';
import type { RunRecord, RunSummary } from '../../shared/types/runs.js';

/**
 * The run page's traffic chart draws one step per tray (each tray's flow held over its own height), offers the
 * vapour load factor with the liquid volume flow instead of mass flows, and both per-tray charts mark the
 * section boundaries and the pump-around draw and return trays.
 */
let b: Browser;
let run: RunRecord;
let col: ColumnDetail;

interface PlotEl {
  data: { name: string; x: (number | null)[]; y: (number | null)[] }[];
  layout: { shapes?: { name?: string; y0: number }[]; xaxis: { title: { text: string } }; annotations?: { text: string }[] };
}
const plot = (sel: string) =>
  b.page.evaluate((s) => {
    const el = document.querySelector(s) as unknown as PlotEl | null;
    return el ? { data: el.data, layout: el.layout } : null;
  }, sel);

beforeAll(async () => {
  b = await launch({ width: 1366, height: 900 });
  b.page.setDefaultTimeout(20000);
  await signInAs(b.page, 'viewer');
  const runs = (await (await b.page.request.get(`${FROTHLINE_URL}/api/runs?pageSize=50`)).json()) as ApiPage<RunSummary>;
  // a demo run on a column with a pump-around and more than one section
  for (const r of runs.items) {
    const full = (await (await b.page.request.get(`${FROTHLINE_URL}/api/runs/${r.id}`)).json()) as RunRecord;
    const c = (await (await b.page.request.get(`${FROTHLINE_URL}/api/columns/${full.columnId}`)).json()) as ColumnDetail;
    if (full.snapshot.sections.length > 1 && c.pumpArounds.length > 0) {
      [run, col] = [full, c];
      break;
    }
  }
  expect(run, 'a demo run with two sections and a pump-around').toBeTruthy();
});
afterAll(() => b?.close());

describe('traffic chart', () => {
  it('draws vapour and liquid as tray steps, one flat step per tray', async () => {
    const p = b.page;
    await p.goto(`${FROTHLINE_URL}/runs/${run.id}`);
    await p.getByRole('tab', { name: 'Charts' }).click();
    await p.waitForFunction(() => document.querySelector('[data-test=chart-traffic] .scatterlayer path'));
    const t = (await plot('[data-test=chart-traffic]'))!;
    const vapour = t.data.find((d) => d.name === 'Vapour')!;
    const first = run.snapshot.loads[0]!;
    const i = vapour.y.indexOf(first.tray - 0.5);
    expect(i).toBeGreaterThanOrEqual(0);
    expect(vapour.y[i + 1]).toBe(first.tray + 0.5); // the step spans the tray's height…
    expect(vapour.x[i]).toBe(vapour.x[i + 1]); // …at one flow
    expect(vapour.x[i]).toBeCloseTo(first.vapourMassFlow_kg_h, 6); // demo viewer reads SI
    expect(vapour.x.filter((x) => x !== null)).toHaveLength(2 * run.snapshot.loads.length);
  });

  it('marks section boundaries and pump-around draw and return on both per-tray charts', async () => {
    const s = [...run.snapshot.sections].sort((a, c) => a.firstTray - c.firstTray);
    const pa = col.pumpArounds[0]!;
    for (const sel of ['[data-test=chart-traffic]', '[data-test=chart-percent]']) {
      const lay = (await plot(sel))!.layout;
      const names = (lay.shapes ?? []).map((x) => x.name ?? '');
      expect(names).toContain(`section: ${s[0]!.name} | ${s[1]!.name}`);
      expect(names).toContain(`pump-around: ${pa.name} draw`);
      expect(names).toContain(`pump-around: ${pa.name} return`);
      const boundary = lay.shapes!.find((x) => x.name === `section: ${s[0]!.name} | ${s[1]!.name}`)!;
      expect(boundary.y0).toBe(Math.max(s[0]!.firstTray, s[0]!.lastTray) + 0.5);
      expect((lay.annotations ?? []).map((a) => a.text)).toContain(`${pa.name} draw`);
    }
  });

  it('shows the vapour load factor and the liquid volume flow instead of mass flows', async () => {
    const p = b.page;
    await p.locator('[data-test=traffic-mode]').getByRole('button', { name: 'Load factor' }).click();
    await p.waitForFunction(() =>
      /load factor/i.test(
        (document.querySelector('[data-test=chart-traffic]') as unknown as PlotEl | null)?.layout.xaxis.title.text ?? '',
      ),
    );
    const t = (await plot('[data-test=chart-traffic]'))!;
    const c = t.data.find((d) => d.name === 'Vapour load factor C')!;
    const tr = run.results.trays[0]!;
    const i = c.y.indexOf(tr.tray - 0.5);
    expect(c.x[i]).toBeCloseTo(tr.details.capacityFactor_m_s, 9);
    const q = t.data.find((d) => d.name === 'Liquid volume flow')!;
    const l = run.snapshot.loads.find((x) => x.tray === tr.tray)!;
    expect(q.x[q.y.indexOf(tr.tray - 0.5)]).toBeCloseTo(l.liquidMassFlow_kg_h / l.liquidDensity_kg_m3, 6);
    await shot(p, 'run-traffic-load-factor');
  });
});
