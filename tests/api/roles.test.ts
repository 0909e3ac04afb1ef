import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { allRoutes } from '../../server/routes/index.js';
import { can, ROLES, type Role } from '../../shared/permissions.js';
import { setupApp, signedIn, type TestContext } from '../helpers/app.js';

let ctx: TestContext;
const agents = {} as Record<Role, ReturnType<typeof request.agent>>;
const FAKE_ID = '00000000-0000-4000-8000-000000000000';
const concrete = (path: string) => `/api${path.replace(/:(\w+)/g, FAKE_ID)}`;

beforeAll(async () => {
  ctx = await setupApp();
  for (const role of ROLES) agents[role] = (await signedIn(ctx, role)).agent;
});
afterAll(() => ctx.close());

describe('every API route declares its permission and enforces it', () => {
  it('the route list is not empty and each route has an access rule', () => {
    expect(allRoutes.length).toBeGreaterThan(5);
    for (const r of allRoutes) expect(r.access, `${r.method} ${r.path}`).toBeTruthy();
  });

  for (const r of allRoutes.filter((x) => x.access !== 'public')) {
    it(`${r.method.toUpperCase()} ${r.path} (${r.access}): 401 without a session, 403 for roles without it`, async () => {
      const url = concrete(r.path);
      const anon = await request(ctx.app)[r.method](url).send({});
      expect(anon.status, 'no session').toBe(401);
      expect(anon.body.error).toBeTypeOf('string');
      for (const role of ROLES) {
        const res = await agents[role][r.method](url).send({});
        const allowed = r.access === 'signed-in' || (r.access !== 'public' && can(role, r.access));
        if (allowed) expect([401, 403], `${role} is allowed`).not.toContain(res.status);
        else {
          expect(res.status, `${role} must be refused`).toBe(403);
          expect(res.body.error).toMatch(/role/i);
        }
      }
    });
  }
});
