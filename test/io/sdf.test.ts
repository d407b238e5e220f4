import { beforeAll, describe, expect, it } from 'vitest';
import { ConformerGenerator, Molecule as OclMolecule, Resources } from 'openchemlib';
import { parseText } from '../../src/io/parseText.js';
import type { Molecule } from '../../src/model/molecule.js';

const SMILES = ['OC1C(O)C(O)C(O)C(CO)O1', 'C[NH3+].CC(=O)[O-]', 'c1ccccc1C(=O)N', 'ClC1CCCCC1Br', 'C#CC=CC'];
const records: Array<{ smiles: string; v2: string; v3: string }> = [];

beforeAll(() => {
  Resources.registerFromNodejs();
  for (const smiles of SMILES) {
    const gen = new ConformerGenerator(7);
    gen.initializeConformers(OclMolecule.fromSmiles(smiles), {});
    const mol = gen.getNextConformerAsMolecule()!;
    mol.setName(smiles);
    records.push({ smiles, v2: mol.toMolfile(), v3: mol.toMolfileV3() });
  }
});

const summary = (m: Molecule) => ({
  title: m.title,
  atoms: m.atoms.map((a) => [a.element, a.charge]),
  bonds: m.bonds!.map((b) => [b.a, b.b, b.order]),
});

describe('parseText (molfile / SDF)', () => {
  it('parseText(V3000) equals parseText(V2000) of the same openchemlib molecule', () => {
    for (const { v2, v3 } of records) {
      const [a] = parseText(v2, { format: 'sdf' });
      const [b] = parseText(v3, { format: 'sdf' });
      expect(summary(b!)).toEqual(summary(a!));
      // V2000 rounds to 4 decimals, V3000 may not: compare to 1e-4 Å
      b!.coords.forEach((v, i) => expect(Math.abs(v - a!.coords[i]!)).toBeLessThanOrEqual(1.5e-4));
    }
  });

  it('parseText(molfile) agrees with openchemlib on elements, charges and bonds (outside reference)', () => {
    for (const { v2, smiles } of records) {
      const ocl = OclMolecule.fromMolfile(v2);
      const [m] = parseText(v2, { format: 'sdf' });
      expect(m!.atoms.map((a) => a.element), smiles).toEqual(
        Array.from({ length: ocl.getAllAtoms() }, (_, i) => ocl.getAtomLabel(i)),
      );
      expect(m!.atoms.map((a) => a.charge)).toEqual(Array.from({ length: ocl.getAllAtoms() }, (_, i) => ocl.getAtomCharge(i)));
      const oclBonds = Array.from({ length: ocl.getAllBonds() }, (_, b) => {
        const [i, j] = [ocl.getBondAtom(0, b), ocl.getBondAtom(1, b)];
        return `${Math.min(i, j)}-${Math.max(i, j)}`;
      }).sort();
      expect(m!.bonds!.map((b) => `${b.a}-${b.b}`).sort()).toEqual(oclBonds);
      // openchemlib keeps y and z negated inside (seen with openchemlib 9.25); x is the file's
      m!.atoms.forEach((_, i) => expect(m!.coords[3 * i]).toBeCloseTo(ocl.getAtomX(i), 4));
    }
  });

  it('parseText(sdf) reads records in order with their SD data fields, multi-line values joined by \\n', () => {
    const fields = (k: number) => `> <energy>\n${-10 - k}.5 kcal/mol\n\n>  <notes> (${k})\nline one\nline two\n\n`;
    const text = records.map((r, k) => r.v2 + fields(k) + '$$$$\n').join('');
    const mols = parseText(text, { file: 'set.sdf' });
    expect(mols.map((m) => m.title)).toEqual(SMILES);
    expect(mols.map((m) => m.source.index)).toEqual([1, 2, 3, 4, 5]);
    expect(mols[2]!.properties).toEqual({ energy: '-12.5 kcal/mol', notes: 'line one\nline two' });
  });

  it('parseText(molfile) keeps bond orders, aromatic 4 included, and M  CHG charges', () => {
    const text = [
      'ion', '  hand made', '',
      '  3  2  0  0  0  0  0  0  0  0999 V2000',
      '    0.0000    0.0000    0.0000 N   0  3  0  0  0  0  0  0  0  0  0  0',
      '    1.4000    0.0000    0.0000 C   0  0  0  0  0  0  0  0  0  0  0  0',
      '    2.1000    1.2000    0.0000 O   0  0  0  0  0  0  0  0  0  0  0  0',
      '  1  2  1  0', '  2  3  4  0',
      'M  CHG  2   1   1   3  -1', 'M  END', '',
    ].join('\n');
    const [m] = parseText(text, { format: 'sdf' });
    expect(m!.atoms.map((a) => a.charge)).toEqual([1, 0, -1]);
    expect(m!.bonds).toEqual([
      { a: 0, b: 1, order: 1, perceived: false },
      { a: 1, b: 2, order: 4, perceived: false },
    ]);
    expect(m!.title).toBe('ion');
  });

  it('parseText(molfile) takes atom-block charges when there is no M  CHG line', () => {
    const text = records[1]!.v2.replace(/^M {2}CHG.*\n/m, '');
    expect(text).not.toContain('M  CHG');
    const [m] = parseText(text, { format: 'sdf' });
    expect(m!.atoms.map((a) => a.charge).filter((c) => c !== 0)).toEqual([]);
    const block = text.replace(/^( *\S+ +\S+ +\S+ N {3}0 {2})0/m, '$13');
    expect(parseText(block, { format: 'sdf' })[0]!.atoms.find((a) => a.element === 'N')!.charge).toBe(1);
  });
});
