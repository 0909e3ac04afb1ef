/** Shared shapes of the batch command line (server/cli.ts dispatches by name to CliCommand functions). */

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
