import { rateLimit } from 'express-rate-limit';
import type { Request, Response } from 'express';
import { config } from '../config.js';
import { ValidationError } from '../errors.js';
import { clearSession, issueSession, readSession, type SessionClaims } from '../http/auth.js';
import { defineRoutes } from '../http/route.js';
import { changeOwnPassword } from '../services/auth/passwords.js';
import { closeSession, openSession } from '../services/auth/sessions.js';
import { setPreferences, signIn, toSessionUser } from '../services/auth/users.js';
import { changePasswordBody, preferencesBody, signInBody } from '../../shared/schemas/auth.js';
import type { ChangePasswordBody, SignInBody } from '../../shared/types/api.js';

const WINDOW_MS = 15 * 60 * 1000;
// only failed attempts count: colleagues signing in from one office address must not lock each other out
const failures = { windowMs: WINDOW_MS, standardHeaders: 'draft-7', legacyHeaders: false, skipSuccessfulRequests: true } as const;

const signInLimiter = rateLimit({
  ...failures,
  limit: () => config.loginRateLimit,
  message: { error: 'Too many failed sign-in attempts from this address; wait 15 minutes and try again' },
});

/** Per account, whatever the address: guessing one user's password from many addresses is slowed too. */
const accountKey = (req: Request): string =>
  `account:${String((req.body as { email?: unknown } | undefined)?.email ?? '')
    .trim()
    .toLowerCase()}`;
const signInAccountLimiter = rateLimit({
  ...failures,
  limit: () => config.loginAccountLimit,
  keyGenerator: accountKey,
  message: { error: 'Too many failed sign-in attempts for this account; wait 15 minutes and try again' },
});

/** Current-password checks of a signed-in user count against the same per-account allowance. */
const passwordChangeLimiter = rateLimit({
  ...failures,
  limit: () => config.loginAccountLimit,
  keyGenerator: (_req: Request, res: Response) => `user:${(res.locals.user as { id: string }).id}`,
  // only a wrong current password counts, not a new password the policy refuses
  requestWasSuccessful: (_req: Request, res: Response) => res.locals.wrongCurrentPassword !== true,
  message: { error: 'Too many failed password changes; wait 15 minutes and try again' },
});

export const authRoutes = defineRoutes([
  {
    method: 'post',
    path: '/auth/sign-in',
    access: 'public',
    summary: 'Sign in with e-mail and password; sets the session cookie',
    body: signInBody,
    before: [signInLimiter, signInAccountLimiter],
    handler: async ({ ds, body, res }) => {
      const b = body as SignInBody;
      const user = await signIn(ds, b.email, b.password);
      issueSession(res, user, await openSession(ds, user.id));
      return { user: toSessionUser(user) };
    },
  },
  {
    method: 'post',
    path: '/auth/sign-out',
    access: 'public',
    summary: 'Sign out: ends the session on the server and clears the cookie',
    handler: async ({ ds, req, res }) => {
      const session = readSession(req);
      if (session) await closeSession(ds, session.userId, session.sessionId);
      clearSession(res);
      return { ok: true };
    },
  },
  {
    method: 'get',
    path: '/auth/me',
    access: 'signed-in',
    whilePasswordChangeDue: true,
    summary: 'The signed-in user; renews the session',
    handler: ({ user, session, res }) => {
      issueSession(res, user, session as SessionClaims);
      return { user };
    },
  },
  {
    method: 'post',
    path: '/auth/password',
    access: 'signed-in',
    whilePasswordChangeDue: true,
    summary: 'Change the signed-in user’s password (current password required); ends their other sessions',
    body: changePasswordBody,
    before: [passwordChangeLimiter],
    handler: async ({ ds, user, session, body, res }) => {
      try {
        return { user: await changeOwnPassword(ds, user.id, (session as SessionClaims).sessionId, body as ChangePasswordBody) };
      } catch (err) {
        if (err instanceof ValidationError && err.details?.some((d) => d.path === 'currentPassword'))
          res.locals.wrongCurrentPassword = true;
        throw err;
      }
    },
  },
  {
    method: 'put',
    path: '/auth/preferences',
    access: 'signed-in',
    whilePasswordChangeDue: true,
    summary: 'Set the signed-in user’s unit system',
    body: preferencesBody,
    handler: async ({ ds, user, body }) => ({
      user: await setPreferences(ds, user.id, (body as { unitSystem: 'SI' | 'US' }).unitSystem),
    }),
  },
]);
