/** The demo field evidence on T-701 (seeded by npm test) reads as its description says. */
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { setupApp, signedIn, type TestContext } from '../helpers/app.js';
import type { EvidenceReading, EvidenceSummary } from '../../shared/types/evidence.js';

let ctx: TestContext;
let agent: Awaited<ReturnType<typeof signedIn>>['agent'];
let items: EvidenceSummary[];
beforeAll(async () => {
  ctx = await setupApp();
  agent = (await signedIn(ctx, 'admin')).agent;
  const [col] = await ctx.ds.query<{ id: string }[]>(`SELECT id FROM columns WHERE tag = 'T-701'`);
  items = (await agent.get(`/api/columns/${col!.id}/evidence`)).body.items;
});
afterAll(() => ctx.close());

const reading = async (kind: string) =>
  (await agent.get(`/api/evidence/${items.find((i) => i.kind === kind)!.id}/reading`)).body as EvidenceReading;

describe('demo field evidence on T-701', () => {
  it('the scan shows one flooded region (trays 4–5) and one tray without its peak (12)', async () => {
    const r = await reading('gamma-scan');
    const res = r.lines[0]!.result!;
    expect(res.floodedRegions.map((f) => [f.topTray, f.bottomTray])).toEqual([[4, 5]]);
    expect(res.trays.filter((t) => t.finding === 'missing-tray').map((t) => t.tray)).toEqual([12]);
    expect(res.trays.filter((t) => !['normal', 'flooded', 'missing-tray'].includes(t.finding))).toEqual([]);
  });

  it('the ΔP survey flags the top section and the temperature survey tray 5', async () => {
    const dp = (await reading('dp-survey')).pressureDrop!.result!.rows;
    expect(dp[0]!.flag).not.toBe('as-predicted');
    expect(dp[1]!.flag).toBe('as-predicted');
    const t = (await reading('temperature-survey')).temperature!.result!.rows;
    expect(t.filter((x) => x.flag !== 'as-predicted').map((x) => x.tray)).toEqual([5]);
  });

  it('prints each record as a PDF report', async () => {
    for (const i of items) {
      const res = await agent.get(`/api/evidence/${i.id}/report.pdf`).buffer(true);
      expect(res.status).toBe(200);
      expect(res.headers['content-type']).toBe('application/pdf');
      expect((res.body as Buffer).subarray(0, 5).toString('latin1')).toBe('%PDF-');
    }
  });
});
