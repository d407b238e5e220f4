import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { findRings, canonicalRing } from '../../src/perceive/findRings.js';
import { ringSystems } from '../../src/perceive/ringSystems.js';
import { minimumCycleBasis } from '../../src/perceive/minimumCycleBasis.js';
import { buildGraph } from '../../src/perceive/graph.js';
import { bondsOf } from './fixtures.js';
import { allSimpleCycles, bondIndexOf, componentCount, cycleBits, greedyBasisSizes, rankOf } from './cycleSpace.js';

const graphOf = (n: number, edges: readonly (readonly [number, number])[]) => buildGraph(n, bondsOf(edges));
const cycle = (atoms: readonly number[]): [number, number][] => atoms.map((a, k) => [a, atoms[(k + 1) % atoms.length]!]);
const sizes = (rings: readonly number[][]) => rings.map((r) => r.length).sort((p, q) => p - q);

/** Checks every ring is a simple closed walk and the set is an independent basis of E − V + C rings. */
function expectBasis(graph: ReturnType<typeof graphOf>, rings: readonly number[][]) {
  const index = bondIndexOf(graph);
  const bits = rings.map((r) => cycleBits(graph, r, index));
  expect(bits.every((b) => b !== null)).toBe(true);
  for (const r of rings) expect(new Set(r).size).toBe(r.length);
  expect(rankOf(bits as bigint[])).toBe(rings.length);
  expect(rings.length).toBe(index.size - graph.size + componentCount(graph));
}

// cubane: two squares 0-1-2-3 and 4-5-6-7 joined by 0-4, 1-5, 2-6, 3-7
const CUBANE: [number, number][] = [...cycle([0, 1, 2, 3]), ...cycle([4, 5, 6, 7]), [0, 4], [1, 5], [2, 6], [3, 7]];

describe('findRings', () => {
  it('findRings returns a ring from its lowest atom toward its smaller neighbour', () => {
    expect(findRings(graphOf(6, cycle([0, 3, 1, 4, 2, 5])))).toEqual([[0, 3, 1, 4, 2, 5]]);
    expect(findRings(graphOf(6, cycle([5, 4, 3, 2, 1, 0])))).toEqual([[0, 1, 2, 3, 4, 5]]);
    expect(canonicalRing([4, 2, 9, 7])).toEqual([2, 4, 7, 9]);
    expect(canonicalRing([4, 2, 7, 9])).toEqual([2, 4, 9, 7]);
  });

  it('findRings gives cubane five four-rings, E − V + 1 (Horton 1987 minimum cycle basis)', () => {
    const graph = graphOf(8, CUBANE);
    const rings = findRings(graph);
    expect(sizes(rings)).toEqual([4, 4, 4, 4, 4]);
    expectBasis(graph, rings);
  });

  it('findRings gives K4 three triangles and norbornane two five-rings', () => {
    expect(sizes(findRings(graphOf(4, [[0, 1], [0, 2], [0, 3], [1, 2], [1, 3], [2, 3]])))).toEqual([3, 3, 3]);
    // norbornane skeleton: C1..C7 as 0..6, bridgeheads 0 and 3, bridge atom 6
    const norbornane = graphOf(7, [[0, 1], [1, 2], [2, 3], [3, 4], [4, 5], [5, 0], [0, 6], [3, 6]]);
    expect(findRings(norbornane)).toEqual([[0, 1, 2, 3, 6], [0, 5, 4, 3, 6]]);
  });

  it('findRings splits spiro rings and separate components into ring systems', () => {
    // spiro[2.2]pentane-like: triangles 0-1-2 and 2-3-4 share atom 2; a separate square 5..8 with a tail 9-10
    const graph = graphOf(11, [...cycle([0, 1, 2]), ...cycle([2, 3, 4]), ...cycle([5, 6, 7, 8]), [8, 9], [9, 10]]);
    expect(ringSystems(graph).map((s) => s.atoms)).toEqual([[0, 1, 2], [2, 3, 4], [5, 6, 7, 8]]);
    expect(findRings(graph)).toEqual([[0, 1, 2], [2, 3, 4], [5, 6, 7, 8]]);
    expectBasis(graph, findRings(graph));
  });

  it('findRings ignores chains, including a 100,000-atom chain ending in a ring', () => {
    const n = 100_000;
    const edges: [number, number][] = [];
    for (let i = 0; i + 1 < n; i++) edges.push([i, i + 1]);
    edges.push([n - 1, n - 6]);
    expect(findRings(graphOf(n, edges))).toEqual([[n - 6, n - 5, n - 4, n - 3, n - 2, n - 1]]);
    expect(findRings(graphOf(5, [[0, 1], [1, 2], [2, 3], [1, 4]]))).toEqual([]);
    expect(findRings(graphOf(0, []))).toEqual([]);
  });

  it('findRings does not depend on the order of the bond list', () => {
    const shuffled = [...CUBANE].reverse().map(([a, b]) => [b, a] as [number, number]);
    expect(findRings(graphOf(8, shuffled))).toEqual(findRings(graphOf(8, CUBANE)));
  });

  it('findRings finds a minimum cycle basis on random small graphs (fast-check vs all simple cycles)', () => {
    const graphs = fc
      .integer({ min: 1, max: 8 })
      .chain((n) => fc.tuple(fc.constant(n), fc.uniqueArray(fc.tuple(fc.nat(n - 1), fc.nat(n - 1)), { maxLength: 14 })));
    fc.assert(
      fc.property(graphs, ([n, raw]) => {
        const graph = graphOf(n, raw.filter(([a, b]) => a !== b));
        const rings = findRings(graph);
        expectBasis(graph, rings);
        // the sorted sizes of every minimum cycle basis are the same (matroid greedy), so compare with brute force
        expect(sizes(rings)).toEqual(greedyBasisSizes(graph, allSimpleCycles(graph)));
        for (const r of rings) expect(canonicalRing(r)).toEqual(r);
      }),
      { seed: 20261203, numRuns: 400 },
    );
  });
});

describe('findRings on large fused lattices', () => {
  /** A simple cubic lattice of n × n × n atoms, bonds to the six axis neighbours: every ring is a 4-ring. */
  const lattice = (n: number) => {
    const id = (x: number, y: number, z: number) => x + n * (y + n * z);
    const edges: [number, number][] = [];
    for (let z = 0; z < n; z++) for (let y = 0; y < n; y++) for (let x = 0; x < n; x++) {
      if (x + 1 < n) edges.push([id(x, y, z), id(x + 1, y, z)]);
      if (y + 1 < n) edges.push([id(x, y, z), id(x, y + 1, z)]);
      if (z + 1 < n) edges.push([id(x, y, z), id(x, y, z + 1)]);
    }
    return graphOf(n ** 3, edges);
  };

  it('findRings(8 × 8 × 8 cubic lattice) gives the E − V + 1 four-rings of an independent basis (built in rounds of growing length)', () => {
    const graph = lattice(8);
    const rings = findRings(graph);
    expect(rings.length).toBe(3 * 8 * 8 * 7 - 512 + 1);
    expect(rings.every((r) => r.length === 4)).toBe(true);
    expectBasis(graph, rings);
  });

  it('minimumCycleBasis refuses a ring system over its work limit with ring-system-too-large, one clear line', () => {
    const [system] = ringSystems(lattice(6));
    expect(() => minimumCycleBasis(system!, 1000)).toThrow(expect.objectContaining({ code: 'ring-system-too-large' }));
    expect(() => minimumCycleBasis(system!, 1000)).toThrow(/a fused ring system of 216 atoms and 325 independent rings is too large for ring perception/);
    expect(minimumCycleBasis(system!)).toHaveLength(325);
  });
});
