/** Ring perception: the smallest set of smallest rings (SSSR) of a molecular graph. */
import type { Graph } from './graph.js';
import { minimumCycleBasis } from './minimumCycleBasis.js';
import { ringBlocks, systemOf, type RingBlocks } from './ringSystems.js';

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
  const n = graph.size;
  const blocks = ringBlocks(graph);
  const stamp = new Int32Array(n).fill(-1);
  // the two block partners of each atom, for blocks that are one simple cycle
  const left = new Int32Array(n);
  const right = new Int32Array(n);
  const rings: number[][] = [];
  for (let id = 0; id < blocks.count; id++) {
    const ring = simpleRing(blocks, id, stamp, left, right);
    if (ring !== null) rings.push(ring);
    else for (const cycle of minimumCycleBasis(systemOf(blocks, id, stamp))) rings.push(canonicalRing(cycle));
  }
  return sortRings(rings, n);
}

/**
 * The ring of block `id` in canonical order when the block is one simple cycle (as many atoms as bonds),
 * else null. Linear in the block's bonds.
 */
function simpleRing(blocks: RingBlocks, id: number, stamp: Int32Array, left: Int32Array, right: Int32Array): number[] | null {
  const { first, atomA, atomB } = blocks;
  const tag = -2 - id; // distinct from systemOf's stamps (ids ≥ 0) and the initial −1
  let atoms = 0;
  let lowest = Infinity;
  for (let k = first[id]!; k < first[id + 1]!; k++) {
    const x = atomA[k]!;
    const y = atomB[k]!;
    const added = attach(stamp, left, right, tag, x, y) + attach(stamp, left, right, tag, y, x);
    if (!(added >= 0)) return null;
    atoms += added;
    lowest = Math.min(lowest, x, y);
  }
  if (atoms !== first[id + 1]! - first[id]!) return null;
  const ring = [lowest];
  let previous = lowest;
  let current = Math.min(left[lowest]!, right[lowest]!);
  while (current !== lowest) {
    ring.push(current);
    const next = left[current] === previous ? right[current]! : left[current]!;
    previous = current;
    current = next;
  }
  return ring;
}

/** Records y as a block partner of x: 1 when x is new, 0 for its second partner, −∞ for a third. */
function attach(stamp: Int32Array, left: Int32Array, right: Int32Array, tag: number, x: number, y: number): number {
  if (stamp[x] !== tag) {
    stamp[x] = tag;
    left[x] = y;
    right[x] = -1;
    return 1;
  }
  if (right[x] !== -1) return -Infinity;
  right[x] = y;
  return 0;
}

/** Sorts canonical rings lexicographically: bucketed by first atom, then compared within a bucket. */
function sortRings(rings: number[][], n: number): number[][] {
  const start = new Int32Array(n + 1);
  for (const ring of rings) start[ring[0]! + 1]!++;
  for (let v = 0; v < n; v++) start[v + 1]! += start[v]!;
  const fill = start.slice(0, n);
  const sorted = new Array<number[]>(rings.length);
  for (const ring of rings) sorted[fill[ring[0]!]!++] = ring;
  for (let v = 0; v < n; v++) {
    if (start[v + 1]! - start[v]! > 1) {
      const group = sorted.slice(start[v]!, start[v + 1]!).sort(compareRings);
      for (let k = 0; k < group.length; k++) sorted[start[v]! + k] = group[k]!;
    }
  }
  return sorted;
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
