import { describe, expect, it } from 'vitest';
import { ringReference } from '../../src/analysis/ringReference.js';
import { ConformarkError } from '../../src/model/errors.js';
import { buildGraph } from '../../src/perceive/graph.js';
import type { Bond } from '../../src/model/molecule.js';

const bonds = (pairs: [number, number][]): Bond[] =>
  pairs.map(([a, b]) => ({ a: Math.min(a, b), b: Math.max(a, b), order: 1, perceived: false }));
const atoms = (els: string) => [...els].map((element) => ({ element, name: null }));

// A pyranose skeleton numbered like a SMILES walk: 0 C5, 1 C4, 2 C3, 3 C2, 4 C1, 5 O5, 6 O1 (on C1), 7 C6 (on C5)
const sugar = { atoms: atoms('CCCCCOOC') };
const sugarGraph = buildGraph(8, bonds([[0, 1], [1, 2], [2, 3], [3, 4], [4, 5], [5, 0], [4, 6], [0, 7]]));

describe('ringReference', () => {
  it('ringReference of a pyranose starts at the ring O and walks toward the anomeric carbon (O5, C1, C2…)', () => {
    const r = ringReference(sugar, sugarGraph, [0, 1, 2, 3, 4, 5]);
    expect(r.atoms).toEqual([5, 4, 3, 2, 1, 0]);
    expect(r.locants).toEqual(['O', '1', '2', '3', '4', '5']);
    expect(r.rule).toMatch(/heteroatom first/);
  });

  it('ringReference of a ring heteroatom with no distinguishing substituent walks toward the lower-index neighbour', () => {
    const g = buildGraph(6, bonds([[0, 1], [1, 2], [2, 3], [3, 4], [4, 5], [5, 0]]));
    expect(ringReference({ atoms: atoms('CCOCCC') }, g, [0, 1, 2, 3, 4, 5]).atoms).toEqual([2, 1, 0, 5, 4, 3]);
  });

  it('ringReference of a carbocycle starts at the lowest index toward its lower-index neighbour, in any input order', () => {
    const g = buildGraph(6, bonds([[3, 1], [1, 4], [4, 0], [0, 5], [5, 2], [2, 3]]));
    const r = ringReference({ atoms: atoms('CCCCCC') }, g, [4, 1, 3, 2, 5, 0]);
    expect(r.atoms).toEqual([0, 4, 1, 3, 2, 5]);
    expect(r.locants).toEqual(['1', '2', '3', '4', '5', '6']);
  });

  it('ringReference with ordered uses the given order exactly and rejects an order that is not a closed walk', () => {
    expect(ringReference(sugar, sugarGraph, [2, 3, 4, 5, 0, 1], { ordered: true }).atoms).toEqual([2, 3, 4, 5, 0, 1]);
    expect(ringReference(sugar, sugarGraph, [5, 0, 1, 2, 3, 4], { ordered: true }).locants[0]).toBe('O');
    expect(() => ringReference(sugar, sugarGraph, [0, 2, 1, 3, 4, 5], { ordered: true })).toThrow(ConformarkError);
    expect(() => ringReference(sugar, sugarGraph, [0, 1, 2, 6], {})).toThrow(/ring/);
    expect(() => ringReference(sugar, sugarGraph, [0, 1], {})).toThrow(ConformarkError);
  });
});
