/**
 * Readers for the forms run results were stored in before the current one (services/runsPack.ts writes
 * FRB3): the FRB2 binary layout, the 'packed-1' JSON array form and plain JSON text. Stored rows are never
 * rewritten, so these stay as long as such rows may exist.
 */
import { CHECK_NAMES, type CheckResult, type TrayDetails } from '../../shared/types/rating.js';
import type { RunResults, RunTrayResult } from '../../shared/types/runs.js';

/** Per tray: tray, section, controlling check, per check [unit, sense, status, method], warnings. */
type HeaderTrayV2 = [number, number, number, number[], RunTrayResult['warnings']];
interface HeaderV2 extends Omit<RunResults, 'trays'> {
  strings: string[];
  detailKeys: string[];
  trays: HeaderTrayV2[];
}

/** Float64 numbers stored little-endian, copied out of `raw` from `offset` (aligned, and ours to swap). */
export function readDoubles(raw: Buffer, offset: number): Float64Array {
  const nums = new Float64Array((raw.length - offset) / 8);
  const bytes = Buffer.from(nums.buffer);
  raw.copy(bytes, 0, offset);
  if (!IS_LE) bytes.swap64();
  return nums;
}
export const IS_LE = new Uint8Array(new Float64Array([1]).buffer)[7] === 0x3f;

/** FRB2: uint32LE header length | header JSON (per tray: tray, section, controlling, string indices, warnings) | float64LE numbers. */
export function decodeFrb2(raw: Buffer): RunResults {
  const headLen = raw.readUInt32LE(0);
  const { strings, detailKeys, trays, ...rest } = JSON.parse(raw.toString('utf8', 4, 4 + headLen)) as HeaderV2;
  const nums = readDoubles(raw, 4 + headLen);
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

/** JSON text rows: plain results, or the 'packed-1' array form. */
export function decodeJsonResults(text: string): RunResults {
  const p = JSON.parse(text) as RunResults | Packed1;
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
