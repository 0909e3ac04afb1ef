import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { config } from '../../server/config.js';
import { makeUser, setupApp, TEST_PASSWORD, type TestContext } from '../helpers/app.js';

let ctx: TestContext;
beforeAll(async () => {
  config.loginRateLimit = 3; // this test file only; read by the limiter on each request
  ctx = await setupApp();
});
afterAll(() => ctx.close());

describe('sign-in rate limit', () => {
  it('does not count successful sign-ins (colleagues behind one office address)', async () => {
    const user = await makeUser(ctx.ds, 'viewer');
    const ok: number[] = [];
    for (let i = 0; i < 5; i++)
      ok.push((await request(ctx.app).post('/api/auth/sign-in').send({ email: user.email, password: TEST_PASSWORD })).status);
    expect(ok).toEqual([200, 200, 200, 200, 200]);
  });

  it('answers 429 with a clear message after too many attempts', async () => {
    const statuses: number[] = [];
    for (let i = 0; i < 5; i++)
      statuses.push(
        (await request(ctx.app).post('/api/auth/sign-in').send({ email: 'nobody@test.example', password: 'nope' })).status,
      );
    expect(statuses.slice(0, 3)).toEqual([401, 401, 401]);
    expect(statuses[4]).toBe(429);
  });
});
