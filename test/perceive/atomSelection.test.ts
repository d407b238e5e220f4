import { describe, expect, it } from 'vitest';
import type { Atom, Molecule } from '../../src/model/molecule.js';
import { ringTokenKind, selectAtom, selectRings, splitAtomList } from '../../src/perceive/atomSelection.js';
import { findRings } from '../../src/perceive/findRings.js';
import { buildGraph } from '../../src/perceive/graph.js';
import { ringSelection } from '../../src/perceive/ringSelection.js';
import { bondsOf } from './fixtures.js';
import { failure, sugar } from './selection.js';

// A structure-like record (geometry unused): [chain, residue, number, insertion, atom names, serial of the first]
const residues: [string, string, number, string, string[], number][] = [
  ['A', 'PRO', 42, '', ['N', 'CA', 'CB', 'CG', 'CD'], 101], // atoms 1-5, ring N-CA-CB-CG-CD
  ['A', 'GLY', 42, 'B', ['N', 'CA', 'C', 'O'], 106], // atoms 6-9, insertion code B
  ['B', 'BGC', 601, '', ['C1', 'C2', 'C3', 'C4', 'C5', 'O5'], 6415], // atoms 10-15, ring
  ['B', 'BGC', 602, '', ['C1', 'C2', 'C3', 'C4', 'C5', 'O5'], 6421], // atoms 16-21, ring
  ['C', 'PRO', 42, '', ['N', 'CA', 'CB'], 6427], // atoms 22-24, no ring
  ['A', 'A2M', 12, '', ['C1'], 6430], // atom 25, residue name ending in a digit
  ['', 'ACE', -1, '', ['N'], 6431], // atom 26, blank chain, negative number
];
const atoms: Atom[] = residues.flatMap(([chain, residue, residueNumber, insertionCode, names, first]) =>
  names.map((name, k) => ({ element: name[0]!, name, residue, residueNumber, insertionCode, chain, serial: first + k })),
);
const ringBonds = (start: number, n: number): [number, number][] => Array.from({ length: n }, (_, k) => [start + k, start + ((k + 1) % n)]);
const bonds = bondsOf([...ringBonds(0, 5), ...ringBonds(9, 6), ...ringBonds(15, 6), [5, 6], [21, 22]]);
const protein: Molecule = {
  title: 'structure',
  atoms,
  coords: new Float64Array(3 * atoms.length),
  bonds,
  properties: {},
  source: { file: 'test.pdb', format: 'pdb', index: 1, line: 1 },
};
const graph = buildGraph(atoms.length, bonds);
const rings = findRings(graph);

describe('selectAtom', () => {
  it('selectAtom keeps positions and names as before', () => {
    expect(selectAtom(protein, '10')).toBe(9);
    expect(selectAtom(sugar, 'O5')).toBe(0);
    expect(selectAtom(protein, 'CG')).toBe(3);
  });

  it('selectAtom reads #serial as the file serial, never as a position', () => {
    expect(selectAtom(protein, '#6415')).toBe(9);
    expect(selectAtom(protein, '#101')).toBe(0);
    expect(failure(() => selectAtom(protein, '#5'))).toEqual(['unknown-atom', 'test.pdb: no atom has serial 5 (serials in the record run 101–6431)']);
    expect(failure(() => selectAtom(sugar, '#3'))[1]).toContain('the record has no atom serials');
    expect(failure(() => selectAtom(protein, '#x1'))[0]).toBe('bad-selection');
  });

  it('selectAtom reads chain/residue/atom with insertion codes and residue names', () => {
    expect(selectAtom(protein, 'A/42/CA')).toBe(1);
    expect(selectAtom(protein, 'A/PRO42/CA')).toBe(1);
    expect(selectAtom(protein, 'A/42B/CA')).toBe(6);
    expect(selectAtom(protein, 'A/GLY42B/CA')).toBe(6);
    expect(selectAtom(protein, 'B/BGC601/C1')).toBe(9);
    expect(selectAtom(protein, '/602/O5')).toBe(20);
    expect(selectAtom(protein, '602/O5')).toBe(20);
    expect(selectAtom(protein, 'a/pro42/ca')).toBe(1); // case-insensitive when no exact match
    expect(selectAtom(protein, 'A/A2M12/C1')).toBe(24);
    expect(selectAtom(protein, '/-1/N')).toBe(25);
  });

  it('selectAtom lists the candidates when a residue atom is ambiguous or missing', () => {
    expect(failure(() => selectAtom(protein, '/42/CA'))).toEqual([
      'ambiguous-atom',
      "test.pdb: '/42/CA' matches atoms 2 (A/PRO42/CA), 23 (C/PRO42/CA); give the chain and residue name",
    ]);
    expect(failure(() => selectAtom(protein, 'A/GLY42/CA'))).toEqual([
      'unknown-residue',
      'test.pdb: no residue GLY42 in chain A; residues numbered 42: A/PRO42, A/GLY42B, C/PRO42',
    ]);
    expect(failure(() => selectAtom(protein, 'A/PRO42/CZ'))).toEqual([
      'unknown-atom',
      'test.pdb: residue A/PRO42 has no atom named CZ; atoms of A/PRO42: N, CA, CB, CG, CD',
    ]);
    expect(failure(() => selectAtom(protein, 'D/7/CA'))).toEqual(['unknown-residue', 'test.pdb: no residue 7 in chain D; chains in the record: A, B, C, (blank)']);
    expect(failure(() => selectAtom(protein, 'A/700/CA'))).toEqual(['unknown-residue', 'test.pdb: no residue 700 in chain A; residues in chain A are numbered 12–42']);
    expect(failure(() => selectAtom(protein, 'A/PRO/CA'))[0]).toBe('bad-selection');
    expect(failure(() => selectAtom(protein, 'A/B/42/CA'))[0]).toBe('bad-selection');
    expect(failure(() => selectAtom(sugar, '/1/C1'))[1]).toContain('the record has no residues');
  });

  it('selectAtom names the residues of an ambiguous atom name', () => {
    expect(failure(() => selectAtom(protein, 'C1'))[1]).toBe(
      'test.pdb: atom name C1 is ambiguous: atoms 10 (B/BGC601/C1), 16 (B/BGC602/C1), 25 (A/A2M12/C1) carry it; use chain/residue/atom (e.g. A/42/CA) or an atom number',
    );
  });
});

describe('selectRings', () => {
  it('selectRings reads a ring number and an atom list of any atom tokens', () => {
    expect(rings).toHaveLength(3);
    expect(selectRings(protein, '1', rings)).toEqual([rings[0]]);
    expect(selectRings(protein, 'B/601/O5-B/601/C1-#6416-C3-B/601/C4-B/601/C5'.replace('C3', 'B/601/C3'), rings, graph)).toEqual([[14, 9, 10, 11, 12, 13]]);
    expect(failure(() => selectRings(protein, '1-2-3-4-6', rings, graph))[0]).toBe('not-bonded');
  });

  it('selectRings gives the rings of a residue with a trailing slash', () => {
    expect(selectRings(protein, 'A/PRO42/', rings)).toEqual([[0, 1, 2, 3, 4]]);
    expect(selectRings(protein, '/601/', rings)).toEqual([[9, 10, 11, 12, 13, 14]]);
    expect(selectRings(protein, 'BGC602/', rings)).toEqual([[15, 16, 17, 18, 19, 20]]);
    expect(failure(() => selectRings(protein, 'C/42/', rings))).toEqual(['no-ring', 'test.pdb: residue C/PRO42 has no ring']);
  });

  it('selectRings gives every ring of every residue with a name, in file order', () => {
    expect(selectRings(protein, 'name:BGC', rings)).toEqual([[9, 10, 11, 12, 13, 14], [15, 16, 17, 18, 19, 20]]);
    expect(selectRings(protein, 'name:pro,BGC', rings)).toHaveLength(3);
    expect(failure(() => selectRings(protein, 'name:NAG', rings))).toEqual([
      'unknown-residue',
      'test.pdb: no residue named NAG; residue names in the record: PRO, GLY, BGC, A2M, ACE',
    ]);
    expect(failure(() => selectRings(protein, 'name:GLY', rings))[0]).toBe('no-ring');
    expect(failure(() => selectRings(protein, 'name:BGC,', rings))[0]).toBe('bad-selection');
  });

  it('ringSelection takes one ring and lists them when a token selects several', () => {
    expect(ringSelection(protein, graph, rings, 'B/BGC602/')).toEqual([15, 16, 17, 18, 19, 20]);
    expect(failure(() => ringSelection(protein, graph, rings, 'name:BGC'))).toEqual([
      'ambiguous-ring',
      "test.pdb: 'name:BGC' selects 2 rings: ring 2 (10-11-12-13-14-15), ring 3 (16-17-18-19-20-21); this command takes one, give its ring number or a single residue",
    ]);
  });

  it('ringTokenKind and splitAtomList tell tokens apart', () => {
    expect(['2', '1-2-3', 'A/PRO42/', 'name:NAG'].map(ringTokenKind)).toEqual(['number', 'atoms', 'residue', 'name']);
    expect(splitAtomList('A/-1/N-A/-1/CA')).toEqual(['A/-1/N', 'A/-1/CA']);
    expect(splitAtomList('1-2')).toEqual(['1', '2']);
  });
});
