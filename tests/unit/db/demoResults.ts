import { readFileSync } from 'node:fs';
import { DEMO_SECTIONS } from '../../../server/db/seed/demoColumn.js';
import { DEMO_LOAD_CASES } from '../../../server/db/seed/demoLoads.js';
import { rateSnapshot } from '../../../server/services/runs/runs.js';
import type { RunResults, RunSnapshot } from '../../../shared/types/runs.js';

/** The demo column rated under each demo load case (engine only, no database). */
export function demoSnapshots(): Omit<RunSnapshot, 'engineVersion'>[] {
  return DEMO_LOAD_CASES.map((lc) => ({
    column: { id: 'c', tag: 'T', numbering: 'top-down' as const, trayCount: 46 },
    loadCase: { id: 'l', name: lc.name, basis: lc.basis, version: 1 },
    sections: DEMO_SECTIONS.map((s, i) => ({
      ...s,
      sectionId: `section-${i}`,
      provenanceDate: s.provenanceDate ?? null,
      overridden: false,
    })),
    loads: lc.loads,
    methods: {},
  }));
}

export function demoResults(): RunResults[] {
  return demoSnapshots().map((s) => rateSnapshot(s).results);
}

/** A golden fixture: stored bytes of one layout and the results they decode to. */
export function storedFixture(name: 'frb2' | 'frb3' | 'frb4'): { stored: Buffer; results: RunResults } {
  const f = JSON.parse(readFileSync(new URL(`../../fixtures/run-results-${name}.json`, import.meta.url), 'utf8')) as {
    stored: string;
    results: RunResults;
  };
  return { stored: Buffer.from(f.stored, 'base64'), results: f.results };
}
