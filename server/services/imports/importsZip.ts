/**
 * Size check of an XLSX (a zip) before it is parsed: the central directory's entry count, each entry's
 * uncompressed size and compression ratio, and the total uncompressed size, read with yauzl without inflating
 * anything.
 *
 * The streaming reader then gets `checkedStream`: only the entries the directory lists, inflated by yauzl,
 * which stops with an error as soon as an entry inflates past the size the directory declared (so a zip whose
 * sizes lie, or that hides records the directory does not list, unpacks no further than the limits), and
 * passed on as stored (uncompressed) records. The worksheets come after every other part: exceljs's
 * WorkbookReader parses a worksheet as it arrives only once it has the shared strings and the workbook's
 * relations, and otherwise copies it to a temporary file, which stays behind when reading stops early.
 */
import { Readable } from 'node:stream';
import yauzl from 'yauzl';
import { DomainError } from '../../errors.js';

export const XLSX_LIMITS = {
  /** files in the workbook's zip (a tray-profile workbook holds 10–30) */
  entries: 500,
  /** uncompressed bytes of one file of the zip (a 5,000-row, 20-column sheet is about 5 MB) */
  entryBytes: 16 * 1024 * 1024,
  /** uncompressed bytes of all files */
  totalBytes: 40 * 1024 * 1024,
  /** uncompressed / compressed size of one file over 1 MB (sheet XML deflates 5–30 times; bombs ~1000 times) */
  ratio: 200,
  ratioFromBytes: 1024 * 1024,
} as const;

const MB = (n: number) => `${(n / 1024 / 1024).toFixed(0)} MB`;

const refuse = (status: 413 | 422, message: string, detail: string) =>
  new DomainError(status, message, [{ path: 'file', message: detail }]);

export const unreadable = (why: string) => refuse(422, 'The XLSX file cannot be read', `is not a readable workbook (${why})`);

/** A zip whose directory passed the limits, kept open for `checkedStream`. */
export interface CheckedZip {
  zip: yauzl.ZipFile;
  entries: yauzl.Entry[];
  /** rejects (422, with the reason) when the checked stream stops at a bad entry, e.g. one larger than declared */
  failed: Promise<never>;
  fail: (why: string) => void;
}

/** Refuses (413 or 422, naming the fault) a workbook that would unpack past the limits; inflates nothing. */
export async function checkXlsxZip(buf: Buffer): Promise<CheckedZip> {
  let zip: yauzl.ZipFile;
  try {
    zip = await yauzl.fromBufferPromise(buf, { lazyEntries: true, validateEntrySizes: true, strictFileNames: false });
  } catch (e) {
    throw unreadable((e as Error).message);
  }
  if (zip.entryCount > XLSX_LIMITS.entries)
    throw refuse(
      413,
      'The workbook holds too many files',
      `holds ${zip.entryCount} files; at most ${XLSX_LIMITS.entries} are read`,
    );
  const entries: yauzl.Entry[] = [];
  let total = 0;
  try {
    for await (const e of zip.eachEntry()) {
      const name = e.fileName.slice(0, 100);
      if (e.isEncrypted())
        throw refuse(422, 'The workbook is encrypted', `"${name}" is encrypted; save the workbook without a password`);
      if (e.uncompressedSize > XLSX_LIMITS.entryBytes)
        throw refuse(
          413,
          'The workbook is too large when unpacked',
          `"${name}" unpacks to ${MB(e.uncompressedSize)}; at most ${MB(XLSX_LIMITS.entryBytes)} per part are read`,
        );
      const ratio = e.uncompressedSize / Math.max(e.compressedSize, 1);
      if (e.uncompressedSize > XLSX_LIMITS.ratioFromBytes && ratio > XLSX_LIMITS.ratio)
        throw refuse(
          413,
          'The workbook is compressed suspiciously far',
          `"${name}" unpacks to ${Math.round(ratio)} times its packed size; at most ${XLSX_LIMITS.ratio} times is read`,
        );
      total += e.uncompressedSize;
      if (total > XLSX_LIMITS.totalBytes)
        throw refuse(
          413,
          'The workbook is too large when unpacked',
          `unpacks to more than ${MB(XLSX_LIMITS.totalBytes)}; at most ${MB(XLSX_LIMITS.totalBytes)} are read`,
        );
      entries.push(e);
    }
  } catch (e) {
    zip.close();
    if (e instanceof DomainError) throw e;
    throw unreadable((e as Error).message);
  }
  let fail: (why: string) => void = () => undefined;
  const failed = new Promise<never>((_, reject) => (fail = (why) => reject(unreadable(why))));
  failed.catch(() => undefined); // only awaited while a stream is read
  return { zip, entries, failed, fail };
}

const SHEET = /^xl\/worksheets\/sheet\d+\.xml$/;

/** A local file header for a stored (uncompressed) entry of known size. */
function storedHeader(e: yauzl.Entry): Buffer {
  const name = Buffer.from(e.fileName, 'utf8');
  const h = Buffer.alloc(30);
  h.writeUInt32LE(0x04034b50, 0);
  h.writeUInt16LE(20, 4); // version needed
  h.writeUInt16LE(0x800, 6); // UTF-8 name
  h.writeUInt32LE(e.crc32, 14);
  h.writeUInt32LE(e.uncompressedSize, 18);
  h.writeUInt32LE(e.uncompressedSize, 22);
  h.writeUInt16LE(name.length, 26);
  return Buffer.concat([h, name]);
}

async function* records(z: CheckedZip): AsyncGenerator<Buffer> {
  const ordered = [...z.entries.filter((e) => !SHEET.test(e.fileName)), ...z.entries.filter((e) => SHEET.test(e.fileName))];
  try {
    for (const e of ordered) {
      yield storedHeader(e);
      if (e.uncompressedSize === 0) continue;
      // one chunk behind: an entry's last bytes go out only once yauzl has found it no longer than declared
      let held: Buffer | null = null;
      for await (const chunk of await z.zip.openReadStreamPromise(e)) {
        if (held) yield held;
        held = chunk as Buffer;
      }
      if (held) yield held;
    }
    const end = Buffer.alloc(22); // an empty end-of-directory record: the reader's signal that the zip ends
    end.writeUInt32LE(0x06054b50, 0);
    yield end;
  } catch (e) {
    // the reader now waits for the rest of the entry for ever: the caller stops waiting on `failed`
    z.fail((e as Error).message);
  } finally {
    z.zip.close();
  }
}

/** The checked entries as a stream of stored zip records, worksheets last (see the module comment). */
export const checkedStream = (z: CheckedZip): Readable => Readable.from(records(z));

/** Whether the zip holds a part of that name. */
export const hasPart = (z: CheckedZip, name: string): boolean => z.entries.some((e) => e.fileName === name);
