import bcrypt from 'bcryptjs';
import type { DataSource } from 'typeorm';
import { config } from '../../config.js';
import { User } from '../../db/entities/User.js';
import { ConflictError, NotFoundError, UnauthorizedError } from '../../errors.js';
import { preparedQuery } from '../../db/prepared.js';
import { audit } from '../audit/audit.js';
import { assertPasswordAcceptable } from './passwordPolicy.js';
import { cachedSessionUser, forgetSessionUsers, rememberSessionUser } from './sessionCache.js';
import { revokeUserSessions } from './sessions.js';
import type { SessionClaims } from '../../http/auth.js';
import type { CreateUserBody, PreferencesBody, SessionUser, UpdateUserBody, UserRecord } from '../../../shared/types/api.js';

export const toSessionUser = (u: User): SessionUser => ({
  id: u.id,
  email: u.email,
  name: u.name,
  role: u.role,
  unitSystem: u.unitSystem,
  pressureDropUnit: u.pressureDropUnit,
  mustChangePassword: u.mustChangePassword,
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
 * The signed-in user of a request, if the session is still open and the user still active: from the
 * short-lived session cache, else one query that checks session and user together (services/auth/sessions.ts).
 */
export async function activeSessionUser(ds: DataSource, session: SessionClaims): Promise<SessionUser | null> {
  const hit = cachedSessionUser(session.sessionId);
  if (hit) return hit.id === session.userId ? hit : null;
  const rows = await preparedQuery<SessionUser>(
    ds,
    'frothline-session',
    `SELECT u.id, u.email, u.name, u.role, u.unit_system AS "unitSystem", u.pressure_drop_unit AS "pressureDropUnit", u.must_change_password AS "mustChangePassword"
       FROM user_sessions s JOIN users u ON u.id = s.user_id
      WHERE s.id = $1 AND s.user_id = $2 AND s.revoked_at IS NULL AND s.expires_at > now() AND u.active`,
    [session.sessionId, session.userId],
  );
  if (rows[0]) rememberSessionUser(session.sessionId, rows[0]);
  return rows[0] ?? null;
}

/** Run a write to users; the session cache is forgotten before it and again after its commit. */
export async function userWrite<T>(fn: () => Promise<T>): Promise<T> {
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
    assertPasswordAcceptable('password', body.password, [email, body.name]);
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
      const activeChanged = changes.active !== undefined && changes.active !== user.active;
      Object.assign(user, changes);
      const saved = await em.save(User, user);
      // deactivation ends every session, so a later reactivation revives none of them
      if (activeChanged) await revokeUserSessions(em, id);
      await audit(em, actorId, 'update', 'user', id, changes);
      return toUserRecord(saved);
    }),
  );
}

export async function setPreferences(ds: DataSource, userId: string, prefs: PreferencesBody): Promise<SessionUser> {
  return userWrite(() =>
    ds.transaction(async (em) => {
      await em.update(User, { id: userId }, prefs);
      await audit(em, userId, 'update', 'user-preferences', userId, prefs);
      const u = await em.findOneByOrFail(User, { id: userId });
      return toSessionUser(u);
    }),
  );
}
