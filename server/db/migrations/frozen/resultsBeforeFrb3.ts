/**
 * Frozen for migration 1764750000000 (RunResultsByName): the forms rating-run results were stored in before
 * FRB3 (it was services/runsPackLegacy.ts): the FRB2 binary layout, the 'packed-1' JSON array form and plain
 * JSON text. Do not change: it must read the bytes written at that time. Checks were stored by position in
 * the order of that time (FRB3_CHECK_ORDER); a row whose values do not fit it is refused, not read shifted.
 */
import { IS_LE, unpack } from '../../codec/brotli.js';
import { FRB3_CHECK_ORDER, type Frb3Check, type Frb3Results, type Frb3Tray, type Frb3Warning } from './resultsFrb3.js';

const FRB2 = Buffer.from('FRB2', 'latin1');
const N_CHECKS = FRB3_CHECK_ORDER.length;

/** Per tray: tray, section, controlling check, per check [unit, sense, status, method], warnings. */
type HeaderTrayV2 = [number, number, number, number[], Frb3Warning[]];
interface HeaderV2 {
  strings: string[];
  detailKeys: string[];
  trays: HeaderTrayV2[];
  [summaryField: string]: unknown;
}

/** FRB2: uint32LE header length | header JSON | float64LE numbers (per tray: tray-level numbers of each check, details). */
export function decodeFrb2(b: Buffer): Frb3Results | null {
  const raw = unpack(FRB2, b);
  if (!raw) return null;
  const headLen = raw.readUInt32LE(0);
  const { strings, detailKeys, trays, ...rest } = JSON.parse(raw.toString('utf8', 4, 4 + headLen)) as HeaderV2;
  const nums = new Float64Array((raw.length - 4 - headLen) / 8);
  const numBuf = Buffer.from(nums.buffer);
  raw.copy(numBuf, 0, 4 + headLen);
  if (!IS_LE) numBuf.swap64();
  let o = 0;
  const get = (): number => nums[o++]!;
  const str = (i: number): string => {
    const s = strings[i];
    if (s === undefined) throw new Error('FRB2: a string index outside the string table');
    return s;
  };
  const out = trays.map(([tray, section, controlling, idx, warnings]): Frb3Tray => {
    if (idx.length !== 4 * N_CHECKS) throw new Error(`FRB2: tray ${tray} holds ${idx.length / 4} checks, not ${N_CHECKS}`);
    const checks: Record<string, Frb3Check> = {};
    FRB3_CHECK_ORDER.forEach((c, i) => {
      const [unit, sense, status, method] = idx.slice(4 * i, 4 * i + 4) as [number, number, number, number];
      checks[c] = {
        value: get(),
        unit: str(unit),
        limit: get(),
        sense: str(sense),
        percentOfLimit: get(),
        status: str(status),
        method: str(method),
      };
    });
    const details: Record<string, number> = {};
    for (const k of detailKeys) {
      const x = get();
      if (!Number.isNaN(x)) details[k] = x;
    }
    return { tray, sectionId: str(section), controllingCheck: str(controlling), checks, details, warnings };
  });
  if (o !== nums.length)
    throw new Error(`FRB2: the stored numbers do not fit ${N_CHECKS} checks per tray (${o}/${nums.length} read)`);
  return { ...rest, trays: out } as Frb3Results;
}

/** The 'packed-1' JSON array form of earlier rows. */
type PackedCheck = [number, number, number, number, number, number, number];
type PackedTray = [number, number, number, PackedCheck[], (number | null)[], Frb3Warning[]];
interface Packed1 {
  format: 'packed-1';
  strings: string[];
  detailKeys: string[];
  trays: PackedTray[];
  [summaryField: string]: unknown;
}

/** JSON text rows: plain results (named, read as they are), or the 'packed-1' array form. */
export function decodeJsonResults(b: Buffer): Frb3Results {
  const p = JSON.parse(b.toString('utf8')) as Frb3Results | Packed1;
  if (!('format' in p) || p.format !== 'packed-1') return p as Frb3Results;
  const { format: _f, strings, detailKeys, trays, ...rest } = p;
  const str = (i: number): string => strings[i]!;
  return {
    ...rest,
    trays: trays.map(([tray, section, controlling, checks, details, warnings]): Frb3Tray => {
      if (checks.length !== N_CHECKS) throw new Error(`packed-1: tray ${tray} holds ${checks.length} checks, not ${N_CHECKS}`);
      return {
        tray,
        sectionId: str(section),
        controllingCheck: str(controlling),
        checks: Object.fromEntries(
          FRB3_CHECK_ORDER.map((c, i) => {
            const [value, unit, limit, sense, percentOfLimit, status, method] = checks[i]!;
            return [
              c,
              { value, unit: str(unit), limit, sense: str(sense), percentOfLimit, status: str(status), method: str(method) },
            ];
          }),
        ),
        details: Object.fromEntries(
          detailKeys.flatMap((k, i) => (details[i] === null || details[i] === undefined ? [] : [[k, details[i]]])),
        ),
        warnings,
      };
    }),
  } as Frb3Results;
}
