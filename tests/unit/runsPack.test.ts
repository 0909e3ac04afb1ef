import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { DEMO_SECTIONS } from '../../server/db/seed/demoColumn.js';
import { DEMO_LOAD_CASES } from '../../server/db/seed/demoLoads.js';
import { decodeResults, encodeResults } from '../../server/services/runsPack.js';
import { rateSnapshot } from '../../server/services/runs.js';
import { CHECK_NAMES } from '../../shared/types/rating.js';
import type { RunResults } from '../../shared/types/runs.js';

function demoSnapshots() {
  return DEMO_LOAD_CASES.map((lc) => {
    const sections = DEMO_SECTIONS.map((s, i) => ({
      ...s,
      sectionId: `section-${i}`,
      provenanceDate: s.provenanceDate ?? null,
      overridden: false,
    }));
    return {
      column: { id: 'c', tag: 'T', numbering: 'top-down' as const, trayCount: 46 },
      loadCase: { id: 'l', name: lc.name, basis: lc.basis, version: 1 },
      sections,
      loads: lc.loads,
      methods: {},
    };
  });
}

function demoResults(): RunResults[] {
  return demoSnapshots().map((s) => rateSnapshot(s).results);
}

describe('compressed storage of run results', () => {
  it('round-trips every demo case exactly and is at least five times smaller than the JSON', () => {
    for (const results of demoResults()) {
      const stored = encodeResults(results);
      expect(decodeResults(stored)).toEqual(results);
      expect(stored.length * 5).toBeLessThan(JSON.stringify(results).length);
    }
  });

  it('round-trips per-pass details of a multipass section beside trays without them', () => {
    const [snap] = demoSnapshots();
    const s0 = snap!.sections[0]!;
    s0.geometry = { ...s0.geometry, passLayout: { sideDowncomerWidth_mm: 900, centreDowncomerWidth_mm: 560, oddTrayOutlets: 'side', liquidSplit: [0.48, 0.52] } };
    const r = rateSnapshot(snap!).results;
    const withPasses = r.trays.find((t) => t.sectionId === s0.sectionId)!;
    const without = r.trays.find((t) => t.sectionId !== s0.sectionId)!;
    expect(withPasses.details.pass2LiquidFraction).toBe(0.52);
    const back = decodeResults(encodeResults(r));
    expect(back).toEqual(r);
    expect('pass1WeirLength_m' in back.trays.find((t) => t.sectionId !== s0.sectionId)!.details).toBe(false);
    expect(without.details.pass1WeirLength_m).toBeUndefined();
  });

  it('keeps numbers bit-exact, absent details absent, and warnings with their text', () => {
    const [r] = demoResults();
    const t = r!.trays[0]!;
    t.checks.jetFlood.value = 0.1 + 0.2; // not representable in short decimal form
    delete (t.details as Record<string, number>).entrainedLiquid_kg_h;
    t.warnings = [{ code: 'x-test', message: 'flow parameter 0.004 – below the chart (°C, m³/h·m)' }];
    const back = decodeResults(encodeResults(r!)).trays[0]!;
    expect(Object.is(back.checks.jetFlood.value, 0.1 + 0.2)).toBe(true);
    expect('entrainedLiquid_kg_h' in back.details).toBe(false);
    expect(back.warnings).toEqual(t.warnings);
  });

  it('writes the current layout (FRB3) and keeps warnings without a tray number without one', () => {
    const [r] = demoResults();
    r!.trays[1]!.warnings = [
      { code: 'a', message: 'no tray' },
      { code: 'b', message: 'with a tray', tray: 7 },
    ];
    const stored = encodeResults(r!);
    expect(stored.subarray(0, 4).toString('latin1')).toBe('FRB3');
    const back = decodeResults(stored);
    expect(back.trays[1]!.warnings).toEqual(r!.trays[1]!.warnings);
    expect('tray' in back.trays[1]!.warnings[0]!).toBe(false);
  });

  it('switches to 4-byte string indices when the string table outgrows 2 bytes', () => {
    const [r] = demoResults();
    const t = r!.trays[0]!;
    t.warnings = Array.from({ length: 70_000 }, (_, i) => ({ code: 'many', message: `message ${i}`, tray: t.tray }));
    const back = decodeResults(encodeResults(r!));
    expect(back.trays[0]!.warnings).toHaveLength(70_000);
    expect(back.trays[0]!.warnings[69_999]).toEqual({ code: 'many', message: 'message 69999', tray: t.tray });
    expect(back).toEqual(r);
  });

  it('reads rows stored in the earlier binary layout (FRB2)', () => {
    // tests/fixtures/run-results-frb2.json: two demo trays as the FRB2 encoder stored them, and their results
    const fixture = JSON.parse(readFileSync(new URL('../fixtures/run-results-frb2.json', import.meta.url), 'utf8')) as {
      stored: string;
      results: RunResults;
    };
    const stored = Buffer.from(fixture.stored, 'base64');
    expect(stored.subarray(0, 4).toString('latin1')).toBe('FRB2');
    expect(decodeResults(stored)).toEqual(fixture.results);
  });

  it('reads rows stored before compression (plain JSON text and the packed-1 array form)', () => {
    const [r] = demoResults();
    expect(decodeResults(Buffer.from(JSON.stringify(r)))).toEqual(r);
    const t = r!.trays[0]!;
    const strings = ['s1', 'jetFlood', '%', 'max', 'ok', 'fair'];
    const packed1 = {
      ...r,
      trays: [[t.tray, 0, 1, CHECK_NAMES.map(() => [1, 2, 80, 3, 1.25, 4, 5]), [0.5, null], []]],
      format: 'packed-1',
      strings,
      detailKeys: ['flowParameter', 'capacityFactor_m_s'],
    };
    const back = decodeResults(Buffer.from(JSON.stringify(packed1))).trays[0]!;
    expect(back.sectionId).toBe('s1');
    expect(back.checks.weeping).toEqual({ value: 1, unit: '%', limit: 80, sense: 'max', percentOfLimit: 1.25, status: 'ok', method: 'fair' });
    expect(back.details).toEqual({ flowParameter: 0.5 });
  });
});

describe('compressed storage of small results', () => {
  it('round-trips a one-tray result (small buffers come from a shared pool, unaligned)', () => {
    const [r] = demoResults();
    const one = { ...r!, trays: r!.trays.slice(0, 1) };
    for (let i = 0; i < 5; i++) expect(decodeResults(encodeResults(one))).toEqual(one);
  });
});

describe('work shared between runs of the same inputs', () => {
  it('rating with validated requests kept from an earlier run gives the same results and leaves them as they were', () => {
    for (const snapshot of demoSnapshots()) {
      const validated = new Map();
      const first = rateSnapshot(snapshot, validated);
      expect(validated.size).toBe(snapshot.sections.length);
      const kept = structuredClone([...validated.entries()]);
      const second = rateSnapshot(snapshot, validated);
      expect(second).toEqual(first);
      expect(second).toEqual(rateSnapshot(snapshot));
      expect([...validated.entries()]).toEqual(kept);
    }
  });
});
