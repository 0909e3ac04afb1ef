import { brotliCompressSync, brotliDecompressSync } from 'node:zlib';
import { afterEach, describe, expect, it } from 'vitest';
import { decodeJson, decodeResults, encodeJson, encodeResults } from '../../../server/db/codec/index.js';
import { rateSnapshot } from '../../../server/services/runs/runs.js';
import { CHECK_NAMES } from '../../../shared/types/rating.js';
import type { RunResults } from '../../../shared/types/runs.js';
import { demoResults, demoSnapshots, storedFixture } from './demoResults.js';

/** CHECK_NAMES as code of another version has it (a check added, or one removed); restored after each test. */
const names = CHECK_NAMES as unknown as string[];
const original = [...names];
afterEach(() => void names.splice(0, names.length, ...original));

function header(stored: Buffer): { strings: string[]; shapes: [string, string][][] } {
  const raw = brotliDecompressSync(stored.subarray(4));
  return JSON.parse(raw.toString('utf8', 4, 4 + raw.readUInt32LE(0))) as { strings: string[]; shapes: [string, string][][] };
}

type Loose = Record<string, Record<string, unknown>>;

describe('stored run results (FRB4: checks and fields by name)', () => {
  it('round-trips every demo case exactly and is at least five times smaller than the JSON', () => {
    for (const results of demoResults()) {
      const stored = encodeResults(results);
      expect(stored.subarray(0, 4).toString('latin1')).toBe('FRB4');
      expect(decodeResults(stored)).toEqual(results);
      expect(stored.length * 5).toBeLessThan(JSON.stringify(results).length);
    }
  });

  it('round-trips per-pass details of a multipass section beside trays without them', () => {
    const [snap] = demoSnapshots();
    const s0 = snap!.sections[0]!;
    s0.geometry = {
      ...s0.geometry,
      passLayout: { sideDowncomerWidth_mm: 900, centreDowncomerWidth_mm: 560, oddTrayOutlets: 'side', liquidSplit: [0.48, 0.52] },
    };
    const r = rateSnapshot(snap!).results;
    const withPasses = r.trays.find((t) => t.sectionId === s0.sectionId)!;
    // a tray of a section without a layout (the demo's wash zone has one of its own)
    const plain = new Set(snap!.sections.filter((s) => !s.geometry.passLayout).map((s) => s.sectionId));
    const without = r.trays.find((t) => plain.has(t.sectionId))!;
    expect(withPasses.details.pass2LiquidFraction).toBe(0.52);
    const back = decodeResults(encodeResults(r));
    expect(back).toEqual(r);
    expect('pass1WeirLength_m' in back.trays.find((t) => plain.has(t.sectionId))!.details).toBe(false);
    expect(without.details.pass1WeirLength_m).toBeUndefined();
  });

  it('names every check and every field of a check, a tray, its details and warnings in the header', () => {
    const [r] = demoResults();
    const shapes = header(encodeResults(r!)).shapes.map((s) => s.map(([n, k]) => `${n}:${k}`));
    expect(shapes).toContainEqual(CHECK_NAMES.map((c) => `${c}:record`));
    expect(shapes).toContainEqual([
      'value:number',
      'unit:string',
      'limit:number',
      'sense:string',
      'percentOfLimit:number',
      'status:string',
      'method:string',
    ]);
    expect(shapes).toContainEqual([
      'tray:number',
      'sectionId:string',
      'controllingCheck:string',
      'checks:record',
      'details:record',
      'warnings:records',
    ]);
    expect(shapes.some((s) => s.includes('flowParameter:number') && s.includes('downcomerAeratedBackup_mm:number'))).toBe(true);
  });

  it('keeps numbers bit-exact (NaN, infinities and −0 too), absent details absent and warnings with their text', () => {
    const [r] = demoResults();
    const t = r!.trays[0]!;
    t.checks.jetFlood!.value = 0.1 + 0.2;
    t.checks.weeping!.value = -0;
    t.checks.entrainment!.percentOfLimit = Infinity;
    t.details.flowParameter = NaN;
    delete (t.details as Record<string, number>).entrainedLiquid_kg_h;
    t.warnings = [
      { code: 'x-test', message: 'flow parameter 0.004 – below the chart (°C, m³/h·m)' },
      { code: 'y-test', message: 'with a tray', tray: 7 },
    ];
    const back = decodeResults(encodeResults(r!));
    const b = back.trays[0]!;
    expect(Object.is(b.checks.jetFlood!.value, 0.1 + 0.2)).toBe(true);
    expect(Object.is(b.checks.weeping!.value, -0)).toBe(true);
    expect(b.checks.entrainment!.percentOfLimit).toBe(Infinity);
    expect(b.details.flowParameter).toBeNaN();
    expect('entrainedLiquid_kg_h' in b.details).toBe(false);
    expect(b.warnings).toEqual(t.warnings);
    expect('tray' in b.warnings[0]!).toBe(false);
    expect(back).toEqual(r);
  });

  it('reads a row written before a check existed: that check is absent, the others keep their values', () => {
    const [r] = demoResults();
    for (const t of r!.trays) delete (t.checks as Partial<RunResults['trays'][number]['checks']>).jetFlood;
    const stored = encodeResults(r!);
    names.push('passImbalance'); // today's code knows a check more
    const back = decodeResults(stored);
    expect(back).toEqual(r);
    for (const [i, t] of back.trays.entries()) {
      expect('jetFlood' in t.checks).toBe(false);
      expect('passImbalance' in t.checks).toBe(false);
      expect(t.checks.entrainment).toEqual(r!.trays[i]!.checks.entrainment);
    }
  });

  it('keeps a stored check that today’s code no longer knows, and a check held by some trays only', () => {
    const [r] = demoResults();
    r!.trays.forEach((t, i) => {
      if (i % 3 === 0)
        (t.checks as unknown as Loose).passImbalance = {
          value: i / 10,
          unit: '-',
          limit: 0.2,
          sense: 'max',
          percentOfLimit: i * 50,
          status: 'ok',
          method: 'passImbalanceTest',
        };
    });
    const stored = encodeResults(r!);
    names.splice(names.indexOf('downcomerSeal'), 1); // today's code dropped a check
    const back = decodeResults(stored);
    expect(back).toEqual(r);
    expect((back.trays[3]!.checks as unknown as Loose).passImbalance).toEqual({
      value: 0.3,
      unit: '-',
      limit: 0.2,
      sense: 'max',
      percentOfLimit: 150,
      status: 'ok',
      method: 'passImbalanceTest',
    });
    expect('passImbalance' in back.trays[1]!.checks).toBe(false);
    expect(back.trays[1]!.checks.downcomerSeal).toEqual(r!.trays[1]!.checks.downcomerSeal);
  });

  it('keeps fields added to the results, a tray, a check or a warning, whatever their type', () => {
    const [r] = demoResults();
    const t = r!.trays[2]! as unknown as Record<string, unknown>;
    t.passes = [
      { pass: 1, liquidShare: 0.52, dry: false },
      { pass: 2, liquidShare: 0.48, dry: null },
    ];
    t.passTrays = [1, 2];
    t.note = 'as-found';
    (r!.trays[2]!.checks.weeping as unknown as Record<string, unknown>).perPass = [0.4, 0.6];
    (r!.trays[2]!.checks.weeping as unknown as Record<string, unknown>).limitSource = { table: 'limits', row: 3 };
    r!.trays[2]!.warnings = [
      { code: 'a', message: 'b', tray: 3, passes: ['A', 'B'] } as RunResults['trays'][number]['warnings'][number],
    ];
    (r as unknown as Record<string, unknown>).mixed = [1, 'two', { three: 3 }];
    const back = decodeResults(encodeResults(r!));
    expect(back).toEqual(r);
    expect((back.trays[2] as unknown as Record<string, unknown>).passes).toEqual(t.passes);
  });

  it('switches to 4-byte integers when the string table outgrows 2 bytes', () => {
    const [r] = demoResults();
    const t = r!.trays[0]!;
    t.warnings = Array.from({ length: 70_000 }, (_, i) => ({ code: 'many', message: `message ${i}`, tray: t.tray }));
    const back = decodeResults(encodeResults(r!));
    expect(back.trays[0]!.warnings[69_999]).toEqual({ code: 'many', message: 'message 69999', tray: t.tray });
    expect(back).toEqual(r);
  });

  it('gives each encoding its own string table and shapes (state kept between encodings is not mixed up)', () => {
    const all = demoResults();
    const one = { ...all[0]!, trays: all[0]!.trays.slice(0, 1) };
    const other = all[2]!;
    other.trays[5]!.checks.weeping!.method = 'aMethodSeenOnlyHere';
    const stored = [encodeResults(all[1]!), encodeResults(one), encodeResults(other), encodeResults(one), encodeResults(all[1]!)];
    expect(stored.map(decodeResults)).toEqual([all[1], one, other, one, all[1]]);
    expect(header(stored[1]!).strings).not.toContain('aMethodSeenOnlyHere');
  });

  it('reads the golden FRB4 row (tests/fixtures/run-results-frb4.json), whatever checks today’s code knows', () => {
    const { stored, results } = storedFixture('frb4');
    expect(stored.subarray(0, 4).toString('latin1')).toBe('FRB4');
    expect(decodeResults(stored)).toEqual(results);
    names.push('passImbalance');
    expect(decodeResults(stored)).toEqual(results);
  });

  it('refuses bytes in another layout (FRB3 rows are re-encoded by a migration) instead of decoding them', () => {
    expect(() => decodeResults(storedFixture('frb3').stored)).toThrow(/unknown layout \(bytes start 'FRB3'\)/);
    expect(() => decodeResults(Buffer.from('{"trays":[]}'))).toThrow(/unknown layout/);
  });

  it('refuses FRB4 bytes whose values do not match their header', () => {
    const stored = encodeResults(demoResults()[0]!);
    const raw = brotliDecompressSync(stored.subarray(4));
    const cut = Buffer.concat([Buffer.from('FRB4'), brotliCompressSync(raw.subarray(0, raw.length - 8))]);
    expect(() => decodeResults(cut)).toThrow(/do not match their header/);
  });
});

describe('stored run snapshots (FRJ1)', () => {
  it('round-trips a snapshot and refuses one in another form', () => {
    const [s] = demoSnapshots();
    const stored = encodeJson(s);
    expect(stored.subarray(0, 4).toString('latin1')).toBe('FRJ1');
    expect(decodeJson(stored)).toEqual(s);
    expect(() => decodeJson(Buffer.from(JSON.stringify(s)))).toThrow(/Run snapshot stored in an unknown layout/);
  });
});
