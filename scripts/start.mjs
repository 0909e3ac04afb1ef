#!/usr/bin/env node
// npm start: set everything up on a fresh clone and serve Frothline on http://127.0.0.1:PORT.
import { readFileSync } from 'node:fs';
import path from 'node:path';
import { ensureNodeModules } from './lib/deps.mjs';
import { Cluster, ensurePostgres } from './lib/postgres.mjs';
import { ensureSessionSecret } from './lib/secret.mjs';
import { log, loadDotEnv, run, SERVER_NODE_OPTIONS, start, waitForPort } from './lib/util.mjs';

const secret = ensureSessionSecret('.env');
if (secret !== 'kept' && secret !== 'from the environment') log(`session-signing secret ${secret} in .env (JWT_SECRET, random)`);
loadDotEnv();
const env = process.env;
const port = Number(env.PORT ?? 5180);
const dataDir = path.resolve(env.DATA_DIR ?? '.data');
const pgPort = Number(env.PGPORT ?? 5433);
const s3Port = Number(env.S3_PORT ?? 5190);
const smtpPort = Number(env.SMTP_PORT ?? 5125);
const bucket = env.S3_BUCKET ?? 'frothline-photos';

ensurePostgres();
ensureNodeModules();
const { startFakes } = await import('./lib/fakes.mjs');

const cluster = new Cluster({ dir: path.join(dataDir, 'db'), port: pgPort, database: env.PGDATABASE ?? 'frothline' });
cluster.init();
cluster.start();
let fakes;
let server;
let stopping = false;
const shutdown = (code = 0) => {
  if (stopping) return;
  stopping = true;
  log('stopping…');
  if (server && server.exitCode === null) server.kill('SIGTERM');
  fakes?.stop();
  cluster.stop();
  log('server and database stopped; data kept in ' + dataDir);
  process.exit(code);
};
process.on('SIGINT', () => shutdown(0));
process.on('SIGTERM', () => shutdown(0));

try {
  cluster.ensureDatabase();
  const childEnv = { ...env, DATABASE_URL: cluster.url, DATA_DIR: dataDir };
  run('node_modules/.bin/tsx', ['server/db/migrate.ts'], { env: childEnv });
  run('node_modules/.bin/tsx', ['server/db/seed/index.ts'], { env: childEnv });
  log('building the client…');
  run('node_modules/.bin/vite', ['build', '--logLevel', 'warn'], { env: childEnv });
  fakes = await startFakes({ dataDir, s3Port, smtpPort, bucket });
  // the same young-generation size as `npm run bench` measures with (DEVELOPERS.md, "Benchmarks")
  const nodeOptions = [childEnv.NODE_OPTIONS, SERVER_NODE_OPTIONS].filter(Boolean).join(' ');
  server = start('node_modules/.bin/tsx', ['server/main.ts'], {
    env: { ...childEnv, NODE_ENV: 'production', NODE_OPTIONS: nodeOptions },
  });
  server.on('exit', (code) => {
    if (!stopping) shutdown(code ?? 1);
  });
  const demo = JSON.parse(readFileSync('server/db/seed/demo-users.json', 'utf8'));
  await waitForPort(port, 30000);
  log(`Frothline is at http://127.0.0.1:${port}  (Ctrl-C stops server and database)`);
  log(`demo sign-ins, password "${demo.password}":`);
  for (const u of demo.users) log(`  ${u.email.padEnd(28)} ${u.role}`);
} catch (err) {
  console.error(err);
  shutdown(1);
}
