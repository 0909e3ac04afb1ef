/**
 * Server-side sessions: one user_sessions row per sign-in, named by the token's jti. A token is accepted
 * only while its row is open (not revoked, before its absolute end) and its user active: checked with the
 * user read of every request (services/auth/users.ts, activeSessionUser), which the session cache keeps for a
 * few seconds. Revocations forget the cache, so they take effect at once in this process and within
 * SESSION_CACHE_MS in any other.
 */
import { randomUUID } from 'node:crypto';
import type { DataSource, EntityManager } from 'typeorm';
import { config } from '../../config.js';
import { forgetSessionUsers } from './sessionCache.js';

/** Opens a session for a user who just proved who they are; rows ended more than a day ago are tidied away. */
export async function openSession(ds: DataSource, userId: string): Promise<{ sessionId: string; endsAt: number }> {
  const sessionId = randomUUID();
  const endsAt = Math.floor(Date.now() / 1000) + Math.round(config.sessionMaxHours * 3600);
  await ds.query(
    `WITH tidy AS (DELETE FROM user_sessions WHERE user_id = $2 AND (expires_at < now() - interval '1 day' OR revoked_at < now() - interval '1 day'))
     INSERT INTO user_sessions (id, user_id, expires_at) VALUES ($1, $2, to_timestamp($3))`,
    [sessionId, userId, endsAt],
  );
  return { sessionId, endsAt };
}

/** Ends one session (sign-out). */
export async function closeSession(ds: DataSource, userId: string, sessionId: string): Promise<void> {
  forgetSessionUsers();
  await ds.query(`UPDATE user_sessions SET revoked_at = now() WHERE id = $1 AND user_id = $2 AND revoked_at IS NULL`, [
    sessionId,
    userId,
  ]);
  forgetSessionUsers();
}

/** Ends every open session of a user, except one (the caller's own, after a password change). */
export async function revokeUserSessions(
  em: EntityManager,
  userId: string,
  exceptSessionId: string | null = null,
): Promise<number> {
  const [, n] = await em.query<[unknown, number]>(
    `UPDATE user_sessions SET revoked_at = now() WHERE user_id = $1 AND revoked_at IS NULL AND ($2::uuid IS NULL OR id <> $2::uuid)`,
    [userId, exceptSessionId],
  );
  forgetSessionUsers();
  return n;
}
