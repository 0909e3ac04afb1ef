/**
 * One contract per route: every route the app mounts has a contract with a declared answer, the OpenAPI
 * document carries each contract's request body and answers, and (NODE_ENV=test) an answer that breaks its
 * contract turns into a loud 500.
 */
import { Type } from '@sinclair/typebox';
import type { Express } from 'express';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createApp } from '../../server/app.js';
import { implement, type RouteDef } from '../../server/http/route.js';
import { allRoutes } from '../../server/routes/index.js';
import { route } from '../../shared/contract/route.js';
import { Obj } from '../../shared/contract/schema.js';
import { setupApp, type TestContext } from '../helpers/app.js';

/**
 * Routes still declared the old way (schemas in shared/schemas, no answer schema), converted feature by
 * feature. This list only shrinks: the test fails when a route here gains a contract or a new one lacks it.
 */
const NOT_YET_CONVERTED = new Set<string>([]);

let ctx: TestContext;
beforeAll(async () => {
  ctx = await setupApp();
});
afterAll(() => ctx.close());

interface Layer {
  route?: { path: string; methods: Record<string, boolean> };
  handle?: { stack?: Layer[] };
}

/** Every `METHOD /path` Express has mounted under the API router. */
function mounted(app: Express): string[] {
  const out: string[] = [];
  const walk = (stack: Layer[]): void => {
    for (const l of stack) {
      if (l.route) for (const m of Object.keys(l.route.methods)) out.push(`${m.toUpperCase()} ${l.route.path}`);
      else if (l.handle?.stack) walk(l.handle.stack);
    }
  };
  walk((app as unknown as { router: { stack: Layer[] } }).router.stack);
  return out;
}

const key = (r: { method: string; path: string }): string => `${r.method.toUpperCase()} ${r.path}`;

describe('every route has a contract', () => {
  it('each mounted route is a contract route with a declared answer (or still on the shrinking list)', () => {
    const byKey = new Map(allRoutes.map((r) => [key(r), r]));
    const missing: string[] = [];
    for (const k of mounted(ctx.app)) {
      if (k === 'GET /openapi.json') continue; // served beside the table, with its own contract (health.ts)
      const r = byKey.get(k);
      expect(r, `${k} is mounted but not in allRoutes`).toBeDefined();
      const ok = r?.contract !== undefined && r.contract.response !== undefined;
      if (!ok && !NOT_YET_CONVERTED.has(k)) missing.push(k);
      if (ok) expect(NOT_YET_CONVERTED.has(k), `${k} has a contract now: take it off NOT_YET_CONVERTED`).toBe(false);
    }
    expect(missing, 'routes without a contract (declare them in shared/contract/, see DEVELOPERS.md)').toEqual([]);
    expect(mounted(ctx.app).length).toBeGreaterThanOrEqual(allRoutes.length);
  });

  it('a contract route takes its method, path, access and schemas from the contract', () => {
    for (const r of allRoutes.filter((x) => x.contract)) {
      const c = r.contract!;
      expect([r.method, r.path, r.access, r.body, r.query, r.params]).toEqual([
        c.method,
        c.path,
        c.access,
        c.body,
        c.query,
        c.params,
      ]);
    }
  });

  it('the OpenAPI document has the request body and the answers of every contract', async () => {
    const doc = (await request(ctx.app).get('/api/openapi.json')).body as {
      paths: Record<
        string,
        Record<
          string,
          {
            requestBody?: { content: Record<string, unknown> };
            responses: Record<string, { content?: Record<string, { schema: unknown }> }>;
          }
        >
      >;
      components: { schemas: Record<string, unknown> };
    };
    expect(doc.components.schemas.Error).toMatchObject({ required: ['error'] });
    for (const r of allRoutes.filter((x) => x.contract)) {
      const c = r.contract!;
      const op = doc.paths['/api' + c.path.replace(/:(\w+)/g, '{$1}')]?.[c.method];
      expect(op, key(c)).toBeDefined();
      const success = String(c.status ?? (c.response === null ? 204 : 200));
      if (c.response !== null) expect(Object.keys(op!.responses[success]?.content ?? {}), key(c)).not.toEqual([]);
      const bad = c.otherResponses?.[400];
      expect(op!.responses['400']?.content?.['application/json']?.schema, key(c)).toEqual(
        bad ? JSON.parse(JSON.stringify(bad)) : { $ref: '#/components/schemas/Error' },
      );
      if (c.body) expect(Object.keys(op!.requestBody?.content ?? {}), key(c)).toEqual(['application/json']);
      if (c.form) expect(Object.keys(op!.requestBody?.content ?? {}), key(c)).toEqual(['multipart/form-data']);
    }
  });
});

describe('answers are checked against their contract in tests', () => {
  const shape = route({
    method: 'get',
    path: '/shape/:kind',
    access: 'public',
    summary: 'test only',
    params: Obj({ kind: Type.String() }),
    response: Obj({ n: Type.Integer(), at: Type.String({ format: 'date-time' }) }),
  });
  // the handler is typed by the contract; the casts make it break the contract on purpose
  const routes: RouteDef[] = [
    implement(shape)({
      handler: ({ params }) => {
        if (params.kind === 'good') return { n: 2, at: new Date(0) as unknown as string };
        if (params.kind === 'extra')
          return { n: 2, at: '1970-01-01T00:00:00.000Z', passwordHash: 'x' } as { n: number; at: string };
        if (params.kind === 'nan') return { n: NaN, at: '1970-01-01T00:00:00.000Z' };
        return { n: 'two' as unknown as number, at: 'yesterday' };
      },
    }),
  ];

  it('lets a matching answer through (a Date goes out as its ISO text)', async () => {
    const res = await request(createApp({ ds: ctx.ds, serveClient: false, routes })).get('/api/shape/good');
    expect(res.status).toBe(200);
    expect(res.body).toEqual({ n: 2, at: '1970-01-01T00:00:00.000Z' });
  });

  it.each([
    ['wrong', /n must be integer.*at must match format "date-time"|at must match format "date-time".*n must be integer/s],
    ['extra', /passwordHash is not an allowed field/],
    ['nan', /n must be integer/],
  ])('answers 500 naming each fault when the answer drifts (%s)', async (kind, fault) => {
    const res = await request(createApp({ ds: ctx.ds, serveClient: false, routes })).get(`/api/shape/${kind}`);
    expect(res.status).toBe(500);
    expect(res.body.error).toMatch(/breaks its contract/);
    expect(res.body.details.map((d: { message: string }) => d.message).join('; ')).toMatch(fault);
  });

  it('checks error answers too, and never runs when turned off (production)', async () => {
    const app = createApp({ ds: ctx.ds, serveClient: false, routes });
    const missing = await request(app).get('/api/no-such-route');
    expect(missing.status).toBe(404);
    expect(Object.keys(missing.body)).toEqual(['error']);
    const unchecked = await request(createApp({ ds: ctx.ds, serveClient: false, routes, checkAnswers: false })).get(
      '/api/shape/extra',
    );
    expect(unchecked.status).toBe(200);
    expect(unchecked.body.passwordHash).toBe('x');
  });
});
