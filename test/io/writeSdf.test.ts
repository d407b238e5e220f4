import { beforeAll, describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { Molecule as OclMolecule, Resources } from 'openchemlib';
import { formatSdf } from '../../src/io/writeSdf.js';
import { elementInfo } from '../../src/model/elements.js';
import type { Atom, Bond, Molecule } from '../../src/model/molecule.js';

beforeAll(() => Resources.registerFromNodejs());

const source = { file: 'test', format: 'sdf', index: 1, line: 1 } as const;

/** Glycine zwitterion with a sodium ion and a chloride ion (H atoms left out): charges +1, −1, +1, −1. */
function zwitterion(coords: Float64Array): Molecule {
  const atoms: Atom[] = ['N', 'C', 'C', 'O', 'O', 'Na', 'Cl'].map((element) => ({ element, name: null }));
  const charged = atoms.map((a, i) => ({ ...a, charge: [1, 0, 0, 0, -1, 1, -1][i] }));
  const bonds: Bond[] = [
    { a: 0, b: 1, order: 1, perceived: false },
    { a: 1, b: 2, order: 1, perceived: false },
    { a: 2, b: 3, order: 2, perceived: false },
    { a: 2, b: 4, order: 1, perceived: false },
  ];
  return { title: 'glycine', atoms: charged, coords, bonds, properties: { note: 'made in the test' }, source };
}

/** What openchemlib reads back: elements, charges, bonds, coordinates in the file frame (y, z negated inside). */
function readBack(text: string) {
  const mol = OclMolecule.fromMolfile(text);
  const n = mol.getAllAtoms();
  return {
    z: Array.from({ length: n }, (_, i) => mol.getAtomicNo(i)),
    charges: Array.from({ length: n }, (_, i) => mol.getAtomCharge(i)),
    bonds: Array.from({ length: mol.getAllBonds() }, (_, k) => {
      const [a, b] = [mol.getBondAtom(0, k), mol.getBondAtom(1, k)].sort((p, q) => p - q);
      return `${a}-${b}:${mol.getBondOrder(k)}`;
    }).sort(),
    coords: Array.from({ length: n }, (_, i) => [mol.getAtomX(i), -mol.getAtomY(i), -mol.getAtomZ(i)]).flat(),
  };
}

// openchemlib invents 2D coordinates when every coordinate is 0, so keep them apart from zero
const coordinate = fc.oneof(
  fc.double({ min: -60, max: -0.01, noNaN: true }),
  fc.double({ min: 0.01, max: 60, noNaN: true }),
);

describe('formatSdf', () => {
  it('formatSdf round-trips elements, charges, bond orders and coordinates through openchemlib (within 1e-4 Å)', () => {
    fc.assert(
      fc.property(fc.array(coordinate, { minLength: 21, maxLength: 21 }), (xyz) => {
        const mol = zwitterion(Float64Array.from(xyz));
        const back = readBack(formatSdf([mol]));
        expect(back.z).toEqual(mol.atoms.map((a) => elementInfo(a.element)!.z));
        expect(back.charges).toEqual([1, 0, 0, 0, -1, 1, -1]);
        expect(back.bonds).toEqual(['0-1:1', '1-2:1', '2-3:2', '2-4:1']);
        back.coords.forEach((v, k) => expect(Math.abs(v - xyz[k]!)).toBeLessThanOrEqual(5e-5 + 1e-9));
      }),
      { seed: 20261202, numRuns: 100 },
    );
  });

  it('formatSdf writes the V2000 layout: counts line, charge codes, M  CHG, M  END, data fields, $$$$', () => {
    const coords = Float64Array.from({ length: 21 }, (_, k) => (k === 0 ? -0.00001 : k / 10));
    const text = formatSdf([zwitterion(coords)]);
    const lines = text.split('\n');
    expect(lines[0]).toBe('glycine');
    expect(lines[1]).toBe('  confmark00000000003D');
    expect(lines[3]).toBe('  7  4  0  0  0  0  0  0  0  0999 V2000');
    // negative zero is written as 0.0000; charge code 3 = +1, 5 = −1 (MDL CTfile format)
    expect(lines[4]).toBe('    0.0000    0.1000    0.2000 N   0  3  0  0  0  0  0  0  0  0  0  0');
    expect(lines[8]).toBe('    1.2000    1.3000    1.4000 O   0  5  0  0  0  0  0  0  0  0  0  0');
    expect(lines[9]!.slice(31, 34)).toBe('Na ');
    expect(lines[13]).toBe('  3  4  2  0');
    expect(lines[15]).toBe('M  CHG  4   1   1   5  -1   6   1   7  -1');
    expect(lines.slice(16)).toEqual(['M  END', '> <note>', 'made in the test', '', '$$$$', '']);
  });

  it('formatSdf splits M  CHG into lines of eight and writes charges beyond ±3 only there', () => {
    const atoms: Atom[] = Array.from({ length: 10 }, (_, i) => ({ element: 'C', name: null, charge: i === 9 ? 4 : 1 }));
    const mol: Molecule = { title: 't', atoms, coords: new Float64Array(30), bonds: null, properties: {}, source };
    const lines = formatSdf([mol]).split('\n');
    const chg = lines.filter((l) => l.startsWith('M  CHG'));
    expect(chg).toHaveLength(2);
    expect(chg[0]!.slice(6, 9)).toBe('  8');
    expect(chg[1]).toBe('M  CHG  2   9   1  10   4');
    expect(lines[13]!.slice(36, 39)).toBe('  0'); // +4 has no atom-block code
    expect(lines[3]!.slice(0, 6)).toBe(' 10  0');
  });

  it('formatSdf keeps records apart, flattens titles to one line and drops blank lines inside values', () => {
    const mol = zwitterion(new Float64Array(21));
    const two = formatSdf([{ ...mol, title: 'first\nline' }, { ...mol, properties: { 'a <b>': 'x\n\ny' } }]);
    const records = two.split('$$$$\n');
    expect(records).toHaveLength(3);
    expect(records[0]!.split('\n')[0]).toBe('first line');
    expect(records[1]).toContain('> <a b>\nx\ny\n\n');
    expect(OclMolecule.fromMolfile(`${records[1]!}`).getAllAtoms()).toBe(7);
  });

  it('formatSdf switches to V3000 above 999 atoms and openchemlib reads it back', () => {
    const n = 1200; // a zigzag carbon chain
    const atoms: Atom[] = Array.from({ length: n }, () => ({ element: 'C', name: null }));
    const coords = Float64Array.from({ length: 3 * n }, (_, k) => {
      const i = Math.floor(k / 3);
      return [1.27 * i, i % 2 === 0 ? 0 : 0.86, 0][k % 3]!;
    });
    const bonds: Bond[] = Array.from({ length: n - 1 }, (_, i) => ({ a: i, b: i + 1, order: 1, perceived: false }));
    const mol: Molecule = { title: 'chain', atoms, coords, bonds, properties: {}, source };
    const text = formatSdf([mol]);
    expect(text.split('\n')[3]).toContain('V3000');
    expect(text).toContain('M  V30 COUNTS 1200 1199 0 0 0');
    const back = readBack(text);
    expect(back.z).toHaveLength(n);
    expect(back.bonds).toHaveLength(n - 1);
    back.coords.forEach((v, k) => expect(Math.abs(v - coords[k]!)).toBeLessThan(1e-4));
  });

  it('formatSdf gives the same bytes for the same input (no clock in the header)', () => {
    const mol = zwitterion(Float64Array.from({ length: 21 }, (_, k) => Math.sin(k)));
    expect(formatSdf([mol])).toBe(formatSdf([mol]));
    expect(formatSdf([mol], { comment: 'x'.repeat(100) }).split('\n')[2]).toHaveLength(80);
  });
});
