// Plain Node helpers for the bootstrap scripts (they run before node_modules exists).
import { spawn, spawnSync } from 'node:child_process';
import { existsSync, statSync } from 'node:fs';
import net from 'node:net';

export const isRoot = typeof process.getuid === 'function' && process.getuid() === 0;

/**
 * Node options of the API server process: a young generation of up to 64 MB per semi-space, so that the
 * short-lived objects of rating requests die there instead of being copied and promoted (the run and
 * pump-around benches measure with the same option: package.json "bench").
 */
export const SERVER_NODE_OPTIONS = '--max-semi-space-size=64';

export function log(msg) {
  process.stdout.write(`\x1b[36m[frothline]\x1b[0m ${msg}\n`);
}

export function fail(msg) {
  process.stderr.write(`\x1b[31m[frothline] ${msg}\x1b[0m\n`);
  process.exit(1);
}

/** Run a command to completion, inheriting output; throws on a non-zero exit. */
export function run(cmd, args, opts = {}) {
  const r = spawnSync(cmd, args, { stdio: 'inherit', ...opts });
  if (r.error) throw r.error;
  if (r.status !== 0) throw new Error(`${cmd} ${args.join(' ')} exited with ${r.status}`);
  return r;
}

export function runQuiet(cmd, args, opts = {}) {
  return spawnSync(cmd, args, { encoding: 'utf8', ...opts });
}

export function start(cmd, args, opts = {}) {
  return spawn(cmd, args, { stdio: 'inherit', ...opts });
}

export function loadDotEnv() {
  if (existsSync('.env') && typeof process.loadEnvFile === 'function') process.loadEnvFile('.env');
}

export function mtime(p) {
  return existsSync(p) ? statSync(p).mtimeMs : 0;
}

/** Ask the OS for a free TCP port on loopback. */
export function freePort() {
  return new Promise((resolve, reject) => {
    const s = net.createServer();
    s.unref();
    s.on('error', reject);
    s.listen(0, '127.0.0.1', () => {
      const { port } = s.address();
      s.close(() => resolve(port));
    });
  });
}

export function waitForPort(port, timeoutMs = 20000) {
  const until = Date.now() + timeoutMs;
  return new Promise((resolve, reject) => {
    const attempt = () => {
      const sock = net.connect(port, '127.0.0.1');
      sock.once('connect', () => {
        sock.destroy();
        resolve();
      });
      sock.once('error', () => {
        sock.destroy();
        if (Date.now() > until) reject(new Error(`nothing listening on 127.0.0.1:${port} after ${timeoutMs} ms`));
        else setTimeout(attempt, 150);
      });
    };
    attempt();
  });
}
