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
}

/** `HoldOptions` with the defaults applied. */
export interface HoldLimits {
  readonly maxRecords: number;
  readonly maxTotalAtoms: number;
}

export const DEFAULT_HOLD_LIMITS: HoldLimits = { maxRecords: 100_000, maxTotalAtoms: 2_000_000 };

/** Applies the defaults of `HoldOptions`. */
export function resolveHoldLimits(options: HoldOptions = {}): HoldLimits {
  return {
    maxRecords: options.maxRecords ?? DEFAULT_HOLD_LIMITS.maxRecords,
    maxTotalAtoms: options.maxTotalAtoms ?? DEFAULT_HOLD_LIMITS.maxTotalAtoms,
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
  return {
    add(mol: Molecule): void {
      records++;
      atoms += mol.atoms.length;
      const line = mol.source.line > 0 ? mol.source.line : null;
      if (records > limits.maxRecords) {
        const message = `record ${mol.source.index}: more than ${limits.maxRecords} records to hold at once (raise with --max-records, option maxRecords)`;
        throw new ConformarkError({ code: 'too-many-records', file: path, line, message });
      }
      if (atoms > limits.maxTotalAtoms) {
        const message = `record ${mol.source.index}: more than ${limits.maxTotalAtoms} atoms in all records to hold at once (raise with --max-total-atoms, option maxTotalAtoms)`;
        throw new ConformarkError({ code: 'too-many-atoms-total', file: path, line, message });
      }
    },
  };
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
