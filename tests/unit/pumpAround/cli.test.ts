import { spawnSync } from 'node:child_process';
import { mkdtempSync, readFileSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';

function cli(...args: string[]) {
  return spawnSync('npx', ['tsx', 'server/cli.ts', 'pump-around', ...args], {
    encoding: 'utf8',
    timeout: 60000,
    maxBuffer: 64 * 1024 * 1024,
  });
}

describe('pump-around batch command', () => {
  const dir = mkdtempSync(join(tmpdir(), 'pa-cli-'));

  it('runs the example: exit 0 and the study JSON on stdout', () => {
    const r = cli('examples/pump-around-study.json');
    expect(r.status, r.stderr).toBe(0);
    const out = JSON.parse(r.stdout);
    expect(out.dryOutDuty_kW).toBeCloseTo(9475, 6);
    expect(out.dryOutTray).toBe(6);
    for (const key of [
      'minimumLiquidDuty_kW',
      'zoneOverloadDuty_kW',
      'limitingDuty_kW',
      'limitingTray',
      'limitingCheck',
      'recommendedDuty_kW',
    ])
      expect(out).toHaveProperty(key);
    expect(out.points).toHaveLength(23);
    expect(out.points[0].trays[0]).toHaveProperty('rating.checks.jetFlood');
  }, 60000);

  it('invalid input: exit 2 and {"errors":[{path,message}]} on stderr', () => {
    const j = JSON.parse(readFileSync('examples/pump-around-study.json', 'utf8'));
    j.pumpAround.returnTray = 12;
    const file = join(dir, 'bad.json');
    writeFileSync(file, JSON.stringify(j));
    const r = cli(file);
    expect(r.status).toBe(2);
    expect(r.stdout).toBe('');
    const { errors } = JSON.parse(r.stderr);
    expect(errors).toContainEqual(expect.objectContaining({ path: '/pumpAround/returnTray' }));
  }, 60000);

  it('bad JSON and a missing file: exit 2', () => {
    const file = join(dir, 'broken.json');
    writeFileSync(file, '{ "sections": [');
    const bad = cli(file);
    expect(bad.status).toBe(2);
    expect(JSON.parse(bad.stderr).errors[0].message).toMatch(/not valid JSON/);
    const missing = cli(join(dir, 'nope.json'));
    expect(missing.status).toBe(2);
    expect(JSON.parse(missing.stderr).errors[0].message).toMatch(/cannot read/);
  }, 60000);
});
