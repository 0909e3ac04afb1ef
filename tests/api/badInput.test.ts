/** Malformed requests answer 4xx with `{ error, details: [{ path, message }] }`, never 5xx; API answers are never cached. */
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { setupApp, signedIn, type TestContext } from '../helpers/app.js';
import { loads, makePlant, type Plant } from './columnsFixture.js';

let ctx: TestContext;
let plant: Plant;
type Agent = Awaited<ReturnType<typeof signedIn>>['agent'];
let admin: Agent;
let engineer: Agent;
let inspector: Agent;
const FAKE = '00000000-0000-4000-8000-000000000000';

beforeAll(async () => {
  ctx = await setupApp();
  plant = await makePlant(ctx.ds);
  admin = (await signedIn(ctx, 'admin')).agent;
  engineer = (await signedIn(ctx, 'process-engineer', [plant.siteId])).agent;
  inspector = (await signedIn(ctx, 'inspector', [plant.siteId])).agent;
});
afterAll(() => ctx.close());

/** The usual 4xx error body, with a detail naming `path`. */
function expectFault(res: request.Response, status: number, path: string | RegExp): void {
  expect(res.status, JSON.stringify(res.body)).toBe(status);
  expect(res.body.error).toBeTypeOf('string');
  expect(res.body.details).toEqual(expect.arrayContaining([{ path: expect.stringMatching(path), message: expect.any(String) }]));
}

const json = (agent: Agent, url: string) => agent.post(url).set('Content-Type', 'application/json');

describe('malformed requests answer 4xx naming the fault', () => {
  it('ids: urn:uuid:, braces, truncated and badly percent-encoded ids', async () => {
    for (const id of [`urn:uuid:${FAKE}`, `{${FAKE}}`, FAKE.slice(0, 30), 'Infinity'])
      expectFault(await engineer.get(`/api/columns/${id}`), 400, 'id');
    expectFault(await engineer.get('/api/columns/%E0%A4%A'), 400, '(url)');
    expectFault(await engineer.get(`/api/runs?columnId=urn:uuid:${FAKE}`), 400, 'columnId');
  });

  it('charset and content encoding: unsupported ones are 415, a corrupt gzip or br body is 400', async () => {
    expectFault(
      await json(admin, '/api/sites').set('Content-Type', 'application/json; charset=klingon').send('{"name":"x"}'),
      415,
      'Content-Type',
    );
    expectFault(await json(admin, '/api/sites').set('Content-Encoding', 'zstd').send('{"name":"x"}'), 415, 'Content-Encoding');
    for (const enc of ['gzip', 'br', 'deflate'])
      expectFault(
        await json(admin, '/api/sites').set('Content-Encoding', enc).send(Buffer.from('not compressed')),
        400,
        'Content-Encoding',
      );
  });

  it('text: NUL, other control characters and lone surrogates are refused naming the field', async () => {
    for (const name of ['a\u0000b', 'bell\u0007', 'two\nlines', 'tab\there', 'x\ud800', '\udc00y']) {
      const res = await admin.post('/api/sites').send({ name, location: 'test' });
      expectFault(res, 400, /^name$/);
    }
    const res = await admin.post('/api/sites').send({ name: 'ok', location: 'a\u001bb' });
    expectFault(res, 400, /^location$/);
    expect(res.body.details[0].message).toMatch(/control character/);
  });

  it('multi-line text keeps its line breaks and tabs but not other control characters', async () => {
    const url = `/api/columns/${plant.columnId}/load-cases`;
    const base = { name: `Notes ${Date.now()}`, basis: 'normal', source: 'typed', loads: loads(1, 2) };
    const ok = await engineer.post(url).send({ ...base, notes: 'line one\r\nline two\twith a tab' });
    expect(ok.status, JSON.stringify(ok.body)).toBe(201);
    expectFault(await engineer.post(url).send({ ...base, name: 'other', notes: 'nul\u0000' }), 400, /^notes$/);
    expectFault(await engineer.post(url).send({ ...base, name: 'two\nlines' }), 400, /^name$/);
  });

  it('paging: huge, infinite, negative and non-numeric page numbers', async () => {
    for (const page of ['1e20', '99999999999999999999', 'Infinity', '-Infinity', 'NaN', '-1', '1.5'])
      expectFault(await engineer.get(`/api/columns?page=${page}`), 400, 'page');
    expectFault(await engineer.get('/api/runs?pageSize=1e400'), 400, 'pageSize');
  });

  it('photo upload: no boundary, the wrong field, two files, odd fields', async () => {
    const url = `/api/inspections/${FAKE}/photos`;
    const png = Buffer.from('89504e470d0a1a0a', 'hex');
    expectFault(await inspector.post(url).set('Content-Type', 'multipart/form-data').send('x'), 400, '(form)');
    expectFault(await inspector.post(url).attach('file', png, 'a.png'), 400, 'file');
    const two = await inspector.post(url).attach('photo', png, 'a.png').attach('photo', png, 'b.png');
    expectFault(two, 400, '(form)');
    expect(two.body.details[0].message).toMatch(/one file/);
    expectFault(await inspector.post(url).field('caption', 'a\u0000b').attach('photo', png, 'a.png'), 400, 'caption');
    const cut = '--b\r\nContent-Disposition: form-data; name="photo"; filename="a.png"\r\n\r\nabc';
    expectFault(await inspector.post(url).set('Content-Type', 'multipart/form-data; boundary=b').send(cut), 400, '(form)');
  });

  it('import upload: no boundary, the wrong field, two files', async () => {
    const url = `/api/columns/${plant.columnId}/imports`;
    const csv = Buffer.from('Tray,Vapour\n1,2\n');
    expectFault(await engineer.post(url).set('Content-Type', 'multipart/form-data').send('x'), 400, '(form)');
    expectFault(await engineer.post(url).attach('photo', csv, 'a.csv'), 400, 'photo');
    const two = await engineer.post(url).attach('file', csv, 'a.csv').attach('file', csv, 'b.csv');
    expect(two.status).toBe(400);
    expect(two.body.details[0].message).toMatch(/one file/);
  });
});

describe('unique names under concurrency', () => {
  it('simultaneous creates of one name give one 201 and 409s naming the field, never 500', async () => {
    const name = `Race site ${Date.now()}`;
    const answers = await Promise.all(Array.from({ length: 6 }, () => admin.post('/api/sites').send({ name, location: 'test' })));
    const statuses = answers.map((a) => a.status).sort();
    expect(statuses).toEqual([201, 409, 409, 409, 409, 409]);
    for (const a of answers.filter((x) => x.status === 409)) expect(a.body.details[0].path).toBe('name');
  });
});

describe('Cache-Control: no-store on every API answer', () => {
  it('records, lists, exports, errors and the health check', async () => {
    const lc = await engineer
      .post(`/api/columns/${plant.columnId}/load-cases`)
      .send({ name: `Export ${Date.now()}`, basis: 'normal', source: 'typed', loads: loads(1, 3) });
    const answers = await Promise.all([
      engineer.get(`/api/columns/${plant.columnId}`),
      engineer.get('/api/columns'),
      engineer.get(`/api/load-cases/${lc.body.id}/export?format=csv`),
      engineer.get(`/api/load-cases/${lc.body.id}/export?format=xlsx`),
      engineer.get(`/api/columns/${FAKE}`),
      request(ctx.app).get('/api/auth/me'),
      request(ctx.app).get('/api/no-such-route'),
      request(ctx.app).get('/api/health'),
    ]);
    expect(answers.map((a) => a.status)).toEqual([200, 200, 200, 200, 404, 401, 404, 200]);
    for (const [i, a] of answers.entries()) expect(a.headers['cache-control'], `answer ${i}`).toBe('no-store');
  });
});
