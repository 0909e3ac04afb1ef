/**
 * Signed-in users seen recently, so that an API request does not need a database round trip just to learn
 * that its user is still active and what role they have. Entries live SESSION_CACHE_MS at most; every write
 * to a user through the services forgets the cache (before and after the commit), so a deactivation or a
 * role change in this process takes effect at once. Another server process sharing the database would see
 * such a change within SESSION_CACHE_MS.
 */
import type { SessionUser } from '../../shared/types/api.js';

export const SESSION_CACHE_MS = 5000;
const MAX_ENTRIES = 1000;
const entries = new Map<string, { user: SessionUser; until: number }>();

export function cachedSessionUser(id: string, now = Date.now()): SessionUser | undefined {
  const e = entries.get(id);
  if (!e) return undefined;
  if (e.until > now) return e.user;
  entries.delete(id);
  return undefined;
}

export function rememberSessionUser(user: SessionUser, now = Date.now()): void {
  if (entries.size >= MAX_ENTRIES) entries.delete(entries.keys().next().value as string);
  entries.set(user.id, { user, until: now + SESSION_CACHE_MS });
}

/** Forget every cached user (after any write to users). */
export function forgetSessionUsers(): void {
  entries.clear();
}
