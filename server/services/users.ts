import bcrypt from 'bcryptjs';
import type { DataSource } from 'typeorm';
import { config } from '../config.js';
import { User } from '../db/entities/User.js';
import { ConflictError, NotFoundError, UnauthorizedError } from '../errors.js';
import { preparedQuery } from '../db/prepared.js';
import { audit } from './audit.js';
import { cachedSessionUser, forgetSessionUsers, rememberSessionUser } from './sessionCache.js';
import type { CreateUserBody, SessionUser, UpdateUserBody, UserRecord } from '../../shared/types/api.js';

export const toSessionUser = (u: User): SessionUser => ({
  id: u.id,
  email: u.email,
  name: u.name,
  role: u.role,
  unitSystem: u.unitSystem,
});

export const toUserRecord = (u: User): UserRecord => ({
  ...toSessionUser(u),
  active: u.active,
  createdAt: u.createdAt.toISOString(),
  version: u.version,
});

// A fixed hash compared against when the e-mail is unknown, so timing does not reveal which e-mails exist.
const DUMMY_HASH = bcrypt.hashSync('no-such-user-password', 10);

export async function signIn(ds: DataSource, email: string, password: string): Promise<User> {
  const user = await ds.getRepository(User).findOneBy({ email: email.toLowerCase() });
  const ok = await bcrypt.compare(password, user?.passwordHash ?? DUMMY_HASH);
  if (!user || !ok) throw new UnauthorizedError('E-mail or password is not correct');
  if (!user.active) throw new UnauthorizedError('This account has been deactivated; ask an administrator');
  return user;
}

/**
 * The signed-in user of a request, if still active: from the short-lived session cache, else one plain
 * query (services/sessionCache.ts).
 */
export async function activeSessionUser(ds: DataSource, id: string): Promise<SessionUser | null> {
  const hit = cachedSessionUser(id);
  if (hit) return hit;
  const rows = await preparedQuery<SessionUser>(
    ds,
    'frothline-session-user',
    `SELECT id, email, name, role, unit_system AS "unitSystem" FROM users WHERE id = $1 AND active`,
    [id],
  );
  if (rows[0]) rememberSessionUser(rows[0]);
  return rows[0] ?? null;
}

/** Run a write to users; the session cache is forgotten before it and again after its commit. */
async function userWrite<T>(fn: () => Promise<T>): Promise<T> {
  forgetSessionUsers();
  try {
    return await fn();
  } finally {
    forgetSessionUsers();
  }
}

export async function listUsers(ds: DataSource): Promise<UserRecord[]> {
  const users = await ds.getRepository(User).find({ order: { name: 'ASC' } });
  return users.map(toUserRecord);
}

export async function createUser(ds: DataSource, actorId: string | null, body: CreateUserBody): Promise<UserRecord> {
  const email = body.email.toLowerCase();
  return ds.transaction(async (em) => {
    if (await em.findOneBy(User, { email }))
      throw new ConflictError('A user with this e-mail already exists', [{ path: 'email', message: 'is already taken' }]);
    const passwordHash = await bcrypt.hash(body.password, config.bcryptRounds);
    const saved = await em.save(User, em.create(User, { email, name: body.name, role: body.role, passwordHash }));
    await audit(em, actorId, 'create', 'user', saved.id, { email, name: body.name, role: body.role });
    return toUserRecord(saved);
  });
}

export async function updateUser(ds: DataSource, actorId: string, id: string, body: UpdateUserBody): Promise<UserRecord> {
  return userWrite(() =>
    ds.transaction(async (em) => {
      const user = await em.findOne(User, { where: { id }, lock: { mode: 'pessimistic_write' } });
      if (!user) throw new NotFoundError('User');
      if (user.version !== body.version)
        throw new ConflictError('This user was changed by someone else since you loaded it; reload and apply your change again', [
          { path: 'version', message: `is ${body.version}, current is ${user.version}` },
        ]);
      if (id === actorId && (body.active === false || (body.role && body.role !== user.role)))
        throw new ConflictError('You cannot deactivate yourself or change your own role');
      const changes: Partial<User> = {};
      if (body.name !== undefined) changes.name = body.name;
      if (body.role !== undefined) changes.role = body.role;
      if (body.active !== undefined) changes.active = body.active;
      if (body.unitSystem !== undefined) changes.unitSystem = body.unitSystem;
      Object.assign(user, changes);
      const saved = await em.save(User, user);
      await audit(em, actorId, 'update', 'user', id, changes);
      return toUserRecord(saved);
    }),
  );
}

export async function setPreferences(ds: DataSource, userId: string, unitSystem: 'SI' | 'US'): Promise<SessionUser> {
  return userWrite(() =>
    ds.transaction(async (em) => {
      await em.update(User, { id: userId }, { unitSystem });
      await audit(em, userId, 'update', 'user-preferences', userId, { unitSystem });
      const u = await em.findOneByOrFail(User, { id: userId });
      return toSessionUser(u);
    }),
  );
}
