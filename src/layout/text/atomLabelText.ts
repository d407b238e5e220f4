/** The text an atom's label shows, by label mode. */
import type { Molecule } from '../../model/molecule.js';

/** What a substituent label shows: element symbol, element + 1-based number (`C3`), or the file's atom name. */
export type NewmanLabels = 'element' | 'id' | 'name';

/** Label text of atom `i` (0-based) in the given mode; `name` falls back to the id when the file has none. */
export function atomLabelText(mol: Molecule, i: number, mode: NewmanLabels): string {
  const atom = mol.atoms[i]!;
  const id = `${atom.element}${i + 1}`;
  if (mode === 'element') return atom.element;
  if (mode === 'name') return atom.name?.trim() || id;
  return id;
}
