import { spawnSync } from 'node:child_process';
import { mkdtempSync, readFileSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';

function cli(...args: string[]) {
  return spawnSync('npx', ['tsx', 'server/cli.ts', 'heat-plan', ...args], {
    encoding: 'utf8',
    timeout: 60000,
    maxBuffer: 512 * 1024 * 1024,
  });
}

describe('heat-plan batch command', () => {
  const dir = mkdtempSync(join(tmpdir(), 'heat-plan-cli-'));
  const example = () => JSON.parse(readFileSync('examples/heat-plan.json', 'utf8'));

  it('runs a plan: exit 0 and the plan JSON with the issue field names on stdout', () => {
    const j = example();
    j.pumpArounds[0].sweep.steps = 4;
    j.pumpArounds[1].sweep.steps = 5;
    const file = join(dir, 'plan.json');
    writeFileSync(file, JSON.stringify(j));
    const r = cli(file);
    expect(r.status, r.stderr).toBe(0);
    const out = JSON.parse(r.stdout);
    expect(out.points).toHaveLength(5 * 6);
    const p = out.points[7];
    expect(p.duties_kW).toEqual([4000, 4400]); // A: 2500, 4000, …; B: 3000, 4400, …
    expect(p.condenserDutyChange_kW).toBeCloseTo(-(4000 - 4400 + 4400 - 6400), 9);
    expect(Object.keys(p.trays[0])).toEqual(
      expect.arrayContaining(['tray', 'vapourMassFlow_kg_h', 'liquidMassFlow_kg_h', 'rating']),
    );
    expect(p.trays[0].rating).toHaveProperty('checks.jetFlood.percentOfLimit');
    expect(out.boundary.length).toBeGreaterThan(0);
    for (const b of out.boundary) {
      expect(b.duties_kW).toHaveLength(2);
      expect(typeof b.tray).toBe('number');
      expect(typeof b.check).toBe('string');
    }
    for (const key of ['duties_kW', 'recoveredHeat_kW', 'recoveredAboveTemperature_kW', 'condenserDutyChange_kW'])
      expect(out.suggestion).toHaveProperty(key);
  }, 60000);

  it('invalid input: exit 2 and field-named errors on stderr', () => {
    const j = example();
    j.pumpArounds[1].returnTray = 8; // zone 8..18 overlaps the upper zone 7..9
    delete j.pumpArounds[0].drawTemperature_C;
    const file = join(dir, 'bad.json');
    writeFileSync(file, JSON.stringify(j));
    const r = cli(file);
    expect(r.status).toBe(2);
    expect(r.stdout).toBe('');
    const { errors } = JSON.parse(r.stderr);
    expect(errors).toContainEqual({ path: '/pumpArounds/0/drawTemperature_C', message: 'drawTemperature_C: is required' });
    j.pumpArounds[0].drawTemperature_C = 178;
    writeFileSync(file, JSON.stringify(j));
    const r2 = cli(file);
    expect(r2.status).toBe(2);
    expect(JSON.parse(r2.stderr).errors).toContainEqual(
      expect.objectContaining({ path: '/pumpArounds/1/returnTray', message: expect.stringMatching(/^returnTray: .*overlaps/) }),
    );
  }, 60000);

  it('bad JSON and a missing file: exit 2', () => {
    const file = join(dir, 'broken.json');
    writeFileSync(file, '{ "pumpArounds": [');
    const bad = cli(file);
    expect(bad.status).toBe(2);
    expect(JSON.parse(bad.stderr).errors[0].message).toMatch(/not valid JSON/);
    const missing = cli(join(dir, 'nope.json'));
    expect(missing.status).toBe(2);
    expect(JSON.parse(missing.stderr).errors[0].message).toMatch(/cannot read/);
  }, 60000);
});
