/**
 * Atomic output: write to a temporary file in the same folder, then rename into place, so a failed run never
 * leaves a half-written file and never clobbers an existing one.
 */
import { existsSync, mkdirSync, realpathSync, renameSync, rmSync, statSync, writeFileSync } from 'node:fs';
import { basename, dirname, join, resolve } from 'node:path';
import { usageError } from '../model/errors.js';
import { fsReason, isSystemError } from './fsReason.js';

let counter = 0;

/** Paths that must never be written (the inputs of the current run), compared after resolving. */
const protectedPaths = new Set<string>();
/** The same inputs as `device:inode`, so a hard link or a bind mount of an input is refused too. */
const protectedFiles = new Set<string>();

function canonical(path: string): string {
  const abs = resolve(path);
  try {
    return realpathSync(abs);
  } catch {
    return abs;
  }
}

function fileId(path: string): string | null {
  try {
    const s = statSync(path);
    return s.isFile() ? `${s.dev}:${s.ino}` : null;
  } catch {
    return null;
  }
}

/** Marks a path as an input of this run: `writeAtomic` refuses to overwrite it. */
export function protectInput(path: string): void {
  if (path === '-') return;
  protectedPaths.add(canonical(path));
  const id = fileId(path);
  if (id) protectedFiles.add(id);
}

/** True when writing `path` would overwrite a protected input (same path after symlinks, or same file). */
export function isProtected(path: string): boolean {
  if (!existsSync(path)) return false;
  if (protectedPaths.has(canonical(path))) return true;
  const id = fileId(path);
  return id !== null && protectedFiles.has(id);
}

/**
 * Creates the missing folders of `dir` one level at a time (Node's recursive mkdir can spin forever on
 * pseudo file systems such as /proc).
 */
function makeFolders(dir: string): void {
  const missing: string[] = [];
  for (let d = dir; !existsSync(d); d = dirname(d)) {
    missing.push(d);
    if (dirname(d) === d) break;
  }
  for (const d of missing.reverse()) mkdirSync(d);
}

function removeQuietly(path: string): void {
  try {
    rmSync(path, { force: true });
  } catch {
    // the temporary file was never made (e.g. its folder is a file): nothing to clean up
  }
}

/**
 * Writes `data` to `path` atomically. Creates the parent folder. Refuses to overwrite a protected input or
 * a folder; a file-system failure is a `write-failed` error naming `path` (the old file, if any, is kept).
 * @example writeAtomic('out/fig.svg', svgText)
 */
export function writeAtomic(path: string, data: string | Uint8Array): void {
  if (isProtected(path)) {
    throw usageError('overwrite-input', 'refusing to overwrite the input file', path);
  }
  if (existsSync(path) && statSync(path).isDirectory()) {
    throw usageError('write-failed', 'is a folder; give a file name to write to', path);
  }
  const dir = dirname(resolve(path));
  const tmp = join(dir, `.${basename(path)}.${process.pid}.${++counter}.tmp`);
  try {
    makeFolders(dir);
    writeFileSync(tmp, data);
    renameSync(tmp, path);
  } catch (err) {
    removeQuietly(tmp);
    if (isSystemError(err)) throw usageError('write-failed', `cannot write: ${fsReason(err.code)}`, path);
    throw err;
  }
}
