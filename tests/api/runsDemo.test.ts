/** The invented demo scenario rates as its descriptions say (engine only, no database). */
import { describe, expect, it } from 'vitest';
import { DEMO_SECTIONS } from '../../server/db/seed/demoColumn.js';
import { DEMO_LOAD_CASES } from '../../server/db/seed/demoLoads.js';
import { rateSnapshot } from '../../server/services/runs/runs.js';

function rate(name: string) {
  const lc = DEMO_LOAD_CASES.find((c) => c.name === name)!;
  const sections = DEMO_SECTIONS.map((s, i) => ({
    ...s,
    sectionId: `s${i}`,
    provenanceDate: s.provenanceDate ?? null,
    overridden: false,
  }));
  return rateSnapshot({
    column: { id: 'c', tag: 'T-701', numbering: 'top-down', trayCount: 46 },
    loadCase: { id: 'l', name, basis: lc.basis, version: 1 },
    sections,
    loads: lc.loads,
    methods: {},
  }).results;
}

describe('demo scenario on T-701', () => {
  it('covers all 46 trays with engine-valid sections and finite results', () => {
    const r = rate('Summer normal');
    expect(r.trays).toHaveLength(46);
    expect(r.uncoveredTrays).toEqual([]);
    for (const t of r.trays) for (const c of Object.values(t.checks)) expect(Number.isFinite(c.percentOfLimit)).toBe(true);
  });

  it('Summer normal: no tray over a limit', () => {
    expect(rate('Summer normal').traysOver).toEqual([]);
  });

  it('Winter maximum: the top trays flood (jet flood above 100 %)', () => {
    const r = rate('Winter maximum');
    const flooding = r.trays.filter((t) => t.checks.jetFlood!.value > 100).map((t) => t.tray);
    expect(flooding.length).toBeGreaterThan(0);
    expect(Math.max(...flooding)).toBeLessThanOrEqual(8);
  });

  it('High top-PA duty: tray 1 above the top PA is near dry-out (crest under 6 mm), and only tray 1 is over', () => {
    const r = rate('High top-PA duty');
    const t1 = r.trays[0]!;
    expect(t1.checks.liquidLoad!.value).toBeLessThan(6);
    expect(t1.controllingCheck).toBe('liquidLoad');
    expect(r.traysOver).toEqual([1]);
  });
});
