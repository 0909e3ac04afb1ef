import 'reflect-metadata';
import bcrypt from 'bcryptjs';
import jwt from 'jsonwebtoken';
import type { Express } from 'express';
import { randomUUID } from 'node:crypto';
import request from 'supertest';
import type { DataSource } from 'typeorm';
import { createApp } from '../../server/app.js';
import { config } from '../../server/config.js';
import { makeDataSource } from '../../server/db/data-source.js';
import { SiteMember } from '../../server/db/entities/SiteMember.js';
import { User } from '../../server/db/entities/User.js';
import type { Role } from '../../shared/permissions.js';

export interface TestContext {
  ds: DataSource;
  app: Express;
  close: () => Promise<void>;
}

/** The real app over the real (throwaway) PostgreSQL that npm test migrated. */
export async function setupApp(): Promise<TestContext> {
  const url = process.env.DATABASE_URL;
  if (!url) throw new Error('DATABASE_URL is not set: run the suite with npm test');
  const ds = makeDataSource(url);
  await ds.initialize();
  const app = createApp({ ds, serveClient: false });
  return { ds, app, close: () => ds.destroy() };
}

export const TEST_PASSWORD = 'test-password-123';
let hash: string | null = null;

/** A fresh user with a unique e-mail, optionally a member of some sites. */
export async function makeUser(ds: DataSource, role: Role, siteIds: string[] = []): Promise<User> {
  hash ??= await bcrypt.hash(TEST_PASSWORD, 10);
  const u = await ds
    .getRepository(User)
    .save({ email: `${role}-${randomUUID().slice(0, 8)}@test.example`, name: `Test ${role}`, role, passwordHash: hash });
  for (const siteId of siteIds) await ds.getRepository(SiteMember).insert({ siteId, userId: u.id });
  return u;
}

/** A supertest agent carrying a session cookie for a new user of the given role. */
export async function signedIn(
  ctx: TestContext,
  role: Role,
  siteIds: string[] = [],
): Promise<{ agent: ReturnType<typeof request.agent>; user: User }> {
  const user = await makeUser(ctx.ds, role, siteIds);
  const agent = request.agent(ctx.app);
  const res = await agent.post('/api/auth/sign-in').send({ email: user.email, password: TEST_PASSWORD });
  if (res.status !== 200) throw new Error(`sign-in failed: ${res.status} ${JSON.stringify(res.body)}`);
  return { agent, user };
}

/**
 * A session cookie made by hand: a user_sessions row ending `endsInSec` from now and a token issued
 * `ageSec` ago that expires `lifeSec` after issue (for tests of expiry and renewal).
 */
export async function sessionCookie(
  ds: DataSource,
  user: { id: string; role: Role },
  { ageSec = 0, lifeSec = config.sessionMinutes * 60, endsInSec = config.sessionMaxHours * 3600 } = {},
): Promise<string> {
  const sessionId = randomUUID();
  const now = Math.floor(Date.now() / 1000);
  await ds.query(`INSERT INTO user_sessions (id, user_id, expires_at) VALUES ($1, $2, to_timestamp($3))`, [
    sessionId,
    user.id,
    now + endsInSec,
  ]);
  const token = jwt.sign(
    { role: user.role, end: now + endsInSec, iat: now - ageSec, exp: now - ageSec + lifeSec },
    config.jwtSecret,
    {
      subject: user.id,
      jwtid: sessionId,
      algorithm: 'HS256',
    },
  );
  return `frothline_session=${token}`;
}
