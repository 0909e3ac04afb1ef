/**
 * `npm run -s cli -- rate request.json`: validate a rating request, rate every tray and print the
 * RatingResult JSON on stdout (exit 0); invalid input prints `{"errors":[{path,message}]}` on stderr (exit 2).
 */
import { readFile } from 'node:fs/promises';
import { rateSection, validateRatingRequest } from '../engine/index.js';
import { failWith, processIo, type CommandIo } from './types.js';

export async function rateCommand(args: string[], io: CommandIo = processIo): Promise<number> {
  const file = args[0];
  if (!file || args.length > 1) return failWith(io, [{ path: '(arguments)', message: 'usage: rate <request.json>' }]);
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
  const v = validateRatingRequest(json);
  if (!v.ok) return failWith(io, v.errors);
  io.stdout(`${JSON.stringify(rateSection(v.value), null, 2)}\n`);
  return 0;
}
