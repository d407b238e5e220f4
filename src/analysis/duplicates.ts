/**
 * Duplicate conformers in an ensemble: each record is compared with the earlier unique records by heavy-atom
 * RMSD after superposition; the first one within the threshold is the one it duplicates (README.md ensemble
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
  /**
   * Energy of each record (any one unit). When given, two records are the same only if their energies also
   * differ by at most `energyWindow` — so rotamers of hydrogens (OH, CH3), which heavy atoms cannot tell apart
   * but which differ in energy, stay separate. Default: not used.
   */
  readonly energies?: readonly number[];
  /** Energy window in the unit of `energies`. Default 0.05 (kcal/mol; common practice, no source). */
  readonly energyWindow?: number;
}

/**
 * For each record the index (0-based) of the earlier unique record it duplicates, or `null`.
 * @example findDuplicates([a, b, a]) // [null, null, 0]
 */
export function findDuplicates(records: readonly Molecule[], options: DuplicateOptions = {}): (number | null)[] {
  const { rmsdThresholdA = 0.125, energies, energyWindow = 0.05 } = options;
  if (energies && energies.length !== records.length) {
    throw usageError('bad-energies', `${energies.length} energies given for ${records.length} records`);
  }
  const close = (u: number, i: number) => !energies || Math.abs(energies[u]! - energies[i]!) <= energyWindow;
  if (!(Number.isFinite(rmsdThresholdA) && rmsdThresholdA >= 0)) {
    throw usageError('bad-threshold', `RMSD threshold must be a non-negative number of Å, got ${rmsdThresholdA}`);
  }
  const unique: number[] = [];
  return records.map((record, i) => {
    const match = unique.find((u) => close(u, i) && heavyAtomRmsd(records[u]!, record).rmsdA <= rmsdThresholdA);
    if (match !== undefined) return match;
    unique.push(i);
    return null;
  });
}
