import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it, vi } from 'vitest';
import { config } from '../../server/config.js';
import { makeUser, sessionCookie, setupApp, signedIn, TEST_PASSWORD, type TestContext } from '../helpers/app.js';

let ctx: TestContext;
beforeAll(async () => {
  ctx = await setupApp();
});
afterAll(() => ctx.close());

describe('sign-in and sessions', () => {
  it('sets an httpOnly, SameSite=Strict session cookie with a short lifetime', async () => {
    const u = await makeUser(ctx.ds, 'viewer');
    const res = await request(ctx.app).post('/api/auth/sign-in').send({ email: u.email, password: TEST_PASSWORD });
    expect(res.status).toBe(200);
    expect(res.body.user).toMatchObject({ email: u.email, role: 'viewer' });
    expect(res.body.user.passwordHash).toBeUndefined();
    const cookie = String(res.headers['set-cookie']);
    expect(cookie).toMatch(/frothline_session=/);
    expect(cookie).toMatch(/HttpOnly/);
    expect(cookie).toMatch(/SameSite=Strict/);
    const maxAge = Number(/Max-Age=(\d+)/.exec(cookie)?.[1]);
    expect(maxAge).toBe(config.sessionMinutes * 60);
    expect(maxAge).toBeLessThanOrEqual(3600);
  });

  it('refuses a wrong password with a clear message and no cookie', async () => {
    const u = await makeUser(ctx.ds, 'viewer');
    const res = await request(ctx.app).post('/api/auth/sign-in').send({ email: u.email, password: 'wrong-password' });
    expect(res.status).toBe(401);
    expect(res.body).toEqual({ error: 'E-mail or password is not correct' });
    expect(res.headers['set-cookie']).toBeUndefined();
  });

  it('validates the body and names the field', async () => {
    const res = await request(ctx.app).post('/api/auth/sign-in').send({ email: 'not-an-email', password: 'x', extra: 1 });
    expect(res.status).toBe(400);
    expect(res.body.error).toBe('Invalid body');
    const paths = res.body.details.map((d: { path: string }) => d.path);
    expect(paths).toContain('email');
    expect(paths).toContain('extra');
  });

  it('stores passwords as bcrypt hashes of cost at least 10', async () => {
    const { agent } = await signedIn(ctx, 'admin');
    const email = `new-${Date.now()}@test.example`;
    const created = await agent
      .post('/api/users')
      .send({ email, name: 'New Person', role: 'inspector', password: 'a-long-password' });
    expect(created.status).toBe(201);
    const rows = await ctx.ds.query<{ password_hash: string }[]>('SELECT password_hash FROM users WHERE email = $1', [email]);
    const cost = Number(rows[0]!.password_hash.split('$')[2]);
    expect(cost).toBeGreaterThanOrEqual(10);
  });

  it('signs out, after which the session is gone', async () => {
    const { agent } = await signedIn(ctx, 'viewer');
    expect((await agent.get('/api/auth/me')).status).toBe(200);
    expect((await agent.post('/api/auth/sign-out')).status).toBe(200);
    expect((await agent.get('/api/auth/me')).status).toBe(401);
  });

  it('renews the cookie on a request made after half of the session life (sliding session); not before', async () => {
    const u = await makeUser(ctx.ds, 'viewer');
    const life = config.sessionMinutes * 60;
    const old = await request(ctx.app)
      .get('/api/columns')
      .set('Cookie', await sessionCookie(ctx.ds, u, { ageSec: life * 0.6 }));
    expect(old.status).toBe(200);
    expect(String(old.headers['set-cookie'])).toMatch(/frothline_session=/);
    const young = await request(ctx.app)
      .get('/api/columns')
      .set('Cookie', await sessionCookie(ctx.ds, u, { ageSec: 60 }));
    expect(young.status).toBe(200);
    expect(young.headers['set-cookie']).toBeUndefined();
    const expired = await request(ctx.app)
      .get('/api/columns')
      .set('Cookie', await sessionCookie(ctx.ds, u, { ageSec: life + 60 }));
    expect(expired.status).toBe(401);
  });

  it('refuses a session token once it has expired, though it was accepted before', async () => {
    const u = await makeUser(ctx.ds, 'viewer');
    const cookie = await sessionCookie(ctx.ds, u, { lifeSec: 120 });
    expect((await request(ctx.app).get('/api/auth/me').set('Cookie', cookie)).status).toBe(200);
    vi.useFakeTimers({ toFake: ['Date'], now: Date.now() + 121_000 });
    try {
      expect((await request(ctx.app).get('/api/auth/me').set('Cookie', cookie)).status).toBe(401);
    } finally {
      vi.useRealTimers();
    }
    expect((await request(ctx.app).get('/api/auth/me').set('Cookie', cookie)).status).toBe(200);
  });

  it('refuses a forged token', async () => {
    const res = await request(ctx.app)
      .get('/api/auth/me')
      .set('Cookie', 'frothline_session=eyJhbGciOiJIUzI1NiJ9.eyJzdWIiOiJ4In0.bad');
    expect(res.status).toBe(401);
  });

  it('a deactivated user loses the session and cannot sign in', async () => {
    const { agent: admin } = await signedIn(ctx, 'admin');
    const { agent, user } = await signedIn(ctx, 'inspector');
    const res = await admin.patch(`/api/users/${user.id}`).send({ active: false, version: user.version });
    expect(res.status).toBe(200);
    expect(res.body.active).toBe(false);
    expect((await agent.get('/api/auth/me')).status).toBe(401);
    const again = await request(ctx.app).post('/api/auth/sign-in').send({ email: user.email, password: TEST_PASSWORD });
    expect(again.status).toBe(401);
    expect(again.body.error).toMatch(/deactivated/);
  });

  it('answers 409 on a stale user edit and overwrites nothing', async () => {
    const { agent: admin } = await signedIn(ctx, 'admin');
    const u = await makeUser(ctx.ds, 'viewer');
    expect((await admin.patch(`/api/users/${u.id}`).send({ name: 'First edit', version: u.version })).status).toBe(200);
    const stale = await admin.patch(`/api/users/${u.id}`).send({ name: 'Stale edit', version: u.version });
    expect(stale.status).toBe(409);
    expect(stale.body.error).toMatch(/changed by someone else/);
    const list = await admin.get('/api/users');
    expect(list.body.items.find((x: { id: string }) => x.id === u.id).name).toBe('First edit');
  });
});

describe('API conventions', () => {
  it('reports database reachability on /api/health', async () => {
    const res = await request(ctx.app).get('/api/health');
    expect(res.status).toBe(200);
    expect(res.body).toMatchObject({ status: 'ok', database: 'reachable' });
  });
  it('answers unknown API routes with 404 JSON', async () => {
    const res = await request(ctx.app).get('/api/no-such-thing');
    expect(res.status).toBe(404);
    expect(res.body.error).toMatch(/No API route/);
  });
  it('answers malformed JSON with 400 and oversize bodies with 413', async () => {
    const bad = await request(ctx.app).post('/api/auth/sign-in').set('Content-Type', 'application/json').send('{"email":');
    expect(bad.status).toBe(400);
    const big = await request(ctx.app)
      .post('/api/auth/sign-in')
      .send({ email: 'a@b.co', password: 'x'.repeat(2_000_000) });
    expect(big.status).toBe(413);
  });
  it('sets security headers (helmet)', async () => {
    const res = await request(ctx.app).get('/api/health');
    expect(res.headers['x-content-type-options']).toBe('nosniff');
    expect(res.headers['content-security-policy']).toMatch(/default-src 'self'/);
  });
  it('serves the OpenAPI document listing the routes', async () => {
    const res = await request(ctx.app).get('/api/openapi.json');
    expect(res.status).toBe(200);
    expect(res.body.paths['/api/users'].post.summary).toBeTruthy();
  });
});

describe('site access', () => {
  it('an admin grants a user a site, after which its columns are listed for that user', async () => {
    const { agent: admin } = await signedIn(ctx, 'admin');
    const { agent, user } = await signedIn(ctx, 'viewer');
    const sites = (await admin.get('/api/sites')).body.items as { id: string; name: string }[];
    expect(sites.length).toBeGreaterThan(0);
    const before = await agent.get('/api/columns');
    expect(before.body.total).toBe(0);
    const put = await admin.put(`/api/users/${user.id}/sites`).send({ siteIds: [sites[0]!.id] });
    expect(put.status).toBe(200);
    const after = await agent.get('/api/columns');
    expect(after.body.total).toBeGreaterThan(0);
    expect(after.body.items[0].siteName).toBe(sites[0]!.name);
  });
  it('refuses an unknown site, naming the field', async () => {
    const { agent: admin } = await signedIn(ctx, 'admin');
    const u = await makeUser(ctx.ds, 'viewer');
    const res = await admin.put(`/api/users/${u.id}/sites`).send({ siteIds: ['00000000-0000-4000-8000-000000000001'] });
    expect(res.status).toBe(400);
    expect(res.body.details[0].path).toBe('siteIds');
  });
});
