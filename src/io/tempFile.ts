/**
 * A temporary file beside its target: an unpredictable name, created exclusively (`wx`, mode 0600, so a
 * symlink or file planted at that name is never opened), every write checked for a short count, flushed to
 * the disk (fsync) before it is renamed into place. Live temporary files are listed so an interrupted run
 * (SIGINT, SIGTERM) can remove them.
 */
import { randomBytes } from 'node:crypto';
import { lstatSync } from 'node:fs';
import { basename, dirname, join } from 'node:path';
import { usageError } from '../model/errors.js';
import { fileOps } from './fileOps.js';
import { fsReason, isSystemError } from './fsReason.js';

/** Temporary files not yet renamed or removed, by path. */
const live = new Set<string>();

/** Mode for new outputs: read-write for the owner, readable by others, as the process umask allows. */
function newFileMode(): number {
  return 0o666 & ~process.umask();
}

/** The mode a replaced file keeps, or the mode of a new one. */
function targetMode(path: string): number {
  try {
    const s = lstatSync(path);
    return s.isFile() ? s.mode & 0o777 : newFileMode();
  } catch {
    return newFileMode();
  }
}

/** A write failure as one user-facing line naming the output (the reason in plain words). */
export function writeFailure(err: unknown, path: string): Error {
  if (isSystemError(err)) return usageError('write-failed', `cannot write: ${fsReason(err.code)}`, path);
  return err instanceof Error ? err : new Error(String(err));
}

/** Writes every byte of `data` to `fd`, going on after short writes; a write of 0 bytes is a full disk. */
export function writeAll(fd: number, data: Uint8Array): void {
  const ops = fileOps();
  let done = 0;
  while (done < data.length) {
    const n = ops.writeSync(fd, data, done, data.length - done);
    if (!(n > 0)) throw Object.assign(new Error('short write'), { code: 'ENOSPC', syscall: 'write' });
    done += n;
  }
}

/**
 * @example const t = new TempFile('out/fig.svg'); t.write(bytes); t.finish(); t.moveIntoPlace();
 */
export class TempFile {
  /** The temporary file's path (in the target's folder). */
  readonly tmp: string;
  private fd: number | null;

  /** Creates the temporary file for `target` (its folder must exist); messages name it `shownAs`. */
  constructor(
    readonly target: string,
    private readonly shownAs: string = target,
  ) {
    const ops = fileOps();
    let fd: number | null = null;
    let tmp = '';
    for (let attempt = 0; fd === null; attempt++) {
      tmp = join(dirname(target), `.${basename(target).slice(0, 80)}.${randomBytes(9).toString('base64url')}.tmp`);
      try {
        fd = ops.openSync(tmp, 'wx', 0o600);
      } catch (err) {
        // a name already taken (planted or a one-in-2^72 clash): draw another, never open it
        if (!(isSystemError(err) && err.code === 'EEXIST' && attempt < 8)) throw writeFailure(err, shownAs);
      }
    }
    this.tmp = tmp;
    this.fd = fd;
    live.add(tmp);
  }

  /** Appends bytes or text (UTF-8). */
  write(data: string | Uint8Array): void {
    if (this.fd === null) throw new Error(`TempFile ${this.tmp} is closed`);
    try {
      writeAll(this.fd, typeof data === 'string' ? Buffer.from(data, 'utf8') : data);
    } catch (err) {
      this.remove();
      throw writeFailure(err, this.shownAs);
    }
  }

  /** Flushes to the disk and closes; the file then has the target's mode. */
  finish(): void {
    if (this.fd === null) return;
    const ops = fileOps();
    const fd = this.fd;
    try {
      ops.fchmodSync(fd, targetMode(this.target));
      ops.fsyncSync(fd);
      this.fd = null;
      ops.closeSync(fd);
    } catch (err) {
      this.fd = null;
      this.remove();
      throw writeFailure(err, this.shownAs);
    }
  }

  /** Renames the finished file onto the target (replacing a file or a symlink there, never following it). */
  moveIntoPlace(): void {
    this.finish();
    try {
      fileOps().renameSync(this.tmp, this.target);
      live.delete(this.tmp);
    } catch (err) {
      this.remove();
      throw writeFailure(err, this.shownAs);
    }
  }

  /** Closes and deletes the temporary file. Safe to call twice or after `moveIntoPlace`. */
  remove(): void {
    const ops = fileOps();
    if (this.fd !== null) {
      try {
        ops.closeSync(this.fd);
      } catch {
        // already closed by the system: nothing to do
      }
      this.fd = null;
    }
    if (!live.has(this.tmp)) return;
    try {
      ops.rmSync(this.tmp);
    } catch {
      // the folder went away: nothing left to clean
    }
    live.delete(this.tmp);
  }
}

/** Removes every temporary file still open or not yet renamed (for an interrupted run); returns how many. */
export function removeLiveTemps(): number {
  let n = 0;
  for (const tmp of [...live]) {
    try {
      fileOps().rmSync(tmp);
      n++;
    } catch {
      // gone already
    }
    live.delete(tmp);
  }
  return n;
}

/** Temporary files not yet renamed or removed (tests). */
export function liveTemps(): readonly string[] {
  return [...live];
}
