import { rateLimit } from 'express-rate-limit';
import { config } from '../config.js';
import { clearSession, issueSession } from '../http/auth.js';
import { defineRoutes } from '../http/route.js';
import { setPreferences, signIn, toSessionUser } from '../services/users.js';
import { preferencesBody, signInBody } from '../../shared/schemas/auth.js';
import type { SignInBody } from '../../shared/types/api.js';

const signInLimiter = rateLimit({
  windowMs: 15 * 60 * 1000,
  limit: () => config.loginRateLimit,
  standardHeaders: 'draft-7',
  legacyHeaders: false,
  // only failed attempts count: colleagues signing in from one office address must not lock each other out
  skipSuccessfulRequests: true,
  message: { error: 'Too many failed sign-in attempts from this address; wait 15 minutes and try again' },
});

export const authRoutes = defineRoutes([
  {
    method: 'post',
    path: '/auth/sign-in',
    access: 'public',
    summary: 'Sign in with e-mail and password; sets the session cookie',
    body: signInBody,
    before: [signInLimiter],
    handler: async ({ ds, body, res }) => {
      const b = body as SignInBody;
      const user = await signIn(ds, b.email, b.password);
      issueSession(res, user);
      return { user: toSessionUser(user) };
    },
  },
  {
    method: 'post',
    path: '/auth/sign-out',
    access: 'public',
    summary: 'Sign out; clears the session cookie',
    handler: ({ res }) => {
      clearSession(res);
      return { ok: true };
    },
  },
  {
    method: 'get',
    path: '/auth/me',
    access: 'signed-in',
    summary: 'The signed-in user; renews the session',
    handler: ({ user, res }) => {
      issueSession(res, user);
      return { user };
    },
  },
  {
    method: 'put',
    path: '/auth/preferences',
    access: 'signed-in',
    summary: 'Set the signed-in user’s unit system',
    body: preferencesBody,
    handler: async ({ ds, user, body }) => ({
      user: await setPreferences(ds, user.id, (body as { unitSystem: 'SI' | 'US' }).unitSystem),
    }),
  },
]);
