/**
 * fast-check arbitraries for malformed API requests, derived from a route's definition (its path
 * parameters, query and body schemas): odd ids, query strings, bodies, headers and encodings.
 */
import fc from 'fast-check';
import { gzipSync } from 'node:zlib';
import type { RouteDef } from '../../server/http/route.js';

export interface FuzzRequest {
  method: RouteDef['method'];
  url: string;
  headers: Record<string, string>;
  body?: Buffer | string | object;
  /** multipart parts sent with supertest's attach/field */
  multipart?: { files: { field: string; name: string; data: Buffer }[]; fields: [string, string][] };
}

const FAKE_ID = '00000000-0000-4000-8000-000000000000';

/** encodeURIComponent, except that a lone surrogate (which it refuses) goes as its raw UTF-8-style bytes. */
const enc = (s: string): string => {
  try {
    return encodeURIComponent(s);
  } catch {
    return '%ED%A0%80';
  }
};

/** Text a careless or hostile client sends: control characters, lone surrogates, injections, huge numbers. */
const nastyText = fc.constantFrom(
  'a\u0000b',
  '\ud800',
  'x\udc00y',
  '\u0007bell',
  'tab\there',
  'line\nbreak',
  '\u202eevil',
  "' OR 1=1 --",
  '=HYPERLINK("http://x")',
  `urn:uuid:${FAKE_ID}`,
  '%E0%A4%A',
  '../../etc/passwd',
  '',
  ' ',
  'x'.repeat(5000),
  '1e400',
  'NaN',
  'Infinity',
  '-0',
  '9'.repeat(40),
);

const oddValue: fc.Arbitrary<unknown> = fc.oneof(
  nastyText,
  fc.string(),
  fc.integer(),
  fc.constantFrom(1e308, -1e308, 2 ** 53 + 1, -1, 0, 0.5, 2147483648, null, true, false),
  fc.double(),
  fc.array(fc.oneof(nastyText, fc.integer()), { maxLength: 4 }),
  fc.jsonValue({ maxDepth: 3 }),
);

/** Percent-encoded path segments: a real id, fakes, prefixed and truncated uuids, bad encodings. */
export function segment(realIds: string[]): fc.Arbitrary<string> {
  return fc.oneof(
    fc.constantFrom(...realIds, FAKE_ID),
    fc.constantFrom(
      `urn:uuid:${FAKE_ID}`,
      `{${FAKE_ID}}`,
      FAKE_ID.toUpperCase(),
      FAKE_ID.slice(0, 30),
      FAKE_ID.replace(/-/g, ''),
    ),
    fc.constantFrom(
      '%E0%A4%A',
      '%ZZ',
      '%',
      '%00',
      '%ED%A0%80',
      '%C0%AF',
      '..',
      '%2e%2e',
      '-1',
      '0',
      '99999999999999999999',
      'Infinity',
      'NaN',
      '1e5',
    ),
    fc.string({ maxLength: 40 }).map(enc),
  );
}

function schemaKeys(schema: object | undefined): string[] {
  return Object.keys((schema as { properties?: Record<string, unknown> } | undefined)?.properties ?? {});
}

/** A query string: the schema's keys (and others) with odd, repeated, nested or badly encoded values. */
function queryString(r: RouteDef): fc.Arbitrary<string> {
  const keys = [...schemaKeys(r.query), 'page', 'pageSize', 'format', 'x'];
  const pair = fc.tuple(
    fc.constantFrom(...keys),
    fc.oneof(nastyText.map(enc), fc.constantFrom('%E0%A4%A', '%', 'Infinity', '-Infinity', '1e999', '1e20', '-5', '[]', 'a&b')),
  );
  return fc.oneof(
    fc.array(pair, { maxLength: 4 }).map((ps) => ps.map(([k, v]) => `${k}=${v}`).join('&')),
    fc.constantFrom('page[a]=1', 'page=1&page=2', 'q[$ne]=1', '%E0%A4%A=1', '&&&', '=', 'columnId=urn:uuid:' + FAKE_ID),
  );
}

/** A JSON body: the schema's fields with odd values, random JSON, or nothing. */
function jsonBody(r: RouteDef): fc.Arbitrary<object | string> {
  const keys = schemaKeys(r.body);
  const fields = keys.length ? fc.dictionary(fc.constantFrom(...keys), oddValue, { maxKeys: keys.length }) : fc.constant({});
  return fc.oneof(
    fields,
    fc.jsonValue({ maxDepth: 3 }).map((v) => (typeof v === 'object' && v !== null ? v : { value: v })),
  );
}

const garbage = Buffer.from('not compressed at all');
const truncatedGzip = gzipSync(Buffer.from(JSON.stringify({ name: 'x'.repeat(200) }))).subarray(0, 20);

type BodyPart = Pick<FuzzRequest, 'headers' | 'body' | 'multipart'>;

/** Bodies with broken encodings, charsets, JSON and multipart forms. */
const rawBody: fc.Arbitrary<BodyPart> = fc.constantFrom<BodyPart>(
  { headers: { 'Content-Type': 'application/json', 'Content-Encoding': 'gzip' }, body: garbage },
  { headers: { 'Content-Type': 'application/json', 'Content-Encoding': 'gzip' }, body: truncatedGzip },
  { headers: { 'Content-Type': 'application/json', 'Content-Encoding': 'br' }, body: garbage },
  { headers: { 'Content-Type': 'application/json', 'Content-Encoding': 'deflate' }, body: garbage },
  { headers: { 'Content-Type': 'application/json', 'Content-Encoding': 'zstd' }, body: '{}' },
  { headers: { 'Content-Type': 'application/json', 'Content-Encoding': 'gzip, br' }, body: garbage },
  { headers: { 'Content-Type': 'application/json; charset=klingon' }, body: '{}' },
  { headers: { 'Content-Type': 'application/json; charset=utf-16' }, body: '{}' },
  { headers: { 'Content-Type': 'application/json' }, body: '{"a":' },
  { headers: { 'Content-Type': 'application/json' }, body: '"\\ud800"' },
  { headers: { 'Content-Type': 'application/json' }, body: '{"name":"\\u0000"}' },
  { headers: { 'Content-Type': 'application/json' }, body: '[]' },
  { headers: { 'Content-Type': 'application/json' }, body: 'null' },
  { headers: { 'Content-Type': 'text/plain' }, body: 'hello' },
  { headers: { 'Content-Type': 'application/x-www-form-urlencoded' }, body: 'a=%E0%A4%A&b[c]=1' },
  { headers: { 'Content-Type': 'multipart/form-data' }, body: 'no boundary' },
  {
    headers: { 'Content-Type': 'multipart/form-data; boundary=xyz' },
    body: '--xyz\r\nContent-Disposition: form-data; name="file"',
  },
  { headers: {}, multipart: { files: [{ field: 'wrong', name: 'a.png', data: garbage }], fields: [] } },
  {
    headers: {},
    multipart: {
      files: [
        { field: 'photo', name: 'a.png', data: garbage },
        { field: 'photo', name: 'b.png', data: garbage },
      ],
      fields: [],
    },
  },
  {
    headers: {},
    multipart: {
      files: [
        { field: 'file', name: 'a.csv', data: garbage },
        { field: 'file', name: 'b.csv', data: garbage },
      ],
      fields: [],
    },
  },
  {
    headers: {},
    multipart: {
      files: [{ field: 'file', name: 'a.xlsx', data: garbage }],
      fields: [
        ['tray', '\u0000'],
        ['caption', '\ud800'],
      ],
    },
  },
  {
    headers: {},
    multipart: {
      files: [{ field: 'photo', name: 'a.png', data: garbage }],
      fields: [
        ['tray', 'Infinity'],
        ['pass', '1e400'],
      ],
    },
  },
);

/** One malformed request to route `r`; `ids` are real record ids to put in the path now and then. */
export function fuzzRequest(r: RouteDef, ids: string[]): fc.Arbitrary<FuzzRequest> {
  const names = [...r.path.matchAll(/:(\w+)/g)].map((m) => m[1]!);
  return fc
    .record({
      segs: fc.tuple(...names.map(() => segment(ids))),
      query: fc.option(queryString(r), { freq: 2 }),
      body: fc.oneof(
        jsonBody(r).map((body): BodyPart => ({ headers: {}, body })),
        rawBody,
      ),
      accept: fc.constantFrom('application/json', '*/*', 'text/html', 'image/png'),
    })
    .map(({ segs, query, body, accept }) => {
      let i = 0;
      const path = r.path.replace(/:(\w+)/g, () => segs[i++]!);
      return {
        method: r.method,
        url: `/api${path}${query ? `?${query}` : ''}`,
        ...body,
        headers: { Accept: accept, ...body.headers },
      };
    });
}
