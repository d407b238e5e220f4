/**
 * Caps for commands that hold every record of a file in memory at once (`inspect` keeps every record's
 * report until the document is written; `ensemble` ranks all conformers). Streaming commands (`newman`,
 * `trajectory`, `batch`) hold one record at a time and are bounded by the reader limits only.
 */
import type { Molecule } from '../model/molecule.js';
import { ConformarkError } from '../model/errors.js';

/** Limits for a command that holds the whole file. */
export interface HoldOptions {
  /** Most records held, default 100,000 (CLI `--max-records`). */
  readonly maxRecords?: number;
  /** Most atoms over all records held, default 2,000,000 (CLI `--max-total-atoms`). */
  readonly maxTotalAtoms?: number;
  /**
   * Most characters of titles, data-field names and values over all records held, default 64,000,000 (CLI
   * `--max-total-text`): long comments and SD fields cannot add up past this.
   */
  readonly maxTotalText?: number;
}

/** `HoldOptions` with the defaults applied. */
export interface HoldLimits {
  readonly maxRecords: number;
  readonly maxTotalAtoms: number;
  readonly maxTotalText: number;
}

export const DEFAULT_HOLD_LIMITS: HoldLimits = { maxRecords: 100_000, maxTotalAtoms: 2_000_000, maxTotalText: 64_000_000 };

/** Applies the defaults of `HoldOptions`. */
export function resolveHoldLimits(options: HoldOptions = {}): HoldLimits {
  return {
    maxRecords: options.maxRecords ?? DEFAULT_HOLD_LIMITS.maxRecords,
    maxTotalAtoms: options.maxTotalAtoms ?? DEFAULT_HOLD_LIMITS.maxTotalAtoms,
    maxTotalText: options.maxTotalText ?? DEFAULT_HOLD_LIMITS.maxTotalText,
  };
}

/**
 * Counts the records a command holds and throws `too-many-records` or `too-many-atoms-total` (naming the
 * file, the record and how to raise the limit) when one more would exceed a cap.
 * @example const hold = holdCounter(path); for (const mol of list) hold.add(mol)
 */
export function holdCounter(path: string, options: HoldOptions = {}): { add(mol: Molecule): void } {
  const limits = resolveHoldLimits(options);
  let records = 0;
  let atoms = 0;
  let text = 0;
  return {
    add(mol: Molecule): void {
      records++;
      atoms += mol.atoms.length;
      text += textHeld(mol);
      const line = mol.source.line > 0 ? mol.source.line : null;
      if (records > limits.maxRecords) {
        const message = `record ${mol.source.index}: more than ${limits.maxRecords} records to hold at once (raise with --max-records, option maxRecords)`;
        throw new ConformarkError({ code: 'too-many-records', file: path, line, message });
      }
      if (atoms > limits.maxTotalAtoms) {
        const message = `record ${mol.source.index}: more than ${limits.maxTotalAtoms} atoms in all records to hold at once (raise with --max-total-atoms, option maxTotalAtoms)`;
        throw new ConformarkError({ code: 'too-many-atoms-total', file: path, line, message });
      }
      if (text > limits.maxTotalText) {
        const message = `record ${mol.source.index}: more than ${limits.maxTotalText} characters of titles and data fields in all records to hold at once (raise with --max-total-text, option maxTotalText)`;
        throw new ConformarkError({ code: 'too-much-text-total', file: path, line, message });
      }
    },
  };
}

/** Characters of text a record carries: its title and every data field's name and value. */
export function textHeld(mol: Molecule): number {
  let n = mol.title.length;
  for (const key in mol.properties) n += key.length + (mol.properties[key]?.length ?? 0);
  return n;
}

/**
 * Passes the records of `source` through a {@link holdCounter}.
 * @example for await (const mol of heldRecords(readRecords(path), path)) all.push(mol)
 */
export async function* heldRecords(source: AsyncIterable<Molecule>, path: string, options: HoldOptions = {}): AsyncGenerator<Molecule> {
  const hold = holdCounter(path, options);
  for await (const mol of source) {
    hold.add(mol);
    yield mol;
  }
}
