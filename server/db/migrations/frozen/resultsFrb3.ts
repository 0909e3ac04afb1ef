/**
 * Frozen for migration 1764750000000 (RunResultsByName): the FRB3 layout of rating-run results as the
 * application wrote it until then (it was services/runsPack.ts), to read rows stored in it and, for the
 * migration's down, to write them back. Do not change: it must read the bytes written at that time. It
 * carries its own copy of the check order of that time (FRB3 stored checks by position, without names)
 * and refuses a row whose values do not fit that order instead of decoding it shifted.
 *
 *   'FRB3' | Brotli( uint32LE header length | header JSON (UTF-8) | integers (uint16LE or uint32LE) | float64LE numbers )
 * Per tray, the integers are: section, controlling check, number of warnings, per check [unit, sense,
 * status, method], then per warning [code, message, has a tray number], all string-table indices. The
 * numbers are, per tray: tray number, per check value, limit and percent of limit, every detail (NaN for an
 * absent one), then the tray number of each warning that has one.
 */
import { IS_LE, pack, unpack } from '../../codec/brotli.js';

export const FRB3 = Buffer.from('FRB3', 'latin1');

/** The checks, in the order FRB3, FRB2 and the packed-1 JSON form stored them. */
export const FRB3_CHECK_ORDER = [
  'jetFlood',
  'entrainment',
  'weeping',
  'pressureDrop',
  'weirLoading',
  'liquidLoad',
  'downcomerBackup',
  'downcomerInletVelocity',
  'downcomerResidenceTime',
  'downcomerSeal',
] as const;
const N_CHECKS = FRB3_CHECK_ORDER.length;

/** The results as they were then (the application's RunResults of that time). */
export interface Frb3Check {
  value: number;
  unit: string;
  limit: number;
  sense: string;
  percentOfLimit: number;
  status: string;
  method: string;
}
export interface Frb3Warning {
  code: string;
  message: string;
  tray?: number;
}
export interface Frb3Tray {
  tray: number;
  sectionId: string;
  controllingCheck: string;
  checks: Record<string, Frb3Check>;
  details: Record<string, number>;
  warnings: Frb3Warning[];
}
export const FRB3_SUMMARY_FIELDS = [
  'engineVersion',
  'sections',
  'uncoveredTrays',
  'controllingCheck',
  'controllingTray',
  'maxPercentOfLimit',
  'traysOver',
  'traysNear',
] as const;
export type Frb3Results = Record<(typeof FRB3_SUMMARY_FIELDS)[number], unknown> & { trays: Frb3Tray[] };

interface Header extends Record<(typeof FRB3_SUMMARY_FIELDS)[number], unknown> {
  strings: string[];
  detailKeys: string[];
  trayCount: number;
  intBytes: 2 | 4;
  intCount: number;
}

/** The results in FRB3 bytes, or null when `b` is not FRB3. Throws when the values do not fit the header. */
export function decodeFrb3(b: Buffer): Frb3Results | null {
  const raw = unpack(FRB3, b);
  if (!raw) return null;
  const headLen = raw.readUInt32LE(0);
  const h = JSON.parse(raw.toString('utf8', 4, 4 + headLen)) as Header;
  const { strings, detailKeys, trayCount, intBytes, intCount } = h;
  const start = 4 + headLen;
  const ints = intBytes === 2 ? new Uint16Array(intCount) : new Uint32Array(intCount);
  const intBuf = Buffer.from(ints.buffer);
  raw.copy(intBuf, 0, start, start + intBuf.length);
  const nums = new Float64Array((raw.length - start - intBuf.length) / 8);
  const numBuf = Buffer.from(nums.buffer);
  raw.copy(numBuf, 0, start + intBuf.length);
  if (!IS_LE) {
    if (intBytes === 2) intBuf.swap16();
    else intBuf.swap32();
    numBuf.swap64();
  }
  let i = 0;
  let o = 0;
  const str = (): string => {
    const s = strings[ints[i++]!];
    if (s === undefined || i > intCount)
      throw new Error(`FRB3: the stored values do not fit ${N_CHECKS} checks per tray (a string index outside the string table)`);
    return s;
  };
  const trays: Frb3Tray[] = [];
  for (let ti = 0; ti < trayCount; ti++) {
    const sectionId = str();
    const controllingCheck = str();
    const nWarnings = ints[i++]!;
    const tray = nums[o++]!;
    const checks: Record<string, Frb3Check> = {};
    for (const c of FRB3_CHECK_ORDER) {
      checks[c] = {
        value: nums[o]!,
        unit: str(),
        limit: nums[o + 1]!,
        sense: str(),
        percentOfLimit: nums[o + 2]!,
        status: str(),
        method: str(),
      };
      o += 3;
    }
    const details: Record<string, number> = {};
    for (const k of detailKeys) {
      const x = nums[o++]!;
      if (!Number.isNaN(x)) details[k] = x;
    }
    const warnings: Frb3Warning[] = [];
    for (let wi = 0; wi < nWarnings; wi++) {
      const w: Frb3Warning = { code: str(), message: str() };
      if (ints[i++] === 1) w.tray = nums[o++]!;
      warnings.push(w);
    }
    trays.push({ tray, sectionId, controllingCheck, checks, details, warnings });
  }
  if (i !== intCount || o !== nums.length)
    throw new Error(
      `FRB3: the stored values do not fit ${N_CHECKS} checks per tray (${i}/${intCount} integers, ${o}/${nums.length} numbers read)`,
    );
  const r = { trays } as Frb3Results;
  for (const k of FRB3_SUMMARY_FIELDS) r[k] = h[k];
  return r;
}

/** Why `r` cannot be written as FRB3 without losing something, or null when it can. */
export function notFrb3(r: Record<string, unknown>): string | null {
  const extra = Object.keys(r).filter((k) => k !== 'trays' && !(FRB3_SUMMARY_FIELDS as readonly string[]).includes(k));
  if (extra.length) return `results fields ${extra.join(', ')}`;
  const checkFields = ['value', 'unit', 'limit', 'sense', 'percentOfLimit', 'status', 'method'];
  for (const t of r.trays as Record<string, unknown>[]) {
    const keys = Object.keys(t).filter((k) => t[k] !== undefined);
    if (keys.sort().join() !== 'checks,controllingCheck,details,sectionId,tray,warnings')
      return `tray ${String(t.tray)} fields ${keys.join(', ')}`;
    const checks = t.checks as Record<string, Record<string, unknown>>;
    if (Object.keys(checks).sort().join() !== [...FRB3_CHECK_ORDER].sort().join())
      return `tray ${String(t.tray)} checks ${Object.keys(checks).join(', ')}`;
    for (const [name, c] of Object.entries(checks))
      if (Object.keys(c).sort().join() !== [...checkFields].sort().join())
        return `tray ${String(t.tray)} check ${name} fields ${Object.keys(c).join(', ')}`;
    for (const [k, v] of Object.entries(t.details as Record<string, unknown>))
      if (typeof v !== 'number' || Number.isNaN(v)) return `tray ${String(t.tray)} detail ${k}`;
    for (const w of t.warnings as Record<string, unknown>[])
      if (Object.keys(w).some((k) => !['code', 'message', 'tray'].includes(k))) return `tray ${String(t.tray)} warning fields`;
  }
  return null;
}

/** FRB3 bytes of `r` (results that notFrb3 accepts), as the application wrote them. */
export function encodeFrb3(r: Frb3Results): Buffer {
  const strings: string[] = [];
  const index = new Map<string, number>();
  const s = (x: string): number => {
    let k = index.get(x);
    if (k === undefined) index.set(x, (k = strings.push(x) - 1));
    return k;
  };
  const keySet = new Set<string>();
  for (const t of r.trays) for (const k in t.details) keySet.add(k);
  const detailKeys = [...keySet];
  const ints: number[] = [];
  const nums: number[] = [];
  for (const t of r.trays) {
    ints.push(s(t.sectionId), s(t.controllingCheck), t.warnings.length);
    nums.push(t.tray);
    for (const c of FRB3_CHECK_ORDER) {
      const k = t.checks[c]!;
      nums.push(k.value, k.limit, k.percentOfLimit);
      ints.push(s(k.unit), s(k.sense), s(k.status), s(k.method));
    }
    for (const k of detailKeys) nums.push(t.details[k] ?? NaN);
    for (const w of t.warnings) {
      ints.push(s(w.code), s(w.message), w.tray === undefined ? 0 : 1);
      if (w.tray !== undefined) nums.push(w.tray);
    }
  }
  const intBytes = strings.length <= 0xffff && Math.max(0, ...r.trays.map((t) => t.warnings.length)) <= 0xffff ? 2 : 4;
  const header = {
    ...Object.fromEntries(FRB3_SUMMARY_FIELDS.map((k) => [k, r[k]])),
    strings,
    detailKeys,
    trayCount: r.trays.length,
    intBytes,
    intCount: ints.length,
  };
  const head = Buffer.from(JSON.stringify(header), 'utf8');
  const intView = intBytes === 2 ? Uint16Array.from(ints) : Uint32Array.from(ints);
  const intBuf = Buffer.from(intView.buffer);
  const numBuf = Buffer.from(Float64Array.from(nums).buffer);
  if (!IS_LE) {
    if (intBytes === 2) intBuf.swap16();
    else intBuf.swap32();
    numBuf.swap64();
  }
  const len = Buffer.alloc(4);
  len.writeUInt32LE(head.length, 0);
  return pack(FRB3, Buffer.concat([len, head, intBuf, numBuf]));
}
