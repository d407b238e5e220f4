import { describe, expect, it } from 'vitest';
import { mkdtempSync, writeFileSync, readFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { parseText } from '../../src/io/parseText.js';
import { readRecords } from '../../src/io/readRecords.js';
import { elementFromName } from '../../src/io/pdbLine.js';

const atom = (tag: string, serial: number, name: string, res: string, x: number, y: number, z: number, el = '') =>
  `${tag.padEnd(6)}${String(serial).padStart(5)} ${name.padEnd(4)} ${res.padStart(3)} A   1    ${[x, y, z]
    .map((v) => v.toFixed(3).padStart(8))
    .join('')}  1.00  0.00          ${el.padStart(2)}`;

const WATER = readFileSync(join(import.meta.dirname, '../data/good-water.pdb'), 'utf8');

/** Two models of methanol-like fragment, CONECT after the last model (the usual layout). */
const MODELS = [
  'HEADER    TEST MOLECULE                           01-DEC-26   XXXX',
  'COMPND    MOLECULE: METHANOL',
  'MODEL        1',
  atom('HETATM', 1, ' C1 ', 'MOH', 0, 0, 0),
  atom('HETATM', 2, ' O1 ', 'MOH', 1.43, 0, 0),
  'ENDMDL',
  'MODEL        2',
  atom('HETATM', 1, ' C1 ', 'MOH', 0, 0, 0.1),
  atom('HETATM', 2, ' O1 ', 'MOH', 1.43, 0, 0.1),
  'ENDMDL',
  'CONECT    1    2',
  'CONECT    2    1',
  'END',
  '',
].join('\n');

describe('parseText (PDB)', () => {
  it('parseText(pdb) reads names, residues (number, chain, serial), elements and CONECT bonds (deduplicated, order 1)', () => {
    const [m] = parseText(WATER, { file: 'water.pdb' });
    expect(m!.title).toBe('WATER BY HAND');
    expect(m!.atoms).toEqual([
      { element: 'O', name: 'O', residue: 'HOH', residueNumber: 1, insertionCode: '', chain: 'A', serial: 1, altLoc: '', charge: 0 },
      { element: 'H', name: 'H1', residue: 'HOH', residueNumber: 1, insertionCode: '', chain: 'A', serial: 2, altLoc: '', charge: 0 },
      { element: 'H', name: 'H2', residue: 'HOH', residueNumber: 1, insertionCode: '', chain: 'A', serial: 3, altLoc: '', charge: 0 },
    ]);
    expect(m!.bonds).toEqual([
      { a: 0, b: 1, order: 1, perceived: false },
      { a: 0, b: 2, order: 1, perceived: false },
    ]);
    expect([...m!.coords.slice(3, 6)]).toEqual([0.957, 0, 0]);
  });

  it('parseText(pdb) turns MODEL/ENDMDL into frames, CONECT after the last model applies to all', () => {
    const mols = parseText(MODELS, { file: 'm.pdb' });
    expect(mols.map((m) => [m.source.index, m.source.line, m.coords[2]])).toEqual([
      [1, 3, 0],
      [2, 7, 0.1],
    ]);
    expect(mols.map((m) => m.bonds)).toEqual([[{ a: 0, b: 1, order: 1, perceived: false }], [{ a: 0, b: 1, order: 1, perceived: false }]]);
    expect(mols[0]!.title).toBe('MOLECULE: METHANOL');
    expect(mols.map((m) => m.atoms.map((a) => a.element))).toEqual([['C', 'O'], ['C', 'O']]);
  });

  it('readRecords(pdb file) streams the models with the CONECT bonds scanned first', async () => {
    const dir = mkdtempSync(join(tmpdir(), 'cfm-pdb-'));
    writeFileSync(join(dir, 'm.pdb'), MODELS);
    const mols = [];
    for await (const m of readRecords(join(dir, 'm.pdb'))) mols.push(m);
    expect(mols.map((m) => m.bonds?.length)).toEqual([1, 1]);
    expect(mols.map((m) => m.title)).toEqual(['MOLECULE: METHANOL', 'MOLECULE: METHANOL']);
  });

  it('parseText(pdb) without TITLE/COMPND/HEADER takes the file name as title and gives bonds null without CONECT', () => {
    const text = `${atom('ATOM', 1, ' N  ', 'GLY', 0, 0, 0, 'N')}\n${atom('ATOM', 2, ' CA ', 'GLY', 1.45, 0, 0, 'C')}\n`;
    const [m] = parseText(text, { file: 'dir/gly.pdb.gz' });
    expect(m!.title).toBe('gly.pdb');
    expect(m!.bonds).toBeNull();
  });

  it('parseText(pdb) keeps only the first alternate location', () => {
    const a = atom('ATOM', 1, ' CA ', 'SER', 0, 0, 0, 'C');
    const alt = (loc: string, x: number) => atom('ATOM', 2, ' OG ', 'SER', x, 0, 0, 'O').replace(/^(.{16})./, `$1${loc}`);
    const [m] = parseText([a, alt('A', 1.4), alt('B', 1.5)].join('\n'), { format: 'pdb' });
    expect(m!.atoms.map((x) => x.name)).toEqual(['CA', 'OG']);
    expect(m!.coords[3]).toBe(1.4);
  });

  it('elementFromName(name) follows the column rule when columns 77-78 are empty (wwPDB format 3.3)', () => {
    expect([' CA ', 'CA  ', 'FE1 ', ' OG1', 'HG21', '1HB ', 'C12 ', 'CL1 ', 'HO4 '].map(elementFromName)).toEqual(
      ['C', 'Ca', 'Fe', 'O', 'H', 'H', 'C', 'Cl', 'H'],
    );
  });
});
