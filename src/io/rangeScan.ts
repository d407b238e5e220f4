/**
 * Field scanning inside one line of a larger string (`text[start, end)`, as in a `LineBlock`), for the
 * readers that read columns in place. Only the common, well-formed case is handled here: anything unusual
 * returns a sentinel and the caller re-reads the line as a string through the full (message-giving) path.
 */

const POW10 = Array.from({ length: 23 }, (_, i) => 10 ** i);
const SPACE = 32;
const TAB = 9;
const CR = 13;

/** Index of the first character at or after `i` that is not space, tab or CR (or `end`). */
export function skipBlankIn(text: string, i: number, end: number): number {
  while (i < end) {
    const c = text.charCodeAt(i);
    if (c !== SPACE && c !== TAB && c !== CR) break;
    i++;
  }
  return i;
}

/** Index just past the field starting at `i`, at most `end`. */
export function fieldEndIn(text: string, i: number, end: number): number {
  while (i < end) {
    const c = text.charCodeAt(i);
    if (c === SPACE || c === TAB || c === CR) break;
    i++;
  }
  return i;
}

/**
 * Skips spaces and tabs from `i`, then reads a plain decimal (`-1.234567`, `+2`, `3.`, at most 15
 * significant digits, no exponent) that ends at a blank or at `end`, stores it at `out[at]` and returns the
 * index just past it. Stores the same value as `scanNumberAt` gives on the line as a string. Returns -1
 * (storing nothing) for anything else: a missing field, an exponent, a long mantissa, not a number; the
 * caller then takes the string path. (Writing into `out` instead of returning the number keeps the hot loop
 * from allocating a heap number per coordinate.)
 */
export function scanPlainInto(text: string, i: number, end: number, out: Float64Array, at: number): number {
  while (i < end) {
    const c = text.charCodeAt(i);
    if (c !== SPACE && c !== TAB) break;
    i++;
  }
  if (i >= end) return -1;
  let c = text.charCodeAt(i);
  let negative = false;
  if (c === 45) {
    negative = true;
    c = ++i < end ? text.charCodeAt(i) : -1;
  } else if (c === 43) c = ++i < end ? text.charCodeAt(i) : -1;
  let mantissa = 0;
  let digits = 0;
  let scale = 0;
  let any = false;
  while (c >= 48 && c <= 57) {
    mantissa = mantissa * 10 + (c - 48);
    if (mantissa !== 0) digits++;
    any = true;
    c = ++i < end ? text.charCodeAt(i) : -1;
  }
  if (c === 46) {
    c = ++i < end ? text.charCodeAt(i) : -1;
    while (c >= 48 && c <= 57) {
      mantissa = mantissa * 10 + (c - 48);
      if (mantissa !== 0) digits++;
      scale--;
      any = true;
      c = ++i < end ? text.charCodeAt(i) : -1;
    }
  }
  const ended = i >= end || c === SPACE || c === TAB || c === CR;
  if (!any || !ended || digits > 15 || scale < -22) return -1;
  const value = scale === 0 ? mantissa : mantissa / POW10[-scale]!;
  out[at] = negative ? -value : value;
  return i;
}
