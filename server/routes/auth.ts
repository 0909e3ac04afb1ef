import { rateLimit } from 'express-rate-limit';
import type { Request, RequestHandler, Response } from 'express';
import { config } from '../config.js';
import { ValidationError } from '../errors.js';
import { clearSession, issueSession, readSession, type SessionClaims } from '../http/auth.js';
import { implement } from '../http/route.js';
import { changeOwnPassword } from '../services/auth/passwords.js';
import { closeSession, openSession } from '../services/auth/sessions.js';
import { setPreferences, signIn, toSessionUser } from '../services/auth/users.js';
import { authContract as c } from '../../shared/contract/auth.js';

const WINDOW_MS = 15 * 60 * 1000;
// only failed attempts count: colleagues signing in from one office address must not lock each other out
const failures = { windowMs: WINDOW_MS, standardHeaders: 'draft-7', legacyHeaders: false, skipSuccessfulRequests: true } as const;

const signInLimiter: RequestHandler = rateLimit({
  ...failures,
  limit: () => config.loginRateLimit,
  message: { error: 'Too many failed sign-in attempts from this address; wait 15 minutes and try again' },
});

const emailOf = (body: unknown): string => {
  const e = (body as { email?: unknown } | undefined)?.email;
  return typeof e === 'string' ? e : '';
};
/** Per account, whatever the address: guessing one user's password from many addresses is slowed too. */
const accountKey = (req: Request): string => `account:${emailOf(req.body).trim().toLowerCase()}`;
const signInAccountLimiter: RequestHandler = rateLimit({
  ...failures,
  limit: () => config.loginAccountLimit,
  keyGenerator: accountKey,
  message: { error: 'Too many failed sign-in attempts for this account; wait 15 minutes and try again' },
});

/** Current-password checks of a signed-in user count against the same per-account allowance. */
const passwordChangeLimiter: RequestHandler = rateLimit({
  ...failures,
  limit: () => config.loginAccountLimit,
  keyGenerator: (_req: Request, res: Response) => `user:${(res.locals.user as { id: string }).id}`,
  // only a wrong current password counts, not a new password the policy refuses
  requestWasSuccessful: (_req: Request, res: Response) => res.locals.wrongCurrentPassword !== true,
  message: { error: 'Too many failed password changes; wait 15 minutes and try again' },
});

export const authRoutes = [
  implement(c.signIn)({
    before: [signInLimiter, signInAccountLimiter],
    handler: async ({ ds, body, res }) => {
      const user = await signIn(ds, body.email, body.password);
      issueSession(res, user, await openSession(ds, user.id));
      return { user: toSessionUser(user) };
    },
  }),
  implement(c.signOut)({
    handler: async ({ ds, req, res }) => {
      const session = readSession(req);
      if (session) await closeSession(ds, session.userId, session.sessionId);
      clearSession(res);
      return { ok: true as const };
    },
  }),
  implement(c.me)({
    whilePasswordChangeDue: true,
    handler: ({ user, session, res }) => {
      issueSession(res, user, session as SessionClaims);
      return { user };
    },
  }),
  implement(c.changePassword)({
    whilePasswordChangeDue: true,
    before: [passwordChangeLimiter],
    handler: async ({ ds, user, session, body, res }) => {
      try {
        return { user: await changeOwnPassword(ds, user.id, (session as SessionClaims).sessionId, body) };
      } catch (err) {
        if (err instanceof ValidationError && err.details?.some((d) => d.path === 'currentPassword'))
          res.locals.wrongCurrentPassword = true;
        throw err;
      }
    },
  }),
  implement(c.preferences)({
    whilePasswordChangeDue: true,
    handler: async ({ ds, user, body }) => ({ user: await setPreferences(ds, user.id, body) }),
  }),
];
