/**
 * Which rings are analysed (docs/methods.md#rings): metal contacts close no ring, disulfide loops between residues
 * and rings over 12 atoms are set aside. The rules are common practice, no source.
 */
import { describe, expect, it } from 'vitest';
import { DEFAULT_MAX_RING_SIZE, isCoordinationBond, ringClosingBonds, scopeRings } from '../../src/perceive/ringScope.js';
import type { Atom, Molecule } from '../../src/model/molecule.js';
import { bondsOf } from './fixtures.js';

/** Atoms only (scopeRings and the ring graph read elements and residues, never coordinates). */
function atoms(list: readonly Partial<Atom>[]): Pick<Molecule, 'atoms'> {
  return { atoms: list.map((a) => ({ element: 'C', name: null, ...a })) };
}
const ring = (n: number) => Array.from({ length: n }, (_, k) => k);

describe('scopeRings', () => {
  it('scopeRings sets aside a ring closed by an S–S bond between two residues and names both sulfurs', () => {
    const mol = atoms([
      { element: 'S', name: 'SG', residue: 'CYS', residueNumber: 3, chain: 'A' },
      ...Array.from({ length: 6 }, () => ({ residue: 'GLY', residueNumber: 4, chain: 'A' })),
      { element: 'S', name: 'SG', residue: 'CYS', residueNumber: 9, chain: 'A' },
    ]);
    const { rings, setAside } = scopeRings(mol, [ring(8)]);
    expect(rings).toEqual([]);
    expect(setAside).toHaveLength(1);
    expect(setAside[0]!.reason).toBe('disulfide');
    expect(setAside[0]!.message).toBe('8-atom ring through the S–S bond A/CYS3/SG (atom 1)–A/CYS9/SG (atom 8): a disulfide loop, listed but not analysed (--ss-rings, option disulfideRings, analyses it)');
    expect(scopeRings(mol, [ring(8)], { disulfideRings: true }).rings).toEqual([ring(8)]);
  });

  it('scopeRings keeps an S–S ring without residues or inside one residue (1,2-dithiane, a lipoyl ligand)', () => {
    const dithiane = atoms([{ element: 'S' }, { element: 'S' }, {}, {}, {}, {}]);
    expect(scopeRings(dithiane, [ring(6)]).rings).toEqual([ring(6)]);
    const lipoyl = atoms([{ element: 'S', residue: 'LPA', residueNumber: 1 }, { element: 'S', residue: 'LPA', residueNumber: 1 }, ...Array.from({ length: 3 }, () => ({ residue: 'LPA', residueNumber: 1 }))]);
    expect(scopeRings(lipoyl, [ring(5)]).rings).toEqual([ring(5)]);
  });

  it(`scopeRings analyses rings up to ${DEFAULT_MAX_RING_SIZE} atoms and sets aside larger ones, keeping the order of the rest`, () => {
    const mol = atoms(Array.from({ length: 40 }, () => ({})));
    const small = [0, 1, 2, 3, 4, 5];
    const twelve = ring(12);
    const thirteen = ring(13);
    const { rings, setAside } = scopeRings(mol, [small, thirteen, twelve]);
    expect(rings).toEqual([small, twelve]);
    expect(setAside.map((r) => [r.reason, r.atoms.length])).toEqual([['too-large', 13]]);
    expect(setAside[0]!.message).toBe('13-atom ring: larger than 12 atoms, listed but not analysed (--max-ring-size 13, option maxRingSize, analyses it)');
    expect(scopeRings(mol, [thirteen], { maxRingSize: 13 }).rings).toEqual([thirteen]);
    expect(() => scopeRings(mol, [small], { maxRingSize: 2 })).toThrow(RangeError);
  });
});

describe('ringClosingBonds', () => {
  it('ringClosingBonds leaves out every bond to a metal unless metalRings, and returns the list itself when there is none', () => {
    const mol = atoms([{ element: 'N' }, { element: 'Zn' }, { element: 'C' }, { element: 'O' }]);
    const bonds = bondsOf([[0, 1], [1, 3], [0, 2], [2, 3]]);
    expect(ringClosingBonds(mol, bonds).map((b) => [b.a, b.b])).toEqual([[0, 2], [2, 3]]);
    expect(ringClosingBonds(mol, bonds, { metalRings: true })).toBe(bonds);
    const organic = atoms([{ element: 'N' }, { element: 'C' }]);
    const one = bondsOf([[0, 1]]);
    expect(ringClosingBonds(organic, one)).toBe(one);
    expect(bonds.map((b) => isCoordinationBond(mol, b))).toEqual([true, true, false, false]);
  });
});
