/**
 * An exclusive lock on an output folder: a `.conformark.lock` file made with exclusive create, holding the
 * process id. A second run into the same folder is refused while the first is alive; a lock left by a process
 * that no longer exists (killed with SIGKILL, a power cut) is taken over.
 */
import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import { usageError } from '../model/errors.js';
import { fileOps } from './fileOps.js';
import { isSystemError } from './fsReason.js';
import { writeAll, writeFailure } from './tempFile.js';

/** The lock file's name inside a folder. */
export const LOCK_NAME = '.conformark.lock';

/** Locks held by this process, by path. */
const held = new Set<string>();

function alive(pid: number): boolean {
  try {
    process.kill(pid, 0);
    return true;
  } catch (err) {
    return isSystemError(err) && err.code === 'EPERM';
  }
}

/** The process id written in a lock file, or null when it cannot be read as one. */
function holder(path: string): number | null {
  try {
    const pid = Number(readFileSync(path, 'utf8').trim());
    return Number.isInteger(pid) && pid > 0 ? pid : null;
  } catch {
    return null;
  }
}

/**
 * Takes the lock on `dir` (which must exist); `shown` names the folder in messages.
 * @example const release = lockFolder('out', 'out'); try { … } finally { release(); }
 */
export function lockFolder(dir: string, shown: string): () => void {
  const path = join(dir, LOCK_NAME);
  const ops = fileOps();
  for (let attempt = 0; ; attempt++) {
    let fd: number;
    try {
      fd = ops.openSync(path, 'wx', 0o600);
    } catch (err) {
      if (!(isSystemError(err) && err.code === 'EEXIST')) throw writeFailure(err, shown);
      const pid = holder(path);
      if (attempt === 0 && pid !== null && pid !== process.pid && !alive(pid)) {
        ops.rmSync(path); // left by a run that is gone
        continue;
      }
      const who = pid === process.pid ? 'this run' : pid !== null ? `process ${pid}` : 'another run';
      throw usageError('folder-locked', `folder is in use by ${who} (lock file ${LOCK_NAME}); wait for it to finish, or remove the lock file if no conformark run is using the folder`, shown);
    }
    try {
      writeAll(fd, Buffer.from(`${process.pid}\n`));
    } finally {
      ops.closeSync(fd);
    }
    held.add(path);
    return () => {
      if (!held.delete(path)) return;
      try {
        ops.rmSync(path);
      } catch {
        // the folder went away: nothing to release
      }
    };
  }
}

/** Releases every lock this process holds (for an interrupted run). */
export function releaseAllLocks(): void {
  for (const path of [...held]) {
    try {
      fileOps().rmSync(path);
    } catch {
      // gone already
    }
    held.delete(path);
  }
}
