/**
 * A minimal zip writer for crafted test workbooks (spreadsheet bombs): deflated entries whose data is made
 * chunk by chunk (so a 100 MB part never sits in the test's memory), with the option to declare a size other
 * than the real one in the local header and the central directory (the lie a crafted bomb tells).
 */
import { crc32, createDeflateRaw } from 'node:zlib';
import yauzl from 'yauzl';

export interface ZipPart {
  name: string;
  data: Buffer;
  crc: number;
  size: number;
  declaredSize?: number;
}

/** Deflates the chunks one after another (CRC and size counted on the way). */
export async function deflatePart(name: string, chunks: Iterable<Buffer>): Promise<ZipPart> {
  const z = createDeflateRaw({ level: 9 });
  const out: Buffer[] = [];
  z.on('data', (b: Buffer) => out.push(b));
  const done = new Promise((resolve) => z.on('end', resolve));
  let crc = 0;
  let size = 0;
  for (const c of chunks) {
    crc = crc32(c, crc);
    size += c.length;
    if (!z.write(c)) await new Promise((r) => z.once('drain', r));
  }
  z.end();
  await done;
  return { name, data: Buffer.concat(out), crc, size };
}

/** The parts of an existing zip (a workbook exceljs wrote), inflated and deflated again. */
export async function partsOf(buf: Buffer): Promise<ZipPart[]> {
  const zip = await yauzl.fromBufferPromise(buf, { lazyEntries: true });
  const parts: ZipPart[] = [];
  for await (const e of zip.eachEntry()) {
    const chunks: Buffer[] = [];
    for await (const c of await zip.openReadStreamPromise(e)) chunks.push(c as Buffer);
    parts.push(await deflatePart(e.fileName, [Buffer.concat(chunks)]));
  }
  return parts;
}

export function writeZip(parts: ZipPart[]): Buffer {
  const local: Buffer[] = [];
  const central: Buffer[] = [];
  let offset = 0;
  for (const p of parts) {
    const name = Buffer.from(p.name, 'utf8');
    const size = p.declaredSize ?? p.size;
    const h = Buffer.alloc(30);
    h.writeUInt32LE(0x04034b50, 0);
    h.writeUInt16LE(20, 4);
    h.writeUInt16LE(8, 8); // deflate
    h.writeUInt32LE(p.crc, 14);
    h.writeUInt32LE(p.data.length, 18);
    h.writeUInt32LE(size, 22);
    h.writeUInt16LE(name.length, 26);
    const c = Buffer.alloc(46);
    c.writeUInt32LE(0x02014b50, 0);
    c.writeUInt16LE(20, 4);
    c.writeUInt16LE(20, 6);
    c.writeUInt16LE(8, 10);
    c.writeUInt32LE(p.crc, 16);
    c.writeUInt32LE(p.data.length, 20);
    c.writeUInt32LE(size, 24);
    c.writeUInt16LE(name.length, 28);
    c.writeUInt32LE(offset, 42);
    local.push(h, name, p.data);
    central.push(c, name);
    offset += h.length + name.length + p.data.length;
  }
  const dir = Buffer.concat(central);
  const end = Buffer.alloc(22);
  end.writeUInt32LE(0x06054b50, 0);
  end.writeUInt16LE(parts.length, 8);
  end.writeUInt16LE(parts.length, 10);
  end.writeUInt32LE(dir.length, 12);
  end.writeUInt32LE(offset, 16);
  return Buffer.concat([...local, dir, end]);
}
