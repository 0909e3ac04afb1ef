import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createApp } from '../../server/app.js';
import { setupApp, type TestContext } from '../helpers/app.js';

let ctx: TestContext;
beforeAll(async () => {
  ctx = await setupApp();
});
afterAll(() => ctx.close());

describe('unexpected errors', () => {
  it('answer 500 JSON with no stack trace or internal message', async () => {
    const app = createApp({
      ds: ctx.ds,
      serveClient: false,
      routes: [
        {
          method: 'get',
          path: '/boom',
          access: 'public',
          summary: 'test only',
          handler: () => {
            throw new Error('secret internal detail at /srv/app.ts:12');
          },
        },
      ],
    });
    const res = await request(app).get('/api/boom');
    expect(res.status).toBe(500);
    expect(res.body).toEqual({ error: 'Internal server error' });
    expect(JSON.stringify(res.body)).not.toMatch(/secret|\.ts:|at /);
  });
});
