import { randomBytes } from 'node:crypto';
import { existsSync } from 'node:fs';
import path from 'node:path';

if (existsSync('.env') && typeof process.loadEnvFile === 'function') process.loadEnvFile('.env');

const env = process.env;
const num = (name: string, fallback: number): number => {
  const v = env[name];
  const n = v === undefined || v === '' ? fallback : Number(v);
  if (!Number.isFinite(n)) throw new Error(`Setting ${name} must be a number, got "${v}"`);
  return n;
};

const dataDir = path.resolve(env.DATA_DIR ?? '.data');

/** Secrets that were published in our example settings: anyone could sign sessions with them. */
export const EXAMPLE_JWT_SECRETS: readonly string[] = ['change-me-to-a-long-random-string', 'dev-only-secret-change-me'];
export const MIN_JWT_SECRET_LENGTH = 32;

/** What is wrong with a session-signing secret, or null when it is fit for a shared server. */
export function jwtSecretProblem(secret: string | undefined): string | null {
  if (!secret) return 'JWT_SECRET is not set';
  if (EXAMPLE_JWT_SECRETS.includes(secret)) return 'JWT_SECRET is the published example value';
  if (secret.length < MIN_JWT_SECRET_LENGTH)
    return `JWT_SECRET is ${secret.length} characters long; at least ${MIN_JWT_SECRET_LENGTH} are needed`;
  return null;
}

/**
 * The session-signing secret. There is no fixed fallback: without JWT_SECRET a development or test process
 * signs with a random secret of its own (sessions then end when it stops and are not accepted by any other
 * process); main.ts refuses to start in production, or with an example secret anywhere (see checkStartup).
 */
const jwtSecretFromEnv = env.JWT_SECRET ? env.JWT_SECRET : undefined;

export const config = {
  port: num('PORT', 5180),
  host: env.HOST ?? '127.0.0.1',
  databaseUrl: env.DATABASE_URL ?? `postgres://frothline@127.0.0.1:${num('PGPORT', 5433)}/${env.PGDATABASE ?? 'frothline'}`,
  jwtSecret: jwtSecretFromEnv ?? randomBytes(48).toString('base64url'),
  jwtSecretGenerated: jwtSecretFromEnv === undefined,
  sessionMinutes: num('SESSION_MINUTES', 30),
  /** Absolute session lifetime: a session ends this long after sign-in however active it is. */
  sessionMaxHours: num('SESSION_MAX_HOURS', 12),
  bcryptRounds: Math.max(10, num('BCRYPT_ROUNDS', 10)),
  loginRateLimit: num('LOGIN_RATE_LIMIT', 20),
  /** Failed sign-ins (and current-password checks) allowed per account per 15 minutes. */
  loginAccountLimit: num('LOGIN_ACCOUNT_LIMIT', 10),
  bodyLimit: env.BODY_LIMIT ?? '1mb',
  importMaxBytes: num('IMPORT_MAX_BYTES', 5 * 1024 * 1024),
  photoMaxBytes: num('PHOTO_MAX_BYTES', 8 * 1024 * 1024),
  s3: {
    endpoint: env.S3_ENDPOINT ?? `http://127.0.0.1:${num('S3_PORT', 5190)}`,
    bucket: env.S3_BUCKET ?? 'frothline-photos',
    accessKeyId: env.S3_ACCESS_KEY ?? 'S3RVER',
    secretAccessKey: env.S3_SECRET_KEY ?? 'S3RVER',
    region: env.S3_REGION ?? 'us-east-1',
  },
  smtp: { host: '127.0.0.1', port: num('SMTP_PORT', 5125), from: env.MAIL_FROM ?? 'frothline@example.test' },
  mailboxDir: path.join(dataDir, 'mailbox'),
  devMailbox: (env.DEV_MAILBOX ?? 'true') === 'true',
  logLevel: env.LOG_LEVEL ?? 'info',
  clientDist: path.resolve(env.CLIENT_DIST ?? 'dist'),
  /** the address people open Frothline at, for links in e-mail notices (APP_URL; default: this server) */
  appUrl: (env.APP_URL ?? `http://${env.HOST ?? '127.0.0.1'}:${num('PORT', 5180)}`).replace(/\/+$/, ''),
  dataDir,
  isTest: env.NODE_ENV === 'test',
  isProduction: env.NODE_ENV === 'production',
};
export type Config = typeof config;

/**
 * Settings that stop the server before it listens: in production a missing, example or short JWT_SECRET;
 * anywhere an example secret. Development and test only warn about a random per-process or short secret.
 */
export function checkStartup(c: { jwtSecret: string; jwtSecretGenerated: boolean; isProduction: boolean }): {
  fatal?: string;
  warning?: string;
} {
  const problem = jwtSecretProblem(c.jwtSecretGenerated ? undefined : c.jwtSecret);
  if (!problem) return {};
  const fix = `set JWT_SECRET to a random string of at least ${MIN_JWT_SECRET_LENGTH} characters (npm start writes one into .env)`;
  if (c.isProduction || EXAMPLE_JWT_SECRETS.includes(c.jwtSecret))
    return { fatal: `Refusing to start: ${problem}; anyone who knows or guesses it could sign in as any user. ${fix}.` };
  if (c.jwtSecretGenerated)
    return { warning: `${problem}: sessions are signed with a random secret of this process and end when it stops; ${fix}.` };
  return { warning: `${problem}; ${fix}.` };
}
