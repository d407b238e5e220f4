/** Independent GF(2) cycle-space helpers for the ring tests (BigInt bitsets over bond indices). */
import type { Graph } from '../../src/perceive/graph.js';

/** Bond bitset of a cyclic atom list, or null when two consecutive atoms are not bonded. */
export function cycleBits(graph: Graph, ring: readonly number[], bondIndex: Map<string, number>): bigint | null {
  let bits = 0n;
  for (let k = 0; k < ring.length; k++) {
    const a = ring[k]!;
    const b = ring[(k + 1) % ring.length]!;
    if (!graph.bonded(a, b)) return null;
    bits ^= 1n << BigInt(bondIndex.get(a < b ? `${a}-${b}` : `${b}-${a}`)!);
  }
  return bits;
}

/** Index of every bond `a-b` (a < b) of the graph. */
export function bondIndexOf(graph: Graph): Map<string, number> {
  const index = new Map<string, number>();
  graph.neighbors.forEach((list, a) => list.forEach((b) => a < b && index.set(`${a}-${b}`, index.size)));
  return index;
}

/** Rank over GF(2) of a set of bitsets. */
export function rankOf(vectors: readonly bigint[]): number {
  const pivots = new Map<number, bigint>();
  for (let v of vectors) {
    while (v !== 0n) {
      const top = v.toString(2).length - 1;
      const row = pivots.get(top);
      if (row === undefined) {
        pivots.set(top, v);
        break;
      }
      v ^= row;
    }
  }
  return pivots.size;
}

/** Sizes of a minimum cycle basis chosen greedily (shortest first) from `rings`. */
export function greedyBasisSizes(graph: Graph, rings: readonly (readonly number[])[]): number[] {
  const index = bondIndexOf(graph);
  const kept: bigint[] = [];
  const sizes: number[] = [];
  for (const ring of [...rings].sort((p, q) => p.length - q.length)) {
    const bits = cycleBits(graph, ring, index)!;
    if (rankOf([...kept, bits]) > kept.length) {
      kept.push(bits);
      sizes.push(ring.length);
    }
  }
  return sizes;
}

/** Number of connected components (isolated atoms count). */
export function componentCount(graph: Graph): number {
  const seen = new Uint8Array(graph.size);
  let count = 0;
  for (let s = 0; s < graph.size; s++) {
    if (seen[s]) continue;
    count++;
    const stack = [s];
    seen[s] = 1;
    while (stack.length) for (const w of graph.neighbors[stack.pop()!]!) if (!seen[w]) (seen[w] = 1), stack.push(w);
  }
  return count;
}

/** Every simple cycle of a small graph, each once (start at its lowest atom). */
export function allSimpleCycles(graph: Graph): number[][] {
  const out: number[][] = [];
  for (let s = 0; s < graph.size; s++) {
    const path = [s];
    const on = new Set([s]);
    const walk = (v: number) => {
      for (const w of graph.neighbors[v]!) {
        if (w === s && path.length >= 3 && path[1]! < path[path.length - 1]!) out.push(path.slice());
        if (w <= s || on.has(w)) continue;
        path.push(w);
        on.add(w);
        walk(w);
        path.pop();
        on.delete(w);
      }
    };
    walk(s);
  }
  return out;
}
