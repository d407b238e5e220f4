/**
 * Atomic output: write to a temporary file in the same folder (unpredictable name, exclusive create, every
 * write checked, fsync), then rename into place, so a failed run never leaves a half-written file and never
 * clobbers an existing one.
 */
import { existsSync, fstatSync, mkdirSync, realpathSync, statSync } from 'node:fs';
import { dirname, resolve } from 'node:path';
import { usageError } from '../model/errors.js';
import { TempFile, writeFailure } from './tempFile.js';

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

/**
 * Marks a path as an input of this run: `writeAtomic` refuses to overwrite it. `-` (standard input) protects
 * the file standard input is redirected from, if it is one (`newman - -o mol.svg < mol.svg` is refused).
 */
export function protectInput(path: string): void {
  if (path === '-') {
    try {
      const s = fstatSync(0);
      if (s.isFile()) protectedFiles.add(`${s.dev}:${s.ino}`);
    } catch {
      // no standard input at all: nothing to protect
    }
    return;
  }
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
export function makeFolders(dir: string): string[] {
  const missing: string[] = [];
  for (let d = dir; !existsSync(d); d = dirname(d)) {
    missing.push(d);
    if (dirname(d) === d) break;
  }
  try {
    for (const d of missing.reverse()) mkdirSync(d);
  } catch (err) {
    throw writeFailure(err, dir);
  }
  return missing;
}

/** Refuses `path` when it is a protected input or a folder. */
export function checkTarget(path: string): void {
  if (isProtected(path)) {
    throw usageError('overwrite-input', 'refusing to overwrite the input file', path);
  }
  if (existsSync(path) && statSync(path).isDirectory()) {
    throw usageError('write-failed', 'is a folder; give a file name to write to', path);
  }
}

/**
 * Writes `data` to `path` atomically. Creates the parent folder. Refuses to overwrite a protected input or
 * a folder; a file-system failure is a `write-failed` error naming `path` (the old file, if any, is kept).
 * @example writeAtomic('out/fig.svg', svgText)
 */
export function writeAtomic(path: string, data: string | Uint8Array): void {
  checkTarget(path);
  const target = resolve(path);
  makeFolders(dirname(target));
  const tmp = new TempFile(target, path);
  tmp.write(data);
  tmp.moveIntoPlace();
}
