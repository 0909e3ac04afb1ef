import { createSecretKey, type KeyObject } from 'node:crypto';
import jwt from 'jsonwebtoken';
import type { Request, Response } from 'express';
import { config } from '../config.js';
import type { SessionUser } from '../../shared/types/api.js';
import type { Role } from '../../shared/permissions.js';

export const SESSION_COOKIE = 'frothline_session';

// A ready key object: jsonwebtoken would otherwise try to parse the text secret as a public key on every call.
let key: { secret: string; obj: KeyObject } | null = null;
function secretKey(): KeyObject {
  if (key?.secret !== config.jwtSecret) {
    key = { secret: config.jwtSecret, obj: createSecretKey(Buffer.from(config.jwtSecret)) };
    verified.clear();
  }
  return key.obj;
}

/** A signed-in session as the token states it; whether it is still open is checked by the caller (services/auth/users.ts). */
export interface SessionClaims {
  userId: string;
  /** the user_sessions row (the token's jti) */
  sessionId: string;
  /** seconds since the epoch */
  issuedAt: number;
  /** absolute end of the session, seconds since the epoch: renewals never pass it */
  endsAt: number;
}

/**
 * Session tokens whose signature was checked with the current secret, with their claims. A token is
 * verified once; its expiry is checked on every use (as jsonwebtoken does: valid while now < exp), and
 * whether its session is still open and its user still active is checked by the caller every time.
 * Forged or expired tokens are never kept. Saves the HMAC, two JSON parses and the option checks of
 * jsonwebtoken on every API request.
 */
const verified = new Map<string, SessionClaims & { expiresAt: number }>();
const MAX_VERIFIED = 1000;

interface TokenClaims {
  sub: string;
  jti: string;
  role: Role;
  /** absolute end of the session (seconds) */
  end: number;
}

/** Sets the session cookie: valid for SESSION_MINUTES (sliding), never past the session's absolute end. */
export function issueSession(
  res: Response,
  user: { id: string; role: Role },
  session: { sessionId: string; endsAt: number },
): void {
  const nowSec = Math.floor(Date.now() / 1000);
  const life = Math.min(config.sessionMinutes * 60, session.endsAt - nowSec);
  if (life <= 0) return;
  const token = jwt.sign({ role: user.role, end: session.endsAt } satisfies Omit<TokenClaims, 'sub' | 'jti'>, secretKey(), {
    subject: user.id,
    jwtid: session.sessionId,
    expiresIn: life,
    algorithm: 'HS256',
  });
  res.cookie(SESSION_COOKIE, token, {
    httpOnly: true,
    sameSite: 'strict',
    secure: false, // served on loopback over http; put TLS in front for any shared deployment
    maxAge: life * 1000,
    path: '/',
  });
}

export function clearSession(res: Response): void {
  res.clearCookie(SESSION_COOKIE, { httpOnly: true, sameSite: 'strict', path: '/' });
}

/** Reads the session cookie; returns its claims, or null for a missing, expired or forged token. */
export function readSession(req: Request): SessionClaims | null {
  const token = (req.cookies as Record<string, string> | undefined)?.[SESSION_COOKIE];
  if (!token) return null;
  const k = secretKey();
  const nowSec = Math.floor(Date.now() / 1000);
  const hit = verified.get(token);
  if (hit) {
    if (nowSec < hit.expiresAt)
      return { userId: hit.userId, sessionId: hit.sessionId, issuedAt: hit.issuedAt, endsAt: hit.endsAt };
    verified.delete(token);
    return null;
  }
  try {
    const claims = jwt.verify(token, k, { algorithms: ['HS256'] }) as jwt.JwtPayload;
    if (typeof claims.sub !== 'string' || typeof claims.exp !== 'number') return null;
    if (typeof claims.jti !== 'string' || typeof claims.end !== 'number') return null;
    const session = { userId: claims.sub, sessionId: claims.jti, issuedAt: claims.iat ?? 0, endsAt: claims.end };
    if (verified.size >= MAX_VERIFIED) verified.delete(verified.keys().next().value as string);
    verified.set(token, { ...session, expiresAt: Math.min(claims.exp, claims.end) });
    return session;
  } catch {
    return null;
  }
}

/**
 * Sliding session: a request made after half of the token's life renews the cookie, so a user who keeps
 * working is not signed out mid-edit; an idle session still ends after SESSION_MINUTES, and every session
 * ends SESSION_MAX_HOURS after sign-in.
 */
export function renewSessionIfOld(
  res: Response,
  user: { id: string; role: Role },
  session: SessionClaims,
  nowMs = Date.now(),
): void {
  if (nowMs / 1000 - session.issuedAt > (config.sessionMinutes * 60) / 2) issueSession(res, user, session);
}

export type { SessionUser };
