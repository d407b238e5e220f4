/** Shared fixture for the selection tests: a pyranose-like ring with PDB-style names (geometry unused). */
import { buildGraph } from '../../src/perceive/graph.js';
import { ConformarkError } from '../../src/model/errors.js';
import { bondsOf, molecule, ringPositions } from './fixtures.js';

// atoms 1–6 ring O5 C1 C2 C3 C4 C5; 7 = O1 on C1; 8, 9 = two atoms both named H; 10 = unnamed C far away
export const names = ['O5', 'C1', 'C2', 'C3', 'C4', 'C5', 'O1', 'H', 'H', null];
export const sugar = molecule(
  ['O', 'C', 'C', 'C', 'C', 'C', 'O', 'H', 'H', 'C'],
  [...ringPositions(6, 1.45), [2.5, 0, 0], [0, 0, 2], [0, 0, -2], [9, 9, 9]],
  bondsOf([[0, 1], [1, 2], [2, 3], [3, 4], [4, 5], [5, 0], [1, 6], [2, 7], [3, 8]]),
  names,
);
export const graph = buildGraph(sugar.atoms.length, sugar.bonds!);

/** The issue code and CLI line of a thrown ConformarkError. */
export function failure(f: () => unknown): [string, string] {
  try {
    f();
  } catch (e) {
    if (!(e instanceof ConformarkError)) throw e;
    return [e.code, e.message];
  }
  throw new Error('expected a ConformarkError');
}
