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
  if (key?.secret !== config.jwtSecret) key = { secret: config.jwtSecret, obj: createSecretKey(Buffer.from(config.jwtSecret)) };
  return key.obj;
}

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
  try {
    const claims = jwt.verify(token, secretKey(), { algorithms: ['HS256'] }) as jwt.JwtPayload;
    return typeof claims.sub === 'string' ? { userId: claims.sub, issuedAt: claims.iat ?? 0 } : null;
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
