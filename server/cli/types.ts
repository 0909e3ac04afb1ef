/** Shared shapes of the batch command line (server/cli.ts dispatches by name to CliCommand functions). */
import { readFile } from 'node:fs/promises';

export interface CommandIo {
  stdout: (text: string) => void;
  stderr: (text: string) => void;
}

/** A subcommand: runs with its arguments and resolves to the exit code (0 ok, 2 invalid input). */
export type CliCommand = (args: string[], io?: CommandIo) => Promise<number>;

export const processIo: CommandIo = {
  stdout: (t) => void process.stdout.write(t),
  stderr: (t) => void process.stderr.write(t),
};

/** Exit code for invalid input (bad file, bad JSON, schema or physics errors, unknown command). */
export const EXIT_INVALID = 2;

/** Print `{"errors":[{path,message}]}` on stderr and return EXIT_INVALID. */
export function failWith(io: CommandIo, errors: { path: string; message: string }[]): number {
  io.stderr(`${JSON.stringify({ errors })}\n`);
  return EXIT_INVALID;
}

type Validation<T> = { ok: true; value: T } | { ok: false; errors: { path: string; message: string }[] };

/**
 * A command that reads one JSON file, validates it and prints the JSON answer on stdout (exit 0); a missing
 * argument or file, bad JSON or invalid input prints `{"errors":[{path,message}]}` on stderr (exit 2).
 */
export function jsonFileCommand<T>(
  usage: string,
  validate: (json: unknown) => Validation<T>,
  run: (input: T) => unknown,
): CliCommand {
  return async (args, io = processIo) => {
    const file = args[0];
    if (!file || args.length > 1) return failWith(io, [{ path: '(arguments)', message: `usage: ${usage}` }]);
    let text: string;
    try {
      text = await readFile(file, 'utf8');
    } catch (e) {
      return failWith(io, [
        { path: '(file)', message: `cannot read ${file}: ${(e as NodeJS.ErrnoException).code ?? String(e)}` },
      ]);
    }
    let json: unknown;
    try {
      json = JSON.parse(text);
    } catch (e) {
      return failWith(io, [{ path: '(root)', message: `not valid JSON: ${(e as Error).message}` }]);
    }
    const v = validate(json);
    if (!v.ok) return failWith(io, v.errors);
    io.stdout(`${JSON.stringify(run(v.value), null, 2)}\n`);
    return 0;
  };
}
