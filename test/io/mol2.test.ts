import { describe, expect, it } from 'vitest';
import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import { parseText } from '../../src/io/parseText.js';

const dir = join(import.meta.dirname, '..', 'data', 'structures');
const read = (name: string) => parseText(readFileSync(join(dir, name), 'utf8'), { file: name });
const pairs = (m: { bonds: readonly { a: number; b: number }[] | null }) => m.bonds!.map((b) => `${Math.min(b.a, b.b)}-${Math.max(b.a, b.b)}`).sort();

describe('MOL2', () => {
  it('parseText(mol2) reads every molecule with the atoms, coordinates and bonds Open Babel reads (two.obabel.sdf)', () => {
    const mine = read('two.mol2');
    const ref = read('two.obabel.sdf');
    expect(mine.map((m) => m.title)).toEqual(['phenol', 'cyclohexane']);
    expect(mine).toHaveLength(ref.length);
    for (const [k, m] of mine.entries()) {
      expect(m.source.format).toBe('mol2');
      expect(m.atoms.map((a) => a.element)).toEqual(ref[k]!.atoms.map((a) => a.element));
      Array.from(m.coords).forEach((v, i) => expect(v).toBeCloseTo(ref[k]!.coords[i]!, 4));
      expect(pairs(m)).toEqual(pairs(ref[k]!));
    }
  });

  it('parseText(mol2) reads aromatic bonds as order 4, substructure names as residues and partial charges', () => {
    const [phenol] = read('two.mol2');
    expect(phenol!.bonds!.filter((b) => b.order === 4)).toHaveLength(6);
    expect(phenol!.atoms[0]).toMatchObject({ element: 'O', name: 'O', serial: 1, residue: 'UNL', residueNumber: 1, partialCharge: -0.5068 });
  });

  it('parseText(mol2) with a bond to a missing atom or an unknown bond type names the line', () => {
    const head = ['@<TRIPOS>MOLECULE', 'x', ' 2 1', '@<TRIPOS>ATOM', '1 C1 0 0 0 C.3', '2 C2 1.5 0 0 C.3', '@<TRIPOS>BOND'];
    expect(() => parseText([...head, '1 1 3 1'].join('\n'), { file: 'x.mol2' })).toThrow('x.mol2:8: bond 1 refers to atom 3, which is not in the molecule');
    expect(() => parseText([...head, '1 1 2 q'].join('\n'), { file: 'x.mol2' })).toThrow("x.mol2:8: unknown bond type 'q'");
    expect(() => parseText(['@<TRIPOS>MOLECULE', 'x', ' 1 0', '@<TRIPOS>ATOM', '1 C1 0 zz 0 C.3'].join('\n'), { file: 'x.mol2' })).toThrow("x.mol2:5: y coordinate 'zz' is not a number");
  });
});
