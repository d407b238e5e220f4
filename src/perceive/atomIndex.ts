/** Atom selection tokens: kept as the original entry point; the grammar lives in atomSelection.ts. */
import type { Molecule } from '../model/molecule.js';
import { selectAtom } from './atomSelection.js';

export { selectionError } from './atomSelection.js';

/**
 * Resolves one atom token to a 0-based index: a file position (`12`), an atom name (`C1`), a serial
 * (`#6415`) or a residue-qualified atom (`A/PRO42/CA`); see {@link selectAtom}.
 * Errors (`ConformarkError`): `bad-selection`, `unknown-atom`, `unknown-residue`, `ambiguous-atom`.
 * @example atomIndex(glucose, '3') // 2
 * @example atomIndex(glucose, 'O5') // index of the atom named O5
 */
export function atomIndex(mol: Molecule, token: string): number {
  return selectAtom(mol, token);
}
