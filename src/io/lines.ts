/**
 * Bytes or text → lines, for every reader. Decodes UTF-8 strictly (invalid bytes or NUL characters are one
 * clear "not a text file" error), strips CR of CRLF, counts lines from 1, and refuses over-long lines before
 * they are held in memory in full.
 */
import { Buffer, isUtf8 } from 'node:buffer';
import { ParseError } from '../model/errors.js';
import { issue } from './sink.js';

/**
 * Pushes text or bytes in, returns the complete lines (without line breaks); `end()` returns the last one.
 * Lines are numbered consecutively from 1: the first line returned by a push is `lastLine + 1` of before.
 */
export class LineSplitter {
  /** Bytes of a UTF-8 sequence cut by the chunk boundary, kept for the next chunk. */
  private carry: Buffer | null = null;
  private started = false;
  private rest = '';
  private lineNo = 0;

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
    let buf = Buffer.from(bytes.buffer, bytes.byteOffset, bytes.byteLength);
    if (this.carry) {
      buf = Buffer.concat([this.carry, buf]);
      this.carry = null;
    }
    const cut = completeLength(buf);
    if (cut < buf.length) this.carry = Buffer.from(buf.subarray(cut));
    const whole = buf.subarray(0, cut);
    // isUtf8 + toString is several times faster than a fatal TextDecoder
    if (!isUtf8(whole)) throw this.notText(this.lineNo + 1 + badUtf8Line(whole, this.rest));
    return this.pushText(whole.toString('utf8'));
  }

  /** Pushes decoded text. Throws `ParseError` on NUL characters or an over-long line. */
  pushText(text: string): string[] {
    if (text.indexOf('\u0000') !== -1) throw this.notText();
    if (!this.started && text !== '') {
      this.started = true;
      if (text.charCodeAt(0) === 0xfeff) text = text.slice(1); // byte-order mark
    }
    const out: string[] = [];
    let pos = 0;
    let nl = text.indexOf('\n');
    if (this.rest !== '' && nl !== -1) {
      out.push(this.finish(this.rest + text.slice(0, nl)));
      this.rest = '';
      pos = nl + 1;
      nl = text.indexOf('\n', pos);
    }
    const max = this.maxLineLength;
    while (nl !== -1) {
      let stop = nl;
      if (stop > pos && text.charCodeAt(stop - 1) === 13) stop--;
      if (stop - pos > max) this.tooLong(this.lineNo + 1);
      out.push(text.slice(pos, stop));
      this.lineNo++;
      pos = nl + 1;
      nl = text.indexOf('\n', pos);
    }
    if (pos < text.length) {
      this.rest = this.rest + text.slice(pos);
      if (this.rest.length > max + 1) this.tooLong(this.lineNo + 1);
    }
    return out;
  }

  /** Flushes the last line (when the input does not end with a line break). */
  end(): string[] {
    if (this.carry) throw this.notText(); // the input ends inside a UTF-8 sequence
    const out: string[] = [];
    if (this.rest !== '') {
      out.push(this.finish(this.rest));
      this.rest = '';
    }
    return out;
  }

  private finish(raw: string): string {
    const line = raw.charCodeAt(raw.length - 1) === 13 ? raw.slice(0, -1) : raw;
    if (line.length > this.maxLineLength) this.tooLong(this.lineNo + 1);
    this.lineNo++;
    return line;
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
