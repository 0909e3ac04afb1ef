import { describe, expect, it } from 'vitest';
import { mkdtempSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { main } from '../../../server/cli.js';
import { inventedRequest } from './fixtures.js';

function capture() {
  const out: string[] = [];
  const err: string[] = [];
  return { io: { stdout: (t: string) => void out.push(t), stderr: (t: string) => void err.push(t) }, out, err };
}

describe('cli rate', () => {
  const dir = mkdtempSync(join(tmpdir(), 'frothline-cli-'));
  it('prints the result JSON and exits 0', async () => {
    const file = join(dir, 'ok.json');
    writeFileSync(file, JSON.stringify(inventedRequest()));
    const c = capture();
    expect(await main(['rate', file], c.io)).toBe(0);
    const result = JSON.parse(c.out.join(''));
    expect(result.trays).toHaveLength(2);
    expect(c.err).toEqual([]);
  });
  it('rates the four-pass example per pass (invented crude tray, examples/rate-four-pass.json)', async () => {
    const c = capture();
    expect(await main(['rate', 'examples/rate-four-pass.json'], c.io)).toBe(0);
    const [odd, even] = JSON.parse(c.out.join('')).trays;
    expect(odd.details.pass4OutletDowncomer).toBe(0); // side
    expect(odd.details.pass2OutletDowncomer).toBe(1); // centre
    expect(even.details.pass1OutletDowncomer).toBe(2); // off-centre
    expect(odd.details.passImbalance_percent).toBeLessThan(1); // split chosen close to the panel areas
  });
  it('exits 2 with field-named errors on stderr for invalid input', async () => {
    const file = join(dir, 'bad.json');
    const req = inventedRequest();
    req.trays[0]!.vapourDensity_kg_m3 = 900;
    writeFileSync(file, JSON.stringify(req));
    const c = capture();
    expect(await main(['rate', file], c.io)).toBe(2);
    const { errors } = JSON.parse(c.err.join(''));
    expect(errors[0].path).toBe('/trays/0/vapourDensity_kg_m3');
    expect(c.out).toEqual([]);
  });
  it('exits 2 on a missing file, bad JSON or unknown command', async () => {
    const bad = join(dir, 'notjson.json');
    writeFileSync(bad, '{');
    for (const argv of [['rate', join(dir, 'missing.json')], ['rate', bad], ['nope'], []]) {
      const c = capture();
      expect(await main(argv, c.io)).toBe(2);
      expect(JSON.parse(c.err.join('')).errors.length).toBeGreaterThan(0);
    }
  });
});
