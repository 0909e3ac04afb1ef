import { mkdtempSync, readFileSync, statSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { describe, expect, it } from 'vitest';
import { checkStartup, jwtSecretProblem } from '../../server/config.js';
// @ts-expect-error plain ESM script without types (it runs before node_modules exists)
import { ensureSessionSecret } from '../../scripts/lib/secret.mjs';

const strong = 'k'.repeat(20) + 'Q9x-2mZ7_vT4pL8sW1nB';

describe('session-signing secret rules', () => {
  it('names what is wrong with a missing, example or short secret', () => {
    expect(jwtSecretProblem(undefined)).toBe('JWT_SECRET is not set');
    expect(jwtSecretProblem('change-me-to-a-long-random-string')).toMatch(/published example/);
    expect(jwtSecretProblem('dev-only-secret-change-me')).toMatch(/published example/);
    expect(jwtSecretProblem('short-secret')).toMatch(/12 characters long; at least 32/);
    expect(jwtSecretProblem(strong)).toBeNull();
  });

  it('refuses to start in production with a missing, example or short secret; warns in development', () => {
    const prod = (jwtSecret: string, jwtSecretGenerated = false) =>
      checkStartup({ jwtSecret, jwtSecretGenerated, isProduction: true });
    expect(prod('random-of-this-process-xxxxxxxxxxxxxxxxxxxxxx', true).fatal).toMatch(/Refusing to start: JWT_SECRET is not set/);
    expect(prod('change-me-to-a-long-random-string').fatal).toMatch(/Refusing to start: JWT_SECRET is the published example/);
    expect(prod('0123456789').fatal).toMatch(/at least 32/);
    expect(prod(strong)).toEqual({});
    const dev = (jwtSecret: string, jwtSecretGenerated = false) =>
      checkStartup({ jwtSecret, jwtSecretGenerated, isProduction: false });
    expect(dev('random-of-this-process-xxxxxxxxxxxxxxxxxxxxxx', true)).toEqual({
      warning: expect.stringMatching(/random secret of this process/),
    });
    expect(dev('dev-only-secret-change-me').fatal).toMatch(/published example/);
    expect(dev('0123456789').warning).toMatch(/at least 32/);
  });
});

describe('npm start writes the secret into .env', () => {
  const dir = () => mkdtempSync(path.join(tmpdir(), 'frothline-secret-'));
  const secretIn = (file: string) => /^JWT_SECRET=(.*)$/m.exec(readFileSync(file, 'utf8'))?.[1];

  it('creates .env with a random secret on the first run and keeps it on later runs', () => {
    const file = path.join(dir(), '.env');
    expect(ensureSessionSecret(file, {})).toBe('written');
    const first = secretIn(file);
    expect(first).toMatch(/^[A-Za-z0-9_-]{64}$/);
    expect(statSync(file).mode & 0o077).toBe(0);
    expect(ensureSessionSecret(file, {})).toBe('kept');
    expect(secretIn(file)).toBe(first);
    const other = path.join(dir(), '.env');
    ensureSessionSecret(other, {});
    expect(secretIn(other)).not.toBe(first);
  });

  it('replaces an empty, example or short secret and keeps the other settings', () => {
    for (const bad of ['', 'change-me-to-a-long-random-string', 'too-short']) {
      const file = path.join(dir(), '.env');
      writeFileSync(file, `PORT=5999\nJWT_SECRET=${bad}\nLOG_LEVEL=warn`);
      expect(ensureSessionSecret(file, {})).toBe('replaced');
      const text = readFileSync(file, 'utf8');
      expect(text).toMatch(/^PORT=5999$/m);
      expect(text).toMatch(/^LOG_LEVEL=warn$/m);
      expect(secretIn(file)).toMatch(/^[A-Za-z0-9_-]{64}$/);
    }
  });

  it('leaves .env alone when the environment already sets the secret', () => {
    const file = path.join(dir(), '.env');
    expect(ensureSessionSecret(file, { JWT_SECRET: strong })).toBe('from the environment');
    expect(() => readFileSync(file)).toThrow();
  });
});
