/**
 * A folder a command owns (batch, trajectory, demo). The command's manifest in the folder lists exactly the
 * files it wrote, as plain relative paths. A run:
 *   1. takes the folder's lock (a second run into the folder is refused);
 *   2. reads the earlier manifest and refuses one that is corrupt, of another kind, or lists a path that
 *      leaves the folder, goes through a symbolic link or names a folder;
 *   3. writes every output to a temporary file beside its target (nothing visible changes yet);
 *   4. on `commit`, renames them all into place, writes the manifest last and removes the files the earlier
 *      manifest listed that this run did not write again (regular files only, never through a link).
 * A failure or an interrupt before `commit` removes the temporary files and leaves the previous state.
 */
import { existsSync, lstatSync, readFileSync, readdirSync, rmdirSync, statSync } from 'node:fs';
import { dirname, join, relative, resolve, sep } from 'node:path';
import { usageError } from '../model/errors.js';
import { checkTarget, isProtected, makeFolders, writeAtomic } from './writeAtomic.js';
import { TempFile } from './tempFile.js';
import { lockFolder } from './folderLock.js';
import { fileOps } from './fileOps.js';

/** How a command's manifest is recognised and read. */
export interface ManifestKind {
  /** File name inside the folder, e.g. `manifest.json`. */
  readonly name: string;
  /** The `schema` value the manifest must carry. */
  readonly schema: string;
  /** The paths the manifest lists as written (anything not a string array is refused by the caller). */
  readonly files: (doc: Record<string, unknown>) => unknown[];
  /**
   * The command, when it owns the whole folder (the demo): a non-empty folder without its manifest is then
   * refused. Batch and trajectory add their files to any folder.
   */
  readonly ownsWholeFolder?: string;
}

/** Largest manifest read back (a 100,000-record batch lists about 15 MB). */
const MAX_MANIFEST_BYTES = 256 * 1024 * 1024;

/** A safe relative path: `/`-separated names, none empty, `.` or `..`, no NUL or backslash. */
export function isRelativeName(p: unknown): p is string {
  if (typeof p !== 'string' || p === '' || p.length > 1024 || /[\0\\]/.test(p) || p.startsWith('/')) return false;
  const parts = p.split('/');
  return parts.length <= 8 && parts.every((s) => s !== '' && s !== '.' && s !== '..');
}

function kindOf(path: string): 'file' | 'dir' | 'link' | 'other' | null {
  try {
    const s = lstatSync(path);
    return s.isSymbolicLink() ? 'link' : s.isFile() ? 'file' : s.isDirectory() ? 'dir' : 'other';
  } catch {
    return null;
  }
}

/** The first folder on the way from `dir` to `rel` that is a link or not a folder, or null. */
function badParent(dir: string, rel: string): string | null {
  const parts = rel.split('/');
  for (let k = 1; k < parts.length; k++) {
    const kind = kindOf(join(dir, ...parts.slice(0, k)));
    if (kind !== null && kind !== 'dir') return parts.slice(0, k).join('/');
  }
  return null;
}

/** @example const out = OutputFolder.open('si', 'si', BATCH); out.write('a.svg', svg); out.commit('manifest text'); */
export class OutputFolder {
  private readonly staged = new Map<string, TempFile>();
  private readonly release: () => void;
  private closed = false;

  private constructor(
    /** The folder, absolute. */
    readonly dir: string,
    /** The folder as the user named it (for messages). */
    readonly shown: string,
    readonly kind: ManifestKind,
    /** Files the earlier run's manifest listed. */
    readonly previous: readonly string[],
    release: () => void,
    /** Folders `open` created (outermost first): an aborted run removes them again when they are empty. */
    private readonly created: readonly string[] = [],
  ) {
    this.release = release;
  }

  /** Creates `dir` if needed, locks it and reads its earlier manifest (refusing a bad one). */
  static open(shown: string, kind: ManifestKind): OutputFolder {
    const dir = resolve(shown);
    if (existsSync(dir) && !statSync(dir).isDirectory()) throw usageError('write-failed', 'is a file, not a folder', shown);
    const created = makeFolders(dir);
    const release = lockFolder(dir, shown);
    try {
      return new OutputFolder(dir, shown, kind, readPrevious(dir, shown, kind), release, created);
    } catch (err) {
      release();
      throw err;
    }
  }

  /** The absolute path of `rel` inside the folder. */
  path(rel: string): string {
    return join(this.dir, ...rel.split('/'));
  }

  /** `path` as the user would write it (for messages). */
  private shownPath(rel: string): string {
    return join(this.shown, rel);
  }

  /** Refuses a relative path that is unsafe or goes through a link; creates its folders. */
  private prepare(rel: string): string {
    if (this.closed) throw new Error(`output folder ${this.shown} is already closed`);
    if (!isRelativeName(rel)) throw new Error(`not a plain relative path: ${rel}`);
    const bad = badParent(this.dir, rel);
    if (bad !== null) throw usageError('unsafe-path', `${bad} is a symbolic link or a file, not a folder: refusing to write through it`, this.shownPath(rel));
    const target = this.path(rel);
    checkTarget(target);
    makeFolders(dirname(target));
    return target;
  }

  /** Writes `rel` to a temporary file; it appears under its name on `commit`. */
  write(rel: string, data: string | Uint8Array): void {
    const target = this.prepare(rel);
    this.staged.get(rel)?.remove();
    const tmp = new TempFile(target, this.shownPath(rel));
    this.staged.set(rel, tmp);
    tmp.write(data);
    tmp.finish();
  }

  /** A writer for library functions that take a path: `path` must lie inside the folder. */
  readonly writer = (path: string, data: string | Uint8Array): void => {
    const rel = relative(this.dir, resolve(path)).split(sep).join('/');
    this.write(rel, data);
  };

  /** Adopts a temporary file made elsewhere (a streamed table) for `rel`, renamed on `commit`. */
  adopt(rel: string, tmp: TempFile): void {
    this.prepare(rel);
    this.staged.get(rel)?.remove();
    this.staged.set(rel, tmp);
  }

  /** Text of `rel` as this run wrote it (still temporary) or as it is on disk. */
  read(rel: string): string {
    const tmp = this.staged.get(rel);
    return readFileSync(tmp ? tmp.tmp : this.path(rel), 'utf8');
  }

  /** Files staged so far, relative, in the order written. */
  get written(): string[] {
    return [...this.staged.keys()];
  }

  /**
   * Renames every staged file into place, writes `manifest` (the manifest text) last, removes the earlier
   * outputs not written again (plus `alsoKeep`, written by a nested command), and releases the lock.
   */
  commit(manifest: string, alsoKeep: readonly string[] = []): void {
    try {
      for (const tmp of this.staged.values()) tmp.moveIntoPlace();
      writeAtomic(this.path(this.kind.name), manifest);
      const keep = new Set([...this.staged.keys(), ...alsoKeep, this.kind.name]);
      for (const rel of this.previous) if (!keep.has(rel)) removeListed(this.dir, rel);
    } catch (err) {
      this.abort();
      throw err;
    } finally {
      this.staged.clear();
      this.close();
    }
  }

  /**
   * Removes every staged file and releases the lock; the folder is as before the run (a folder this run
   * created is removed again when nothing else was put in it). Safe to call twice.
   */
  abort(): void {
    for (const tmp of this.staged.values()) tmp.remove();
    this.staged.clear();
    const wasOpen = !this.closed;
    this.close();
    if (!wasOpen) return;
    for (const d of [...this.created].reverse()) {
      try {
        if (readdirSync(d).length > 0) break;
        rmdirSync(d);
      } catch {
        break;
      }
    }
  }

  private close(): void {
    if (this.closed) return;
    this.closed = true;
    this.release();
  }
}

/** Removes a file the earlier manifest listed: a regular file only, never through a link; then empty folders it leaves. */
function removeListed(dir: string, rel: string): void {
  if (badParent(dir, rel) !== null) return;
  const path = join(dir, ...rel.split('/'));
  if (kindOf(path) !== 'file' || isProtected(path)) return;
  fileOps().rmSync(path);
  const parts = rel.split('/');
  for (let k = parts.length - 1; k >= 1; k--) {
    const sub = join(dir, ...parts.slice(0, k));
    try {
      if (readdirSync(sub).length > 0) break;
      rmdirSync(sub);
    } catch {
      break;
    }
  }
}

/** The earlier manifest's files; refuses a manifest that is corrupt, of another kind or lists unsafe paths. */
function readPrevious(dir: string, shown: string, kind: ManifestKind): string[] {
  const path = join(dir, kind.name);
  const where = join(shown, kind.name);
  const refuse = (why: string) =>
    usageError('bad-manifest', `${why}: refusing to write into this folder (remove ${kind.name} or choose another folder)`, where);
  const k = kindOf(path);
  if (k === null) {
    if (kind.ownsWholeFolder) {
      const others = readdirSync(dir).filter((n) => n !== '.conformark.lock');
      if (others.length > 0) throw usageError('folder-not-empty', `not empty and was not made by ${kind.ownsWholeFolder} (no ${kind.name}): choose an empty or new folder`, shown);
    }
    return [];
  }
  if (k !== 'file') throw refuse('is not a regular file');
  if (lstatSync(path).size > MAX_MANIFEST_BYTES) throw refuse('is too large for a manifest');
  let doc: unknown;
  try {
    doc = JSON.parse(readFileSync(path, 'utf8'));
  } catch {
    throw refuse('is not valid JSON');
  }
  if (typeof doc !== 'object' || doc === null || Array.isArray(doc) || (doc as { schema?: unknown }).schema !== kind.schema) {
    throw refuse(`is not a ${kind.schema} manifest`);
  }
  const files = kind.files(doc as Record<string, unknown>);
  const out: string[] = [];
  for (const f of files) {
    if (!isRelativeName(f)) throw refuse(`lists ${JSON.stringify(String(f)).slice(0, 80)}, which is not a plain path inside the folder`);
    const bad = badParent(dir, f);
    if (bad !== null) throw refuse(`lists ${f}, but ${bad} is a symbolic link or a file`);
    if (kindOf(join(dir, ...f.split('/'))) === 'dir') throw refuse(`lists ${f}, which is a folder`);
    out.push(f);
  }
  return out;
}
