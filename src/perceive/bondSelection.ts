/** Bond selections: `3-4` (atom tokens joined by `-`) and comma-separated lists `1-2,3-4`. */
import type { Molecule } from '../model/molecule.js';
import { atomIndex, selectionError } from './atomIndex.js';
import { splitAtomList } from './atomSelection.js';
import type { Graph } from './graph.js';

/**
 * Resolves a bond selection such as `3-4` or `C1-C2` to 0-based `[front, back]`, in the order given (for a
 * Newman projection the first atom is in front). Each side is an atom token (see {@link atomIndex}).
 * Errors (`ConformarkError`): `bad-selection` (not two atoms, or the same atom twice), `not-bonded`, and
 * those of {@link atomIndex}.
 * @example bondSelection(mol, graph, '3-4') // [2, 3]
 */
export function bondSelection(mol: Molecule, graph: Graph, text: string): [number, number] {
  const parts = splitAtomList(text);
  if (parts.length !== 2 || parts.some((p) => p.trim() === '')) {
    throw selectionError(mol, 'bad-selection', `bond '${text}' should be two atoms joined by '-', e.g. 3-4`);
  }
  const a = atomIndex(mol, parts[0]!);
  const b = atomIndex(mol, parts[1]!);
  if (a === b) throw selectionError(mol, 'bad-selection', `bond '${text}' names atom ${a + 1} twice`);
  if (!graph.bonded(a, b)) throw selectionError(mol, 'not-bonded', `atoms ${a + 1} and ${b + 1} are not bonded`);
  return [a, b];
}

/**
 * Resolves a comma-separated list of bonds (`1-2,3-4`) with {@link bondSelection}, in the order given.
 * @example bondListSelection(mol, graph, '1-2, 3-4') // [[0, 1], [2, 3]]
 */
export function bondListSelection(mol: Molecule, graph: Graph, text: string): [number, number][] {
  const items = text.split(',').map((s) => s.trim());
  if (items.some((s) => s === '')) {
    throw selectionError(mol, 'bad-selection', `bond list '${text}' has an empty entry; write e.g. 1-2,3-4`);
  }
  return items.map((item) => bondSelection(mol, graph, item));
}
