/**
 * FRB4: rating-run results (rating_runs.results) stored with the names of all their fields.
 *
 *   'FRB4' | Brotli( uint32LE header length | header JSON (UTF-8) | integers (uint16LE or uint32LE) | float64LE numbers )
 *
 * The header holds the string table and the shapes: a shape is the list of a record's fields in the order
 * they are stored, each as [name, kind]; the results, each tray, its map of checks, each check, its details
 * and each warning are records. A record is stored as its shape's index (an integer) and then its fields'
 * values by kind:
 *   number   a float64 (exact, NaN and ±Infinity included)       string   an integer, its string-table index
 *   boolean  an integer 0 or 1                                  null     nothing
 *   record   a record (its shape index, then its fields)
 *   numbers / strings / records   an integer count, then each element as above
 *   json     any other value (mixed arrays, class instances): its JSON text, as a string
 * Fields whose value is undefined are not stored. Shapes are found from the values as they are written, so
 * the reader needs no list of checks or fields: a check or field added or removed since a row was written
 * decodes by its name (absent when the row does not hold it, kept when today's code no longer knows it),
 * never shifted. Strings repeated from tray to tray are written once; per field, a string equal to the last
 * one written there costs no lookup.
 *
 * Frozen: stored rows and migrations (1764750000000) depend on these bytes. Change nothing that alters them;
 * a new layout gets a new file and magic, and a migration re-encodes the rows (DEVELOPERS.md "Stored runs").
 * Imports no application code.
 */
import { IS_LE, pack, unpack } from './brotli.js';

export const FRB4 = Buffer.from('FRB4', 'latin1');

const KINDS = ['number', 'string', 'boolean', 'null', 'record', 'numbers', 'strings', 'records', 'json'] as const;
export type FieldKind = (typeof KINDS)[number];
const NUMBER = 0;
const STRING = 1;
const BOOLEAN = 2;
const NULL = 3;
const RECORD = 4;
const NUMBERS = 5;
const STRINGS = 6;
const RECORDS = 7;
const JSON_TEXT = 8;

interface Header {
  strings: string[];
  shapes: [name: string, kind: FieldKind][][];
  intBytes: 2 | 4;
  intCount: number;
}

/**
 * A field at its place in a shape (the fields before it are its parents'); a record's shape is the node
 * its last field reaches. The tree outlives an encoding (shapes are found once, not per run); what belongs
 * to one encoding (shape and string indices) carries that encoding's number.
 */
class Node {
  /** the shape ending here, as the header lists it, and its JSON, found once */
  fields: Header['shapes'][number] | undefined;
  key = '';
  shape = 0;
  shapeOf = 0;
  lastKey: string | undefined;
  lastKind = -1;
  lastNext: Node | undefined;
  next: Map<string, Node[]> | undefined;
  /** the last string written for this field in encoding `stringOf`, and its index */
  lastString: string | undefined;
  lastIndex = 0;
  stringOf = 0;
  /** root of the shapes of records held by this field (a record, or the elements of a list) */
  child: Node | undefined;
  constructor(
    readonly parent: Node | undefined,
    readonly name: string,
    readonly kind: number,
  ) {
    nodeCount++;
  }
}

/** The shape tree; started afresh if results ever bring unbounded field names (keys made from data). */
let nodeCount = 0;
let tree = new Node(undefined, '', -1);
let encoding = 0;

function isPlain(v: object): boolean {
  const p = Object.getPrototypeOf(v) as unknown;
  return p === Object.prototype || p === null;
}

function listKind(a: unknown[]): number {
  if (a.length === 0) return RECORDS;
  const t = typeof a[0];
  for (let k = 0; k < a.length; k++) {
    const v = a[k];
    if (typeof v !== t || (t === 'object' && (v === null || Array.isArray(v) || !isPlain(v as object)))) return JSON_TEXT;
  }
  return t === 'number' ? NUMBERS : t === 'string' ? STRINGS : t === 'object' ? RECORDS : JSON_TEXT;
}

/** Scratch space reused by every call (encoding is synchronous); grown when a result needs more. */
let ints = new Uint32Array(1 << 13);
let nums = new Float64Array(1 << 13);

/** One encoding: string table, shapes and the write positions. */
class Writer {
  i = 0;
  o = 0;
  maxInt = 0;
  readonly strings: string[] = [];
  readonly stringIndex = new Map<string, number>();
  readonly shapes: Header['shapes'] = [];
  readonly shapeIndex = new Map<string, number>();
  constructor(readonly encoding: number) {}

  int(x: number): void {
    if (this.i === ints.length) ints = grow(ints, new Uint32Array(ints.length * 2));
    if (x > this.maxInt) this.maxInt = x;
    ints[this.i++] = x;
  }

  num(x: number): void {
    if (this.o === nums.length) nums = grow(nums, new Float64Array(nums.length * 2));
    nums[this.o++] = x;
  }

  str(x: string, slot: Node): void {
    if (slot.lastString !== x || slot.stringOf !== this.encoding) {
      let k = this.stringIndex.get(x);
      if (k === undefined) this.stringIndex.set(x, (k = this.strings.push(x) - 1));
      slot.lastString = x;
      slot.lastIndex = k;
      slot.stringOf = this.encoding;
    }
    this.int(slot.lastIndex);
  }

  record(r: Record<string, unknown>, root: Node): void {
    const at = this.i;
    this.int(0);
    let node = root;
    for (const key in r) {
      const v = r[key];
      let kind: number;
      switch (typeof v) {
        case 'number':
          kind = NUMBER;
          break;
        case 'string':
          kind = STRING;
          break;
        case 'boolean':
          kind = BOOLEAN;
          break;
        case 'object':
          kind = v === null ? NULL : Array.isArray(v) ? listKind(v) : isPlain(v) ? RECORD : JSON_TEXT;
          break;
        default:
          continue; // undefined, functions and symbols: not stored (as in JSON)
      }
      node = node.lastKey === key && node.lastKind === kind ? node.lastNext! : step(node, key, kind);
      this.value(v, kind, node);
    }
    const shape = node.shapeOf === this.encoding ? node.shape : this.shapeOf(node);
    ints[at] = shape;
    if (shape > this.maxInt) this.maxInt = shape;
  }

  value(v: unknown, kind: number, node: Node): void {
    switch (kind) {
      case NUMBER:
        return this.num(v as number);
      case STRING:
        return this.str(v as string, node);
      case BOOLEAN:
        return this.int(v ? 1 : 0);
      case NULL:
        return;
      case RECORD:
        return this.record(v as Record<string, unknown>, (node.child ??= new Node(undefined, '', -1)));
      case JSON_TEXT:
        return this.str(JSON.stringify(v), node);
    }
    const a = v as unknown[];
    this.int(a.length);
    if (kind === NUMBERS) for (let k = 0; k < a.length; k++) this.num(a[k] as number);
    else if (kind === STRINGS) for (let k = 0; k < a.length; k++) this.str(a[k] as string, node);
    else {
      const root = (node.child ??= new Node(undefined, '', -1));
      for (let k = 0; k < a.length; k++) this.record(a[k] as Record<string, unknown>, root);
    }
  }

  shapeOf(end: Node): number {
    if (end.fields === undefined) {
      const fields: Header['shapes'][number] = [];
      for (let n: Node | undefined = end; n?.parent; n = n.parent) fields.push([n.name, KINDS[n.kind]!]);
      end.key = JSON.stringify(fields.reverse());
      end.fields = fields;
    }
    let s = this.shapeIndex.get(end.key);
    if (s === undefined) this.shapeIndex.set(end.key, (s = this.shapes.push(end.fields) - 1));
    end.shapeOf = this.encoding;
    return (end.shape = s);
  }
}

function step(node: Node, key: string, kind: number): Node {
  const byName = (node.next ??= new Map<string, Node[]>()).get(key);
  let next = byName?.find((n) => n.kind === kind);
  if (!next) {
    next = new Node(node, key, kind);
    if (byName) byName.push(next);
    else node.next.set(key, [next]);
  }
  node.lastKey = key;
  node.lastKind = kind;
  node.lastNext = next;
  return next;
}

function grow<T extends Uint32Array | Float64Array>(from: T, to: T): T {
  to.set(from);
  return to;
}

/** Any record of JSON-like values (here: RunResults) as FRB4 bytes. */
export function encodeFrb4(r: Record<string, unknown>): Buffer {
  if (nodeCount > 100_000) {
    nodeCount = 0;
    tree = new Node(undefined, '', -1);
  }
  const w = new Writer(++encoding);
  w.record(r, tree);
  const intBytes = w.maxInt <= 0xffff ? 2 : 4;
  const header: Header = { strings: w.strings, shapes: w.shapes, intBytes, intCount: w.i };
  const head = Buffer.from(JSON.stringify(header), 'utf8');
  const intLen = w.i * intBytes;
  const raw = Buffer.allocUnsafe(4 + head.length + intLen + w.o * 8);
  raw.writeUInt32LE(head.length, 0);
  head.copy(raw, 4);
  let at = 4 + head.length;
  const intView = intBytes === 2 ? Uint16Array.from(ints.subarray(0, w.i)) : ints.slice(0, w.i);
  const intBuf = Buffer.from(intView.buffer, intView.byteOffset, intLen);
  if (!IS_LE) {
    if (intBytes === 2) intBuf.swap16();
    else intBuf.swap32();
  }
  intBuf.copy(raw, at);
  at += intLen;
  const numBuf = Buffer.from(nums.buffer, 0, w.o * 8);
  if (!IS_LE) numBuf.swap64();
  numBuf.copy(raw, at);
  if (!IS_LE) numBuf.swap64(); // the scratch space, back as it was
  return pack(FRB4, raw);
}

/** The record from FRB4 bytes, or null when `b` is not FRB4. Throws when the bytes disagree with their header. */
export function decodeFrb4(b: Buffer): Record<string, unknown> | null {
  const raw = unpack(FRB4, b);
  if (!raw) return null;
  const headLen = raw.readUInt32LE(0);
  const h = JSON.parse(raw.toString('utf8', 4, 4 + headLen)) as Header;
  const { strings, intBytes, intCount } = h;
  const names = h.shapes.map((s) => s.map((f) => f[0]));
  const kinds = h.shapes.map((s) => s.map((f) => KINDS.indexOf(f[1])));
  const start = 4 + headLen;
  const ints = intBytes === 2 ? new Uint16Array(intCount) : new Uint32Array(intCount); // a copy: aligned
  const intBuf = Buffer.from(ints.buffer);
  raw.copy(intBuf, 0, start, start + intBuf.length);
  const numStart = start + intBuf.length;
  const nums = new Float64Array((raw.length - numStart) / 8);
  const numBuf = Buffer.from(nums.buffer);
  raw.copy(numBuf, 0, numStart);
  if (!IS_LE) {
    if (intBytes === 2) intBuf.swap16();
    else intBuf.swap32();
    numBuf.swap64();
  }
  let i = 0;
  let o = 0;
  const record = (): Record<string, unknown> => {
    const s = ints[i++]!;
    const n = names[s];
    const k = kinds[s]!;
    if (!n) throw new Error(`FRB4: shape ${s} is not in the header`);
    const r: Record<string, unknown> = {};
    for (let f = 0; f < n.length; f++) r[n[f]!] = value(k[f]!);
    return r;
  };
  const value = (kind: number): unknown => {
    switch (kind) {
      case NUMBER:
        return nums[o++];
      case STRING:
        return strings[ints[i++]!];
      case BOOLEAN:
        return ints[i++] === 1;
      case NULL:
        return null;
      case RECORD:
        return record();
      case JSON_TEXT:
        return JSON.parse(strings[ints[i++]!]!);
    }
    const a = new Array<unknown>(ints[i++]!);
    if (kind === NUMBERS) for (let k = 0; k < a.length; k++) a[k] = nums[o++];
    else if (kind === STRINGS) for (let k = 0; k < a.length; k++) a[k] = strings[ints[i++]!];
    else if (kind === RECORDS) for (let k = 0; k < a.length; k++) a[k] = record();
    else throw new Error(`FRB4: unknown field kind ${kind}`);
    return a;
  };
  const r = record();
  if (i !== intCount || o !== nums.length)
    throw new Error(
      `FRB4: the stored values do not match their header (${i}/${intCount} integers, ${o}/${nums.length} numbers read)`,
    );
  return r;
}
