/**
 * Lossless compact storage of run results (rating_runs.results, bytea). Layout of the stored bytes:
 *   'FRB3' | Brotli( uint32LE header length | header JSON (UTF-8) | integers (uint16LE or uint32LE) | float64LE numbers )
 * The header holds what is not per tray (summary fields, section results) and two tables: the strings
 * (units, senses, statuses, method ids, section ids, check names, warning codes and messages) and the
 * detail keys. Per tray, the integers are: section, controlling check, number of warnings, per check
 * [unit, sense, status, method], then per warning [code, message, has a tray number], all string-table
 * indices. The numbers are, per tray: tray number, per check value, limit and percent of limit, every
 * detail (NaN for an absent one), then the tray number of each warning that has one. Numbers stay binary
 * doubles, so they are exact and never go through text.
 *
 * Run creation is the busiest write of the API (bench/api.ts) and packing is a large part of it: only the
 * small header goes through JSON.stringify, strings repeated from tray to tray are written once, and a
 * 60-tray result goes from ~200 kB of JSON to ~9 kB. decodeResults(encodeResults(r)) deep-equals r.
 * Rows stored in earlier forms (FRB2, JSON text) are read by runsPackLegacy.ts.
 * The run snapshot (geometry, loads, methods) is stored as compressed JSON (encodeJson).
 */
import { brotliCompressSync, brotliDecompressSync, constants as zc } from 'node:zlib';
import type { ValueTransformer } from 'typeorm';
import { decodeFrb2, decodeJsonResults, IS_LE, readDoubles } from './runsPackLegacy.js';
import { CHECK_NAMES, type CheckResult, type EngineWarning, type TrayDetails } from '../../shared/types/rating.js';
import type { RunResults, RunTrayResult } from '../../shared/types/runs.js';

const MAGIC = Buffer.from('FRB3', 'latin1');
const MAGIC_V2 = Buffer.from('FRB2', 'latin1');

const brotliParams = (bytes: Buffer) => ({ [zc.BROTLI_PARAM_QUALITY]: 1, [zc.BROTLI_PARAM_SIZE_HINT]: bytes.length });

/**
 * magic | Brotli(bytes), quality 1: fast, and most of the size gain. Compressed on the event loop: a 60-tray
 * result takes ~0.1 ms here, where zlib's asynchronous form (a stream per call and a thread-pool hop) took
 * two to four times the CPU on a 2-core machine under load (bench/api.ts).
 */
function pack(magic: Buffer, bytes: Buffer): Buffer {
  return Buffer.concat([magic, brotliCompressSync(bytes, { params: brotliParams(bytes) })]);
}

/** The bytes packed behind `magic`, or null when `b` does not start with it. */
function unpack(magic: Buffer, b: Buffer): Buffer | null {
  return b.subarray(0, magic.length).equals(magic) ? brotliDecompressSync(b.subarray(magic.length)) : null;
}

const N_CHECKS = CHECK_NAMES.length;

interface Header extends Omit<RunResults, 'trays'> {
  strings: string[];
  detailKeys: string[];
  trayCount: number;
  intBytes: 2 | 4;
  intCount: number;
}

export function encodeResults(r: RunResults): Buffer {
  return pack(MAGIC, resultsLayout(r));
}

/** The uncompressed layout. Plain indexed loops: this runs once per stored run, on the request path. */
function resultsLayout(r: RunResults): Buffer {
  const strings: string[] = [];
  const index = new Map<string, number>();
  const s = (x: string): number => {
    let i = index.get(x);
    if (i === undefined) index.set(x, (i = strings.push(x) - 1));
    return i;
  };
  // the last string seen in each per-check slot and its index: units, senses and methods rarely change
  const lastString = new Array<string | undefined>(4 * N_CHECKS);
  const lastIndex = new Uint32Array(4 * N_CHECKS);
  const slot = (k: number, x: string): number => {
    if (lastString[k] === x) return lastIndex[k]!;
    lastString[k] = x;
    return (lastIndex[k] = s(x));
  };

  const trays = r.trays;
  const nTrays = trays.length;
  const keySet = new Set<string>();
  let nWarnings = 0;
  let nWarningTrays = 0;
  for (let ti = 0; ti < nTrays; ti++) {
    const t = trays[ti]!;
    for (const k in t.details) keySet.add(k);
    const ws = t.warnings;
    nWarnings += ws.length;
    for (let wi = 0; wi < ws.length; wi++) if (ws[wi]!.tray !== undefined) nWarningTrays++;
  }
  const detailKeys = [...keySet];
  const nDetails = detailKeys.length;
  const ints = new Uint32Array(nTrays * (3 + 4 * N_CHECKS) + 3 * nWarnings);
  const nums = new Float64Array(nTrays * (1 + 3 * N_CHECKS + nDetails) + nWarningTrays);
  let i = 0;
  let o = 0;
  for (let ti = 0; ti < nTrays; ti++) {
    const t = trays[ti]!;
    const ws = t.warnings;
    ints[i++] = s(t.sectionId);
    ints[i++] = s(t.controllingCheck);
    ints[i++] = ws.length;
    nums[o++] = t.tray;
    const checks = t.checks;
    for (let ci = 0; ci < N_CHECKS; ci++) {
      const k = checks[CHECK_NAMES[ci]!];
      nums[o++] = k.value ?? NaN;
      nums[o++] = k.limit ?? NaN;
      nums[o++] = k.percentOfLimit ?? NaN;
      ints[i++] = slot(4 * ci, k.unit);
      ints[i++] = slot(4 * ci + 1, k.sense);
      ints[i++] = slot(4 * ci + 2, k.status);
      ints[i++] = slot(4 * ci + 3, k.method);
    }
    const d = t.details as unknown as Record<string, number | undefined>;
    for (let j = 0; j < nDetails; j++) nums[o++] = d[detailKeys[j]!] ?? NaN;
    for (let wi = 0; wi < ws.length; wi++) {
      const w = ws[wi]!;
      ints[i++] = s(w.code);
      ints[i++] = s(w.message);
      ints[i++] = w.tray === undefined ? 0 : 1;
      if (w.tray !== undefined) nums[o++] = w.tray;
    }
  }
  const intBytes = strings.length <= 0xffff && nWarnings <= 0xffff ? 2 : 4;
  const intView = intBytes === 2 ? Uint16Array.from(ints) : ints;
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
    trayCount: nTrays,
    intBytes,
    intCount: ints.length,
  };
  const head = Buffer.from(JSON.stringify(header), 'utf8');
  const intBuf = Buffer.from(intView.buffer, intView.byteOffset, intView.byteLength);
  const numBuf = Buffer.from(nums.buffer);
  if (!IS_LE) {
    if (intBytes === 2) intBuf.swap16();
    else intBuf.swap32();
    numBuf.swap64(); // the arrays are ours
  }
  const raw = Buffer.allocUnsafe(4 + head.length + intBuf.length + numBuf.length);
  raw.writeUInt32LE(head.length, 0);
  head.copy(raw, 4);
  intBuf.copy(raw, 4 + head.length);
  numBuf.copy(raw, 4 + head.length + intBuf.length);
  return raw;
}

function decodeFrb3(raw: Buffer): RunResults {
  const headLen = raw.readUInt32LE(0);
  const h = JSON.parse(raw.toString('utf8', 4, 4 + headLen)) as Header;
  const { strings, detailKeys, trayCount, intBytes, intCount } = h;
  const start = 4 + headLen;
  const ints = intBytes === 2 ? new Uint16Array(intCount) : new Uint32Array(intCount); // a copy: aligned
  const intBuf = Buffer.from(ints.buffer);
  raw.copy(intBuf, 0, start, start + intBuf.length);
  if (!IS_LE) {
    if (intBytes === 2) intBuf.swap16();
    else intBuf.swap32();
  }
  const nums = readDoubles(raw, start + intBuf.length);
  let i = 0;
  let o = 0;
  const str = (): string => strings[ints[i++]!]!;
  const trays = new Array<RunTrayResult>(trayCount);
  for (let ti = 0; ti < trayCount; ti++) {
    const sectionId = str();
    const controllingCheck = str() as RunTrayResult['controllingCheck'];
    const nWarnings = ints[i++]!;
    const tray = nums[o++]!;
    const checks = {} as RunTrayResult['checks'];
    for (const c of CHECK_NAMES) {
      const k: CheckResult = {
        value: nums[o]!,
        unit: str(),
        limit: nums[o + 1]!,
        sense: str() as CheckResult['sense'],
        percentOfLimit: nums[o + 2]!,
        status: str() as CheckResult['status'],
        method: str(),
      };
      o += 3;
      checks[c] = k;
    }
    const details = {} as TrayDetails;
    for (const k of detailKeys) {
      const x = nums[o++]!;
      if (!Number.isNaN(x)) details[k] = x;
    }
    const warnings: EngineWarning[] = [];
    for (let wi = 0; wi < nWarnings; wi++) {
      const w: EngineWarning = { code: str(), message: str() };
      if (ints[i++] === 1) w.tray = nums[o++]!;
      warnings.push(w);
    }
    trays[ti] = { tray, sectionId, controllingCheck, checks, details, warnings };
  }
  return {
    engineVersion: h.engineVersion,
    trays,
    sections: h.sections,
    uncoveredTrays: h.uncoveredTrays,
    controllingCheck: h.controllingCheck,
    controllingTray: h.controllingTray,
    maxPercentOfLimit: h.maxPercentOfLimit,
    traysOver: h.traysOver,
    traysNear: h.traysNear,
  };
}

/** Results from the stored bytes: the current layout, or any earlier form (runsPackLegacy.ts). */
export function decodeResults(b: Buffer): RunResults {
  const raw = unpack(MAGIC, b);
  if (raw) return decodeFrb3(raw);
  const v2 = unpack(MAGIC_V2, b);
  if (v2) return decodeFrb2(v2);
  return decodeJsonResults(b.toString('utf8'));
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
