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

export const config = {
  port: num('PORT', 5180),
  host: env.HOST ?? '127.0.0.1',
  databaseUrl:
    env.DATABASE_URL ?? `postgres://frothline@127.0.0.1:${num('PGPORT', 5433)}/${env.PGDATABASE ?? 'frothline'}`,
  jwtSecret: env.JWT_SECRET ?? 'dev-only-secret-change-me',
  sessionMinutes: num('SESSION_MINUTES', 30),
  bcryptRounds: Math.max(10, num('BCRYPT_ROUNDS', 10)),
  loginRateLimit: num('LOGIN_RATE_LIMIT', 20),
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
  dataDir,
  isTest: env.NODE_ENV === 'test',
};
export type Config = typeof config;
