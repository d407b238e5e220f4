/**
 * Atoms whose bonding is planar (sp², aromatic, or a two-coordinate heteroatom in a conjugated ring), from the
 * file's bond orders where it has them and from geometry where it does not (XYZ, perceived bonds). Used to keep
 * aromatic and other sp²-only rings out of "nearly planar" warnings and their bonds out of default batch Newmans.
 *
 * An atom counts when (common practice, no source):
 * - a bond to it has order 2 or 4 (aromatic) in the file; or
 * - it has at most three neighbours and a bond to a heavy atom at least 0.05 Å shorter than the sum of the two
 *   single-bond covalent radii (Cordero et al. 2008, Dalton Trans. 2832): aromatic C–C 1.39 vs 1.52 Å, furan
 *   C–O 1.36 vs 1.42 Å, thiophene C–S 1.71 vs 1.81 Å; or
 * - it has exactly three neighbours whose bond angles sum to at least 350° (a planar centre; sp³ gives ~330°).
 */
import { atomPosition, type Molecule } from '../model/molecule.js';
import { elementInfo } from '../model/elements.js';
import { angleBetween, distance, sub } from '../geometry/vec3.js';
import type { Graph } from './graph.js';

const SHORTER_BY_A = 0.05;
const PLANAR_SUM_DEG = 350;

/**
 * One flag per atom: true when its bonding is planar as described above.
 * @example trigonalAtoms(benzene, graph).slice(0, 6) // [true, true, true, true, true, true]
 */
export function trigonalAtoms(mol: Pick<Molecule, 'atoms' | 'coords'>, graph: Graph): boolean[] {
  return mol.atoms.map((_, i) => isTrigonalAtom(mol, graph, i));
}

/** True when atom `i` (0-based) has planar bonding as described above. */
export function isTrigonalAtom(mol: Pick<Molecule, 'atoms' | 'coords'>, graph: Graph, i: number): boolean {
  const atom = mol.atoms[i]!;
  const nbrs = graph.neighbors[i]!;
  if (atom.element === 'H' || nbrs.length === 0) return false;
  if (nbrs.some((j) => graph.order(i, j) === 2 || graph.order(i, j) === 4)) return true;
  if (nbrs.length > 3) return false;
  const p = atomPosition(mol, i);
  const ri = elementInfo(atom.element)?.radius;
  if (ri !== undefined) {
    for (const j of nbrs) {
      const other = mol.atoms[j]!.element;
      const rj = elementInfo(other)?.radius;
      if (other === 'H' || rj === undefined) continue;
      if (distance(p, atomPosition(mol, j)) <= ri + rj - SHORTER_BY_A) return true;
    }
  }
  if (nbrs.length !== 3) return false;
  const v = nbrs.map((j) => sub(atomPosition(mol, j), p));
  const sum = (angleBetween(v[0]!, v[1]!) + angleBetween(v[1]!, v[2]!) + angleBetween(v[0]!, v[2]!)) * (180 / Math.PI);
  return sum >= PLANAR_SUM_DEG;
}

/** True when every atom of `ring` is trigonal (an aromatic or otherwise sp²-only ring). */
export function isTrigonalRing(mol: Pick<Molecule, 'atoms' | 'coords'>, graph: Graph, ring: readonly number[]): boolean {
  return ring.every((a) => isTrigonalAtom(mol, graph, a));
}
