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
  const alive = pruneTrees(graph);
  const blocks = biconnectedBlocks(graph, alive);
  const systems: RingSystem[] = [];
  for (const edges of blocks) {
    const atomSet = new Set<number>();
    for (const [a, b] of edges) atomSet.add(a).add(b);
    const atoms = [...atomSet].sort((x, y) => x - y);
    const bonds = edges
      .map(([a, b]): [number, number] => (a < b ? [a, b] : [b, a]))
      .sort((p, q) => p[0] - q[0] || p[1] - q[1]);
    systems.push({ atoms, bonds });
  }
  return systems.sort((p, q) => p.atoms[0]! - q.atoms[0]!);
}

/** Marks atoms that survive repeated removal of atoms with at most one remaining neighbour. */
function pruneTrees(graph: Graph): Uint8Array {
  const n = graph.size;
  const degree = new Int32Array(n);
  const alive = new Uint8Array(n).fill(1);
  const queue: number[] = [];
  for (let v = 0; v < n; v++) {
    degree[v] = graph.neighbors[v]!.length;
    if (degree[v]! <= 1) queue.push(v);
  }
  for (let head = 0; head < queue.length; head++) {
    const v = queue[head]!;
    if (!alive[v]) continue;
    alive[v] = 0;
    for (const w of graph.neighbors[v]!) {
      if (alive[w] && --degree[w]! === 1) queue.push(w);
    }
  }
  return alive;
}

/** Bond lists of the biconnected blocks (bridges left out) of the subgraph induced by `alive` atoms. */
function biconnectedBlocks(graph: Graph, alive: Uint8Array): [number, number][][] {
  const n = graph.size;
  const disc = new Int32Array(n).fill(-1);
  const low = new Int32Array(n);
  const blocks: [number, number][][] = [];
  let bondCount = 0;
  for (const list of graph.neighbors) bondCount += list.length;
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
      const list = graph.neighbors[v]!;
      if (next[depth]! < list.length) {
        const w = list[next[depth]!++]!;
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
