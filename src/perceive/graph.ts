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
 * Neighbour lists packed into typed arrays (compressed sparse rows): the neighbours of atom v, ascending,
 * are `list[start[v]…start[v + 1]]`, with the bond orders at the same positions of `orders`.
 */
export interface Adjacency {
  readonly size: number;
  readonly start: Int32Array;
  readonly list: Int32Array;
  readonly orders: Float64Array;
}

/** The packed rows behind each graph made by {@link buildGraph}, so ring perception need not repack them. */
const packed = new WeakMap<Graph, Adjacency>();

/**
 * Builds the graph of `size` atoms from a bond list. Self-bonds and out-of-range atoms are skipped; when a
 * pair is listed twice the first bond's order is kept. Linear in atoms plus bonds (two counting sorts).
 * @example buildGraph(3, [{ a: 0, b: 1, order: 1, perceived: true }]).neighbors[1] // [0]
 */
export function buildGraph(size: number, bonds: readonly Bond[]): Graph {
  const adjacency = pack(size, bonds);
  const { start, list, orders } = adjacency;
  const neighbors: number[][] = new Array<number[]>(size);
  for (let v = 0; v < size; v++) {
    const row: number[] = [];
    for (let k = start[v]!; k < start[v + 1]!; k++) row.push(list[k]!);
    neighbors[v] = row;
  }
  const graph: Graph = {
    size,
    neighbors,
    order: (a, b) => {
      const k = find(adjacency, a, b);
      return k < 0 ? 0 : orders[k]!;
    },
    bonded: (a, b) => find(adjacency, a, b) >= 0,
  };
  packed.set(graph, adjacency);
  return graph;
}

/**
 * The packed rows of `graph`: those kept by {@link buildGraph}, else packed from `graph.neighbors` (orders
 * from `graph.order`).
 */
export function adjacencyOf(graph: Graph): Adjacency {
  const known = packed.get(graph);
  if (known !== undefined) return known;
  const n = graph.size;
  const start = new Int32Array(n + 1);
  for (let v = 0; v < n; v++) start[v + 1] = start[v]! + graph.neighbors[v]!.length;
  const list = new Int32Array(start[n]!);
  const orders = new Float64Array(start[n]!);
  for (let v = 0; v < n; v++) {
    const row = graph.neighbors[v]!;
    for (let k = 0; k < row.length; k++) {
      list[start[v]! + k] = row[k]!;
      orders[start[v]! + k] = graph.order(v, row[k]!);
    }
  }
  return { size: n, start, list, orders };
}

/** Position of `b` in the row of `a` (binary search), or −1. */
function find(adjacency: Adjacency, a: number, b: number): number {
  const { size, start, list } = adjacency;
  if (!(a >= 0 && a < size && Number.isInteger(a))) return -1;
  let lo = start[a]!;
  let hi = start[a + 1]!;
  while (lo < hi) {
    const mid = (lo + hi) >>> 1;
    const x = list[mid]!;
    if (x === b) return mid;
    if (x < b) lo = mid + 1;
    else hi = mid;
  }
  return -1;
}

/**
 * Rows sorted by neighbour: the directed bonds are bucketed by target, then stably by source, so each row
 * comes out ascending with repeated pairs adjacent in input order (the first is kept).
 */
function pack(size: number, bonds: readonly Bond[]): Adjacency {
  const m = bonds.length;
  const from = new Int32Array(2 * m);
  const to = new Int32Array(2 * m);
  const weight = new Float64Array(2 * m);
  let count = 0;
  for (let k = 0; k < m; k++) {
    const { a, b, order } = bonds[k]!;
    if (a === b || !(a >= 0 && b >= 0 && a < size && b < size && Number.isInteger(a) && Number.isInteger(b))) continue;
    from[count] = a;
    to[count] = b;
    weight[count++] = order;
    from[count] = b;
    to[count] = a;
    weight[count++] = order;
  }
  const byTarget = bucket(to, count, size);
  const start = new Int32Array(size + 1);
  for (let e = 0; e < count; e++) start[from[e]! + 1]!++;
  for (let v = 0; v < size; v++) start[v + 1]! += start[v]!;
  const fill = start.slice(0, size);
  const rowList = new Int32Array(count);
  const rowOrders = new Float64Array(count);
  for (let r = 0; r < count; r++) {
    const e = byTarget[r]!;
    const slot = fill[from[e]!]!++;
    rowList[slot] = to[e]!;
    rowOrders[slot] = weight[e]!;
  }
  // drop repeated pairs (adjacent within a row), keeping the first
  const list = new Int32Array(count);
  const orders = new Float64Array(count);
  let kept = 0;
  for (let v = 0; v < size; v++) {
    const begin = start[v]!;
    const end = start[v + 1]!;
    start[v] = kept;
    for (let k = begin; k < end; k++) {
      if (k > begin && rowList[k] === rowList[k - 1]) continue;
      list[kept] = rowList[k]!;
      orders[kept++] = rowOrders[k]!;
    }
  }
  start[size] = kept;
  return { size, start, list: list.slice(0, kept), orders: orders.slice(0, kept) };
}

/** Indices 0…count−1 stably sorted by `key` (values in 0…slots−1), by counting. */
function bucket(key: Int32Array, count: number, slots: number): Int32Array {
  const first = new Int32Array(slots + 1);
  for (let e = 0; e < count; e++) first[key[e]! + 1]!++;
  for (let s = 0; s < slots; s++) first[s + 1]! += first[s]!;
  const sorted = new Int32Array(count);
  for (let e = 0; e < count; e++) sorted[first[key[e]!]!++] = e;
  return sorted;
}
