/**
 * `npm run -s cli -- gamma-scan scan.json`: read a gamma scan tray by tray against the column (and the
 * rating, when loads are given) and print `{ threshold, trays, floodedRegions, notes }` on stdout (exit 0);
 * a missing file, bad JSON or invalid input prints `{"errors":[{path,message}]}` on stderr (exit 2).
 */
import { readFile } from 'node:fs/promises';
import { runGammaScan, validateGammaScanInput } from '../engine/fieldEvidence/index.js';
import { failWith, processIo, type CommandIo } from './types.js';

export async function gammaScanCommand(args: string[], io: CommandIo = processIo): Promise<number> {
  const file = args[0];
  if (!file || args.length > 1) return failWith(io, [{ path: '(arguments)', message: 'usage: gamma-scan <scan.json>' }]);
  let text: string;
  try {
    text = await readFile(file, 'utf8');
  } catch (e) {
    return failWith(io, [{ path: '(file)', message: `cannot read ${file}: ${(e as NodeJS.ErrnoException).code ?? String(e)}` }]);
  }
  let json: unknown;
  try {
    json = JSON.parse(text);
  } catch (e) {
    return failWith(io, [{ path: '(root)', message: `not valid JSON: ${(e as Error).message}` }]);
  }
  const v = validateGammaScanInput(json);
  if (!v.ok) return failWith(io, v.errors);
  const { profile: _profile, ...result } = runGammaScan(v.value);
  io.stdout(`${JSON.stringify(result, null, 2)}\n`);
  return 0;
}
