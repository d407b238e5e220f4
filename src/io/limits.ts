/** Reading options shared by every reader, resolved once at the boundary into `ReadLimits`. */
import type { FormatName } from '../model/molecule.js';
import { usageError } from '../model/errors.js';
import { altLocChoiceError } from './pdbAltLoc.js';

/** Options for `parseText`, `readRecords` and friends. */
export interface ReadOptions {
  /** Force the input format instead of detecting it from the extension or content. Default: detected. */
  readonly format?: FormatName;
  /** Longest accepted line, in characters. Default 100,000. */
  readonly maxLineLength?: number;
  /** Most atoms accepted in one record. Default 1,000,000. */
  readonly maxAtoms?: number;
  /** Most records accepted in one file. Default: no limit. */
  readonly maxRecords?: number;
  /**
   * Two atoms closer than this are an error (Å). Default 0.4; 0 turns the check off.
   */
  readonly minDistanceA?: number;
  /**
   * Which alternate location to keep (PDB, mmCIF), chosen per residue: a letter such as `A`, or
   * `highest-occupancy` (default: the letter with the highest mean occupancy in that residue, then the first).
   */
  readonly altLoc?: string;
}

/** `ReadOptions` with every default applied. */
export interface ReadLimits {
  readonly maxLineLength: number;
  readonly maxAtoms: number;
  readonly maxRecords: number;
  readonly minDistanceA: number;
  readonly altLoc: string;
}

export const DEFAULT_LIMITS: ReadLimits = {
  maxLineLength: 100_000,
  maxAtoms: 1_000_000,
  maxRecords: Number.POSITIVE_INFINITY,
  minDistanceA: 0.4,
  altLoc: 'highest-occupancy',
};

/** Applies the defaults of `ReadOptions`; a bad `altLoc` is a `bad-option` error. */
export function resolveLimits(options: ReadOptions = {}): ReadLimits {
  const choice = options.altLoc ?? DEFAULT_LIMITS.altLoc;
  const bad = altLocChoiceError(choice);
  if (bad !== null) throw usageError('bad-option', bad);
  return {
    maxLineLength: options.maxLineLength ?? DEFAULT_LIMITS.maxLineLength,
    maxAtoms: options.maxAtoms ?? DEFAULT_LIMITS.maxAtoms,
    maxRecords: options.maxRecords ?? DEFAULT_LIMITS.maxRecords,
    minDistanceA: options.minDistanceA ?? DEFAULT_LIMITS.minDistanceA,
    altLoc: options.altLoc ?? DEFAULT_LIMITS.altLoc,
  };
}
