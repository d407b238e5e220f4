/**
 * The file-system calls every writer goes through, in one object so a test can stand in a file system that
 * writes short or fails (a full disk, a read-only mount) without needing one.
 */
import { closeSync, fchmodSync, fsyncSync, openSync, renameSync, rmSync, writeSync } from 'node:fs';

/** The calls used to write outputs (same signatures as `node:fs`). */
export interface FileOps {
  openSync(path: string, flags: string, mode: number): number;
  /** Returns the number of bytes written, which may be fewer than asked (a short write). */
  writeSync(fd: number, data: Uint8Array, offset: number, length: number): number;
  fsyncSync(fd: number): void;
  fchmodSync(fd: number, mode: number): void;
  closeSync(fd: number): void;
  renameSync(from: string, to: string): void;
  rmSync(path: string): void;
}

/** The real calls. */
export const NODE_FILE_OPS: FileOps = {
  openSync: (path, flags, mode) => openSync(path, flags, mode),
  writeSync: (fd, data, offset, length) => writeSync(fd, data, offset, length),
  fsyncSync: (fd) => fsyncSync(fd),
  fchmodSync: (fd, mode) => fchmodSync(fd, mode),
  closeSync: (fd) => closeSync(fd),
  renameSync: (from, to) => renameSync(from, to),
  rmSync: (path) => rmSync(path, { force: true }),
};

let current: FileOps = NODE_FILE_OPS;

/** The calls in use. */
export function fileOps(): FileOps {
  return current;
}

/**
 * Runs `body` with `ops` standing in for the file system (tests only), then puts the real calls back.
 * @example await withFileOps({ ...NODE_FILE_OPS, writeSync: () => 1 }, () => writeAtomic('x.txt', 'abc'))
 */
export async function withFileOps<T>(ops: FileOps, body: () => T | Promise<T>): Promise<T> {
  const saved = current;
  current = ops;
  try {
    return await body();
  } finally {
    current = saved;
  }
}
