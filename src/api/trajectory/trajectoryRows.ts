/**
 * The CSV rows of a trajectory run, written as bytes straight into a buffer that is handed to the text
 * stream every 64 KiB. Numbers are printed digit by digit: `String(x)` goes through V8's number-to-string
 * cache, which keeps the last few thousand result strings alive long enough to be promoted, so a million
 * rows grew the old generation by some 60 MB before a full collection; rows built with `+=` and queued as
 * strings did the same. Here a row allocates nothing.
 */
import { Buffer } from 'node:buffer';
import type { TextStream } from './csvStream.js';

/** Bytes gathered per hand-over (a string of this size is still a regular, young heap object). */
const ROW_BYTES = 1 << 16;
/** Room always left for one more field of numbers. */
const FIELD_BYTES = 64;
const POW10 = Array.from({ length: 16 }, (_, i) => 10 ** i);
const COMMA = 44;
const NEWLINE = 10;

export class TrajectoryRows {
  private readonly bytes = Buffer.allocUnsafe(ROW_BYTES);
  private readonly digits = new Uint8Array(20);
  private used = 0;

  constructor(private readonly out: TextStream) {}

  /** Ends the current row. */
  newline(): void {
    this.bytes[this.used++] = NEWLINE;
    if (this.used > ROW_BYTES - FIELD_BYTES) this.flush();
  }

  /** Appends a field separator. */
  comma(): void {
    this.room(1);
    this.bytes[this.used++] = COMMA;
  }

  /** Appends text as it is (the caller quotes it for CSV). */
  text(s: string): void {
    if (s.length === 0) return;
    // at most 3 UTF-8 bytes per UTF-16 unit
    if (3 * s.length > ROW_BYTES - FIELD_BYTES) {
      this.flush();
      this.out.write(s);
      return;
    }
    this.room(3 * s.length);
    this.used += this.bytes.write(s, this.used, 'utf8');
  }

  /**
   * Appends `x` rounded to `decimals` (0…15) places, exactly as `String(Math.round(x * 10 ** decimals) /
   * 10 ** decimals)` prints it: no trailing zeros, `0` for minus zero. (For |x · 10^decimals| < 10^15 the
   * shortest round-trip form of that double is the decimal itself, since decimals of at most 15 significant
   * digits map to distinct doubles.)
   */
  number(x: number, decimals: number): void {
    const f = POW10[decimals]!;
    const k = Math.round(x * f);
    if (!(Math.abs(k) < 1e15)) return this.text(String(k / f));
    this.room(FIELD_BYTES);
    const bytes = this.bytes;
    let a = Math.abs(k);
    if (k < 0) bytes[this.used++] = 45;
    const digits = this.digits;
    let len = 0;
    do {
      digits[len++] = 48 + (a % 10);
      a = Math.floor(a / 10);
    } while (a > 0);
    // digits[] is least significant first; drop trailing zeros of the fraction
    let low = 0;
    while (low < decimals && low < len && digits[low] === 48) low++;
    if (low < decimals && low === len) low = decimals; // k = 0
    let p = this.used;
    if (len <= decimals) bytes[p++] = 48;
    else for (let i = len - 1; i >= decimals; i--) bytes[p++] = digits[i]!;
    if (low < decimals) {
      bytes[p++] = 46;
      for (let i = decimals - 1; i >= low; i--) bytes[p++] = i < len ? digits[i]! : 48;
    }
    this.used = p;
  }

  /** Hands what is gathered to the stream (call before `commit`). */
  flush(): void {
    if (this.used > 0) this.out.write(this.bytes.toString('utf8', 0, this.used));
    this.used = 0;
  }

  private room(n: number): void {
    if (this.used + n > ROW_BYTES) this.flush();
  }
}
