/**
 * API benches (need PostgreSQL at DATABASE_URL; skipped with a line when it is unset):
 * 1. POST /api/runs rating a 60-tray load case on loopback, 16 concurrent connections (autocannon): p95 latency.
 * 2. Preview of a 1,000-row CSV tray profile through POST /api/columns/:id/imports.
 * The app runs in-process on a free port; every row the bench creates hangs off its own column, deleted at the end.
 */
import { fork } from 'node:child_process';
import { readFileSync } from 'node:fs';
import bcrypt from 'bcryptjs';
import { randomUUID } from 'node:crypto';
import type { AddressInfo } from 'node:net';
import os from 'node:os';
import { performance } from 'node:perf_hooks';
import { fileURLToPath, pathToFileURL } from 'node:url';
import type { DataSource } from 'typeorm';
import { createApp } from '../server/app.js';
import { makeDataSource } from '../server/db/data-source.js';
import { LoadCase, ProcessUnit, Site, SiteMember, TowerColumn, TraySection, User } from '../server/db/entities/index.js';
import { DEMO_SECTIONS } from '../server/db/seed/demoColumn.js';
import { demoProfile } from '../server/db/seed/demoLoads.js';
import { logger } from '../server/logger.js';
import type { TrayLoad } from '../shared/types/rating.js';

const PASSWORD = 'bench-password-123';

/** 60 invented tray loads: the demo's middle-section loads repeated down the column. */
function loads60(): TrayLoad[] {
  const base = demoProfile({ vapour: 1, liquid: 1, topReflux_kg_h: 150000 }).filter((l) => l.tray >= 9 && l.tray <= 30);
  return Array.from({ length: 60 }, (_, i) => ({ ...base[i % base.length]!, tray: i + 1 }));
}

async function fixture(ds: DataSource, trayCount: number) {
  const tag = `bench-${randomUUID().slice(0, 8)}`;
  const site = await ds.getRepository(Site).save({ name: `Bench site ${tag}`, location: 'bench' });
  const unit = await ds.getRepository(ProcessUnit).save({ siteId: site.id, name: tag });
  const col = await ds.getRepository(TowerColumn).save({ unitId: unit.id, tag, numbering: 'top-down', trayCount });
  const user = await ds.getRepository(User).save({
    email: `${tag}@bench.example`,
    name: 'Bench engineer',
    role: 'process-engineer',
    passwordHash: await bcrypt.hash(PASSWORD, 10),
  });
  await ds.getRepository(SiteMember).insert({ siteId: site.id, userId: user.id });
  const cleanup = async () => {
    await ds.query('DELETE FROM columns WHERE id = $1', [col.id]);
    await ds.query('DELETE FROM process_units WHERE id = $1', [unit.id]);
    await ds.query('DELETE FROM sites WHERE id = $1', [site.id]);
    await ds.query('DELETE FROM users WHERE id = $1', [user.id]);
  };
  return { col, user, cleanup };
}

async function withServer<T>(fn: (base: string, ds: DataSource) => Promise<T>): Promise<T> {
  const ds = makeDataSource(process.env.DATABASE_URL);
  await ds.initialize();
  const level = logger.level;
  logger.level = 'warn'; // one log line per request would measure the terminal
  const server = createApp({ ds, serveClient: false }).listen(0, '127.0.0.1');
  await new Promise<void>((r) => server.once('listening', () => r()));
  try {
    return await fn(`http://127.0.0.1:${(server.address() as AddressInfo).port}`, ds);
  } finally {
    await new Promise<void>((r) => server.close(() => r()));
    await ds.destroy();
    logger.level = level;
  }
}

async function signIn(base: string, email: string): Promise<string> {
  const res = await fetch(`${base}/api/auth/sign-in`, {
    method: 'POST',
    headers: { 'content-type': 'application/json' },
    body: JSON.stringify({ email, password: PASSWORD }),
  });
  if (res.status !== 200) throw new Error(`bench sign-in failed: ${res.status}`);
  return res.headers.get('set-cookie')!.split(';')[0]!;
}

interface LoadResult {
  times: number[];
  warmupTimes: number[];
  bad: number;
  reqPerSec: number;
  cpuMs: number;
}

/** Drive the server from a separate process (bench/loadGenerator.mjs), as real clients would. */
function runLoad(opts: object, requests: number, warmup: number): Promise<LoadResult> {
  return new Promise((resolve, reject) => {
    const child = fork(fileURLToPath(new URL('./loadGenerator.mjs', import.meta.url)), { execArgv: [] });
    child.once('message', (m) => resolve(m as LoadResult));
    child.once('error', reject);
    child.once('exit', (code) => (code ? reject(new Error(`load generator exited with ${code}`)) : undefined));
    child.send({ opts, requests, warmup });
  });
}

/** Busy CPU time of the whole machine so far (Linux /proc/stat; 0 elsewhere), in ms. */
function machineCpuMs(): number {
  try {
    const f = readFileSync('/proc/stat', 'utf8').split('\n')[0]!.trim().split(/\s+/).slice(1).map(Number);
    const busy = f.reduce((a, b) => a + b, 0) - f[3]! - (f[4] ?? 0); // all but idle and iowait
    return (busy * 1000) / 100; // USER_HZ is 100 on Linux
  } catch {
    return 0;
  }
}

const percentile = (xs: number[], p: number): number => {
  const s = [...xs].sort((a, b) => a - b);
  return s[Math.min(s.length - 1, Math.ceil((p / 100) * s.length) - 1)]!;
};

/**
 * POST /api/runs under load. The figure is the steady state: `warmup` runs first (JIT, heap sizing, the
 * statements prepared on each pooled connection), then `requests` measured runs, as a server in service
 * would be. The p95 of the first 1,000 runs after start is printed beside it, so a slow start stays visible.
 */
export async function benchRunCreate(requests = 4000, connections = 16, warmup = 2000): Promise<string> {
  if (!process.env.DATABASE_URL) return 'api runs: skipped — DATABASE_URL is not set (needs PostgreSQL)';
  return withServer(async (base, ds) => {
    const { col, user, cleanup } = await fixture(ds, 60);
    try {
      await ds.getRepository(TraySection).save({
        columnId: col.id,
        name: 'All',
        firstTray: 1,
        lastTray: 60,
        geometry: DEMO_SECTIONS[1]!.geometry,
        provenance: 'design',
        notes: '',
      });
      const lc = await ds
        .getRepository(LoadCase)
        .save({ columnId: col.id, name: 'Bench', basis: 'normal', source: 'typed', loads: loads60() });
      const cookie = await signIn(base, user.email);
      const body = JSON.stringify({ columnId: col.id, loadCaseId: lc.id, label: 'bench' });
      const opts = {
        url: `${base}/api/runs`,
        method: 'POST' as const,
        headers: { 'content-type': 'application/json', cookie },
        body,
        connections,
      };
      const cpu0 = process.cpuUsage();
      const elu0 = performance.eventLoopUtilization();
      const sys0 = machineCpuMs();
      const load = await runLoad(opts, requests, warmup);
      const sysMs = machineCpuMs() - sys0;
      const cpu = process.cpuUsage(cpu0);
      const elu = performance.eventLoopUtilization(elu0);
      const { times, bad } = load;
      if (bad > 0 || times.length === 0) throw new Error(`${bad} of ${requests} requests did not answer 201`);
      const served = times.length + warmup;
      const cpuMs = (cpu.user + cpu.system) / 1000 / served;
      const p95 = percentile(times, 95);
      const cold = percentile(load.warmupTimes.slice(0, 1000), 95);
      return `api runs: POST /api/runs (60 trays, ${connections} connections, ${times.length} runs after ${warmup} warm-up runs): p95 ${p95.toFixed(1)} ms, p50 ${percentile(times, 50).toFixed(1)} ms, ${Math.round(load.reqPerSec)} req/s (first 1,000 runs after start: p95 ${cold.toFixed(1)} ms), server CPU ${cpuMs.toFixed(1)} ms per run (its event loop busy ${(elu.active / served).toFixed(1)} ms; load generator in its own process: ${(load.cpuMs / times.length).toFixed(1)} ms; whole machine ${(sysMs / served).toFixed(1)} ms), load average ${os.loadavg()[0]!.toFixed(1)} on ${os.cpus().length} cores (target p95 < 50 ms)`;
    } finally {
      await cleanup();
    }
  });
}

/** 1,000 invented rows, tray 1..1000, plausible SI values. */
function csv1000(): string {
  const lines = [
    'Tray,Vapour flow (kg/h),Liquid flow (kg/h),Vapour density (kg/m3),Liquid density (kg/m3),Surface tension (mN/m),Viscosity (cP),Temperature (C),Pressure (kPa)',
  ];
  for (let t = 1; t <= 1000; t++)
    lines.push(
      `${t},${200000 + t * 10},${150000 + t * 5},${(3 + t / 1000).toFixed(3)},${(690 + t / 20).toFixed(2)},${(19 - t / 200).toFixed(2)},0.5,${120 + t / 5},${168 + t / 10}`,
    );
  return lines.join('\n');
}

export async function benchImportPreview(repeats = 7): Promise<string> {
  if (!process.env.DATABASE_URL) return 'api import: skipped — DATABASE_URL is not set (needs PostgreSQL)';
  return withServer(async (base, ds) => {
    const { col, user, cleanup } = await fixture(ds, 1000);
    try {
      const cookie = await signIn(base, user.email);
      const file = new Blob([csv1000()], { type: 'text/csv' });
      const times: number[] = [];
      for (let i = 0; i < repeats + 2; i++) {
        const form = new FormData();
        form.append('file', file, 'profile-1000.csv');
        const t0 = performance.now();
        const res = await fetch(`${base}/api/columns/${col.id}/imports`, { method: 'POST', headers: { cookie }, body: form });
        const json = (await res.json()) as { loads?: unknown[]; errors?: unknown[] };
        const ms = performance.now() - t0;
        if (res.status !== 200 || json.loads?.length !== 1000 || json.errors?.length !== 0)
          throw new Error(`preview answered ${res.status}`);
        if (i >= 2) times.push(ms); // the first two warm up
      }
      return `api import: 1,000-row CSV preview through the API: median ${percentile(times, 50).toFixed(1)} ms, max ${Math.max(...times).toFixed(1)} ms over ${repeats} (target < 500 ms)`;
    } finally {
      await cleanup();
    }
  });
}

if (process.argv[1] && import.meta.url === pathToFileURL(process.argv[1]).href) {
  console.log(await benchRunCreate());
  console.log(await benchImportPreview());
}
