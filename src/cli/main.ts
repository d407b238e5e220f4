/**
 * The `conformark` program: a thin shell over the public API. Parses options, calls `src/index.ts`, writes.
 * User errors print one line each and exit 2; bugs print one "internal error" line (stack with `--debug`).
 */
import { Command, CommanderError } from 'commander';
import { ConformarkError, formatIssue, VERSION } from '../index.js';
import { COMMANDS } from './commands/index.js';

/** Exit codes: 0 done, 1 finished with per-record errors, 2 bad input or usage. */
export const EXIT = { ok: 0, partial: 1, usage: 2 } as const;

/** Builds the commander program; exported for parse tests. */
export function buildProgram(): Command {
  const program = new Command('conformark')
    .description('Newman projections, chair drawings and ring puckering from 3D coordinates')
    .version(VERSION)
    .option('--debug', 'show stack traces for internal errors')
    .showSuggestionAfterError(true)
    .exitOverride()
    .configureOutput({ writeErr: (s) => process.stderr.write(s) });
  for (const register of COMMANDS.values()) register(program);
  return program;
}

/** Runs the program on `argv` (as `process.argv`) and resolves to the exit code. */
export async function main(argv: readonly string[]): Promise<number> {
  const program = buildProgram();
  const debug = argv.includes('--debug');
  try {
    await program.parseAsync([...argv]);
    return typeof process.exitCode === 'number' ? process.exitCode : EXIT.ok;
  } catch (err) {
    return reportFailure(err, debug);
  }
}

function reportFailure(err: unknown, debug: boolean): number {
  if (err instanceof CommanderError) {
    if (err.code === 'commander.helpDisplayed' || err.code === 'commander.version') return EXIT.ok;
    if (err.code === 'commander.help') return EXIT.ok;
    return EXIT.usage; // commander already printed its one line
  }
  if (err instanceof ConformarkError) {
    for (const issue of err.issues) process.stderr.write(`conformark: ${formatIssue(issue)}\n`);
    return EXIT.usage;
  }
  const e = err as NodeJS.ErrnoException;
  if (e && typeof e === 'object' && typeof e.code === 'string' && typeof e.path === 'string') {
    const what = e.code === 'ENOENT' ? 'no such file' : e.code === 'EACCES' ? 'permission denied' : e.code;
    process.stderr.write(`conformark: ${e.path}: ${what}\n`);
    return EXIT.usage;
  }
  const message = err instanceof Error ? err.message : String(err);
  process.stderr.write(`conformark: internal error: ${message.split('\n')[0]}\n`);
  if (debug && err instanceof Error && err.stack) process.stderr.write(`${err.stack}\n`);
  else process.stderr.write('conformark: this is a bug; rerun with --debug and report the output\n');
  return EXIT.usage;
}
