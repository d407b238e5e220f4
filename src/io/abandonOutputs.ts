/** What an interrupted run (SIGINT, SIGTERM) must undo before it exits: its temporary files and folder locks. */
import { releaseAllLocks } from './folderLock.js';
import { removeLiveTemps } from './tempFile.js';

/**
 * Removes every temporary output file not yet renamed into place and releases every folder lock this process
 * holds, so the folders are left as they were before the run. Returns the number of temporary files removed.
 * @example process.on('SIGTERM', () => { abandonOutputs(); process.exit(143); })
 */
export function abandonOutputs(): number {
  const n = removeLiveTemps();
  releaseAllLocks();
  return n;
}
