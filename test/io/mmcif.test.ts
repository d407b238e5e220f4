import { describe, expect, it } from 'vitest';
import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import { parseText } from '../../src/io/parseText.js';
import { cifTokens } from '../../src/io/cifTokens.js';
import { selectAtom, selectRings } from '../../src/perceive/atomSelection.js';
import { findRings } from '../../src/perceive/findRings.js';
import { buildGraph } from '../../src/perceive/graph.js';
import { withBonds } from '../../src/perceive/withBonds.js';

const dir = join(import.meta.dirname, '..', 'data', 'structures');
/** gemmi 0.5.7's reading of glyco.cif, alternate location A kept (scripts/fixtures/mmcif_gemmi.py). */
const gemmi = JSON.parse(readFileSync(join(dir, 'glyco.gemmi.json'), 'utf8')) as {
  atoms: { name: string; element: string; residue: string; number: number; insertion: string; chain: string; serial: number; xyz: number[] }[];
};

describe('mmCIF', () => {
  it('parseText(mmcif) reads the same atoms, residues, insertion codes, chains, serials and coordinates as gemmi', () => {
    const [m] = parseText(readFileSync(join(dir, 'glyco.cif'), 'utf8'), { file: 'glyco.cif', altLoc: 'A' });
    expect(m!.source.format).toBe('mmcif');
    const got = m!.atoms.map((a, i) => ({
      name: a.name, element: a.element, residue: a.residue, number: a.residueNumber, insertion: a.insertionCode, chain: a.chain, serial: a.serial,
      xyz: [0, 1, 2].map((k) => Math.round(m!.coords[3 * i + k]! * 1000) / 1000),
    }));
    expect(got).toEqual(gemmi.atoms);
  });

  it('parseText(mmcif) agrees with the same structure written as PDB by gemmi, and keeps the higher-occupancy OG by default', () => {
    const [c] = parseText(readFileSync(join(dir, 'glyco.cif'), 'utf8'), { file: 'glyco.cif' });
    const [p] = parseText(readFileSync(join(dir, 'glyco.pdb'), 'utf8'), { file: 'glyco.pdb' });
    const key = (a: { name?: string | null; residue?: string; residueNumber?: number; insertionCode?: string; chain?: string; altLoc?: string }) =>
      `${a.chain}/${a.residue}${a.residueNumber}${a.insertionCode}/${a.name}${a.altLoc}`;
    expect(c!.atoms.map(key)).toEqual(p!.atoms.map(key));
    expect(c!.atoms.find((a) => a.name === 'OG')?.altLoc).toBe('A');
    expect(Array.from(c!.coords)).toEqual(Array.from(p!.coords));
  });

  it('parseText(mmcif) with a bad coordinate names the line', () => {
    const text = ['data_X', 'loop_', '_atom_site.id', '_atom_site.type_symbol', '_atom_site.Cartn_x', '_atom_site.Cartn_y', '_atom_site.Cartn_z', '1 C 0.0 0.0 0.0', '2 C 1.5 abc 0.0'].join('\n');
    expect(() => parseText(text, { file: 'x.cif' })).toThrow("x.cif:9: y coordinate 'abc' is not a number (_atom_site.Cartn_y)");
  });

  it('parseText(mmcif) with a short last row or no Cartesian coordinates says so at the line', () => {
    const short = ['data_X', 'loop_', '_atom_site.id', '_atom_site.type_symbol', '_atom_site.Cartn_x', '_atom_site.Cartn_y', '_atom_site.Cartn_z', '1 C 0.0 0.0 0.0', '2 C 1.5'].join('\n');
    expect(() => parseText(short, { file: 'x.cif' })).toThrow('x.cif:9: an _atom_site row has 3 values, expected 5');
    const fract = ['data_X', 'loop_', '_atom_site_label', '_atom_site_fract_x', 'C1 0.1'].join('\n');
    expect(() => parseText(fract, { file: 'x.cif' })).toThrow(/x.cif:5: no _atom_site loop with Cartn_x/);
  });

  it('cifTokens(line) splits quoted values and drops comments', () => {
    expect(cifTokens(`ATOM 1 C "C1'" 'a b' . ? # note`)).toEqual(['ATOM', '1', 'C', "C1'", 'a b', '.', '?']);
    expect(cifTokens(`x ''`)).toEqual(['x', '']);
  });

  it('selectAtom and selectRings on an mmCIF record: #serial, chain/residue/atom with insertion code, a residue\'s ring', () => {
    const [raw] = parseText(readFileSync(join(dir, 'glyco.cif'), 'utf8'), { file: 'glyco.cif' });
    const m = withBonds(raw!);
    const rings = findRings(buildGraph(m.atoms.length, m.bonds!));
    expect(selectAtom(m, '#8')).toBe(6); // C1: serial 8, but position 7 since OG B (serial 7) is not kept
    expect(selectAtom(m, 'A/SER42A/CA')).toBe(1);
    const [ring] = selectRings(m, 'A/BGC501/', rings);
    expect(ring!.map((i) => m.atoms[i]!.name).sort()).toEqual(['C1', 'C2', 'C3', 'C4', 'C5', 'O5']);
  });
});
