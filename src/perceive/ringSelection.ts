/** Ring selections: a ring number as listed by `inspect`, or an ordered atom list `1-2-3-4-5-6`. */
import type { Molecule } from '../model/molecule.js';
import { atomIndex, selectionError } from './atomIndex.js';
import type { Graph } from './graph.js';

/**
 * Resolves a ring selection to 0-based atoms in cyclic order.
 * - A plain number `k` is the k-th ring of `rings` (1-based, the numbering `inspect` prints); a copy of it is
 *   returned.
 * - Otherwise the text is an atom list `a-b-c-…` (numbers or names, at least 3 distinct atoms) that must be a
 *   closed walk along bonds, last atom bonded to the first; repeating the first atom at the end is allowed.
 *   The atoms are used in exactly that order (it fixes the Cremer–Pople numbering); the ring need not be
 *   one of `rings`.
 *
 * Errors (`ConformarkError`): `unknown-ring`, `bad-selection`, `not-bonded`, and those of {@link atomIndex}.
 * @example ringSelection(mol, graph, rings, '1') // rings[0]
 * @example ringSelection(mol, graph, rings, 'O5-C1-C2-C3-C4-C5') // pyranose order
 */
export function ringSelection(
  mol: Molecule,
  graph: Graph,
  rings: readonly (readonly number[])[],
  text: string,
): number[] {
  const trimmed = text.trim();
  if (/^\d+$/.test(trimmed)) {
    const k = Number(trimmed);
    const ring = rings[k - 1];
    if (k < 1 || !ring) {
      const have = rings.length === 0 ? 'the record has no rings' : `the record has ${rings.length} ring${rings.length === 1 ? '' : 's'}`;
      throw selectionError(mol, 'unknown-ring', `ring ${trimmed} does not exist (${have})`);
    }
    return ring.slice();
  }
  const parts = trimmed.split('-');
  if (parts.some((p) => p.trim() === '')) {
    throw selectionError(mol, 'bad-selection', `ring '${text}' should be a ring number or atoms joined by '-', e.g. 1-2-3-4-5-6`);
  }
  const atoms = parts.map((p) => atomIndex(mol, p));
  if (atoms.length > 3 && atoms[0] === atoms[atoms.length - 1]) atoms.pop();
  if (atoms.length < 3) {
    throw selectionError(mol, 'bad-selection', `ring '${text}' needs at least 3 atoms (or a ring number)`);
  }
  if (new Set(atoms).size !== atoms.length) {
    throw selectionError(mol, 'bad-selection', `ring '${text}' visits an atom twice; list each ring atom once`);
  }
  atoms.forEach((a, k) => {
    const b = atoms[(k + 1) % atoms.length]!;
    if (!graph.bonded(a, b)) {
      throw selectionError(
        mol,
        'not-bonded',
        `atoms ${a + 1} and ${b + 1} are not bonded, so '${text}' is not a closed ring walk`,
      );
    }
  });
  return atoms;
}
