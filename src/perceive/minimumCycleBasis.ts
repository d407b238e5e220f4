/**
 * Minimum cycle basis of one ring system (its smallest set of smallest rings), by Horton's method:
 * Horton 1987 (SIAM J. Comput. 16, 358) shows that the cycles P(r, x) + (x, y) + P(y, r), built from one
 * fixed shortest path between every pair of atoms, contain a minimum cycle basis; the basis is then picked
 * greedily, shortest first, keeping each cycle that is independent of those kept (Gaussian elimination over
 * GF(2) on bond bitsets).
 */
import { usageError, type ConformarkError } from '../model/errors.js';
import type { RingSystem } from './ringSystems.js';

interface Candidate {
  /** Local atom ids in cyclic bonded order. */
  readonly cycle: number[];
  /** Bond bitset. */
  readonly bits: Uint32Array;
  /** Sorted local atom ids, for deterministic tie-breaking. */
  readonly sorted: number[];
}

/**
 * Most elimination work (32-bit word operations, candidates × basis rows touched) spent on one ring system
 * before it is refused: far above any molecule (a 1,000-atom fused cage takes well under 1 % of it), and
 * below the minutes and gigabytes a crystal-sized lattice would take.
 */
export const MAX_RING_WORK = 4e9;

/**
 * The rings of a minimum cycle basis of `system`, each in cyclic bonded order (0-based atom indices).
 * There are `bonds − atoms + 1` of them. Among rings of equal size the choice is deterministic: rings whose
 * sorted atom lists come first lexicographically are preferred.
 *
 * Candidates are made in rounds of growing length (breadth-first trees cut at depth D give every Horton cycle
 * of length ≤ 2D + 1), each round sorted and eliminated before the next: the same greedy order as making them
 * all first, but a lattice of short rings never builds its long cycles. Elimination keeps one basis row per
 * pivot bond, so a candidate meets only the rows of its own bonds. Work beyond `MAX_RING_WORK` stops with a
 * `ring-system-too-large` error instead of running for minutes.
 * @example minimumCycleBasis(norbornaneSystem).map((r) => r.length) // [5, 5]
 */
export function minimumCycleBasis(system: RingSystem, maxWork: number = MAX_RING_WORK): number[][] {
  const { atoms, bonds } = system;
  const v = atoms.length;
  const rank = bonds.length - v + 1;
  if (rank <= 0) return [];
  if (rank === 1) return [simpleCycle(system)];
  const local = new Map<number, number>(atoms.map((a, i) => [a, i]));
  const adjacency: number[][] = Array.from({ length: v }, () => []);
  const bondId = new Map<number, number>();
  bonds.forEach(([a, b], id) => {
    const x = local.get(a)!;
    const y = local.get(b)!;
    adjacency[x]!.push(y);
    adjacency[y]!.push(x);
    bondId.set(x * v + y, id).set(y * v + x, id);
  });
  for (const list of adjacency) list.sort((p, q) => p - q);
  const words = Math.ceil(bonds.length / 32);
  const bitsOf = (cycle: readonly number[]): Uint32Array => {
    const bits = new Uint32Array(words);
    for (let k = 0; k < cycle.length; k++) {
      const id = bondId.get(cycle[k]! * v + cycle[(k + 1) % cycle.length]!)!;
      bits[id >>> 5]! |= 1 << (id & 31);
    }
    return bits;
  };

  // basis rows by pivot (the row's lowest bond); a row has no bond below its pivot
  const rowOf = new Map<number, Uint32Array>();
  const chosen: number[][] = [];
  let work = 0;
  let done = 0; // candidates of at most this length are processed
  for (let depth = 1; chosen.length < rank; depth = Math.min(v, depth * 2)) {
    const longest = depth >= v ? Infinity : 2 * depth + 1;
    const candidates = hortonCandidates(adjacency, depth, done, longest).map((cycle): Candidate => ({
      cycle,
      bits: bitsOf(cycle),
      sorted: cycle.slice().sort((p, q) => p - q),
    }));
    candidates.sort(compareCandidates);
    for (const c of candidates) {
      if (chosen.length === rank) break;
      const reduced = c.bits;
      for (let pivot = lowestBit(reduced, 0); pivot >= 0; pivot = lowestBit(reduced, pivot >>> 5)) {
        const row = rowOf.get(pivot);
        if (row === undefined) {
          rowOf.set(pivot, reduced);
          chosen.push(c.cycle.map((i) => atoms[i]!));
          break;
        }
        for (let w = pivot >>> 5; w < words; w++) reduced[w]! ^= row[w]!;
        work += words - (pivot >>> 5);
        if (work > maxWork) throw tooLarge(v, rank);
      }
    }
    if (longest === Infinity) break;
    done = longest;
  }
  return chosen;
}

function tooLarge(atoms: number, rank: number): ConformarkError {
  return usageError(
    'ring-system-too-large',
    `a fused ring system of ${atoms} atoms and ${rank} independent rings is too large for ring perception (a framework or lattice, not a molecule): give a fragment`,
  );
}

/**
 * Horton's candidate cycles of length in (`shortest`, `longest`]: from each root r, a breadth-first tree cut
 * at `depth` (neighbours in ascending order fix one shortest path to every atom); every non-tree bond (x, y)
 * whose tree paths to r meet only at r closes the cycle r → … → x → y → … → r.
 */
function hortonCandidates(adjacency: readonly (readonly number[])[], depth: number, shortest: number, longest: number): number[][] {
  const v = adjacency.length;
  const parent = new Int32Array(v).fill(-2);
  const branch = new Int32Array(v);
  const dist = new Int32Array(v);
  const order = new Int32Array(v);
  const out: number[][] = [];
  const seen = new Set<string>();
  for (let root = 0; root < v; root++) {
    parent[root] = -1;
    branch[root] = -1;
    dist[root] = 0;
    order[0] = root;
    let tail = 1;
    for (let head = 0; head < tail; head++) {
      const x = order[head]!;
      if (dist[x]! >= depth) continue;
      for (const y of adjacency[x]!) {
        if (parent[y] !== -2) continue;
        parent[y] = x;
        branch[y] = x === root ? y : branch[x]!;
        dist[y] = dist[x]! + 1;
        order[tail++] = y;
      }
    }
    // in ascending atom order, as a scan of every atom would meet them
    const ball = Array.from(order.subarray(0, tail)).sort((p, q) => p - q);
    for (const x of ball) {
      for (const y of adjacency[x]!) {
        if (y < x || parent[y] === -2 || parent[y] === x || parent[x] === y) continue;
        if (branch[x] === branch[y]) continue;
        const length = dist[x]! + dist[y]! + 1;
        if (length <= shortest || length > longest) continue;
        const cycle = pathToRoot(parent, x).reverse();
        for (let w = y; w !== root; w = parent[w]!) cycle.push(w);
        const key = cycleKey(cycle);
        if (seen.has(key)) continue;
        seen.add(key);
        out.push(cycle);
      }
    }
    for (let k = 0; k < tail; k++) parent[order[k]!] = -2;
  }
  return out;
}

/** A block with as many bonds as atoms is one simple cycle: walk it in bonded order from its lowest atom. */
function simpleCycle(system: RingSystem): number[] {
  const partners = new Map<number, number[]>();
  for (const [a, b] of system.bonds) {
    (partners.get(a) ?? partners.set(a, []).get(a)!).push(b);
    (partners.get(b) ?? partners.set(b, []).get(b)!).push(a);
  }
  const first = system.atoms[0]!;
  const cycle = [first];
  let previous = -1;
  let current = first;
  for (;;) {
    const [p, q] = partners.get(current)!;
    const next = p === previous ? q! : p!;
    if (next === first) return cycle;
    cycle.push(next);
    previous = current;
    current = next;
  }
}

/** Atoms from `x` up the tree to the root, both included. */
function pathToRoot(parent: Int32Array, x: number): number[] {
  const path: number[] = [];
  for (let w = x; w !== -1; w = parent[w]!) path.push(w);
  return path;
}

/** Identifies a cycle by its bonds, independent of start atom and direction. */
function cycleKey(cycle: readonly number[]): string {
  const n = cycle.length;
  const bonds: string[] = [];
  for (let k = 0; k < n; k++) {
    const a = cycle[k]!;
    const b = cycle[(k + 1) % n]!;
    bonds.push(a < b ? `${a}-${b}` : `${b}-${a}`);
  }
  return bonds.sort().join(',');
}

function compareCandidates(p: Candidate, q: Candidate): number {
  if (p.cycle.length !== q.cycle.length) return p.cycle.length - q.cycle.length;
  for (let k = 0; k < p.sorted.length; k++) {
    if (p.sorted[k] !== q.sorted[k]) return p.sorted[k]! - q.sorted[k]!;
  }
  // same atoms, different bonds (possible in dense systems): order by bond bitset
  for (let w = 0; w < p.bits.length; w++) {
    if (p.bits[w] !== q.bits[w]) return p.bits[w]! - q.bits[w]!;
  }
  return 0;
}

/** The lowest set bit of `bits` at word `from` or above, or −1. */
function lowestBit(bits: Uint32Array, from: number): number {
  for (let w = from; w < bits.length; w++) {
    const word = bits[w]!;
    if (word !== 0) return w * 32 + (31 - Math.clz32(word & -word));
  }
  return -1;
}
