import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { FROTHLINE_URL, launch, shot, signInAs, type Browser } from '../helpers/browser.js';
import type { Page as ApiPage } from '../../shared/types/api.js';
import type { ColumnDetail, ColumnSummary } from '../../shared/types/columns.js';
import type { StudySummary } from '../../shared/types/studies.js';

/**
 * At 1280 px nothing is clipped: the tray sections table (with its delete buttons) and the mail outbox fit their
 * cards, load-case dates stay on one line, the column profile shows its labels whole and marks section
 * boundaries and pump-around draws and returns, and the study's duty labels are horizontal above the plot.
 */
let b: Browser;
let col: ColumnDetail;

const overflow = (sel: string) =>
  b.page
    .locator(sel)
    .locator('.q-table__middle')
    .evaluate((el) => el.scrollWidth - el.clientWidth);

beforeAll(async () => {
  b = await launch({ width: 1280, height: 860 });
  b.page.setDefaultTimeout(30000);
  await signInAs(b.page, 'internals-specialist');
  const cols = (await (await b.page.request.get(`${FROTHLINE_URL}/api/columns?q=T-701`)).json()) as ApiPage<ColumnSummary>;
  const id = cols.items.find((c) => c.tag === 'T-701')!.id;
  col = (await (await b.page.request.get(`${FROTHLINE_URL}/api/columns/${id}`)).json()) as ColumnDetail;
});
afterAll(() => b?.close());

describe('clipped columns at 1280 px', () => {
  it('the tray sections table fits its card, every delete button inside it; load-case dates do not wrap', async () => {
    const p = b.page;
    await p.goto(`${FROTHLINE_URL}/columns/${col.id}`);
    await p.locator('[data-test=sections-table]').waitFor();
    expect(await overflow('[data-test=sections-table]')).toBeLessThanOrEqual(0);
    const card = (await p.locator('[data-test=sections-table]').boundingBox())!;
    for (const s of col.sections) {
      const btn = (await p.getByRole('button', { name: `Delete ${s.name}` }).boundingBox())!;
      expect(btn.x + btn.width).toBeLessThanOrEqual(card.x + card.width);
    }
    const dates = p.getByRole('cell', { name: /^\d{4}-\d\d-\d\d$/ });
    expect(await dates.count()).toBeGreaterThan(0);
    const lines = await dates.evaluateAll((els) =>
      els
        .filter((e) => /^\s*\d{4}-\d\d-\d\d\s*$/.test(e.textContent ?? ''))
        .map((e) => {
          const r = document.createRange();
          r.selectNodeContents(e);
          return `${e.textContent}:${new Set([...r.getClientRects()].map((x) => Math.round(x.top))).size}`;
        }),
    );
    expect(lines.filter((n) => !n.endsWith(':1'))).toEqual([]); // each date on one line
    await shot(p, 'column-page-1280');
  });

  it('the column profile shows its labels whole and marks the boundaries', async () => {
    const p = b.page;
    const svg = p.locator('.fl-profile svg');
    const texts = await svg.locator('text').allTextContents();
    expect(texts.join(' ')).not.toContain('…');
    const marks = await svg.locator('[data-mark]').evaluateAll((els) => els.map((e) => e.getAttribute('data-mark')));
    const s = [...col.sections].sort((a, c) => a.firstTray - c.firstTray);
    expect(marks).toContain(`section: ${s[0]!.name} | ${s[1]!.name}`);
    for (const pa of col.pumpArounds) expect(marks).toEqual(expect.arrayContaining([`pump-around: ${pa.name} draw`]));
  });

  it("the study's duty lines are labelled in horizontal text", async () => {
    const p = b.page;
    const studies = (await (await p.request.get(`${FROTHLINE_URL}/api/columns/${col.id}/studies`)).json()) as StudySummary[];
    await p.goto(`${FROTHLINE_URL}/studies/${studies.at(-1)!.id}`);
    const sel = '.js-plotly-plot';
    await expect
      .poll(
        () =>
          p.evaluate(
            (s) =>
              [...document.querySelectorAll(s)].some((e) =>
                ((e as unknown as { layout?: { shapes?: { name?: string }[] } }).layout?.shapes ?? []).some(
                  (x) => x.name === 'duty: dry-out',
                ),
              ),
            sel,
          ),
        { timeout: 30000 },
      )
      .toBe(true);
    const labels = await p.evaluate((s) => {
      const el = [...document.querySelectorAll(s)].find((e) =>
        ((e as unknown as { layout?: { shapes?: { name?: string }[] } }).layout?.shapes ?? []).some(
          (x) => x.name === 'duty: dry-out',
        ),
      ) as unknown as {
        layout: { shapes: { label?: { textangle?: number } }[]; annotations: { text: string; textangle?: number }[] };
      };
      return { shapes: el.layout.shapes, annotations: el.layout.annotations };
    }, sel);
    expect(labels.shapes.every((x) => x.label?.textangle === undefined)).toBe(true);
    expect(labels.annotations.map((a) => a.text)).toEqual(expect.arrayContaining(['dry-out', 'slider']));
    await shot(p, 'study-duty-labels-1280');
  });
});

describe('mail outbox at 1280 px', () => {
  it('fits its card: addresses and subjects wrap, attempts go with the status', async () => {
    const p = b.page;
    await b.context.clearCookies();
    await signInAs(p, 'admin');
    await p.goto(`${FROTHLINE_URL}/admin/mail`);
    await p.locator('[data-test=outbox] tbody tr').first().waitFor();
    expect(await overflow('[data-test=outbox]')).toBeLessThanOrEqual(0);
    await shot(p, 'mail-outbox-1280');
  });
});
