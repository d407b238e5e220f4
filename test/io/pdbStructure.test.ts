import { describe, expect, it } from 'vitest';
import { parseText } from '../../src/io/parseText.js';
import { keepAltLocs } from '../../src/io/pdbAltLoc.js';

/** A PDB ATOM/HETATM line in the fixed columns. */
function atomLine(tag: string, serial: number, name: string, alt: string, res: string, chain: string, num: number, x: number, y: number, z: number, occ: number, el: string): string {
  const nm = name.length < 4 ? ` ${name.padEnd(3)}` : name;
  return `${tag.padEnd(6)}${String(serial).padStart(5)} ${nm}${alt || ' '}${res.padStart(3)} ${chain}${String(num).padStart(4)}    ${x.toFixed(3).padStart(8)}${y.toFixed(3).padStart(8)}${z.toFixed(3).padStart(8)}${occ.toFixed(2).padStart(6)}  0.00          ${el.padStart(2)}`;
}

describe('PDB structure files', () => {
  it('parseText(pdb) reads a 0.39 Å contact between an arginine and a water as a warning naming both atoms, not a bond', () => {
    const text = [
      atomLine('ATOM', 1, 'NH1', '', 'ARG', 'A', 45, 0, 0, 0, 1, 'N'),
      atomLine('ATOM', 2, 'CZ', '', 'ARG', 'A', 45, 1.33, 0, 0, 1, 'C'),
      atomLine('HETATM', 3, 'O', '', 'HOH', 'A', 301, 0.39, 0, 0, 1, 'O'),
      'END',
    ].join('\n');
    const [m] = parseText(text, { file: 'contact.pdb' });
    expect(m!.atoms).toHaveLength(3);
    expect(m!.warnings?.map((w) => w.message)).toEqual([
      'A/ARG45/NH1 (atom 1) and A/HOH301/O (atom 3) are 0.39 Å apart, closer than 0.4 Å: a contact with a water, not bonded',
    ]);
  });

  it('parseText(pdb) applies CONECT only to models whose serials carry the same elements; others get perceived bonds and a warning', () => {
    const model = (n: number, second: string) => [
      `MODEL     ${String(n).padStart(4)}`,
      atomLine('HETATM', 1, 'C1', '', 'LIG', 'A', 1, 0, 0, 0, 1, 'C'),
      atomLine('HETATM', 2, second === 'C' ? 'C2' : 'O2', '', 'LIG', 'A', 1, 1.52, 0, 0, 1, second),
      atomLine('HETATM', 3, 'C3', '', 'LIG', 'A', 1, 9, 9, 9, 1, 'C'),
      'ENDMDL',
    ];
    const text = [...model(1, 'C'), ...model(2, 'O'), 'CONECT    1    2', 'END'].join('\n');
    const [m1, m2] = parseText(text, { file: 'models.pdb' });
    expect(m1!.bonds?.map((b) => [b.a, b.b])).toEqual([[0, 1]]);
    expect(m1!.warnings).toBeUndefined();
    expect(m2!.bonds).toBeNull();
    expect(m2!.warnings?.[0]?.message).toBe('CONECT (line 11) names atom serial 2 as C, but it is O in model 2; bonds perceived from coordinates instead');
  });

  it('parseText(pdb) keeps one alternate location per residue: highest occupancy by default, the letter asked for, never a blank atom beside its own copy', () => {
    const text = [
      atomLine('ATOM', 1, 'N', '', 'SER', 'A', 7, 0, 0, 0, 1, 'N'),
      atomLine('ATOM', 2, 'CA', '', 'SER', 'A', 7, 1.46, 0, 0, 1, 'C'),
      atomLine('ATOM', 3, 'CB', 'A', 'SER', 'A', 7, 2, 1.4, 0, 0.3, 'C'),
      atomLine('ATOM', 4, 'CB', 'B', 'SER', 'A', 7, 2, -1.4, 0, 0.7, 'C'),
      atomLine('ATOM', 5, 'CA', 'B', 'SER', 'A', 7, 1.5, 0.1, 0, 0.7, 'C'),
      'END',
    ].join('\n');
    const [best] = parseText(text, { file: 'alt.pdb' });
    expect(best!.atoms.map((a) => `${a.name}${a.altLoc}`)).toEqual(['N', 'CB' + 'B', 'CA' + 'B']);
    const [a] = parseText(text, { file: 'alt.pdb', altLoc: 'A' });
    expect(a!.atoms.map((x) => `${x.name}${x.altLoc}`)).toEqual(['N', 'CA', 'CBA']);
    expect(() => parseText(text, { file: 'alt.pdb', altLoc: 'AB' })).toThrow(/altLoc expects a letter/);
  });

  it('keepAltLocs(atoms without alternates) keeps them all', () => {
    const atoms = [{ name: 'N', altLoc: '', occupancy: 1, payload: 0 }, { name: 'CA', altLoc: '', occupancy: 1, payload: 1 }];
    expect(keepAltLocs(atoms, 'highest-occupancy').kept.map((x) => x.payload)).toEqual([0, 1]);
  });
});

describe('PDBQT', () => {
  it('parseText(pdbqt) reads AutoDock atom types as elements and keeps partial charges', () => {
    const line = (serial: number, name: string, x: number, q: string, type: string) =>
      `ATOM  ${String(serial).padStart(5)}  ${name.padEnd(3)} LIG A   1    ${x.toFixed(3).padStart(8)}   0.000   0.000  1.00  0.00    ${q.padStart(6)} ${type.padEnd(2)}`;
    const text = ['ROOT', line(1, 'C1', 0, '0.123', 'A'), line(2, 'O1', 1.36, '-0.391', 'OA'), 'ENDROOT', 'TORSDOF 0'].join('\n');
    const [m] = parseText(text, { file: 'pose.pdbqt' });
    expect(m!.source.format).toBe('pdbqt');
    expect(m!.atoms.map((a) => [a.element, a.partialCharge])).toEqual([['C', 0.123], ['O', -0.391]]);
  });
});
