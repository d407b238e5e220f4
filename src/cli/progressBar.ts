/** cli-progress, loaded on first use: only a run whose stderr is a terminal draws a bar. */
import { createRequire } from 'node:module';
import type CliProgress from 'cli-progress';

let module: typeof CliProgress | undefined;

/** The cli-progress module. */
export function cliProgress(): typeof CliProgress {
  return (module ??= createRequire(import.meta.url)('cli-progress') as typeof CliProgress);
}
