/**
 * FRJ1: any JSON value as 'FRJ1' | Brotli(UTF-8 JSON). Used for the run snapshot (rating_runs.snapshot),
 * whose fields JSON names. Frozen: stored rows and migrations depend on these bytes.
 */
import { pack, unpack } from './brotli.js';

export const FRJ1 = Buffer.from('FRJ1', 'latin1');

export function encodeFrj1(v: unknown): Buffer {
  return pack(FRJ1, Buffer.from(JSON.stringify(v), 'utf8'));
}

/** The value from encodeFrj1's bytes, or null when `b` is not FRJ1. */
export function decodeFrj1<T>(b: Buffer): T | null {
  const raw = unpack(FRJ1, b);
  return raw ? (JSON.parse(raw.toString('utf8')) as T) : null;
}
