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

/**
 * Session tokens whose signature was checked with the current secret, with their claims. A token is
 * verified once; its expiry is checked on every use (as jsonwebtoken does: valid while now < exp), and
 * whether its user is still active is checked by the caller every time. Forged or expired tokens are never
 * kept. Saves the HMAC, two JSON parses and the option checks of jsonwebtoken on every API request.
 */
const verified = new Map<string, { userId: string; issuedAt: number; expiresAt: number }>();
const MAX_VERIFIED = 1000;

interface TokenClaims {
  sub: string;
  role: Role;
}

export function issueSession(res: Response, user: { id: string; role: Role }): void {
  const token = jwt.sign({ role: user.role } satisfies Omit<TokenClaims, 'sub'>, secretKey(), {
    subject: user.id,
    expiresIn: config.sessionMinutes * 60,
    algorithm: 'HS256',
  });
  res.cookie(SESSION_COOKIE, token, {
    httpOnly: true,
    sameSite: 'strict',
    secure: false, // served on loopback over http; put TLS in front for any shared deployment
    maxAge: config.sessionMinutes * 60 * 1000,
    path: '/',
  });
}

export function clearSession(res: Response): void {
  res.clearCookie(SESSION_COOKIE, { httpOnly: true, sameSite: 'strict', path: '/' });
}

/** Reads the session cookie; returns the user id and issue time, or null for a missing, expired or forged token. */
export function readSession(req: Request): { userId: string; issuedAt: number } | null {
  const token = (req.cookies as Record<string, string> | undefined)?.[SESSION_COOKIE];
  if (!token) return null;
  const k = secretKey();
  const nowSec = Math.floor(Date.now() / 1000);
  const hit = verified.get(token);
  if (hit) {
    if (nowSec < hit.expiresAt) return { userId: hit.userId, issuedAt: hit.issuedAt };
    verified.delete(token);
    return null;
  }
  try {
    const claims = jwt.verify(token, k, { algorithms: ['HS256'] }) as jwt.JwtPayload;
    if (typeof claims.sub !== 'string' || typeof claims.exp !== 'number') return null;
    const session = { userId: claims.sub, issuedAt: claims.iat ?? 0 };
    if (verified.size >= MAX_VERIFIED) verified.delete(verified.keys().next().value as string);
    verified.set(token, { ...session, expiresAt: claims.exp });
    return session;
  } catch {
    return null;
  }
}

/**
 * Sliding session: a request made after half of the session's life renews the cookie, so a user who keeps
 * working is not signed out mid-edit; an idle session still ends after SESSION_MINUTES.
 */
export function renewSessionIfOld(res: Response, user: { id: string; role: Role }, issuedAt: number, nowMs = Date.now()): void {
  if (nowMs / 1000 - issuedAt > (config.sessionMinutes * 60) / 2) issueSession(res, user);
}

export type { SessionUser };
