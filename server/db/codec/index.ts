/**
 * How rating runs are stored: the database layer's codec, below the entities (RatingRun) and the services
 * that write runs in bulk (runsStore.ts). Results are written in the FRB4 layout (resultsFrb4.ts), which
 * names its checks and fields, and snapshots as FRJ1 compressed JSON (jsonFrj1.ts). Only these layouts are
 * read: rows stored in earlier ones were re-encoded by migration 1764750000000; other bytes are refused with
 * an error, never decoded as something else. Imports no application code.
 */
import type { ValueTransformer } from 'typeorm';
import type { RunResults } from '../../../shared/types/runs.js';
import { describeMagic } from './brotli.js';
import { decodeFrj1, encodeFrj1 } from './jsonFrj1.js';
import { decodeFrb4, encodeFrb4 } from './resultsFrb4.js';

function unknownLayout(what: string, b: Buffer): Error {
  return new Error(`${what} stored in an unknown layout (bytes start ${describeMagic(b)}): are the migrations applied?`);
}

/** Results as stored bytes (FRB4). decodeResults(encodeResults(r)) deep-equals r. */
export function encodeResults(r: RunResults): Buffer {
  return encodeFrb4(r);
}

/**
 * Results from stored bytes, by name: a check or field that the row does not hold is absent, one that the
 * code no longer knows is kept.
 */
export function decodeResults(b: Buffer): RunResults {
  const r = decodeFrb4(b);
  if (!r) throw unknownLayout('Run results', b);
  return r as unknown as RunResults;
}

/** Any JSON value as stored bytes (FRJ1). Used for the run snapshot. */
export function encodeJson(v: unknown): Buffer {
  return encodeFrj1(v);
}

export function decodeJson<T>(b: Buffer): T {
  const v = decodeFrj1<T>(b);
  if (v === null) throw unknownLayout('Run snapshot', b);
  return v;
}

/** TypeORM transformer for the rating_runs.snapshot column (bytea). */
export const snapshotTransformer: ValueTransformer = {
  to: (v: unknown) => (v == null ? v : encodeJson(v)),
  from: (b: Buffer | null): unknown => (b ? decodeJson(b) : b),
};

/** TypeORM transformer for a bytea column holding any JSON value as FRJ1 (heat_plans.results). */
export const compressedJsonTransformer: ValueTransformer = snapshotTransformer;

/** TypeORM transformer for the rating_runs.results column (bytea). */
export const resultsTransformer: ValueTransformer = {
  to: (r: RunResults | null | undefined) => (r ? encodeResults(r) : r),
  from: (b: Buffer | null) => (b ? decodeResults(b) : b),
};
