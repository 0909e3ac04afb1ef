/**
 * Lossless compact storage of run results: every per-tray check and detail becomes an array in a fixed
 * key order and repeated strings (units, senses, statuses, method ids, section ids) an index into one
 * string table. A 60-tray result shrinks about threefold, which is what a run insert mostly costs
 * (bench/api.ts). Numbers are kept exactly; unpack(pack(r)) deep-equals r.
 */
import type { ValueTransformer } from 'typeorm';
import { CHECK_NAMES, type CheckResult, type TrayDetails } from '../../shared/types/rating.js';
import type { RunResults, RunTrayResult } from '../../shared/types/runs.js';

const FORMAT = 'packed-1';
type PackedCheck = [number, number, number, number, number, number, number];
type PackedTray = [number, number, number, PackedCheck[], (number | null)[], RunTrayResult['warnings']];
interface Packed extends Omit<RunResults, 'trays'> {
  format: typeof FORMAT;
  strings: string[];
  detailKeys: string[];
  trays: PackedTray[];
}

export function packResults(r: RunResults): Packed {
  const strings: string[] = [];
  const index = new Map<string, number>();
  const s = (x: string): number => {
    let i = index.get(x);
    if (i === undefined) index.set(x, (i = strings.push(x) - 1));
    return i;
  };
  const detailKeys = [...new Set(r.trays.flatMap((t) => Object.keys(t.details)))];
  const trays = r.trays.map((t): PackedTray => {
    const checks = CHECK_NAMES.map((c): PackedCheck => {
      const k = t.checks[c];
      return [k.value, s(k.unit), k.limit, s(k.sense), k.percentOfLimit, s(k.status), s(k.method)];
    });
    return [t.tray, s(t.sectionId), s(t.controllingCheck), checks, detailKeys.map((k) => t.details[k] ?? null), t.warnings];
  });
  return { ...r, format: FORMAT, strings, detailKeys, trays };
}

export function unpackResults(p: RunResults | Packed): RunResults {
  if (!('format' in p) || p.format !== FORMAT) return p as RunResults;
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

/** TypeORM transformer for the rating_runs.results column. */
export const resultsTransformer: ValueTransformer = {
  to: (r: RunResults | null | undefined) => (r ? packResults(r) : r),
  from: (p: RunResults | Packed | null) => (p ? unpackResults(p) : p),
};
