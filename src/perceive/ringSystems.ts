/**
 * Ring systems of a molecular graph: its biconnected blocks that contain a cycle. Fused and bridged rings
 * form one system; spiro rings (sharing one atom) and rings joined by a chain are separate systems.
 */
import type { Graph } from './graph.js';

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
  const csr = compact(graph);
  const alive = pruneTrees(csr);
  const blocks = biconnectedBlocks(csr, alive);
  const stamp = new Int32Array(graph.size).fill(-1);
  const systems: RingSystem[] = blocks.map((edges, id) => {
    const atoms: number[] = [];
    for (const edge of edges) {
      if (edge[0] > edge[1]) edge.reverse();
      for (const atom of edge) {
        if (stamp[atom] !== id) {
          stamp[atom] = id;
          atoms.push(atom);
        }
      }
    }
    atoms.sort((x, y) => x - y);
    edges.sort((p, q) => p[0] - q[0] || p[1] - q[1]);
    return { atoms, bonds: edges };
  });
  return systems.sort((p, q) => p.atoms[0]! - q.atoms[0]!);
}

/** Neighbour lists packed into two typed arrays: neighbours of v are `list[start[v]…start[v + 1]]`. */
interface Packed {
  readonly size: number;
  readonly start: Int32Array;
  readonly list: Int32Array;
}

function compact(graph: Graph): Packed {
  const n = graph.size;
  const start = new Int32Array(n + 1);
  for (let v = 0; v < n; v++) start[v + 1] = start[v]! + graph.neighbors[v]!.length;
  const list = new Int32Array(start[n]!);
  for (let v = 0; v < n; v++) list.set(graph.neighbors[v]!, start[v]!);
  return { size: n, start, list };
}

/** Marks atoms that survive repeated removal of atoms with at most one remaining neighbour. */
function pruneTrees(graph: Packed): Uint8Array {
  const { size: n, start, list } = graph;
  const degree = new Int32Array(n);
  const alive = new Uint8Array(n).fill(1);
  const queue: number[] = [];
  for (let v = 0; v < n; v++) {
    degree[v] = start[v + 1]! - start[v]!;
    if (degree[v]! <= 1) queue.push(v);
  }
  for (let head = 0; head < queue.length; head++) {
    const v = queue[head]!;
    if (!alive[v]) continue;
    alive[v] = 0;
    for (let k = start[v]!; k < start[v + 1]!; k++) {
      const w = list[k]!;
      if (alive[w] && --degree[w]! === 1) queue.push(w);
    }
  }
  return alive;
}

/** Bond lists of the biconnected blocks (bridges left out) of the subgraph induced by `alive` atoms. */
function biconnectedBlocks(graph: Packed, alive: Uint8Array): [number, number][][] {
  const { size: n, start, list } = graph;
  const disc = new Int32Array(n).fill(-1);
  const low = new Int32Array(n);
  const blocks: [number, number][][] = [];
  const bondCount = list.length;
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
          const block: [number, number][] = [];
          for (let k = bottom; k < bonds; k++) block.push([stackA[k]!, stackB[k]!]);
          blocks.push(block);
        }
        bonds = bottom;
      }
    }
  }
  return blocks;
}
