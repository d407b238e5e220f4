/**
 * Heavy-atom RMSD between two conformers of the same molecule after optimal superposition (superpose.ts:
 * Horn's quaternion method, proper rotations only, so a mirror image is not superposable onto its original).
 * Atoms are matched by index: both records must list the same elements in the same order. Symmetry-equivalent
 * atom permutations (e.g. the two ortho carbons of a phenyl ring) are not searched.
 */
import { atomPosition, type Molecule } from '../model/molecule.js';
import { usageError } from '../model/errors.js';
import { superpose } from './superpose.js';
import { isHydrogen } from './couplingSubstituents.js';

/** Options for `heavyAtomRmsd`. */
export interface RmsdOptions {
  /** Include hydrogens too. Default `false` (heavy atoms only). */
  readonly includeHydrogens?: boolean;
}

/** RMSD of two conformers. */
export interface ConformerRmsd {
  /** Å, after superposition. */
  readonly rmsdA: number;
  /** The atoms compared (0-based). */
  readonly atoms: readonly number[];
}

/**
 * Heavy-atom RMSD between two conformers with the same atoms in the same order.
 * @example heavyAtomRmsd(conformerA, conformerB).rmsdA // e.g. 0.83
 */
export function heavyAtomRmsd(a: Molecule, b: Molecule, options: RmsdOptions = {}): ConformerRmsd {
  const { includeHydrogens = false } = options;
  if (a.atoms.length !== b.atoms.length) {
    throw usageError('atoms-differ', `records have ${a.atoms.length} and ${b.atoms.length} atoms; RMSD needs the same atoms`);
  }
  const mismatch = a.atoms.findIndex((atom, i) => atom.element !== b.atoms[i]!.element);
  if (mismatch >= 0) {
    throw usageError(
      'atoms-differ',
      `atom ${mismatch + 1} is ${a.atoms[mismatch]!.element} in one record and ${b.atoms[mismatch]!.element} in the other`,
    );
  }
  const atoms = a.atoms.flatMap((atom, i) => (includeHydrogens || !isHydrogen(atom.element) ? [i] : []));
  const fit = superpose(
    atoms.map((i) => atomPosition(a, i)),
    atoms.map((i) => atomPosition(b, i)),
  );
  return { rmsdA: fit.rmsdA, atoms };
}
