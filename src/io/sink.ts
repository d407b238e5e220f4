/**
 * What a push-style parser hands back: records, per-record errors (the parser resynchronises and goes on)
 * and fatal errors (the rest of the input cannot be read).
 */
import { ParseError, type Issue } from '../model/errors.js';
import type { Molecule } from '../model/molecule.js';

/** One record's outcome. */
export type Settled =
  | { readonly ok: true; readonly molecule: Molecule }
  | { readonly ok: false; readonly error: ParseError; readonly fatal: boolean };

/** Receives what a line consumer produces. */
export type Emit = (result: Settled) => void;

/** A push-style parser: fed one line at a time (without its line break), then told the input ended. */
export interface LineConsumer {
  /** `lineNo` is 1-based. */
  feed(line: string, lineNo: number): void;
  /**
   * Optional: the same as `feed(text.slice(start, end), lineNo)`, for consumers that read columns in place.
   * `[start, end)` never includes the line break.
   */
  feedRange?(text: string, start: number, end: number, lineNo: number): void;
  /** `lastLine` is the number of the last line fed (0 for empty input). */
  end(lastLine: number): void;
}

/** Builds an issue. */
export function issue(code: string, file: string, line: number | null, message: string): Issue {
  return { code, file, line, message };
}

/** Builds a `Settled` failure for one issue. */
export function failure(i: Issue, fatal = false): Settled {
  return { ok: false, error: new ParseError(i), fatal };
}

/** Shortens user text for a message: at most `max` characters, quoted. */
export function quote(text: string, max = 40): string {
  const t = text.trim();
  return `'${t.length > max ? `${t.slice(0, max)}…` : t}'`;
}
