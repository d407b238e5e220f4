/**
 * Torsion fingerprints: a conformer described by a chosen list of torsions (e.g. every rotatable bond and
 * ring bond), and the largest circular difference between two such lists. A cheap duplicate test that,
 * unlike RMSD, needs no superposition.
 */
import { atomPosition, type Molecule } from '../model/molecule.js';
import { usageError } from '../model/errors.js';
import { torsion } from '../geometry/torsion.js';
import { wrap180 } from '../geometry/vec3.js';

/** Four 0-based atoms a–b–c–d. */
export type TorsionAtoms = readonly [number, number, number, number];

/**
 * The torsions (degrees, (−180, 180]) of `mol` for each atom quadruple; `null` where undefined (collinear).
 * @example torsionFingerprint(mol, [[0, 1, 2, 3]]) // [-62.1]
 */
export function torsionFingerprint(mol: Molecule, quadruples: readonly TorsionAtoms[]): (number | null)[] {
  return quadruples.map(([a, b, c, d]) =>
    torsion(atomPosition(mol, a), atomPosition(mol, b), atomPosition(mol, c), atomPosition(mol, d)),
  );
}

/** Outcome of comparing two fingerprints. */
export interface FingerprintDifference {
  /** Largest |wrap180(a_i − b_i)| over the compared positions, degrees in [0, 180]; 0 when nothing compared. */
  readonly maxDifferenceDeg: number;
  /** Position of that largest difference, or `null` when nothing was compared. */
  readonly index: number | null;
  /** Positions compared (those where neither side is `null`). */
  readonly compared: number;
}

/**
 * Largest circular difference between two torsion lists of the same length (degrees). Positions where either
 * side is `null` are left out.
 * @example compareTorsionFingerprints([179, 60], [-179, 65]).maxDifferenceDeg // 5
 */
export function compareTorsionFingerprints(
  a: readonly (number | null)[],
  b: readonly (number | null)[],
): FingerprintDifference {
  if (a.length !== b.length) throw usageError('length-mismatch', `fingerprints of ${a.length} and ${b.length} torsions`);
  let maxDifferenceDeg = 0;
  let index: number | null = null;
  let compared = 0;
  a.forEach((x, i) => {
    const y = b[i];
    if (x === null || y === null || y === undefined) return;
    compared++;
    const d = Math.abs(wrap180(x - y));
    if (index === null || d > maxDifferenceDeg) {
      maxDifferenceDeg = d;
      index = i;
    }
  });
  return { maxDifferenceDeg, index, compared };
}
