/**
 * Frozen for migrations 1764670000000 (down) and 1764750000000: rating-run results in any form stored before
 * FRB4 (FRB3, FRB2, packed-1 JSON, JSON text), read with the check order of that time.
 */
import { decodeFrb2, decodeJsonResults } from './resultsBeforeFrb3.js';
import { decodeFrb3, type Frb3Results } from './resultsFrb3.js';

export function decodeResultsBeforeFrb4(b: Buffer): Frb3Results {
  const r = decodeFrb3(b) ?? decodeFrb2(b);
  if (r) return r;
  if (b[0] !== 0x7b) throw new Error(`results stored in an unknown form (bytes start 0x${b.subarray(0, 4).toString('hex')})`);
  return decodeJsonResults(b);
}
