/** File-system error codes in plain words, for one-line messages. */

const REASONS: Readonly<Record<string, string>> = {
  ENOENT: 'no such file',
  EACCES: 'permission denied',
  EPERM: 'permission denied',
  EISDIR: 'is a folder, not a file',
  ENOTDIR: 'a part of the path is not a folder',
  ENOSPC: 'no space left on the device',
  EDQUOT: 'disk quota exceeded',
  EROFS: 'the file system is read-only',
  ENAMETOOLONG: 'the file name is too long',
  ELOOP: 'too many symbolic links',
  EEXIST: 'already exists',
  EBUSY: 'the file is busy',
  EXDEV: 'cannot rename across file systems',
};

/**
 * The words for a Node file-system error code (`ENOENT` → `no such file`); the code itself when unknown.
 * @example fsReason('EISDIR') // 'is a folder, not a file'
 */
export function fsReason(code: string): string {
  return Object.hasOwn(REASONS, code) ? REASONS[code]! : code;
}

/** True for a Node system error carrying a string `code` (ENOENT, EACCES, ...). */
export function isSystemError(err: unknown): err is NodeJS.ErrnoException & { code: string } {
  return typeof err === 'object' && err !== null && typeof (err as NodeJS.ErrnoException).code === 'string' && 'syscall' in err;
}
