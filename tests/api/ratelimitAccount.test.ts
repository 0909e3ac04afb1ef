import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { config } from '../../server/config.js';
import { makeUser, setupApp, TEST_PASSWORD, type TestContext } from '../helpers/app.js';

let ctx: TestContext;
beforeAll(async () => {
  // this test file only; read by the limiters on each request
  config.loginRateLimit = 1000;
  config.loginAccountLimit = 3;
  ctx = await setupApp();
});
afterAll(() => ctx.close());

describe('sign-in throttling per account', () => {
  it('after too many failures for one account answers 429 with Retry-After, even with the right password; other accounts still sign in', async () => {
    const victim = await makeUser(ctx.ds, 'viewer');
    const other = await makeUser(ctx.ds, 'viewer');
    const attempt = (email: string, password: string) => request(ctx.app).post('/api/auth/sign-in').send({ email, password });
    const statuses: number[] = [];
    // the account is counted by its normalised e-mail, whatever its case
    for (const email of [victim.email, victim.email.toUpperCase(), victim.email])
      statuses.push((await attempt(email, 'wrong-password')).status);
    expect(statuses).toEqual([401, 401, 401]);
    const locked = await attempt(victim.email, TEST_PASSWORD);
    expect(locked.status).toBe(429);
    expect(locked.body.error).toMatch(/for this account/);
    expect(Number(locked.headers['retry-after'])).toBeGreaterThan(0);
    expect((await attempt(other.email, TEST_PASSWORD)).status).toBe(200);
  });

  it('wrong current passwords in a password change count too', async () => {
    const u = await makeUser(ctx.ds, 'viewer');
    const agent = request.agent(ctx.app);
    expect((await agent.post('/api/auth/sign-in').send({ email: u.email, password: TEST_PASSWORD })).status).toBe(200);
    const statuses: number[] = [];
    for (let i = 0; i < 4; i++)
      statuses.push(
        (
          await agent
            .post('/api/auth/password')
            .send({ currentPassword: 'guess-' + i, newPassword: 'Weir-crest Sparrow 41 gasket' })
        ).status,
      );
    expect(statuses).toEqual([400, 400, 400, 429]);
  });
});
