/** Option parsing shared by every command: whole numbers, enumerations, warnings on stderr. */
import type { Command } from 'commander';
import { DEFAULT_HOLD_LIMITS, DEFAULT_LIMITS, DEFAULT_MAX_PIXELS, DEFAULT_MAX_RING_SIZE, safeText, usageError, type HoldOptions, type ReadOptions, type RingScopeOptions, type Warning } from '../index.js';

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

/** Help text of `--dpi`, shared by every command that writes PNG. */
export const DPI_HELP = 'PNG resolution in dots per inch, 36 to 2400; the PNG is tagged with it and keeps the figure\'s print size (default 300)';

/** `--dpi` from its text, or undefined when absent. */
export function dpiOption(text: string | undefined): number | undefined {
  return text === undefined ? undefined : finiteNumber('--dpi', text, 36, 2400);
}

/** One of a fixed set of words, or `fallback` when the flag is absent. */
export function oneOf<T extends string>(flag: string, text: string | undefined, words: readonly T[], fallback: T): T {
  if (text === undefined) return fallback;
  if ((words as readonly string[]).includes(text)) return text as T;
  throw usageError('bad-option', `${flag} expects one of ${words.join(', ')}, got "${text}"`);
}

/** Prints warnings, one line each, on stderr. */
export function printWarnings(warnings: readonly Warning[], where = ''): void {
  for (const w of warnings) process.stderr.write(`conformark: warning: ${safeText(`${where ? `${where}: ` : ''}${w.message}`, 1000).text}\n`);
}

/** The input limits every reading command shares; global options, given before or after the command. */
export interface LimitFlags {
  maxAtoms?: string;
  maxLineLength?: string;
  maxRecords?: string;
  maxTotalAtoms?: string;
  maxTotalText?: string;
  maxPixels?: string;
  altloc?: string;
  metalRings?: boolean;
  ssRings?: boolean;
  maxRingSize?: string;
}

/** Adds the limit options to the program (inherited by every command). */
export function addLimitOptions(program: Command): Command {
  return program
    .option('--max-atoms <n>', `most atoms in one record (default ${DEFAULT_LIMITS.maxAtoms})`)
    .option('--max-line-length <n>', `longest input line, characters (default ${DEFAULT_LIMITS.maxLineLength})`)
    .option('--max-records <n>', `most records read; commands that hold every record (inspect, ensemble) default to ${DEFAULT_HOLD_LIMITS.maxRecords}`)
    .option('--max-total-atoms <n>', `most atoms over all records for commands that hold every record (default ${DEFAULT_HOLD_LIMITS.maxTotalAtoms})`)
    .option('--max-total-text <n>', `most characters of titles and data fields over all records held at once (default ${DEFAULT_HOLD_LIMITS.maxTotalText})`)
    .option('--max-pixels <n>', `most pixels (width × height) of one PNG (default ${DEFAULT_MAX_PIXELS})`)
    .option('--altloc <which>', 'alternate location kept in PDB/mmCIF files, chosen per residue: a letter such as A, or highest-occupancy (default; ties: the first)')
    .option('--metal-rings', 'let bonds to metal atoms close rings, so chelate rings are analysed (default: coordination bonds close no rings)')
    .option('--ss-rings', 'analyse rings through an S–S bond (disulfide loops; default: listed, not analysed)')
    .option('--max-ring-size <n>', `largest ring analysed, atoms; larger rings are listed, not analysed (default ${DEFAULT_MAX_RING_SIZE})`);
}

/** Which rings are analysed, from the global ring options of `command`'s program. */
export function ringScopeOf(command: Command): RingScopeOptions {
  const flags = command.optsWithGlobals<LimitFlags>();
  return {
    metalRings: flags.metalRings === true,
    disulfideRings: flags.ssRings === true,
    maxRingSize: flags.maxRingSize === undefined ? DEFAULT_MAX_RING_SIZE : wholeNumber('--max-ring-size', flags.maxRingSize, 3),
  };
}

/** Reader and hold limits from the global options of `command`'s program. */
export function limitsOf(command: Command): { read: ReadOptions; hold: HoldOptions; maxPixels: number | undefined } {
  const flags = command.optsWithGlobals<LimitFlags>();
  const n = (flag: string, text: string | undefined): number | undefined => (text === undefined ? undefined : wholeNumber(flag, text));
  const maxRecords = n('--max-records', flags.maxRecords);
  return {
    read: { maxAtoms: n('--max-atoms', flags.maxAtoms), maxLineLength: n('--max-line-length', flags.maxLineLength), maxRecords, ...(flags.altloc === undefined ? {} : { altLoc: flags.altloc }) },
    hold: { maxRecords, maxTotalAtoms: n('--max-total-atoms', flags.maxTotalAtoms), maxTotalText: n('--max-total-text', flags.maxTotalText) },
    maxPixels: n('--max-pixels', flags.maxPixels),
  };
}
