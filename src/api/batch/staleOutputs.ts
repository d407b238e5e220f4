/**
 * A rerun into the same folder must not leave files of the earlier run behind that the new manifest does not
 * list. The earlier `manifest.json` says which files conformark wrote; only those (plain names inside the
 * folder) are removed, and only when this run did not write them again. Nothing else in the folder is touched.
 */
import { existsSync, readFileSync, rmSync } from 'node:fs';
import { join } from 'node:path';
import { isProtected } from '../../io/writeAtomic.js';

/** Paths (relative to `dir`) that the manifest already in `dir` lists, or none when there is no valid one. */
export function previousOutputs(dir: string, schema: string): string[] {
  const path = join(dir, 'manifest.json');
  if (!existsSync(path)) return [];
  try {
    const doc = JSON.parse(readFileSync(path, 'utf8')) as { schema?: unknown; figures?: unknown; tables?: unknown };
    if (doc.schema !== schema) return [];
    const entries = [...(Array.isArray(doc.figures) ? doc.figures : []), ...(Array.isArray(doc.tables) ? doc.tables : [])];
    return entries.map((e) => (e as { path?: unknown }).path).filter((p): p is string => typeof p === 'string' && isPlainName(p));
  } catch {
    return [];
  }
}

/** Removes the earlier outputs this run did not write again. */
export function removeStale(dir: string, previous: readonly string[], written: ReadonlySet<string>): void {
  for (const name of previous) {
    const path = join(dir, name);
    if (!written.has(name) && existsSync(path) && !isProtected(path)) rmSync(path, { force: true });
  }
}

/** A file name with no folder part and no way out of the folder. */
const isPlainName = (p: string): boolean => p !== '' && !/[\\/]/.test(p) && p !== '.' && p !== '..';
