import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { parseText } from '../../src/io/parseText.js';
import { formatXyz } from '../../src/io/formatXyz.js';
import { parseXyzComment } from '../../src/io/xyzComment.js';
import type { Molecule } from '../../src/model/molecule.js';

const WATER = '3\nwater energy=-76.4 note="two words" Properties=species:S:1:pos:R:3\nO 0 0 0\nH 0.957 0 0\nH -0.24 0.927 0\n';

describe('parseText (XYZ)', () => {
  it('parseText(xyz) keeps the comment line as title and its key=value pairs as properties', () => {
    const [m] = parseText(WATER, { file: 'w.xyz' });
    expect(m!.title).toBe('water energy=-76.4 note="two words" Properties=species:S:1:pos:R:3');
    expect(m!.properties).toEqual({ energy: '-76.4', note: 'two words', Properties: 'species:S:1:pos:R:3' });
    expect(m!.atoms.map((a) => a.element)).toEqual(['O', 'H', 'H']);
    expect([...m!.coords]).toEqual([0, 0, 0, 0.957, 0, 0, -0.24, 0.927, 0]);
    expect(m!.bonds).toBeNull();
    expect(m!.source).toEqual({ file: 'w.xyz', format: 'xyz', index: 1, line: 1 });
  });

  it('parseText(xyz) reads every frame with its first line and index', () => {
    const mols = parseText(WATER + WATER.replace('water', 'second'), { file: 't.xyz' });
    expect(mols.map((m) => [m.source.index, m.source.line, m.title.split(' ')[0]])).toEqual([
      [1, 1, 'water'],
      [2, 6, 'second'],
    ]);
  });

  it('parseText(xyz) accepts atomic numbers, labels, any case, tabs, CRLF and extra columns', () => {
    const text = '4\r\nmixed\r\n8\t0 0 0\r\ncl1 1.8 0 0 0.1 0.2\r\nBR -2 0 0\r\nH2 0 1 0\r\n';
    const [m] = parseText(text, { file: 'm.xyz' });
    expect(m!.atoms).toEqual([
      { element: 'O', name: null },
      { element: 'Cl', name: 'cl1' },
      { element: 'Br', name: null },
      { element: 'H', name: 'H2' },
    ]);
  });

  it('parseText(xyz) reuses one atom list across frames with the same elements', () => {
    const [a, b] = parseText(WATER + WATER, { file: 't.xyz' });
    expect(b!.atoms).toBe(a!.atoms);
    expect(b!.coords).not.toBe(a!.coords);
  });

  it('parseText(xyz) reads numbers exactly as Number() does (fast scanner)', () => {
    const num = fc.double({ min: -1e6, max: 1e6, noNaN: true });
    fc.assert(
      fc.property(fc.tuple(num, num, num), fc.constantFrom('e', 'fixed', 'plain'), (xyz, style) => {
        const show = (v: number) => (style === 'e' ? v.toExponential() : style === 'fixed' ? v.toFixed(7) : String(v));
        const [m] = parseText(`1\n\nC ${xyz.map(show).join(' ')}\n`, { format: 'xyz' });
        expect([...m!.coords]).toEqual(xyz.map((v) => Number(show(v))));
      }),
      { seed: 20261201, numRuns: 300 },
    );
  });
});

describe('formatXyz', () => {
  it('formatXyz(parseText(xyz)) round-trips atoms, titles and properties', () => {
    const mols = parseText(WATER + WATER.replace('water', 'second frame'), { file: 'w.xyz' });
    const again = parseText(formatXyz(mols), { file: 'w.xyz' });
    expect(again.map((m) => m.title)).toEqual(mols.map((m) => m.title));
    expect(again.map((m) => m.properties)).toEqual(mols.map((m) => m.properties));
    expect(again.map((m) => m.atoms)).toEqual(mols.map((m) => m.atoms));
    again.forEach((m, k) => m.coords.forEach((v, i) => expect(v).toBeCloseTo(mols[k]!.coords[i]!, 6)));
  });

  it('formatXyz(mol from another format) writes properties as quoted key=value pairs', () => {
    const mol: Molecule = {
      title: 'glucose',
      atoms: [{ element: 'C', name: null }],
      coords: Float64Array.from([1, -0, 2.5]),
      bonds: null,
      properties: { energy: '-12.5 kcal/mol', 'odd key': 'a"b', empty: '' },
      source: { file: 'g.sdf', format: 'sdf', index: 1, line: 1 },
    };
    const text = formatXyz([mol]);
    expect(text).toBe('1\nglucose energy="-12.5 kcal/mol" "odd key"="a\\"b" empty=""\nC      1.000000     0.000000     2.500000\n');
    expect(parseText(text, { format: 'xyz' })[0]!.properties).toEqual(mol.properties);
  });

  it('parseXyzComment(comment) keeps quoted values with escapes and ignores bare words', () => {
    expect(parseXyzComment('frame 3 a=1 b="x y" c="q\\"uote" =bad d=')).toEqual({ a: '1', b: 'x y', c: 'q"uote', d: '' });
  });
});
