/**
 * Password change by the signed-in user (current password required; their other sessions end) and reset by
 * an administrator (a temporary password the user must change at next sign-in; all their sessions end).
 * Both apply the password policy (passwordPolicy.ts) and are audited without the password.
 */
import bcrypt from 'bcryptjs';
import type { DataSource } from 'typeorm';
import { config } from '../../config.js';
import { User } from '../../db/entities/User.js';
import { ConflictError, NotFoundError, ValidationError } from '../../errors.js';
import { audit } from '../audit/audit.js';
import { assertPasswordAcceptable } from './passwordPolicy.js';
import { revokeUserSessions } from './sessions.js';
import { toSessionUser, toUserRecord, userWrite } from './users.js';
import type { ChangePasswordBody, SessionUser, UserRecord } from '../../../shared/types/api.js';

export async function changeOwnPassword(
  ds: DataSource,
  userId: string,
  sessionId: string,
  body: ChangePasswordBody,
): Promise<SessionUser> {
  return userWrite(() =>
    ds.transaction(async (em) => {
      const user = await em.findOne(User, { where: { id: userId }, lock: { mode: 'pessimistic_write' } });
      if (!user) throw new NotFoundError('User');
      if (!(await bcrypt.compare(body.currentPassword, user.passwordHash)))
        throw new ValidationError('The current password is not correct', [
          { path: 'currentPassword', message: 'is not correct' },
        ]);
      if (body.newPassword === body.currentPassword)
        throw new ValidationError('The new password must differ from the current one', [
          { path: 'newPassword', message: 'is the same as the current password' },
        ]);
      assertPasswordAcceptable('newPassword', body.newPassword, [user.email, user.name]);
      user.passwordHash = await bcrypt.hash(body.newPassword, config.bcryptRounds);
      user.mustChangePassword = false;
      const saved = await em.save(User, user);
      const ended = await revokeUserSessions(em, userId, sessionId);
      await audit(em, userId, 'change-password', 'user', userId, { otherSessionsEnded: ended });
      return toSessionUser(saved);
    }),
  );
}

export async function resetPassword(ds: DataSource, actorId: string, userId: string, password: string): Promise<UserRecord> {
  if (actorId === userId)
    throw new ConflictError('Change your own password from the account menu (Change password); it asks for your current one');
  return userWrite(() =>
    ds.transaction(async (em) => {
      const user = await em.findOne(User, { where: { id: userId }, lock: { mode: 'pessimistic_write' } });
      if (!user) throw new NotFoundError('User');
      assertPasswordAcceptable('password', password, [user.email, user.name]);
      user.passwordHash = await bcrypt.hash(password, config.bcryptRounds);
      user.mustChangePassword = true;
      const saved = await em.save(User, user);
      const ended = await revokeUserSessions(em, userId);
      await audit(em, actorId, 'reset-password', 'user', userId, { sessionsEnded: ended });
      return toUserRecord(saved);
    }),
  );
}
