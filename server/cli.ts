/**
 * Frothline batch command line: `npm run -s cli -- <command> [args]`.
 * Subcommands live in server/cli/ and are dispatched by name from COMMANDS below; each resolves to the
 * exit code (0 ok, 2 invalid input with `{"errors":[{path,message}]}` on stderr).
 */
import { pathToFileURL } from 'node:url';
import { rateCommand } from './cli/rateCommand.js';
import { failWith, processIo, type CliCommand, type CommandIo } from './cli/types.js';

export const COMMANDS: Record<string, CliCommand> = {
  rate: rateCommand,
  // Pump-around study (server/cli/pumpAroundCommand.ts), loaded on demand so that `rate` never depends on it.
  'pump-around': async (args, io) => (await import('./cli/pumpAroundCommand.js')).pumpAroundCommand(args, io),
  // Gamma-scan reading (server/cli/gammaScanCommand.ts), loaded on demand like pump-around.
  'gamma-scan': async (args, io) => (await import('./cli/gammaScanCommand.js')).gammaScanCommand(args, io),
  // Heat-recovery plan (server/cli/heatPlanCommand.ts), loaded on demand likewise.
  'heat-plan': async (args, io) => (await import('./cli/heatPlanCommand.js')).heatPlanCommand(args, io),
};

export async function main(argv: string[], io: CommandIo = processIo): Promise<number> {
  const [name, ...args] = argv;
  const command = name === undefined ? undefined : COMMANDS[name];
  if (!command) {
    const known = Object.keys(COMMANDS).join(', ');
    return failWith(io, [
      { path: '(command)', message: `${name === undefined ? 'no command given' : `unknown command '${name}'`}; known: ${known}` },
    ]);
  }
  return command(args, io);
}

if (process.argv[1] && import.meta.url === pathToFileURL(process.argv[1]).href) {
  main(process.argv.slice(2)).then(
    (code) => {
      process.exitCode = code;
    },
    (e: unknown) => {
      process.stderr.write(`${JSON.stringify({ errors: [{ path: '(internal)', message: String(e) }] })}\n`);
      process.exitCode = 1;
    },
  );
}
