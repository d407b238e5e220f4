/**
 * Hand-written number scanning for the readers' hot loops: no regex, no substring for the common case.
 * `scanFloat` is exact: mantissas of up to 15 digits with a decimal exponent of at most 22 are computed as one
 * correctly rounded multiplication or division of two exact doubles (Clinger 1990, PLDI, "fast path");
 * anything longer falls back to `Number()` on the validated text.
 */
import { scanPlainInto } from './rangeScan.js';

const POW10 = Array.from({ length: 23 }, (_, i) => 10 ** i);
const SPACE = 32;
const TAB = 9;

/** True for the characters that separate fields (space, tab, and stray CR). */
export function isBlank(code: number): boolean {
  return code === SPACE || code === TAB || code === 13;
}

/** Index of the first non-blank character at or after `i` (or `line.length`). */
export function skipBlank(line: string, i: number): number {
  const n = line.length;
  while (i < n && isBlank(line.charCodeAt(i))) i++;
  return i;
}

/** Index just past the field starting at `i`. */
export function fieldEnd(line: string, i: number): number {
  const n = line.length;
  while (i < n && !isBlank(line.charCodeAt(i))) i++;
  return i;
}

/**
 * Parses `line[start, end)` as a decimal number (`-1.5`, `+2`, `.5`, `3.`, `1e-3`, Fortran `1.0D+00`).
 * Returns NaN when the text is not a number, ±Infinity when it overflows (`1e999`).
 * @example scanFloat('x -1.25 y', 2, 7) // -1.25
 */
export function scanFloat(line: string, start: number, end: number): number {
  let i = start;
  let negative = false;
  let c = line.charCodeAt(i);
  if (c === 45 || c === 43) {
    negative = c === 45;
    c = line.charCodeAt(++i);
  }
  let mantissa = 0;
  let digits = 0;
  let scale = 0;
  let any = false;
  while (i < end && c >= 48 && c <= 57) {
    if (digits < 15) {
      mantissa = mantissa * 10 + (c - 48);
      if (mantissa !== 0) digits++;
    } else scale++;
    any = true;
    c = line.charCodeAt(++i);
  }
  if (i < end && c === 46) {
    c = line.charCodeAt(++i);
    while (i < end && c >= 48 && c <= 57) {
      if (digits < 15) {
        mantissa = mantissa * 10 + (c - 48);
        if (mantissa !== 0) digits++;
        scale--;
      }
      any = true;
      c = line.charCodeAt(++i);
    }
  }
  if (!any) return Number.NaN;
  const truncated = digits >= 15;
  if (i < end && (c === 101 || c === 69 || c === 100 || c === 68)) {
    c = line.charCodeAt(++i);
    let expNegative = false;
    if (c === 45 || c === 43) {
      expNegative = c === 45;
      c = line.charCodeAt(++i);
    }
    let exp = 0;
    let expDigits = 0;
    while (i < end && c >= 48 && c <= 57) {
      if (exp < 100_000) exp = exp * 10 + (c - 48);
      expDigits++;
      c = line.charCodeAt(++i);
    }
    if (expDigits === 0) return Number.NaN;
    scale += expNegative ? -exp : exp;
  }
  if (i !== end) return Number.NaN;
  if (truncated || scale > 22 || scale < -22) {
    const text = line.slice(start, end).replace(/[dD]/, 'e');
    return Number(text);
  }
  const value = scale >= 0 ? mantissa * POW10[scale]! : mantissa / POW10[-scale]!;
  return negative ? -value : value;
}

/**
 * `scanFloat` for exactly `line[start, end)`, with the usual plain decimal of at most 15 digits (`-1.2345`,
 * fixed-column molfile coordinates) computed in one pass, to the same value; anything else goes to `scanFloat`.
 */
export function scanDecimal(line: string, start: number, end: number): number {
  let i = start;
  const negative = line.charCodeAt(i) === 45;
  if (negative) i++;
  let mantissa = 0;
  let digits = 0;
  let point = -1;
  for (; i < end; i++) {
    const c = line.charCodeAt(i);
    if (c >= 48 && c <= 57) {
      mantissa = mantissa * 10 + (c - 48);
      digits++;
    } else if (c === 46 && point < 0) point = i;
    else return scanFloat(line, start, end);
  }
  if (digits === 0 || digits > 15) return scanFloat(line, start, end);
  const value = point < 0 ? mantissa : mantissa / POW10[end - point - 1]!;
  return negative ? -value : value;
}

/**
 * Parses `line[start, end)` as a non-negative decimal integer without allocating.
 * Returns -1 when it is not one, and `Infinity` when it has more than 15 digits (so a count such as
 * `999999999999999999` can be refused without being trusted).
 */
export function scanCount(line: string, start: number, end: number): number {
  if (start >= end) return -1;
  let value = 0;
  for (let i = start; i < end; i++) {
    const c = line.charCodeAt(i);
    if (c < 48 || c > 57) return -1;
    value = value * 10 + (c - 48);
  }
  return end - start > 15 ? Number.POSITIVE_INFINITY : value;
}

/** Splits a line into whitespace-separated fields (for the slower, non-hot paths). */
export function fields(line: string): string[] {
  const out: string[] = [];
  let i = skipBlank(line, 0);
  while (i < line.length) {
    const e = fieldEnd(line, i);
    out.push(line.slice(i, e));
    i = skipBlank(line, e);
  }
  return out;
}

/** Parses a whole string as a number with `scanFloat` (NaN if it is not one). */
export function parseNumber(text: string): number {
  const s = skipBlank(text, 0);
  let e = text.length;
  while (e > s && isBlank(text.charCodeAt(e - 1))) e--;
  return s < e ? scanFloat(text, s, e) : Number.NaN;
}

/** Where the last `scanNumberAt` stopped (index just past the number). */
export const cursor = { end: 0 };

/**
 * Skips blanks from `i`, then parses one number and leaves `cursor.end` just past it: the XYZ hot path,
 * one pass per field. Plain decimals (`-1.234567`) go through `scanPlainInto`; exponents, long mantissas and
 * malformed text go through `scanFloat` (NaN when it is no number, also for a missing field).
 */
export function scanNumberAt(line: string, i: number): number {
  const end = scanPlainInto(line, i, line.length, ONE, 0);
  if (end >= 0) {
    cursor.end = end;
    return ONE[0]!;
  }
  const start = skipBlank(line, i);
  const e = fieldEnd(line, start);
  cursor.end = e;
  return e === start ? Number.NaN : scanFloat(line, start, e);
}

/** One-slot buffer for `scanPlainInto` when the caller wants the number back. */
const ONE = new Float64Array(1);
