// A private PostgreSQL cluster from Debian's postgresql package, listening only on 127.0.0.1.
import { chmodSync, existsSync, mkdirSync, readdirSync, rmSync, writeFileSync } from 'node:fs';
import path from 'node:path';
import { ensureDebian } from './deps.mjs';
import { isRoot, log, run, runQuiet } from './util.mjs';

function pgBinDir() {
  const base = '/usr/lib/postgresql';
  if (!existsSync(base)) return null;
  const versions = readdirSync(base)
    .filter((v) => existsSync(path.join(base, v, 'bin', 'initdb')))
    .sort((a, b) => Number(b) - Number(a));
  return versions[0] ? path.join(base, versions[0], 'bin') : null;
}

export function ensurePostgres() {
  ensureDebian('postgresql', () => pgBinDir() !== null);
  return pgBinDir();
}

/** Commands run as the postgres user when we are root (initdb refuses root). */
function asOwner(bin, args) {
  return isRoot ? ['runuser', ['-u', 'postgres', '--', bin, ...args]] : [bin, args];
}

/** Make every parent of dir enterable so the postgres user can reach its cluster folder. */
function openPath(dir) {
  if (!isRoot) return;
  let d = path.dirname(dir);
  while (d !== path.dirname(d)) {
    const r = runQuiet('runuser', ['-u', 'postgres', '--', 'test', '-x', d]);
    if (r.status !== 0) chmodSync(d, 0o711);
    d = path.dirname(d);
  }
}

export class Cluster {
  constructor({ dir, port, database = 'frothline', user = 'frothline', fsyncOff = false }) {
    this.dir = path.resolve(dir);
    this.pgdata = path.join(this.dir, 'pgdata');
    this.sock = path.join(this.dir, 'run');
    this.port = port;
    this.database = database;
    this.user = user;
    this.fsyncOff = fsyncOff;
    this.bin = ensurePostgres();
  }

  get url() {
    return `postgres://${this.user}@127.0.0.1:${this.port}/${this.database}`;
  }

  exec(tool, args, quiet = false) {
    const [cmd, a] = asOwner(path.join(this.bin, tool), args);
    return quiet ? runQuiet(cmd, a) : run(cmd, a);
  }

  init() {
    mkdirSync(this.sock, { recursive: true });
    openPath(this.dir);
    if (isRoot) run('chown', ['-R', 'postgres:postgres', this.dir]);
    if (existsSync(path.join(this.pgdata, 'PG_VERSION'))) return false;
    log(`creating a private database cluster in ${this.pgdata}`);
    const r = this.exec('initdb', ['-D', this.pgdata, '-U', 'postgres', '-A', 'trust', '-E', 'UTF8', '--locale=C.UTF-8'], true);
    if (r.status !== 0) throw new Error(`initdb failed: ${r.stderr || r.stdout}`);
    // Loopback only: refuse anything but 127.0.0.1 at the authentication layer too.
    writeFileSync(path.join(this.pgdata, 'pg_hba.conf'), 'local all all trust\nhost all all 127.0.0.1/32 trust\n');
    return true;
  }

  start() {
    const opts =
      `-c listen_addresses=127.0.0.1 -p ${this.port} -c unix_socket_directories=${this.sock}` +
      (this.fsyncOff ? ' -c fsync=off -c synchronous_commit=off -c full_page_writes=off' : '');
    const r = this.exec(
      'pg_ctl',
      ['-D', this.pgdata, '-l', path.join(this.dir, 'postgres.log'), '-w', '-t', '30', '-o', opts, 'start'],
      true,
    );
    if (r.status !== 0) throw new Error(`PostgreSQL did not start (see ${this.dir}/postgres.log): ${r.stderr || r.stdout}`);
    log(`PostgreSQL listening on 127.0.0.1:${this.port}`);
  }

  psql(sql, db = 'postgres') {
    const r = runQuiet(path.join(this.bin, 'psql'), [
      '-h',
      '127.0.0.1',
      '-p',
      String(this.port),
      '-U',
      'postgres',
      '-d',
      db,
      '-tAc',
      sql,
    ]);
    if (r.status !== 0) throw new Error(`psql failed: ${r.stderr}`);
    return r.stdout.trim();
  }

  ensureDatabase() {
    if (this.psql(`SELECT 1 FROM pg_roles WHERE rolname='${this.user}'`) !== '1') this.psql(`CREATE ROLE ${this.user} LOGIN`);
    if (this.psql(`SELECT 1 FROM pg_database WHERE datname='${this.database}'`) !== '1')
      this.psql(`CREATE DATABASE ${this.database} OWNER ${this.user}`);
  }

  stop() {
    this.exec('pg_ctl', ['-D', this.pgdata, '-m', 'fast', '-w', 'stop'], true);
  }

  remove() {
    rmSync(this.dir, { recursive: true, force: true });
  }
}
