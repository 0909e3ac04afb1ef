/**
 * The run codec sits below the entities and migrations never import application code: files under
 * server/db/codec and server/db/migrations import only node built-ins, typeorm, each other, and payload
 * types from shared/types (type-only imports, erased when compiled).
 */
import { readdirSync, readFileSync } from 'node:fs';
import path from 'node:path';
import { describe, expect, it } from 'vitest';

const root = path.resolve('server/db');
const allowed = [path.join(root, 'codec'), path.join(root, 'migrations')];

function files(dir: string): string[] {
  return readdirSync(dir, { withFileTypes: true }).flatMap((e) =>
    e.isDirectory() ? files(path.join(dir, e.name)) : e.name.endsWith('.ts') ? [path.join(dir, e.name)] : [],
  );
}

describe('layering of the run codec and the migrations', () => {
  const checked = allowed.flatMap(files);

  it('finds the files it checks', () => {
    expect(checked.some((f) => f.endsWith('resultsFrb4.ts'))).toBe(true);
    expect(checked.some((f) => f.endsWith('1764750000000-RunResultsByName.ts'))).toBe(true);
  });

  it.each(checked.map((f) => [path.relative(root, f), f]))('%s imports no application code', (_name, file) => {
    const text = readFileSync(file, 'utf8');
    for (const m of text.matchAll(/^import (type )?[^'"]*from '([^']+)';/gm)) {
      const [, typeOnly, spec] = m as unknown as [string, string | undefined, string];
      if (spec.startsWith('node:') || spec === 'typeorm') continue;
      const target = path.resolve(path.dirname(file), spec);
      const inDbLayer = allowed.some((d) => target.startsWith(d + path.sep));
      const sharedType = !!typeOnly && target.startsWith(path.resolve('shared/types') + path.sep);
      expect(inDbLayer || sharedType, `${spec}`).toBe(true);
    }
  });
});
