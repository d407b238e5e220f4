/** One ring from a ring token (number, atom list, residue or residue name), for commands that draw one ring. */
import type { Molecule } from '../model/molecule.js';
import { selectionError, selectRings } from './atomSelection.js';
import type { Graph } from './graph.js';

/**
 * Resolves a ring selection to the 0-based atoms of exactly one ring, in cyclic order (see
 * {@link selectRings} for the tokens: `2`, `1-2-3-4-5-6`, `O5-C1-C2-C3-C4-C5`, `A/NAG501/`, `name:BGC`).
 * An atom list is used in exactly its order and must be a closed walk along bonds; repeating the first atom
 * at the end is allowed. A residue or name token that selects several rings is an `ambiguous-ring` error
 * listing them.
 *
 * Errors (`ConformarkError`): `unknown-ring`, `no-ring`, `ambiguous-ring`, `bad-selection`, `not-bonded`,
 * and those of `selectAtom`.
 * @example ringSelection(mol, graph, rings, '1') // rings[0]
 * @example ringSelection(mol, graph, rings, 'O5-C1-C2-C3-C4-C5') // pyranose order
 */
export function ringSelection(
  mol: Molecule,
  graph: Graph,
  rings: readonly (readonly number[])[],
  text: string,
): number[] {
  const found = selectRings(mol, text, rings, graph);
  if (found.length > 1) {
    const shown = found.slice(0, 8).map((ring) => {
      const k = rings.findIndex((r) => r.length === ring.length && r.every((a, i) => a === ring[i]));
      return `ring ${k + 1} (${ring.map((a) => a + 1).join('-')})`;
    });
    const more = found.length > 8 ? ` and ${found.length - 8} more` : '';
    throw selectionError(mol, 'ambiguous-ring', `'${text.trim()}' selects ${found.length} rings: ${shown.join(', ')}${more}; this command takes one, give its ring number or a single residue`);
  }
  return found[0]!;
}
