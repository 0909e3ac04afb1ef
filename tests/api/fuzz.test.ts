/**
 * Malformed requests across every route of the route table, as every role and anonymously: odd ids,
 * query strings, bodies, headers and encodings. No answer may be a 5xx, and every 4xx carries an error.
 * FUZZ_SEED=<n> replays a run; FUZZ_RUNS=<n> changes the number of requests per route.
 */
import fc from 'fast-check';
import http from 'node:http';
import type { AddressInfo } from 'node:net';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { allRoutes } from '../../server/routes/index.js';
import { can, ROLES, type Role } from '../../shared/permissions.js';
import { makeUser, setupApp, TEST_PASSWORD, type TestContext } from '../helpers/app.js';
import { makePlant } from './columnsFixture.js';
import { fuzzRequest, type FuzzRequest } from './fuzzRequests.js';

const RUNS_PER_ROUTE = Number(process.env.FUZZ_RUNS ?? 40);
const SEED = Number(process.env.FUZZ_SEED ?? 20261204);
const CONCURRENCY = 4;

let ctx: TestContext;
let server: http.Server;
let ids: string[];
const cookies = {} as Record<Role, string>;

beforeAll(async () => {
  ctx = await setupApp();
  server = http.createServer(ctx.app).listen(0, '127.0.0.1');
  await new Promise((resolve) => server.once('listening', resolve));
  const plant = await makePlant(ctx.ds);
  ids = [plant.columnId, plant.siteId, plant.unitId];
  for (const role of ROLES) {
    const user = await makeUser(ctx.ds, role, [plant.siteId]);
    const res = await request(server).post('/api/auth/sign-in').send({ email: user.email, password: TEST_PASSWORD });
    if (res.status !== 200) throw new Error(`sign-in failed: ${res.status}`);
    cookies[role] = ([] as string[])
      .concat(res.headers['set-cookie'] ?? [])
      .map((c) => c.split(';')[0])
      .join('; ');
  }
});
afterAll(async () => {
  await new Promise((resolve) => server.close(resolve));
  await ctx.close();
});

async function send(req: FuzzRequest, cookie: string | null): Promise<request.Response> {
  const port = (server.address() as AddressInfo).port;
  let t = request(`http://127.0.0.1:${port}`)[req.method](req.url).timeout(15000);
  for (const [k, v] of Object.entries(req.headers)) t = t.set(k, v);
  if (cookie) t = t.set('Cookie', cookie);
  if (req.multipart) {
    for (const [k, v] of req.multipart.fields) t = t.field(k, v);
    for (const f of req.multipart.files) t = t.attach(f.field, f.data, f.name);
    return t;
  }
  return req.body === undefined ? t : t.send(req.body as string);
}

describe('no malformed request answers 5xx', () => {
  it('derives its routes from the route table', () => {
    expect(allRoutes.length).toBeGreaterThan(50);
  });

  for (const [index, r] of allRoutes.entries()) {
    // mostly a role the route admits (so the request reaches validation), sometimes another or none
    const allowed = ROLES.filter((role) => r.access === 'public' || r.access === 'signed-in' || can(role, r.access));
    // signing in or out with the fuzzers' sessions would end them: those routes get no session
    const sessionless = r.path.startsWith('/auth/sign');
    const who = fc.oneof(
      { weight: 6, arbitrary: fc.constantFrom<Role | null>(...(allowed.length ? allowed : ROLES)) },
      { weight: 1, arbitrary: fc.constantFrom<Role | null>(...ROLES, null) },
    );
    it(`${r.method.toUpperCase()} ${r.path}`, async () => {
      const cases = fc.sample(fc.tuple(fuzzRequest(r, ids), who), { numRuns: RUNS_PER_ROUTE, seed: SEED + index });
      const failures: string[] = [];
      // a few at a time: the server sees concurrent requests, and the suite stays fast on 2 cores
      for (let i = 0; i < cases.length; i += CONCURRENCY)
        await Promise.all(
          cases.slice(i, i + CONCURRENCY).map(async ([req, role]) => {
            const res = await send(req, role && !sessionless ? cookies[role] : null);
            const bad =
              res.status >= 500 || (res.status >= 400 && res.type === 'application/json' && typeof res.body.error !== 'string');
            if (bad)
              failures.push(
                `${res.status} ${JSON.stringify(res.body)} as ${role ?? 'anonymous'} for ${JSON.stringify(req).slice(0, 600)}`,
              );
          }),
        );
      expect(failures, `seed ${SEED + index}`).toEqual([]);
    });
  }
});
