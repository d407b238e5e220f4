/**
 * A text file written as a stream through a temporary file in the same folder (exclusive create, every write
 * checked, fsync), renamed into place only by `commit()`: a run that fails half-way (a full disk included)
 * leaves no half-written table and keeps any older one.
 */
import { dirname, resolve } from 'node:path';
import { checkTarget, makeFolders } from '../../io/writeAtomic.js';
import { TempFile } from '../../io/tempFile.js';

const FLUSH_CHARS = 1 << 16;

/**
 * @example const out = new TextStream('out/table.csv'); out.write('a,b\n'); out.commit();
 */
export class TextStream {
  private readonly file: TempFile;
  private buffer = '';

  constructor(readonly path: string) {
    checkTarget(path);
    makeFolders(dirname(resolve(path)));
    this.file = new TempFile(resolve(path), path);
  }

  /** The temporary file's path (for a caller that renames several files together). */
  get temporary(): TempFile {
    return this.file;
  }

  /** Appends text (buffered; flushed in blocks of about 64 K characters). */
  write(text: string): void {
    this.buffer += text;
    if (this.buffer.length >= FLUSH_CHARS) this.flush();
  }

  private flush(): void {
    if (this.buffer !== '') this.file.write(this.buffer);
    this.buffer = '';
  }

  /** Writes what is left, flushes it to the disk and closes the file, not yet renamed (see `temporary`). */
  finish(): void {
    this.flush();
    this.file.finish();
  }

  /** Writes what is left and renames the file into place. */
  commit(): void {
    this.finish();
    this.file.moveIntoPlace();
  }

  /** Drops the temporary file (after a failure). Safe to call twice or after `commit`. */
  abort(): void {
    this.buffer = '';
    this.file.remove();
  }
}
