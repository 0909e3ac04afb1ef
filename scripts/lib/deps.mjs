import { existsSync } from 'node:fs';
import { isRoot, log, fail, mtime, run } from './util.mjs';

/** Install a Debian package when missing (root only); otherwise stop with a message naming it. */
export function ensureDebian(pkg, present) {
  if (present()) return;
  if (!isRoot) fail(`Debian package "${pkg}" is missing. Install it with: sudo apt-get install -y ${pkg}`);
  log(`installing Debian package ${pkg} (apt-get)…`);
  const env = { ...process.env, DEBIAN_FRONTEND: 'noninteractive' };
  try {
    run('apt-get', ['install', '-y', '--no-install-recommends', pkg], { env });
  } catch {
    run('apt-get', ['update'], { env });
    run('apt-get', ['install', '-y', '--no-install-recommends', pkg], { env });
  }
  if (!present()) fail(`Debian package "${pkg}" did not install cleanly`);
}

/** npm ci when node_modules is missing or older than the lock file. */
export function ensureNodeModules() {
  const stamp = 'node_modules/.package-lock.json';
  if (existsSync(stamp) && mtime(stamp) >= mtime('package-lock.json')) return;
  log('installing npm packages (npm ci)…');
  run('npm', ['ci', '--no-audit', '--no-fund']);
}

export const chromiumPath = '/usr/bin/chromium';
export function ensureChromium() {
  ensureDebian('chromium', () => existsSync(chromiumPath));
}
