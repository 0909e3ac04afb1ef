import { describe, expect, it } from 'vitest';
import { readdirSync, readFileSync } from 'node:fs';
import path from 'node:path';
import { palette } from '../../../shared/palette';

const SCSS = 'src/css/quasar.variables.scss';
const HEX = /(?<![&\w])#(?:[0-9a-f]{8}|[0-9a-f]{6}|[0-9a-f]{3,4})\b/gi;

/** `$name: #hex;` lines of the SCSS variables, keyed by name. */
function scssColours(): Record<string, string> {
  const out: Record<string, string> = {};
  for (const m of readFileSync(SCSS, 'utf8').matchAll(/^\$([a-z0-9-]+)\s*:\s*(#[0-9a-f]+)\s*;/gim))
    out[m[1]!] = m[2]!.toLowerCase();
  return out;
}
const kebab = (k: string) => k.replace(/[A-Z0-9]/g, (c) => `-${c.toLowerCase()}`);

function sourceFiles(dir: string): string[] {
  return readdirSync(dir, { withFileTypes: true }).flatMap((e) => {
    const p = path.join(dir, e.name);
    if (e.isDirectory()) return sourceFiles(p);
    return /\.(vue|ts|scss|css)$/.test(e.name) ? [p] : [];
  });
}

describe('brand colours live in quasar.variables.scss', () => {
  it('the palette module has exactly the colours of the SCSS variables, with the same values', () => {
    const scss = scssColours();
    expect(Object.keys(scss).length).toBeGreaterThan(9); // Quasar's brand colours and ours
    const fromModule = Object.fromEntries(Object.entries(palette).map(([k, v]) => [kebab(k), v.toLowerCase()]));
    expect(fromModule).toEqual(scss);
  });

  it('no other client file writes a colour as a hex literal', () => {
    const found = sourceFiles('src')
      .filter((f) => f !== path.normalize(SCSS))
      .flatMap((f) => [...readFileSync(f, 'utf8').matchAll(HEX)].map((m) => `${f}: ${m[0]}`));
    expect(found).toEqual([]);
  });

  it("the server (PDF charts and tables) writes none of the palette's colours as a hex literal: it imports shared/palette.ts", () => {
    const values = new Set<string>(Object.values(palette).map((v) => v.toLowerCase()));
    const found = sourceFiles('server').flatMap((f) =>
      [...readFileSync(f, 'utf8').matchAll(HEX)].filter((m) => values.has(m[0].toLowerCase())).map((m) => `${f}: ${m[0]}`),
    );
    expect(found).toEqual([]);
  });
});
