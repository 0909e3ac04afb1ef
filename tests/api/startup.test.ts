import { spawnSync } from 'node:child_process';
import { describe, expect, it } from 'vitest';

/** Starts server/main.ts as `npm start` does (production) with the given secret; returns how it ended. */
function startServer(jwtSecret: string) {
  const r = spawnSync('node_modules/.bin/tsx', ['server/main.ts'], {
    env: {
      ...process.env,
      NODE_ENV: 'production',
      JWT_SECRET: jwtSecret,
      PORT: '1',
      DATABASE_URL: 'postgres://nobody@127.0.0.1:1/none',
    },
    encoding: 'utf8',
    timeout: 20000,
  });
  return { status: r.status, stderr: r.stderr };
}

describe('the server refuses to start in production without a proper session secret', () => {
  it('refuses a missing secret, saying why and what to do', () => {
    const r = startServer('');
    expect(r.status).toBe(1);
    expect(r.stderr).toMatch(/Refusing to start: JWT_SECRET is not set.*at least 32 characters/);
  });
  it('refuses the example secret and a short one', () => {
    expect(startServer('change-me-to-a-long-random-string').stderr).toMatch(/published example value/);
    const short = startServer('0123456789abcdef');
    expect(short.status).toBe(1);
    expect(short.stderr).toMatch(/16 characters long; at least 32/);
  });
});
