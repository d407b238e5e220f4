/**
 * A text file written as a stream through a temporary file in the same folder, renamed into place only by
 * `commit()`: a run that fails half-way leaves no half-written table and keeps any older one.
 */
import { closeSync, mkdirSync, openSync, renameSync, rmSync, writeSync } from 'node:fs';
import { basename, dirname, join, resolve } from 'node:path';
import { usageError } from '../../model/errors.js';
import { isProtected } from '../../io/writeAtomic.js';

const FLUSH_CHARS = 1 << 16;
let counter = 0;

/**
 * @example const out = new TextStream('out/table.csv'); out.write('a,b\n'); out.commit();
 */
export class TextStream {
  private readonly tmp: string;
  private fd: number | null;
  private buffer = '';

  constructor(readonly path: string) {
    if (isProtected(path)) throw usageError('overwrite-input', 'refusing to overwrite the input file', path);
    const dir = dirname(resolve(path));
    mkdirSync(dir, { recursive: true });
    this.tmp = join(dir, `.${basename(path)}.${process.pid}.${++counter}.tmp`);
    this.fd = openSync(this.tmp, 'w');
  }

  /** Appends text (buffered; flushed in blocks of about 64 K characters). */
  write(text: string): void {
    this.buffer += text;
    if (this.buffer.length >= FLUSH_CHARS) this.flush();
  }

  private flush(): void {
    if (this.fd !== null && this.buffer !== '') writeSync(this.fd, this.buffer);
    this.buffer = '';
  }

  /** Writes what is left and renames the file into place. */
  commit(): void {
    this.flush();
    if (this.fd !== null) closeSync(this.fd);
    this.fd = null;
    renameSync(this.tmp, this.path);
  }

  /** Drops the temporary file (after a failure). Safe to call twice or after `commit`. */
  abort(): void {
    if (this.fd !== null) closeSync(this.fd);
    this.fd = null;
    this.buffer = '';
    rmSync(this.tmp, { force: true });
  }
}
