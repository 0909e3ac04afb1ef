import { spawnSync } from 'node:child_process';
import { mkdtempSync, readFileSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { main } from '../../../server/cli.js';
import { gammaInput, scanSpec } from './fixtures.js';

/** In process (no extra tsx start-up): exit code, stdout and stderr of `gamma-scan <args>`. */
async function run(...args: string[]) {
  let stdout = '';
  let stderr = '';
  const status = await main(['gamma-scan', ...args], { stdout: (t) => void (stdout += t), stderr: (t) => void (stderr += t) });
  return { status, stdout, stderr };
}

function cli(...args: string[]) {
  return spawnSync('npx', ['tsx', 'server/cli.ts', 'gamma-scan', ...args], {
    encoding: 'utf8',
    timeout: 60000,
    maxBuffer: 16 * 1024 * 1024,
  });
}

describe('gamma-scan batch command', () => {
  const dir = mkdtempSync(join(tmpdir(), 'gamma-cli-'));

  it('runs the example (an invented scan from our model): exit 0, flooded trays 6–8 and missing tray 12', () => {
    const r = cli('examples/gamma-scan.json');
    expect(r.status, r.stderr).toBe(0);
    const out = JSON.parse(r.stdout);
    expect(out.trays.map((t: { tray: number }) => t.tray)).toEqual([2, 3, 4, 5, 6, 7, 8, 9, 10, 11, 12, 13, 14, 15]);
    for (const t of out.trays) {
      for (const k of ['tray', 'deckElevation_m', 'frothHeight_mm', 'predictedFrothHeight_mm', 'finding', 'reason'])
        expect(t).toHaveProperty(k);
      expect(t.reason).not.toMatch(/\n/);
    }
    const flagged = out.trays
      .filter((t: { finding: string }) => t.finding !== 'normal')
      .map((t: { tray: number; finding: string }) => [t.tray, t.finding]);
    expect(flagged).toEqual([
      [6, 'flooded'],
      [7, 'flooded'],
      [8, 'flooded'],
      [12, 'missing-tray'],
    ]);
    expect(out.floodedRegions).toEqual([expect.objectContaining({ topTray: 6, bottomTray: 8 })]);
    expect(out.threshold.fraction).toBe(0.5);
    expect(out).not.toHaveProperty('profile');
  }, 60000);

  it('a count-rate scan without loads: no prediction fields', async () => {
    const input = gammaInput(
      scanSpec([{ tray: 9, frothHeight_mm: 0 }], { countRates: { vapourCountRate: 40000, liquidCountRate: 3000 } }),
    );
    const file = join(dir, 'counts.json');
    writeFileSync(file, JSON.stringify(input));
    const r = await run(file);
    expect(r.status, r.stderr).toBe(0);
    const out = JSON.parse(r.stdout);
    expect(out.trays.find((t: { tray: number }) => t.tray === 9).finding).toBe('missing-tray');
    expect(out.trays[0]).not.toHaveProperty('predictedFrothHeight_mm');
  }, 60000);

  it('invalid input: exit 2 and field-named errors on stderr', async () => {
    const j = JSON.parse(readFileSync('examples/gamma-scan.json', 'utf8'));
    j.datum.tray = 40;
    j.scan[0] = { elevation_m: j.scan[0].elevation_m, density_kg_m3: 1, countRate: 5 };
    const file = join(dir, 'bad.json');
    writeFileSync(file, JSON.stringify(j));
    const r = await run(file);
    expect(r.status).toBe(2);
    expect(r.stdout).toBe('');
    const { errors } = JSON.parse(r.stderr);
    expect(errors).toContainEqual({ path: '/datum/tray', message: expect.stringMatching(/^tray: tray 40 is outside/) });
    expect(errors).toContainEqual({
      path: '/scan/0',
      message: expect.stringMatching(/exactly one of density_kg_m3 or countRate/),
    });
  }, 60000);

  it('bad JSON, a missing file and a missing argument: exit 2', async () => {
    const file = join(dir, 'broken.json');
    writeFileSync(file, '{ "scan": [');
    const bad = await run(file);
    expect(bad.status).toBe(2);
    expect(JSON.parse(bad.stderr).errors[0].message).toMatch(/not valid JSON/);
    const missing = await run(join(dir, 'nope.json'));
    expect(missing.status).toBe(2);
    expect(JSON.parse(missing.stderr).errors[0].message).toMatch(/cannot read/);
    const none = await run();
    expect(none.status).toBe(2);
    expect(JSON.parse(none.stderr).errors[0]).toEqual({ path: '(arguments)', message: 'usage: gamma-scan <scan.json>' });
  }, 60000);
});
