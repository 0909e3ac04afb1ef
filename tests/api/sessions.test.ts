/** Sessions that end: sign-out, deactivation, absolute lifetime, password change and administrator reset. */
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it, vi } from 'vitest';
import { config } from '../../server/config.js';
import { SESSION_CACHE_MS } from '../../server/services/auth/sessionCache.js';
import { makeUser, sessionCookie, setupApp, signedIn, TEST_PASSWORD, type TestContext } from '../helpers/app.js';

let ctx: TestContext;
type Agent = Awaited<ReturnType<typeof signedIn>>['agent'];
let admin: Agent;
beforeAll(async () => {
  ctx = await setupApp();
  admin = (await signedIn(ctx, 'admin')).agent;
});
afterAll(() => ctx.close());

/** Signs in over HTTP and returns the session cookie itself, so that it can be replayed later. */
async function signIn(email: string, password = TEST_PASSWORD): Promise<string> {
  const res = await request(ctx.app).post('/api/auth/sign-in').send({ email, password });
  expect(res.status, JSON.stringify(res.body)).toBe(200);
  return String(res.headers['set-cookie']).split(';')[0]!;
}
const me = (cookie: string) => request(ctx.app).get('/api/auth/me').set('Cookie', cookie);
const STRONG = 'Weir-crest Sparrow 41 gasket';

describe('sign-out ends the session on the server', () => {
  it('a replay of the token after sign-out answers 401 at once, though the session was just cached', async () => {
    const u = await makeUser(ctx.ds, 'viewer');
    const cookie = await signIn(u.email);
    expect((await me(cookie)).status).toBe(200);
    const out = await request(ctx.app).post('/api/auth/sign-out').set('Cookie', cookie);
    expect(out.status).toBe(200);
    expect(String(out.headers['set-cookie'])).toMatch(/frothline_session=;/);
    expect((await me(cookie)).status).toBe(401);
    expect((await request(ctx.app).get('/api/columns').set('Cookie', cookie)).status).toBe(401);
  });

  it("ends only that session: the user's other sessions go on", async () => {
    const u = await makeUser(ctx.ds, 'viewer');
    const [a, b] = [await signIn(u.email), await signIn(u.email)];
    await request(ctx.app).post('/api/auth/sign-out').set('Cookie', a);
    expect((await me(a)).status).toBe(401);
    expect((await me(b)).status).toBe(200);
  });

  it('a session revoked by another server process is refused within the session cache time', async () => {
    const u = await makeUser(ctx.ds, 'viewer');
    const cookie = await signIn(u.email);
    expect((await me(cookie)).status).toBe(200);
    await ctx.ds.query(`UPDATE user_sessions SET revoked_at = now() WHERE user_id = $1`, [u.id]); // as another process would
    vi.useFakeTimers({ toFake: ['Date'], now: Date.now() + SESSION_CACHE_MS + 1 });
    try {
      expect((await me(cookie)).status).toBe(401);
    } finally {
      vi.useRealTimers();
    }
  });
});

describe('deactivation', () => {
  it('reactivating a user does not revive their old tokens', async () => {
    const u = await makeUser(ctx.ds, 'inspector');
    const cookie = await signIn(u.email);
    const off = await admin.patch(`/api/users/${u.id}`).send({ active: false, version: u.version });
    expect(off.status).toBe(200);
    const on = await admin.patch(`/api/users/${u.id}`).send({ active: true, version: off.body.version });
    expect(on.status).toBe(200);
    expect((await me(cookie)).status).toBe(401);
    expect((await me(await signIn(u.email))).status).toBe(200);
  });
});

describe('absolute session lifetime', () => {
  it('a sign-in opens a session that ends SESSION_MAX_HOURS later', async () => {
    const u = await makeUser(ctx.ds, 'viewer');
    await signIn(u.email);
    const [row] = await ctx.ds.query<{ s: string }[]>(
      `SELECT extract(epoch FROM expires_at - created_at) AS s FROM user_sessions WHERE user_id = $1`,
      [u.id],
    );
    expect(Number(row!.s)).toBeCloseTo(config.sessionMaxHours * 3600, -1);
  });

  it('renewal never carries a session past its end, and an ended session is refused though its token is young', async () => {
    const u = await makeUser(ctx.ds, 'viewer');
    const ending = await sessionCookie(ctx.ds, u, { ageSec: config.sessionMinutes * 60 * 0.8, endsInSec: 90 });
    const renewed = await me(ending);
    expect(renewed.status).toBe(200);
    const maxAge = Number(/Max-Age=(\d+)/.exec(String(renewed.headers['set-cookie']))?.[1]);
    expect(maxAge).toBeLessThanOrEqual(90);
    expect(maxAge).toBeGreaterThan(80);
    vi.useFakeTimers({ toFake: ['Date'], now: Date.now() + 91_000 });
    try {
      expect((await me(String(renewed.headers['set-cookie']).split(';')[0]!)).status).toBe(401);
    } finally {
      vi.useRealTimers();
    }
    const ended = await sessionCookie(ctx.ds, u, { endsInSec: -1 });
    expect((await me(ended)).status).toBe(401);
  });
});

describe('password change by the signed-in user', () => {
  const change = (cookie: string, currentPassword: string, newPassword: string) =>
    request(ctx.app).post('/api/auth/password').set('Cookie', cookie).send({ currentPassword, newPassword });
  const detail = (res: request.Response) => res.body.details?.[0] as { path: string; message: string };

  it('needs the current password and a new one the policy accepts, saying why not', async () => {
    const u = await makeUser(ctx.ds, 'viewer');
    const cookie = await signIn(u.email);
    const wrong = await change(cookie, 'not-my-password', STRONG);
    expect(wrong.status).toBe(400);
    expect(detail(wrong)).toEqual({ path: 'currentPassword', message: 'is not correct' });
    const short = await change(cookie, TEST_PASSWORD, 'Tr4y!deck');
    expect(detail(short)).toEqual({ path: 'newPassword', message: 'must be at least 12 characters long' });
    const common = await change(cookie, TEST_PASSWORD, 'password1234');
    expect(detail(common).path).toBe('newPassword');
    expect(detail(common).message).toMatch(/too easy to guess \(strength \d of 4, at least 3 needed\): .*commonly used password/);
    const own = await change(cookie, TEST_PASSWORD, `${u.email}1`);
    expect(detail(own).message).toMatch(/too easy to guess/);
    const long = await change(cookie, TEST_PASSWORD, 'ü'.repeat(40)); // 40 characters, 80 bytes
    expect(long.status).toBe(400);
    expect(detail(long)).toEqual({
      path: 'newPassword',
      message: expect.stringMatching(/80 bytes long in UTF-8; at most 72 bytes/),
    });
    expect((await request(ctx.app).post('/api/auth/sign-in').send({ email: u.email, password: TEST_PASSWORD })).status).toBe(200);
  });

  it('changes it, keeps this session and ends the others', async () => {
    const u = await makeUser(ctx.ds, 'viewer');
    const [mine, other] = [await signIn(u.email), await signIn(u.email)];
    const res = await change(mine, TEST_PASSWORD, STRONG);
    expect(res.status, JSON.stringify(res.body)).toBe(200);
    expect(res.body.user).toMatchObject({ id: u.id, mustChangePassword: false });
    expect((await me(mine)).status).toBe(200);
    expect((await me(other)).status).toBe(401);
    expect((await request(ctx.app).post('/api/auth/sign-in').send({ email: u.email, password: TEST_PASSWORD })).status).toBe(401);
    expect((await me(await signIn(u.email, STRONG))).status).toBe(200);
  });
});

describe('password reset by an administrator', () => {
  it('sets a temporary password: sessions end, the user must change it before anything else', async () => {
    const { agent: userAgent, user } = await signedIn(ctx, 'process-engineer');
    const weak = await admin.post(`/api/users/${user.id}/password`).send({ password: 'password12345' });
    expect(weak.status).toBe(400);
    expect(weak.body.details[0].path).toBe('password');
    const temp = 'Temporary Downcomer 7 bolt';
    const reset = await admin.post(`/api/users/${user.id}/password`).send({ password: temp });
    expect(reset.status, JSON.stringify(reset.body)).toBe(200);
    expect(reset.body.mustChangePassword).toBe(true);
    expect((await userAgent.get('/api/auth/me')).status).toBe(401);

    const cookie = await signIn(user.email, temp);
    const meRes = await me(cookie);
    expect(meRes.status).toBe(200);
    expect(meRes.body.user.mustChangePassword).toBe(true);
    const blocked = await request(ctx.app).get('/api/columns').set('Cookie', cookie);
    expect(blocked.status).toBe(403);
    expect(blocked.body.error).toMatch(/Change the temporary password/);
    const changed = await request(ctx.app)
      .post('/api/auth/password')
      .set('Cookie', cookie)
      .send({ currentPassword: temp, newPassword: STRONG });
    expect(changed.status).toBe(200);
    expect(changed.body.user.mustChangePassword).toBe(false);
    expect((await request(ctx.app).get('/api/columns').set('Cookie', cookie)).status).toBe(200);
  });

  it("refuses an administrator's own reset (409) and an unknown user (404)", async () => {
    const { agent, user } = await signedIn(ctx, 'admin');
    const own = await agent.post(`/api/users/${user.id}/password`).send({ password: STRONG });
    expect(own.status).toBe(409);
    expect(own.body.error).toMatch(/Change password/);
    expect((await admin.post('/api/users/6f1c2a9e-3b4d-4e5f-8a7b-9c0d1e2f3a4b/password').send({ password: STRONG })).status).toBe(
      404,
    );
  });

  it('a new user gets a password the policy accepts', async () => {
    const res = await admin
      .post('/api/users')
      .send({ email: `weak-${Date.now()}@test.example`, name: 'Weak Pass', role: 'viewer', password: 'qwertyuiop12' });
    expect(res.status).toBe(400);
    expect(res.body.details[0]).toMatchObject({ path: 'password', message: expect.stringMatching(/too easy to guess/) });
  });
});
