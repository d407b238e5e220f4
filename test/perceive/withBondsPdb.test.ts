import { describe, expect, it } from 'vitest';
import { parseText } from '../../src/io/parseText.js';
import { withBonds } from '../../src/perceive/withBonds.js';

// Ethanol as ATOM records plus a water HETATM whose CONECT lines are the only bonds in the file.
const PDB = [
  'ATOM      1  C1  ETH A   1       0.000   0.000   0.000  1.00  0.00           C',
  'ATOM      2  C2  ETH A   1       1.520   0.000   0.000  1.00  0.00           C',
  'ATOM      3  O1  ETH A   1       2.000   1.350   0.000  1.00  0.00           O',
  'HETATM    4  O   HOH A   2       6.000   0.000   0.000  1.00  0.00           O',
  'HETATM    5  H1  HOH A   2       6.960   0.000   0.000  1.00  0.00           H',
  'CONECT    4    5',
  'END',
].join('\n');

describe('withBonds', () => {
  it('withBonds(pdb) adds perceived bonds for atoms CONECT leaves out and keeps the CONECT bonds', () => {
    const [mol] = parseText(PDB, { file: 'mixed.pdb', format: 'pdb' });
    const bonded = withBonds(mol!);
    expect(bonded.bonds!.map((b) => [b.a + 1, b.b + 1, b.perceived])).toEqual([
      [1, 2, true],
      [2, 3, true],
      [4, 5, false],
    ]);
  });

  it('withBonds keeps a molfile bond table as it is, even when an atom has no bond', () => {
    const mol = { ...parseText(PDB, { file: 'mixed.pdb', format: 'pdb' })[0]!, source: { file: 'x.sdf', format: 'sdf' as const, index: 1, line: 1 } };
    expect(withBonds(mol)).toBe(mol);
  });
});
