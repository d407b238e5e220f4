/** Option parsing shared by every command: whole numbers, enumerations, warnings on stderr. */
import { usageError, type Warning } from '../index.js';

/** A whole number ≥ `min` from a flag's text. */
export function wholeNumber(flag: string, text: string, min = 1): number {
  const value = Number(text);
  if (text.trim() === '' || !Number.isInteger(value) || value < min) {
    throw usageError('bad-option', `${flag} expects a whole number from ${min}, got "${text}"`);
  }
  return value;
}

/** A finite number from a flag's text, optionally within [min, max]. */
export function finiteNumber(flag: string, text: string, min = -Infinity, max = Infinity): number {
  const value = Number(text);
  if (text.trim() === '' || !Number.isFinite(value) || value < min || value > max) {
    const range = Number.isFinite(min) && Number.isFinite(max) ? ` between ${min} and ${max}` : '';
    throw usageError('bad-option', `${flag} expects a number${range}, got "${text}"`);
  }
  return value;
}

/** One of a fixed set of words, or `fallback` when the flag is absent. */
export function oneOf<T extends string>(flag: string, text: string | undefined, words: readonly T[], fallback: T): T {
  if (text === undefined) return fallback;
  if ((words as readonly string[]).includes(text)) return text as T;
  throw usageError('bad-option', `${flag} expects one of ${words.join(', ')}, got "${text}"`);
}

/** Prints warnings, one line each, on stderr. */
export function printWarnings(warnings: readonly Warning[], where = ''): void {
  for (const w of warnings) process.stderr.write(`conformark: warning: ${where ? `${where}: ` : ''}${w.message}\n`);
}
