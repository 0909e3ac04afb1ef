import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { config } from '../../server/config.js';
import { setupApp, type TestContext } from '../helpers/app.js';

let ctx: TestContext;
beforeAll(async () => {
  config.loginRateLimit = 3; // this test file only; read by the limiter on each request
  ctx = await setupApp();
});
afterAll(() => ctx.close());

describe('sign-in rate limit', () => {
  it('answers 429 with a clear message after too many attempts', async () => {
    const statuses: number[] = [];
    for (let i = 0; i < 5; i++) statuses.push((await request(ctx.app).post('/api/auth/sign-in').send({ email: 'nobody@test.example', password: 'nope' })).status);
    expect(statuses.slice(0, 3)).toEqual([401, 401, 401]);
    expect(statuses[4]).toBe(429);
  });
});
