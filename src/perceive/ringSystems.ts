/**
 * Ring systems of a molecular graph: its biconnected blocks that contain a cycle. Fused and bridged rings
 * form one system; spiro rings (sharing one atom) and rings joined by a chain are separate systems.
 */
import { adjacencyOf, type Adjacency, type Graph } from './graph.js';

/** One ring system: its atoms (ascending, 0-based) and bonds (`[a, b]` with `a < b`, sorted). */
export interface RingSystem {
  readonly atoms: readonly number[];
  readonly bonds: readonly (readonly [number, number])[];
}

/**
 * Splits the cyclic part of `graph` into ring systems. Tree atoms are removed first by pruning degree-1
 * atoms repeatedly; blocks are then found by Tarjan's biconnected-components walk (iterative, so deep
 * chains cannot overflow the stack). Linear in atoms plus bonds. The number of independent rings of a
 * system is `bonds.length − atoms.length + 1`.
 * @example ringSystems(buildGraph(3, triangleBonds)).length // 1
 */
export function ringSystems(graph: Graph): RingSystem[] {
  const blocks = ringBlocks(graph);
  const stamp = new Int32Array(graph.size).fill(-1);
  const systems: RingSystem[] = [];
  for (let id = 0; id < blocks.count; id++) systems.push(systemOf(blocks, id, stamp));
  return systems.sort((p, q) => p.atoms[0]! - q.atoms[0]!);
}

/**
 * Bonds of the blocks that contain a cycle, flat: block `id` holds bonds `k` from `first[id]` to
 * `first[id + 1]`, each bond `atomA[k]`–`atomB[k]` (either order). Blocks come in no particular order.
 */
export interface RingBlocks {
  readonly count: number;
  readonly first: Int32Array;
  readonly atomA: Int32Array;
  readonly atomB: Int32Array;
}

/** The blocks of {@link ringSystems} as flat typed arrays (tree atoms pruned first). Linear. */
export function ringBlocks(graph: Graph): RingBlocks {
  const adjacency = adjacencyOf(graph);
  return biconnectedBlocks(adjacency, pruneTrees(adjacency));
}

/** Block `id` as a ring system: atoms ascending, bonds `[a, b]` with `a < b` sorted. `stamp` is scratch. */
export function systemOf(blocks: RingBlocks, id: number, stamp: Int32Array): RingSystem {
  const atoms: number[] = [];
  const bonds: [number, number][] = [];
  for (let k = blocks.first[id]!; k < blocks.first[id + 1]!; k++) {
    const a = blocks.atomA[k]!;
    const b = blocks.atomB[k]!;
    bonds.push(a < b ? [a, b] : [b, a]);
    if (stamp[a] !== id) {
      stamp[a] = id;
      atoms.push(a);
    }
    if (stamp[b] !== id) {
      stamp[b] = id;
      atoms.push(b);
    }
  }
  atoms.sort((x, y) => x - y);
  bonds.sort((p, q) => p[0] - q[0] || p[1] - q[1]);
  return { atoms, bonds };
}

/** Marks atoms that survive repeated removal of atoms with at most one remaining neighbour. */
function pruneTrees(graph: Adjacency): Uint8Array {
  const { size: n, start, list } = graph;
  const degree = new Int32Array(n);
  const alive = new Uint8Array(n).fill(1);
  // each atom enters the queue at most once: at degree ≤ 1, or when its degree drops to 1
  const queue = new Int32Array(n);
  let tail = 0;
  for (let v = 0; v < n; v++) {
    degree[v] = start[v + 1]! - start[v]!;
    if (degree[v]! <= 1) queue[tail++] = v;
  }
  for (let head = 0; head < tail; head++) {
    const v = queue[head]!;
    alive[v] = 0;
    for (let k = start[v]!; k < start[v + 1]!; k++) {
      const w = list[k]!;
      if (alive[w] && --degree[w]! === 1) queue[tail++] = w;
    }
  }
  return alive;
}

/** The biconnected blocks (bridges left out) of the subgraph induced by `alive` atoms. */
function biconnectedBlocks(graph: Adjacency, alive: Uint8Array): RingBlocks {
  const { size: n, start, list } = graph;
  const disc = new Int32Array(n).fill(-1);
  const low = new Int32Array(n);
  const bondCount = list.length;
  // blocks are copied out of the walk's stack into these (each bond lands in at most one block)
  const atomA = new Int32Array(bondCount / 2 + 1);
  const atomB = new Int32Array(bondCount / 2 + 1);
  const first: number[] = [0];
  let stored = 0;
  // bonds of the current walk, as two parallel stacks of atoms (each bond is pushed at most once)
  const stackA = new Int32Array(bondCount / 2 + 1);
  const stackB = new Int32Array(bondCount / 2 + 1);
  let bonds = 0;
  // depth-first frames: atom, its parent in the tree, next neighbour position
  const atom = new Int32Array(n);
  const parent = new Int32Array(n);
  const next = new Int32Array(n);
  let time = 0;
  for (let root = 0; root < n; root++) {
    if (!alive[root] || disc[root] !== -1) continue;
    disc[root] = low[root] = time++;
    let depth = 0;
    atom[0] = root;
    parent[0] = -1;
    next[0] = 0;
    while (depth >= 0) {
      const v = atom[depth]!;
      if (next[depth]! < start[v + 1]! - start[v]!) {
        const w = list[start[v]! + next[depth]!++]!;
        if (!alive[w]) continue;
        if (disc[w] === -1) {
          stackA[bonds] = v;
          stackB[bonds++] = w;
          disc[w] = low[w] = time++;
          depth++;
          atom[depth] = w;
          parent[depth] = v;
          next[depth] = 0;
        } else if (w !== parent[depth] && disc[w]! < disc[v]!) {
          stackA[bonds] = v;
          stackB[bonds++] = w;
          low[v] = Math.min(low[v]!, disc[w]!);
        }
        continue;
      }
      const p = parent[depth]!;
      depth--;
      if (p === -1) continue;
      low[p] = Math.min(low[p]!, low[v]!);
      if (low[v]! >= disc[p]!) {
        // the block is everything above the tree bond p–v; a lone bond is a bridge and is dropped
        let bottom = bonds - 1;
        while (stackA[bottom] !== p || stackB[bottom] !== v) bottom--;
        if (bottom < bonds - 1) {
          for (let k = bottom; k < bonds; k++) {
            atomA[stored] = stackA[k]!;
            atomB[stored++] = stackB[k]!;
          }
          first.push(stored);
        }
        bonds = bottom;
      }
    }
  }
  return { count: first.length - 1, first: Int32Array.from(first), atomA, atomB };
}
