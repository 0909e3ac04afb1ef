/**
 * `npm run -s cli -- heat-plan plan.json`: validate a heat-recovery plan, run it and print the
 * HeatPlanResult JSON on stdout (exit 0); a missing file, bad JSON or invalid input prints
 * `{"errors":[{path,message}]}` on stderr (exit 2).
 */
import { readFile } from 'node:fs/promises';
import { runHeatPlan, validateHeatPlanInput } from '../engine/heatPlan/index.js';
import { failWith, processIo, type CommandIo } from './types.js';

export async function heatPlanCommand(args: string[], io: CommandIo = processIo): Promise<number> {
  const file = args[0];
  if (!file || args.length > 1) return failWith(io, [{ path: '(arguments)', message: 'usage: heat-plan <plan.json>' }]);
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
  const v = validateHeatPlanInput(json);
  if (!v.ok) return failWith(io, v.errors);
  io.stdout(`${JSON.stringify(runHeatPlan(v.value), null, 2)}\n`);
  return 0;
}
