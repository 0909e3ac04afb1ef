/**
 * Magic-tagged Brotli bytes, shared by the stored layouts of this folder. Frozen: layouts written to the
 * database (and migrations that re-encode rows) depend on these bytes; a change here is a new layout.
 */
import { brotliCompressSync, brotliDecompressSync, constants as zc } from 'node:zlib';

/**
 * magic | Brotli(bytes), quality 1: fast, and most of the size gain. Compressed on the event loop: a 60-tray
 * result takes ~0.1 ms here, where zlib's asynchronous form (a stream per call and a thread-pool hop) took
 * two to four times the CPU on a 2-core machine under load (bench/api.ts).
 */
export function pack(magic: Buffer, bytes: Buffer): Buffer {
  const params = { [zc.BROTLI_PARAM_QUALITY]: 1, [zc.BROTLI_PARAM_SIZE_HINT]: bytes.length };
  return Buffer.concat([magic, brotliCompressSync(bytes, { params })]);
}

/** The bytes packed behind `magic`, or null when `b` does not start with it. */
export function unpack(magic: Buffer, b: Buffer): Buffer | null {
  return hasMagic(magic, b) ? brotliDecompressSync(b.subarray(magic.length)) : null;
}

export function hasMagic(magic: Buffer, b: Buffer): boolean {
  return b.subarray(0, magic.length).equals(magic);
}

/** The first four bytes as text when they look like a magic (for error messages), else their hex. */
export function describeMagic(b: Buffer): string {
  const head = b.subarray(0, 4);
  return /^[\x20-\x7e]{4}$/.test(head.toString('latin1')) ? `'${head.toString('latin1')}'` : `0x${head.toString('hex')}`;
}

/** true on little-endian machines; the layouts store integers and doubles little-endian. */
export const IS_LE = new Uint8Array(new Float64Array([1]).buffer)[7] === 0x3f;
