/**
 * Bytes or text → lines, for every reader. Decodes UTF-8 strictly (invalid bytes or NUL characters are one
 * clear "not a text file" error), strips CR of CRLF, counts lines from 1, and refuses over-long lines before
 * they are held in memory in full.
 */
import { Buffer, isAscii, isUtf8 } from 'node:buffer';
import { ParseError } from '../model/errors.js';
import { issue, type LineConsumer } from './sink.js';

/**
 * Complete lines as ranges of one string: line k < count (numbered `first + k`) is
 * `text.slice(starts[k], ends[k])`, without its line break. Lets a consumer scan columns in place instead of
 * taking a substring per line. (Typed arrays: pushing 16,000 numbers onto plain arrays cost 10x more.)
 */
export interface LineBlock {
  readonly text: string;
  readonly count: number;
  readonly starts: Int32Array;
  readonly ends: Int32Array;
  readonly first: number;
}

/** The lines of some blocks as strings. */
export function lineStrings(blocks: readonly LineBlock[]): string[] {
  const out: string[] = [];
  for (const { text, count, starts, ends } of blocks) {
    for (let k = 0; k < count; k++) out.push(text.slice(starts[k], ends[k]));
  }
  return out;
}

/**
 * Feeds the lines of a block to a consumer, in place when it scans ranges (`feedRange`), from line `from`
 * until `stopped()`; returns the index of the first line not fed (`block.count` when all were).
 */
export function feedBlock(consumer: LineConsumer, block: LineBlock, stopped: () => boolean, from = 0): number {
  const { text, count, starts, ends, first } = block;
  let k = from;
  if (consumer.feedRange) {
    for (; k < count && !stopped(); k++) consumer.feedRange(text, starts[k]!, ends[k]!, first + k);
  } else {
    for (; k < count && !stopped(); k++) consumer.feed(text.slice(starts[k], ends[k]), first + k);
  }
  return k;
}

/** Line-range arrays shorter than this are not worth recycling. */
const RECYCLE_MIN = 256;
/** Spare line-range arrays kept by a splitter. */
const RECYCLE_MAX = 4;

/**
 * Pushes text or bytes in, returns the complete lines (without line breaks); `end()` returns the last one.
 * Lines are numbered consecutively from 1: the first line returned by a push is `lastLine + 1` of before.
 * The `...Blocks` forms return the same lines as ranges (`LineBlock`), without a substring per line.
 */
export class LineSplitter {
  /** Bytes of a UTF-8 sequence cut by the chunk boundary, kept for the next chunk. */
  private carry: Buffer | null = null;
  private started = false;
  private rest = '';
  private lineNo = 0;
  /** Line-range arrays handed back with `recycle`, reused by the next pushes. */
  private readonly spare: { starts: Int32Array; ends: Int32Array }[] = [];

  constructor(
    private readonly file: string,
    private readonly maxLineLength: number,
  ) {}

  /** Number of the last line handed out (0 before the first). */
  get lastLine(): number {
    return this.lineNo;
  }

  /** Pushes raw bytes. Throws `ParseError` on binary input or an over-long line. */
  pushBytes(bytes: Uint8Array): string[] {
    return lineStrings(this.pushBytesBlocks(bytes));
  }

  /** Pushes decoded text. Throws `ParseError` on NUL characters or an over-long line. */
  pushText(text: string): string[] {
    return lineStrings(this.pushTextBlocks(text));
  }

  /** Flushes the last line (when the input does not end with a line break). */
  end(): string[] {
    return lineStrings(this.endBlocks());
  }

  /** `pushBytes` as blocks. */
  pushBytesBlocks(bytes: Uint8Array): LineBlock[] {
    let buf = Buffer.from(bytes.buffer, bytes.byteOffset, bytes.byteLength);
    if (this.carry) {
      buf = Buffer.concat([this.carry, buf]);
      this.carry = null;
    }
    const cut = completeLength(buf);
    if (cut < buf.length) this.carry = Buffer.from(buf.subarray(cut));
    const whole = buf.subarray(0, cut);
    // plain ASCII (the usual case) decodes as latin1, a straight copy, some 20x faster than UTF-8 decoding;
    // otherwise isUtf8 + toString is several times faster than a fatal TextDecoder
    if (isAscii(whole)) return this.pushTextBlocks(whole.toString('latin1'));
    if (!isUtf8(whole)) throw this.notText(this.lineNo + 1 + badUtf8Line(whole, this.rest));
    return this.pushTextBlocks(whole.toString('utf8'));
  }

  /**
   * `pushText` as blocks: the line completed from the previous push is a block of its own, so the chunk
   * itself is never concatenated (a 1 MB concatenation is a rope that reads many times slower). Every line
   * is checked before anything is returned, so an over-long line throws before any line of the chunk is out.
   */
  pushTextBlocks(chunk: string): LineBlock[] {
    if (chunk.indexOf('\u0000') !== -1) throw this.notText();
    if (!this.started && chunk !== '') {
      this.started = true;
      if (chunk.charCodeAt(0) === 0xfeff) chunk = chunk.slice(1); // byte-order mark
    }
    const last = chunk.lastIndexOf('\n');
    if (last === -1) {
      this.rest = this.rest + chunk;
      if (this.rest.length > this.maxLineLength + 1) this.tooLong(this.lineNo + 1);
      return [];
    }
    const blocks: LineBlock[] = [];
    let from = 0;
    if (this.rest !== '') {
      from = chunk.indexOf('\n') + 1;
      const joined = this.rest + chunk.slice(0, from);
      blocks.push(this.ranges(joined, 0, joined.length - 1));
    }
    if (from <= last) blocks.push(this.ranges(chunk, from, last));
    this.rest = chunk.slice(last + 1);
    if (this.rest.length > this.maxLineLength + 1) this.tooLong(this.lineNo + 1);
    return blocks;
  }

  /**
   * Hands back blocks the caller is done with: their range arrays are reused by later pushes (the blocks
   * must not be read afterwards). Optional; without it every push allocates its own arrays.
   */
  recycle(blocks: readonly LineBlock[]): void {
    for (const { starts, ends } of blocks) {
      if (starts.length >= RECYCLE_MIN && this.spare.length < RECYCLE_MAX) this.spare.push({ starts, ends });
    }
  }

  /** `end` as blocks (none, or one with the last line). */
  endBlocks(): LineBlock[] {
    if (this.carry) throw this.notText(); // the input ends inside a UTF-8 sequence
    if (this.rest === '') return [];
    const raw = this.rest;
    this.rest = '';
    const first = this.lineNo + 1;
    const e = raw.charCodeAt(raw.length - 1) === 13 ? raw.length - 1 : raw.length;
    if (e > this.maxLineLength) this.tooLong(first);
    this.lineNo++;
    return [{ text: raw, count: 1, starts: Int32Array.of(0), ends: Int32Array.of(e), first }];
  }

  /** The lines of `text` from `from` up to the line break at `last` (inclusive), counted and checked. */
  private ranges(text: string, from: number, last: number): LineBlock {
    const first = this.lineNo + 1;
    const max = this.maxLineLength;
    const want = ((last - from) >> 5) + 16;
    const spare = this.spare.length > 0 && this.spare[this.spare.length - 1]!.starts.length >= want ? this.spare.pop() : undefined;
    let starts: Int32Array = spare?.starts ?? new Int32Array(want);
    let ends: Int32Array = spare?.ends ?? new Int32Array(starts.length);
    let count = 0;
    for (let pos = from; pos <= last; ) {
      const nl = text.indexOf('\n', pos);
      let e = nl;
      if (e > pos && text.charCodeAt(e - 1) === 13) e--;
      if (e - pos > max) this.tooLong(this.lineNo + 1);
      if (count === starts.length) [starts, ends] = [grown(starts), grown(ends)];
      starts[count] = pos;
      ends[count++] = e;
      this.lineNo++;
      pos = nl + 1;
    }
    return { text, count, starts, ends, first };
  }

  private tooLong(lineNo: number): never {
    throw new ParseError(
      issue('line-too-long', this.file, lineNo, `line is longer than ${this.maxLineLength} characters`),
    );
  }

  private notText(lineNo = this.lineNo + 1): ParseError {
    return new ParseError(
      issue(
        'binary-input',
        this.file,
        lineNo,
        'this is not a text file (NUL bytes or invalid UTF-8); expected XYZ, SDF/molfile or PDB text',
      ),
    );
  }
}

/** A copy of `a` with twice the room. */
function grown(a: Int32Array): Int32Array {
  const b = new Int32Array(2 * a.length);
  b.set(a);
  return b;
}

/** Length of the prefix of `buf` that ends on a UTF-8 sequence boundary (at most 3 bytes are held back). */
function completeLength(buf: Uint8Array): number {
  const n = buf.length;
  let i = n - 1;
  while (i >= 0 && i > n - 4 && (buf[i]! & 0xc0) === 0x80) i--;
  if (i < 0) return n;
  const lead = buf[i]!;
  if (lead < 0xc0) return n;
  const size = lead >= 0xf0 ? 4 : lead >= 0xe0 ? 3 : 2;
  return i + size > n ? i : n;
}

/** Line breaks before the first invalid UTF-8 sequence of `buf` (which continues the partial line `rest`). */
function badUtf8Line(buf: Buffer, rest: string): number {
  let lo = 0;
  let hi = buf.length; // isUtf8(buf[0, lo)) holds; the first bad byte lies in [lo, hi)
  while (hi - lo > 1) {
    const mid = (lo + hi) >>> 1;
    if (isUtf8(buf.subarray(0, completeLength(buf.subarray(0, mid))))) lo = mid;
    else hi = mid;
  }
  let breaks = 0;
  for (let i = 0; i < lo; i++) if (buf[i] === 10) breaks++;
  return rest === '' || breaks > 0 ? breaks : 0;
}
