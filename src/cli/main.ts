/**
 * The `conformark` program: a thin shell over the public API. Parses options, calls `src/index.ts`, writes.
 * User errors print one line each and exit 2; bugs print one "internal error" line (stack with `--debug`).
 */
import { Command, CommanderError } from 'commander';
import { abandonOutputs, ConformarkError, formatIssue, fsReason, safeText, VERSION } from '../index.js';
import { COMMANDS } from './commands/index.js';
import { addLimitOptions } from './options.js';

/** Exit codes: 0 done, 1 finished with per-record errors, 2 bad input or usage. */
export const EXIT = { ok: 0, partial: 1, usage: 2 } as const;

/** Builds the commander program; exported for parse tests. */
export function buildProgram(): Command {
  const program = new Command('conformark')
    .description('Newman projections, chair drawings and ring puckering from 3D coordinates')
    .version(VERSION)
    .option('--debug', 'show stack traces for internal errors')
    .configureHelp({ showGlobalOptions: true })
    .showSuggestionAfterError(true)
    .exitOverride()
    // commander's own error text is replaced by one line of ours in `usageLine`; help goes to stdout
    .configureOutput({ writeErr: (s) => process.stderr.write(s), outputError: () => {} });
  addLimitOptions(program);
  for (const register of COMMANDS.values()) register(program);
  return program;
}

/** Runs the program on `argv` (as `process.argv`) and resolves to the exit code. */
export async function main(argv: readonly string[]): Promise<number> {
  const program = buildProgram();
  const debug = argv.includes('--debug');
  quietOnClosedPipe();
  cleanUpOnSignals();
  if (argv.slice(2).every((a) => a === '--debug')) {
    const names = [...COMMANDS.keys()].join(', ');
    process.stderr.write(`conformark: no command given (commands: ${names}); see conformark --help\n`);
    return EXIT.usage;
  }
  try {
    await program.parseAsync([...argv]);
    return typeof process.exitCode === 'number' ? process.exitCode : EXIT.ok;
  } catch (err) {
    return reportFailure(err, debug, commandOf(argv));
  }
}

let signalGuard = false;

/**
 * SIGINT (Ctrl-C) and SIGTERM: remove the temporary files and folder locks of the run, so every output file
 * and folder stays as it was before, then exit 130 or 143 (128 + the signal number) with one line.
 */
function cleanUpOnSignals(): void {
  if (signalGuard) return;
  signalGuard = true;
  const stop = (name: string, code: number) => () => {
    abandonOutputs();
    process.stderr.write(`conformark: stopped by ${name}; outputs left as they were before the run\n`);
    process.exit(code);
  };
  process.once('SIGINT', stop('SIGINT', 130));
  process.once('SIGTERM', stop('SIGTERM', 143));
}

let pipeGuard = false;

/** `conformark … | head` closes standard output early: stop quietly instead of crashing on EPIPE. */
function quietOnClosedPipe(): void {
  if (pipeGuard) return;
  pipeGuard = true;
  process.stdout.on('error', (err: NodeJS.ErrnoException) => {
    if (err.code === 'EPIPE') process.exit(EXIT.ok);
    throw err;
  });
}

/** The subcommand named on the command line, if any (for the help hint). */
function commandOf(argv: readonly string[]): string | null {
  return argv.slice(2).find((a) => COMMANDS.has(a)) ?? null;
}

/** Commander's message as one line of ours, ending with where to find help. */
export function usageLine(err: CommanderError, command: string | null): string {
  const text = err.message.replace(/^error: /, '').replace(/\n\(Did you mean (.*)\?\)/, ' (did you mean $1?)');
  const rewritten = text
    .replace(/^missing required argument '(.*)'$/, 'missing the <$1> argument')
    .replace(/^option '(\S+)[^']*' argument missing$/, '$1 needs a value')
    .replace(/^required option '(\S+) ([^']*)' not specified$/, '$1 $2 is required');
  const help = command && err.code !== 'commander.unknownCommand' ? `conformark ${command} --help` : 'conformark --help';
  return `conformark: ${rewritten.split('\n').join(' ')}; see ${help}`;
}

/** Prints a failure as one line (user error) or an "internal error" line plus a hint or the stack; returns the exit code. */
export function reportFailure(err: unknown, debug: boolean, command: string | null): number {
  if (err instanceof CommanderError) {
    if (err.code === 'commander.helpDisplayed' || err.code === 'commander.version') return EXIT.ok;
    if (err.code === 'commander.help') return EXIT.usage; // help shown because a command was missing
    process.stderr.write(`${usageLine(err, command)}\n`);
    return EXIT.usage;
  }
  if (err instanceof ConformarkError) {
    // messages quote file text: no terminal control sequences, bounded length
    for (const issue of err.issues) process.stderr.write(`conformark: ${safeText(formatIssue(issue), 1000).text}\n`);
    return EXIT.usage;
  }
  const e = err as NodeJS.ErrnoException;
  if (e && typeof e === 'object' && typeof e.code === 'string' && typeof e.path === 'string') {
    process.stderr.write(`conformark: ${e.path}: ${fsReason(e.code)}\n`);
    return EXIT.usage;
  }
  const message = err instanceof Error ? err.message : String(err);
  process.stderr.write(`conformark: internal error: ${message.split('\n')[0]}\n`);
  if (debug && err instanceof Error && err.stack) process.stderr.write(`${err.stack}\n`);
  else process.stderr.write('conformark: this is a bug; rerun with --debug and report the output\n');
  return EXIT.usage;
}
