/** Synchronous parsing of a whole text: the same line consumers as the streaming reader. */
import { ParseError, type Issue } from '../model/errors.js';
import type { Molecule } from '../model/molecule.js';
import { detectFormat } from './detectFormat.js';
import { FORMATS, type ConsumerExtras } from './formats.js';
import { resolveLimits, type ReadOptions } from './limits.js';
import { feedBlock, LineSplitter } from './lines.js';
import { emptyInputIssue } from './emptyInput.js';
import type { Settled } from './sink.js';

/** Options of `parseText`. */
export interface ParseTextOptions extends ReadOptions {
  /** Name used in messages and `source.file`, and for the format by extension. Default `''`. */
  readonly file?: string;
}

const PIECE = 1 << 20;

/** Most issues collected into one `ParseError` by `parseText`. */
const MAX_ISSUES = 100;

/**
 * Parses every record of `text` and reports each one's outcome, continuing after a bad record where the
 * format allows (XYZ at the next count line, SDF after `$$$$`). A fatal problem (binary data, an over-long
 * line, too many records) is the last entry.
 * @example parseTextSettled('1\nH atom\nH 0 0 0\n', { file: 'h.xyz' })[0].ok // true
 */
export function parseTextSettled(text: string, options: ParseTextOptions = {}): Settled[] {
  const file = options.file ?? '';
  const limits = resolveLimits(options);
  const out: Settled[] = [];
  let fatal = false;
  const emit = (r: Settled): void => {
    out.push(r);
    if (!r.ok && r.fatal) fatal = true;
  };
  try {
    const format = options.format ?? detectFormat(file || '-', text.slice(0, 64 * 1024));
    const extras: ConsumerExtras = {};
    const consumer = FORMATS.get(format)!.consumer(file, limits, emit, extras);
    const splitter = new LineSplitter(file, limits.maxLineLength);
    const stopped = (): boolean => fatal;
    // pieces of about 1 MiB keep the line arrays short-lived, as in streaming
    for (let at = 0; at < text.length && !fatal; at += PIECE) {
      for (const block of splitter.pushTextBlocks(text.slice(at, at + PIECE))) feedBlock(consumer, block, stopped);
    }
    if (!fatal) for (const block of splitter.endBlocks()) feedBlock(consumer, block, stopped);
    if (!fatal) consumer.end(splitter.lastLine);
  } catch (err) {
    if (!(err instanceof ParseError)) throw err;
    out.push({ ok: false, error: err, fatal: true });
  }
  if (out.length === 0) out.push({ ok: false, error: new ParseError(emptyInputIssue(file, text.trim() === '')), fatal: true });
  return out;
}

/**
 * Parses every record of `text`; throws one `ParseError` holding every issue when any record is bad.
 * @example parseText(xyzText, { file: 'conformers.xyz' }).length // number of frames
 */
export function parseText(text: string, options: ParseTextOptions = {}): Molecule[] {
  const settled = parseTextSettled(text, options);
  const issues: Issue[] = settled.flatMap((r) => (r.ok ? [] : r.error.issues));
  if (issues.length > 0) throw new ParseError(issues.slice(0, MAX_ISSUES));
  return settled.map((r) => (r.ok ? r.molecule : null)).filter((m): m is Molecule => m !== null);
}
