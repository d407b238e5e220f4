/**
 * Sequential reading of a binary file through one growing buffer: `ensure(n)` makes the next `n` bytes
 * readable at `buffer[at]`, reading the file in large pieces, so a frame reader costs one system call per
 * few megabytes whatever the frame size. Constant memory (the largest frame plus one piece).
 */
import { open, type FileHandle } from 'node:fs/promises';

const PIECE = 4 << 20;

export class BinaryStream {
  /** The bytes read; `buffer[at]` is the byte at file offset `offset`. */
  buffer: Buffer;
  /** Index in `buffer` of the next unread byte. */
  at = 0;
  private end = 0;
  /** File offset of `buffer[0]`. */
  private base = 0;
  private eof = false;

  private constructor(
    private readonly fh: FileHandle,
    /** File size in bytes. */
    readonly size: number,
  ) {
    this.buffer = Buffer.alloc(Math.max(64, Math.min(PIECE, size)));
  }

  /** Opens `path` for sequential reading. */
  static async open(path: string): Promise<BinaryStream> {
    const fh = await open(path, 'r');
    try {
      return new BinaryStream(fh, (await fh.stat()).size);
    } catch (err) {
      await fh.close();
      throw err;
    }
  }

  /** File offset of the next unread byte. */
  get offset(): number {
    return this.base + this.at;
  }

  /** Bytes left in the file after the next unread byte. */
  get remaining(): number {
    return this.size - this.offset;
  }

  /** Makes `n` bytes from `at` readable; false when the file ends first. */
  async ensure(n: number): Promise<boolean> {
    if (this.end - this.at >= n) return true;
    if (this.at > 0) {
      this.buffer.copy(this.buffer, 0, this.at, this.end);
      this.base += this.at;
      this.end -= this.at;
      this.at = 0;
    }
    if (n > this.buffer.length) {
      const grown = Buffer.alloc(Math.max(n, 2 * this.buffer.length));
      this.buffer.copy(grown, 0, 0, this.end);
      this.buffer = grown;
    }
    while (this.end < n && !this.eof) {
      const { bytesRead } = await this.fh.read(this.buffer, this.end, this.buffer.length - this.end, this.base + this.end);
      if (bytesRead === 0) this.eof = true;
      this.end += bytesRead;
    }
    return this.end - this.at >= n;
  }

  /** Moves past `n` bytes (which need not have been read yet). */
  async skip(n: number): Promise<void> {
    const have = this.end - this.at;
    if (n <= have) {
      this.at += n;
      return;
    }
    this.base += this.at + n;
    this.at = 0;
    this.end = 0;
    this.eof = this.base >= this.size;
  }

  async close(): Promise<void> {
    await this.fh.close();
  }
}
