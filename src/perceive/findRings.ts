/** Ring perception: the smallest set of smallest rings (SSSR) of a molecular graph. */
import type { Graph } from './graph.js';
import { minimumCycleBasis } from './minimumCycleBasis.js';
import { ringSystems } from './ringSystems.js';

/**
 * The smallest set of smallest rings of `graph`: a minimum cycle basis, E − V + C rings for E bonds, V atoms
 * and C connected components (fused and bridged systems included; cubane gives 5 rings, adamantane 3).
 * Each ring is a list of 0-based atom indices in cyclic bonded order, starting at its lowest index and
 * continuing toward the smaller of that atom's two ring neighbours. Rings are sorted lexicographically by
 * these lists, so the result is deterministic.
 *
 * Only the cyclic part is examined: chains and substituents are pruned in linear time, and each ring
 * system (biconnected block) is solved on its own, so a large molecule with few rings is fast.
 * @example findRings(buildGraph(6, cyclohexaneBonds)) // [[0, 1, 2, 3, 4, 5]]
 */
export function findRings(graph: Graph): number[][] {
  const rings: number[][] = [];
  for (const system of ringSystems(graph)) {
    for (const ring of minimumCycleBasis(system)) rings.push(canonicalRing(ring));
  }
  return rings.sort(compareRings);
}

/** Rotates and orients a cyclic atom list: lowest index first, then toward its smaller neighbour. */
export function canonicalRing(ring: readonly number[]): number[] {
  const n = ring.length;
  let start = 0;
  for (let k = 1; k < n; k++) if (ring[k]! < ring[start]!) start = k;
  const forward = ring[(start + 1) % n]!;
  const backward = ring[(start + n - 1) % n]!;
  const step = forward <= backward ? 1 : n - 1;
  return Array.from({ length: n }, (_, k) => ring[(start + k * step) % n]!);
}

function compareRings(p: readonly number[], q: readonly number[]): number {
  const n = Math.min(p.length, q.length);
  for (let k = 0; k < n; k++) if (p[k] !== q[k]) return p[k]! - q[k]!;
  return p.length - q.length;
}
