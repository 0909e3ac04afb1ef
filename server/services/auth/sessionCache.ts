/**
 * Sessions seen recently, so that an API request does not need a database round trip just to learn that
 * its session is still open and its user still active, and what role they have. Keyed by session id;
 * entries live SESSION_CACHE_MS at most. Every write to a user through the services and every revocation
 * forgets the cache (before and after the commit), so a sign-out, password change, deactivation or role
 * change in this process takes effect at once. Another server process sharing the database sees such a
 * change within SESSION_CACHE_MS.
 */
import type { SessionUser } from '../../../shared/types/api.js';

export const SESSION_CACHE_MS = 5000;
const MAX_ENTRIES = 1000;
const entries = new Map<string, { user: SessionUser; until: number }>();

export function cachedSessionUser(sessionId: string, now = Date.now()): SessionUser | undefined {
  const e = entries.get(sessionId);
  if (!e) return undefined;
  if (e.until > now) return e.user;
  entries.delete(sessionId);
  return undefined;
}

export function rememberSessionUser(sessionId: string, user: SessionUser, now = Date.now()): void {
  if (entries.size >= MAX_ENTRIES) entries.delete(entries.keys().next().value as string);
  entries.set(sessionId, { user, until: now + SESSION_CACHE_MS });
}

/** Forget every cached session (after any write to users or sessions). */
export function forgetSessionUsers(): void {
  entries.clear();
}
