import { describe, expect, it } from 'vitest';
import { DEMO_SECTIONS } from '../../server/db/seed/demoColumn.js';
import { DEMO_LOAD_CASES } from '../../server/db/seed/demoLoads.js';
import { packResults, unpackResults } from '../../server/services/runsPack.js';
import { rateSnapshot } from '../../server/services/runs.js';

describe('packed storage of run results', () => {
  it('round-trips every demo case exactly through JSON and is at least twice smaller', () => {
    for (const lc of DEMO_LOAD_CASES) {
      const sections = DEMO_SECTIONS.map((s, i) => ({
        ...s,
        sectionId: `section-${i}`,
        provenanceDate: s.provenanceDate ?? null,
        overridden: false,
      }));
      const { results } = rateSnapshot({
        column: { id: 'c', tag: 'T', numbering: 'top-down', trayCount: 46 },
        loadCase: { id: 'l', name: lc.name, basis: lc.basis, version: 1 },
        sections,
        loads: lc.loads,
        methods: {},
      });
      const stored = JSON.stringify(packResults(results));
      expect(unpackResults(JSON.parse(stored))).toEqual(results);
      expect(stored.length * 2).toBeLessThan(JSON.stringify(results).length);
    }
  });

  it('reads unpacked results unchanged', () => {
    const plain = { trays: [], sections: [] } as unknown as Parameters<typeof unpackResults>[0];
    expect(unpackResults(plain)).toBe(plain);
  });
});
