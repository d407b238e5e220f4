/** Adjacency view of a molecule's bonds (0-based atom indices). */
import type { Bond } from '../model/molecule.js';

/** Undirected molecular graph with sorted neighbour lists. */
export interface Graph {
  readonly size: number;
  /** Neighbours of each atom, ascending. */
  readonly neighbors: readonly (readonly number[])[];
  /** Bond order between two atoms, or 0 when not bonded. */
  order(a: number, b: number): number;
  /** True when `a` and `b` are bonded. */
  bonded(a: number, b: number): boolean;
}

/**
 * Builds the graph of `size` atoms from a bond list.
 * @example buildGraph(3, [{ a: 0, b: 1, order: 1, perceived: true }]).neighbors[1] // [0]
 */
export function buildGraph(size: number, bonds: readonly Bond[]): Graph {
  const lists: number[][] = Array.from({ length: size }, () => []);
  const orders = new Map<number, number>();
  for (const { a, b, order } of bonds) {
    if (a === b || a < 0 || b < 0 || a >= size || b >= size) continue;
    const key = a < b ? a * size + b : b * size + a;
    if (orders.has(key)) continue;
    orders.set(key, order);
    lists[a]!.push(b);
    lists[b]!.push(a);
  }
  for (const l of lists) l.sort((x, y) => x - y);
  const keyOf = (a: number, b: number) => (a < b ? a * size + b : b * size + a);
  return {
    size,
    neighbors: lists,
    order: (a, b) => orders.get(keyOf(a, b)) ?? 0,
    bonded: (a, b) => orders.has(keyOf(a, b)),
  };
}
