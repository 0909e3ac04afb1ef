// The session-signing secret of `npm start`: written into .env on the first run, kept on later runs.
import { randomBytes } from 'node:crypto';
import { chmodSync, existsSync, readFileSync, writeFileSync } from 'node:fs';

// The same rules as server/config.ts (jwtSecretProblem); this script runs before node_modules exists.
const EXAMPLES = ['change-me-to-a-long-random-string', 'dev-only-secret-change-me'];
const MIN_LENGTH = 32;
const usable = (s) => typeof s === 'string' && s.length >= MIN_LENGTH && !EXAMPLES.includes(s);

/**
 * Make sure JWT_SECRET is usable: a secret set in the environment is respected as it is (the server judges
 * it); otherwise the one in `file` is kept when usable, else a new random one replaces or joins it there.
 * Returns what was done, for the log.
 */
export function ensureSessionSecret(file = '.env', env = process.env) {
  if (env.JWT_SECRET) return 'from the environment';
  const text = existsSync(file) ? readFileSync(file, 'utf8') : '';
  const line = /^[ \t]*JWT_SECRET[ \t]*=[ \t]*(.*?)[ \t]*$/m;
  const current = line.exec(text)?.[1]?.replace(/^(['"])(.*)\1$/, '$2');
  if (usable(current)) return 'kept';
  const secret = randomBytes(48).toString('base64url');
  const entry = `JWT_SECRET=${secret}`;
  const next = current === undefined ? `${text}${text && !text.endsWith('\n') ? '\n' : ''}${entry}\n` : text.replace(line, entry);
  writeFileSync(file, next, { mode: 0o600 });
  chmodSync(file, 0o600);
  return current === undefined ? 'written' : 'replaced';
}
