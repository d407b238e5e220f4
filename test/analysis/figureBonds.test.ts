import { describe, expect, it } from 'vitest';
import { buildGraph, figureBonds, ringBonds } from '../../src/index.js';
import { butane, cyclohexaneChair } from '../helpers/newmanMolecules.js';

describe('figureBonds', () => {
  it('figureBonds rotatable keeps butane C2–C3 and leaves out the bonds to the terminal methyls and hydrogens', () => {
    const mol = butane(180);
    const graph = buildGraph(mol.atoms.length, mol.bonds!);
    expect(figureBonds(mol, graph, [], 'rotatable')).toEqual([[1, 2]]);
    const all = figureBonds(mol, graph, [], 'all');
    expect(all).toEqual([[0, 1], [1, 2], [2, 3]]);
    expect(figureBonds(mol, graph, [], 'ring')).toEqual([]);
  });

  it('figureBonds ring gives each ring bond once, along the ring, and rotatable gives none of them', () => {
    const { mol, ring } = cyclohexaneChair();
    const graph = buildGraph(mol.atoms.length, mol.bonds!);
    const bonds = figureBonds(mol, graph, [ring], 'ring');
    expect(bonds).toEqual(ring.map((a, i) => [a, ring[(i + 1) % 6]]));
    expect(figureBonds(mol, graph, [ring], 'rotatable')).toEqual([]);
    expect(ringBonds([ring, [ring[1]!, ring[0]!, 99, 98]])).toHaveLength(6 + 3); // the shared bond counted once
  });
});
