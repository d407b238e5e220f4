/**
 * Atomic output: write to a temporary file in the same folder, then rename into place, so a failed run never
 * leaves a half-written file and never clobbers an existing one.
 */
import { mkdirSync, renameSync, rmSync, writeFileSync, realpathSync, existsSync } from 'node:fs';
import { dirname, basename, join, resolve } from 'node:path';
import { usageError } from '../model/errors.js';

let counter = 0;

/** Paths that must never be written (the inputs of the current run), compared after resolving. */
const protectedPaths = new Set<string>();

function canonical(path: string): string {
  const abs = resolve(path);
  try {
    return realpathSync(abs);
  } catch {
    return abs;
  }
}

/** Marks a path as an input of this run: `writeAtomic` refuses to overwrite it. */
export function protectInput(path: string): void {
  if (path !== '-') protectedPaths.add(canonical(path));
}

/**
 * Writes `data` to `path` atomically. Creates the parent folder. Refuses to overwrite a protected input.
 * @example writeAtomic('out/fig.svg', svgText)
 */
export function writeAtomic(path: string, data: string | Uint8Array): void {
  if (existsSync(path) && protectedPaths.has(canonical(path))) {
    throw usageError('overwrite-input', `refusing to overwrite the input file ${path}`, path);
  }
  const dir = dirname(resolve(path));
  mkdirSync(dir, { recursive: true });
  const tmp = join(dir, `.${basename(path)}.${process.pid}.${++counter}.tmp`);
  try {
    writeFileSync(tmp, data);
    renameSync(tmp, path);
  } catch (err) {
    rmSync(tmp, { force: true });
    throw err;
  }
}
