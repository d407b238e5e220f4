import { describe, expect, it } from 'vitest';
import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import { parseText, parseTextSettled } from '../../src/io/parseText.js';
import { groElement } from '../../src/io/gro.js';
import { ParseError } from '../../src/model/errors.js';

// written and read back by mdtraj 1.9.7 (McGibbon et al. 2015, Biophys. J. 109, 1528): scripts/fixtures/gromacs.py
const FIX = join(__dirname, '..', 'fixtures', 'md');
const text = readFileSync(join(FIX, 'rings.gro'), 'utf8');
const ref = JSON.parse(readFileSync(join(FIX, 'gromacs.json'), 'utf8')) as {
  natoms: number; names: string[]; elements: string[]; residues: [string, number][];
  gro: { time_ps: number; dimensions: number[]; positions: number[][] }[];
};

function issueOf(fn: () => unknown): string {
  try {
    fn();
  } catch (err) {
    if (err instanceof ParseError) return `${err.issues[0]!.line}: ${err.issues[0]!.message}`;
    throw err;
  }
  throw new Error('no error');
}

describe('GRO reader', () => {
  it('parseTextSettled(GRO with one bad atom line in frame 2) fails that frame alone, with one issue, and reads the frames after it', () => {
    const lines = text.split('\n');
    const per = Number(lines[1]) + 3;
    const at = per + 2 + 4; // atom 5 of frame 2
    lines[at] = `${lines[at]!.slice(0, 20)}   x.xxx${lines[at]!.slice(28)}`;
    const settled = parseTextSettled(lines.join('\n'), { file: 'bad.gro' });
    expect(settled.map((s) => s.ok)).toEqual([true, false, true, true, true]);
    const bad = settled[1]!;
    expect(bad.ok ? [] : bad.error.issues.map((i) => `${i.line}: ${i.message}`)).toEqual([`${at + 1}: x coordinate 'x.xxx' is not a number`]);
  });

  it('parseTextSettled(GRO cut inside an atom line) gives one issue for the cut frame, not a second about its box line', () => {
    const cut = text.slice(0, text.indexOf('\n', 2900) - 12); // ends inside an atom line's coordinates
    const issues = parseTextSettled(cut, { file: 'cut.gro' }).flatMap((s) => (s.ok ? [] : s.error.issues.map((i) => i.code)));
    expect(issues).toHaveLength(1);
  });

  it('parseText(multi-frame GRO) gives the coordinates mdtraj reads (Å), atom names, elements, residues and serials', () => {
    const frames = parseText(text, { file: 'rings.gro' });
    expect(frames.length).toBe(ref.gro.length);
    frames.forEach((m, k) => {
      expect(m.source.format).toBe('gro');
      const worst = Math.max(...ref.gro[k]!.positions.flatMap((p, i) => p.map((x, a) => Math.abs(m.coords[3 * i + a]! - x))));
      expect(worst).toBeLessThan(1e-4);
      expect(Number(m.properties.TIME_PS)).toBeCloseTo(ref.gro[k]!.time_ps, 6);
    });
    const m = frames[0]!;
    expect(m.atoms.map((a) => a.name)).toEqual(ref.names);
    expect(m.atoms.map((a) => a.element)).toEqual(ref.elements);
    expect(m.atoms[36]).toMatchObject({ residue: 'CPE', residueNumber: 3, serial: 36 });
    expect(m.bonds).toBeNull();
  });

  it('parseText(GRO) gives the triclinic box line as row vectors in Å with the cell mdtraj reads', () => {
    const v = parseText(text, { file: 'rings.gro' })[0]!.properties.BOX_VECTORS!.split(' ').map(Number);
    const len = (k: number) => Math.hypot(v[k]!, v[k + 1]!, v[k + 2]!);
    const ang = (i: number, j: number) => (Math.acos((v[i]! * v[j]! + v[i + 1]! * v[j + 1]! + v[i + 2]! * v[j + 2]!) / (len(i) * len(j))) * 180) / Math.PI;
    const cell = [len(0), len(3), len(6), ang(3, 6), ang(0, 6), ang(0, 3)];
    cell.forEach((x, k) => expect(x).toBeCloseTo(ref.gro[0]!.dimensions[k]!, 2));
  });

  it('parseText(GRO without an extension) is recognised from its content', () => {
    expect(parseText(text, { file: '-' })[0]!.source.format).toBe('gro');
  });

  it('parseText(GRO) with higher precision reads fields as wide as the distance between decimal points', () => {
    const gro = 'wide\n 2\n    1SOL     OW    1   0.12345   1.00000   2.00000\n    1SOL    HW1    2   0.21345   1.00000   2.00000\n   3.0 3.0 3.0\n';
    const m = parseText(gro, { file: 'w.gro' })[0]!;
    [1.2345, 10, 20, 2.1345, 10, 20].forEach((x, k) => expect(m.coords[k]).toBeCloseTo(x, 9));
  });

  it('parseText(bad GRO) names the line: truncated frame, bad count, bad number, bad box, unknown element', () => {
    const head = 'x\n 2\n    1SOL     OW    1   0.100   1.000   2.000\n';
    expect(issueOf(() => parseText(head, { file: 'a.gro' }))).toBe('3: frame 1 (title at line 1) ends before atom 2 of 2');
    expect(issueOf(() => parseText('x\ntwo\n', { file: 'a.gro' }))).toBe("2: expected the atom count of a GRO frame, found 'two'");
    expect(issueOf(() => parseText('x\n 1\n    1SOL     OW    1   0.1x0   1.000   2.000\n 3 3 3\n', { file: 'a.gro' }))).toBe("3: x coordinate '0.1x0' is not a number");
    expect(issueOf(() => parseText('x\n 1\n    1SOL     OW    1   0.100   1.000   2.000\n 3 3\n', { file: 'a.gro' }))).toBe("4: expected the box line (3 or 9 numbers, nm) after 1 atoms, found '3 3'");
    expect(issueOf(() => parseText('x\n 1\n    1XX      QQ    1   0.100   1.000   2.000\n 3 3 3\n', { file: 'a.gro' }))).toBe("3: cannot tell the element of atom name 'QQ' (residue XX)");
  });

  it('groElement reads force-field names: Cα is carbon, an ion named as its residue is the ion', () => {
    expect(groElement('CA', 'ALA')).toBe('C');
    expect(groElement('HW1', 'SOL')).toBe('H');
    expect(groElement('1HB', 'ALA')).toBe('H');
    expect(groElement('CL', 'CL')).toBe('Cl');
    expect(groElement('NA', 'NA')).toBe('Na');
    expect(groElement('CA', 'CA')).toBe('Ca');
    expect(groElement('ZN', 'ZN2')).toBe('Zn');
    expect(groElement('BR', 'LIG')).toBe('Br');
    // three-letter ion names would otherwise read as sulfur, phosphorus and carbon
    expect(['SOD', 'POT', 'CLA', 'CAL'].map((n) => groElement(n, n))).toEqual(['Na', 'K', 'Cl', 'Ca']);
    expect(groElement('SD', 'MET')).toBe('S');
  });
});
