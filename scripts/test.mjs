#!/usr/bin/env node
// npm test: the same bootstrap as npm start with throwaway data on free ports, then every test.
// Ends with the line "N passed, N failed" and a non-zero exit on any failure.
import { randomBytes } from 'node:crypto';
import { existsSync, mkdirSync, readFileSync } from 'node:fs';
import path from 'node:path';
import { chromiumPath, ensureChromium, ensureNodeModules } from './lib/deps.mjs';
import { Cluster, ensurePostgres } from './lib/postgres.mjs';
import { freePort, log, runQuiet, start, waitForPort } from './lib/util.mjs';

const t0 = Date.now();
ensurePostgres();
ensureNodeModules();
ensureChromium();
const { startFakes } = await import('./lib/fakes.mjs');

const root = path.resolve('.test-data', `run-${process.pid}`);
mkdirSync(root, { recursive: true });
const [pgPort, s3Port, smtpPort, appPort] = [await freePort(), await freePort(), await freePort(), await freePort()];
const cluster = new Cluster({ dir: path.join(root, 'db'), port: pgPort, database: 'frothline_test', fsyncOff: true });
let fakes;
let server;
const results = [];
const record = (name, ok, detail = '') => {
  results.push({ name, ok });
  log(`${ok ? '✔' : '✘'} ${name}${detail ? ` — ${detail}` : ''}`);
};

const env = {
  ...process.env,
  NODE_ENV: 'test',
  DATABASE_URL: '',
  DATA_DIR: root,
  S3_PORT: String(s3Port),
  SMTP_PORT: String(smtpPort),
  S3_BUCKET: 'frothline-test',
  PORT: String(appPort),
  JWT_SECRET: randomBytes(48).toString('base64url'),
  LOGIN_RATE_LIMIT: '1000',
  BCRYPT_ROUNDS: '10',
  CHROMIUM_PATH: chromiumPath,
  FROTHLINE_URL: `http://127.0.0.1:${appPort}`,
  SCREENSHOT_DIR: path.resolve('test-results', 'screenshots'),
  LOG_LEVEL: 'warn',
};

function step(name, cmd, args, extraEnv = {}) {
  const r = runQuiet(cmd, args, { env: { ...env, ...extraEnv }, stdio: 'inherit' });
  record(name, r.status === 0);
  return r.status === 0;
}

let code = 1;
try {
  cluster.init();
  cluster.start();
  cluster.ensureDatabase();
  env.DATABASE_URL = cluster.url;
  fakes = await startFakes({ dataDir: root, s3Port, smtpPort, bucket: env.S3_BUCKET, quiet: true });
  step('type check (vue-tsc, strict)', 'node_modules/.bin/vue-tsc', ['--noEmit', '-p', 'tsconfig.json']);
  step('formatting (prettier --check)', 'node_modules/.bin/prettier', ['--check', '.', '--log-level', 'warn']);
  step('lint (eslint, type-aware, with eslint-plugin-vue)', 'node_modules/.bin/eslint', [
    'server',
    'shared',
    'tests',
    'bench',
    'src',
  ]);
  const migrated = step('migrations apply to an empty database', 'node_modules/.bin/tsx', ['server/db/migrate.ts']);
  const seeded = migrated && step('demo data seeds', 'node_modules/.bin/tsx', ['server/db/seed/index.ts']);
  const built = step('client builds (vite build)', 'node_modules/.bin/vite', ['build', '--logLevel', 'warn']);
  if (built && seeded) {
    server = start('node_modules/.bin/tsx', ['server/main.ts'], { env, stdio: ['ignore', 'ignore', 'inherit'] });
    await waitForPort(appPort, 30000);
  }
  const report = path.join(root, 'vitest.json');
  const projects = built && seeded ? [] : ['--project', 'unit', '--project', 'api'];
  runQuiet(
    'node_modules/.bin/vitest',
    ['run', ...projects, '--reporter=default', '--reporter=json', `--outputFile.json=${report}`],
    {
      env,
      stdio: 'inherit',
    },
  );
  if (existsSync(report)) {
    const j = JSON.parse(readFileSync(report, 'utf8'));
    for (const file of j.testResults ?? [])
      for (const t of file.assertionResults ?? [])
        if (t.status === 'passed' || t.status === 'failed') results.push({ name: t.fullName, ok: t.status === 'passed' });
    if (j.numFailedTestSuites && !(j.testResults ?? []).some((f) => f.assertionResults?.some((t) => t.status === 'failed')))
      record('test files load', false, `${j.numFailedTestSuites} test file(s) failed to load`);
  } else record('vitest ran', false, 'no report written');
  const failed = results.filter((r) => !r.ok).length;
  code = failed === 0 && results.length > 0 ? 0 : 1;
} catch (err) {
  console.error(err);
  record('test bootstrap', false, String(err?.message ?? err));
} finally {
  if (server && server.exitCode === null) server.kill('SIGTERM');
  fakes?.stop();
  try {
    cluster.stop();
  } catch {}
  cluster.remove();
}
const passed = results.filter((r) => r.ok).length;
const failed = results.length - passed;
log(`finished in ${((Date.now() - t0) / 1000).toFixed(0)} s`);
console.log(`${passed} passed, ${failed} failed`);
process.exit(failed === 0 && passed > 0 ? 0 : code || 1);
