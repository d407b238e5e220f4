/**
 * Duplicate conformers in an ensemble: each record is compared with the earlier unique records by heavy-atom
 * RMSD after superposition; the first one within the threshold is the one it duplicates (DESIGN.md ensemble
 * `duplicateOf`). Records in input order; pass them sorted by energy to keep the lowest of each set.
 */
import type { Molecule } from '../model/molecule.js';
import { usageError } from '../model/errors.js';
import { heavyAtomRmsd } from './rmsd.js';

/** Options for `findDuplicates`. */
export interface DuplicateOptions {
  /**
   * Heavy-atom RMSD (Å) at or below which two conformers count as the same. Default 0.125 (common practice,
   * no source: a typical cut-off in conformer searches).
   */
  readonly rmsdThresholdA?: number;
}

/**
 * For each record the index (0-based) of the earlier unique record it duplicates, or `null`.
 * @example findDuplicates([a, b, a]) // [null, null, 0]
 */
export function findDuplicates(records: readonly Molecule[], options: DuplicateOptions = {}): (number | null)[] {
  const { rmsdThresholdA = 0.125 } = options;
  if (!(Number.isFinite(rmsdThresholdA) && rmsdThresholdA >= 0)) {
    throw usageError('bad-threshold', `RMSD threshold must be a non-negative number of Å, got ${rmsdThresholdA}`);
  }
  const unique: number[] = [];
  return records.map((record, i) => {
    const match = unique.find((u) => heavyAtomRmsd(records[u]!, record).rmsdA <= rmsdThresholdA);
    if (match !== undefined) return match;
    unique.push(i);
    return null;
  });
}
