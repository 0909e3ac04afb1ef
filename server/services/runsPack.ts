/**
 * Lossless compact storage of run results (rating_runs.results, bytea). Layout of the stored bytes:
 *   'FRB2' | Brotli( uint32LE header length | header JSON (UTF-8) | float64LE numbers )
 * The header holds everything but the per-tray numbers: a string table (units, senses, statuses, method
 * ids, section ids), the detail key order and, per tray, indices into the string table and the warnings.
 * The numbers (per check value, limit, percent of limit; then every detail, NaN for an absent one) are
 * written as binary doubles, so they are exact and never go through text. A 60-tray result goes from
 * ~200 kB of JSON to ~10 kB; the bytes sent to and written by PostgreSQL and the JSON text are what a run
 * insert mostly costs (bench/api.ts). decodeResults(encodeResults(r)) deep-equals r.
 * Older rows hold JSON text (plain results, or the 'packed-1' array form), and are read back unchanged.
 * The run snapshot (geometry, loads, methods) is stored the same way as compressed JSON (encodeJson).
 */
import { brotliCompressSync, brotliDecompressSync, constants as zc } from 'node:zlib';
import type { ValueTransformer } from 'typeorm';
import { CHECK_NAMES, type CheckResult, type TrayDetails } from '../../shared/types/rating.js';
import type { RunResults, RunTrayResult } from '../../shared/types/runs.js';

const MAGIC = Buffer.from('FRB2', 'latin1');

const brotliParams = (bytes: Buffer) => ({ [zc.BROTLI_PARAM_QUALITY]: 1, [zc.BROTLI_PARAM_SIZE_HINT]: bytes.length });

/**
 * magic | Brotli(bytes), quality 1: fast, and most of the size gain. Compressed on the event loop: a 60-tray
 * result takes ~0.1 ms here, where zlib's asynchronous form (a stream per call and a thread-pool hop) took
 * two to four times the CPU on a 2-core machine under load (bench/api.ts).
 */
function pack(magic: Buffer, bytes: Buffer): Buffer {
  return Buffer.concat([magic, brotliCompressSync(bytes, { params: brotliParams(bytes) })]);
}

/** The bytes packed behind `magic`, or null when `b` does not start with it (older rows: JSON text). */
function unpack(magic: Buffer, b: Buffer): Buffer | null {
  return b.subarray(0, magic.length).equals(magic) ? brotliDecompressSync(b.subarray(magic.length)) : null;
}
const PER_CHECK = 3;

/** Per tray: tray, section, controlling check, per check [unit, sense, status, method], warnings. */
type HeaderTray = [number, number, number, number[], RunTrayResult['warnings']];
interface Header extends Omit<RunResults, 'trays'> {
  strings: string[];
  detailKeys: string[];
  trays: HeaderTray[];
}

export function encodeResults(r: RunResults): Buffer {
  return pack(MAGIC, resultsLayout(r));
}

/** The uncompressed layout: header length, header JSON, doubles. */
function resultsLayout(r: RunResults): Buffer {
  // Plain indexed loops: this runs once per stored run, on the request path (bench/api.ts).
  const strings: string[] = [];
  const index = new Map<string, number>();
  const s = (x: string): number => {
    let i = index.get(x);
    if (i === undefined) index.set(x, (i = strings.push(x) - 1));
    return i;
  };
  const keySet = new Set<string>();
  for (const t of r.trays) for (const k in t.details) keySet.add(k);
  const detailKeys = [...keySet];
  const nChecks = CHECK_NAMES.length;
  const nDetails = detailKeys.length;
  const nums = new Float64Array((nChecks * PER_CHECK + nDetails) * r.trays.length);
  const trays: HeaderTray[] = new Array<HeaderTray>(r.trays.length);
  let o = 0;
  for (let ti = 0; ti < r.trays.length; ti++) {
    const t = r.trays[ti]!;
    const idx = new Array<number>(4 * nChecks);
    for (let ci = 0; ci < nChecks; ci++) {
      const k = t.checks[CHECK_NAMES[ci]!];
      nums[o++] = k.value ?? NaN;
      nums[o++] = k.limit ?? NaN;
      nums[o++] = k.percentOfLimit ?? NaN;
      idx[4 * ci] = s(k.unit);
      idx[4 * ci + 1] = s(k.sense);
      idx[4 * ci + 2] = s(k.status);
      idx[4 * ci + 3] = s(k.method);
    }
    const d = t.details as unknown as Record<string, number | undefined>;
    for (let j = 0; j < nDetails; j++) nums[o++] = d[detailKeys[j]!] ?? NaN;
    trays[ti] = [t.tray, s(t.sectionId), s(t.controllingCheck), idx, t.warnings];
  }
  // every field named rather than spread: see rateSnapshot in runs.ts on spread copies and young objects
  const header: Header = {
    engineVersion: r.engineVersion,
    sections: r.sections,
    uncoveredTrays: r.uncoveredTrays,
    controllingCheck: r.controllingCheck,
    controllingTray: r.controllingTray,
    maxPercentOfLimit: r.maxPercentOfLimit,
    traysOver: r.traysOver,
    traysNear: r.traysNear,
    strings,
    detailKeys,
    trays,
  };
  const head = Buffer.from(JSON.stringify(header), 'utf8');
  const raw = Buffer.allocUnsafe(4 + head.length + nums.byteLength);
  raw.writeUInt32LE(head.length, 0);
  head.copy(raw, 4);
  littleEndian(Buffer.from(nums.buffer)).copy(raw, 4 + head.length);
  return raw;
}

/** Doubles are stored little-endian; swap in place on a big-endian host (the buffer is ours). */
function littleEndian(b: Buffer): Buffer {
  return IS_LE ? b : b.swap64();
}
const IS_LE = new Uint8Array(new Float64Array([1]).buffer)[7] === 0x3f;

function decodeBinary(raw: Buffer): RunResults {
  const headLen = raw.readUInt32LE(0);
  const { strings, detailKeys, trays, ...rest } = JSON.parse(raw.toString('utf8', 4, 4 + headLen)) as Header;
  const nums = new Float64Array((raw.length - 4 - headLen) / 8); // a copy: aligned, and ours to swap
  const bytes = Buffer.from(nums.buffer);
  raw.copy(bytes, 0, 4 + headLen);
  littleEndian(bytes);
  let o = 0;
  const get = (): number => nums[o++]!;
  const str = (i: number): string => strings[i]!;
  return {
    ...rest,
    trays: trays.map(([tray, section, controlling, idx, warnings]): RunTrayResult => {
      const checks = {} as RunTrayResult['checks'];
      CHECK_NAMES.forEach((c, i) => {
        const [unit, sense, status, method] = idx.slice(4 * i, 4 * i + 4) as [number, number, number, number];
        const k: CheckResult = {
          value: get(),
          unit: str(unit),
          limit: get(),
          sense: str(sense) as CheckResult['sense'],
          percentOfLimit: get(),
          status: str(status) as CheckResult['status'],
          method: str(method),
        };
        checks[c] = k;
      });
      const details = {} as TrayDetails;
      for (const k of detailKeys) {
        const x = get();
        if (!Number.isNaN(x)) details[k] = x;
      }
      return { tray, sectionId: str(section), controllingCheck: str(controlling) as RunTrayResult['controllingCheck'], checks, details, warnings };
    }),
  };
}

/** The 'packed-1' JSON array form of earlier rows. */
type PackedCheck = [number, number, number, number, number, number, number];
type PackedTray = [number, number, number, PackedCheck[], (number | null)[], RunTrayResult['warnings']];
interface Packed1 extends Omit<RunResults, 'trays'> {
  format: 'packed-1';
  strings: string[];
  detailKeys: string[];
  trays: PackedTray[];
}

function unpackLegacy(p: RunResults | Packed1): RunResults {
  if (!('format' in p) || p.format !== 'packed-1') return p as RunResults;
  const { format: _f, strings, detailKeys, trays, ...rest } = p;
  const str = (i: number): string => strings[i]!;
  return {
    ...rest,
    trays: trays.map(([tray, section, controlling, checks, details, warnings]) => ({
      tray,
      sectionId: str(section),
      controllingCheck: str(controlling) as RunTrayResult['controllingCheck'],
      checks: Object.fromEntries(
        CHECK_NAMES.map((c, i) => {
          const [value, unit, limit, sense, percentOfLimit, status, method] = checks[i]!;
          const k: CheckResult = {
            value,
            unit: str(unit),
            limit,
            sense: str(sense) as CheckResult['sense'],
            percentOfLimit,
            status: str(status) as CheckResult['status'],
            method: str(method),
          };
          return [c, k];
        }),
      ) as RunTrayResult['checks'],
      details: Object.fromEntries(detailKeys.flatMap((k, i) => (details[i] === null ? [] : [[k, details[i]]]))) as TrayDetails,
      warnings,
    })),
  };
}

/** Results from the stored bytes: the binary form, or JSON text written before it. */
export function decodeResults(b: Buffer): RunResults {
  const raw = unpack(MAGIC, b);
  if (raw) return decodeBinary(raw);
  return unpackLegacy(JSON.parse(b.toString('utf8')) as RunResults | Packed1);
}

const JSON_MAGIC = Buffer.from('FRJ1', 'latin1');

/** Any JSON value as stored bytes: 'FRJ1' | Brotli(JSON). Used for the run snapshot. */
export function encodeJson(v: unknown): Buffer {
  return pack(JSON_MAGIC, Buffer.from(JSON.stringify(v), 'utf8'));
}

/** The value from encodeJson's bytes, or from plain UTF-8 JSON text (rows stored before compression). */
export function decodeJson<T>(b: Buffer): T {
  const text = (unpack(JSON_MAGIC, b) ?? b).toString('utf8');
  return JSON.parse(text) as T;
}

/** TypeORM transformer for the rating_runs.snapshot column (bytea). */
export const snapshotTransformer: ValueTransformer = {
  to: (v: unknown) => (v == null ? v : encodeJson(v)),
  from: (b: Buffer | null) => (b ? decodeJson(b) : b),
};

/** TypeORM transformer for the rating_runs.results column (bytea). */
export const resultsTransformer: ValueTransformer = {
  to: (r: RunResults | null | undefined) => (r ? encodeResults(r) : r),
  from: (b: Buffer | null) => (b ? decodeResults(b) : b),
};
