import { describe, expect, it } from 'vitest';
import { analyseRecord, prepareRecord, supportTables, tableCsv, tableLatex, tableMarkdown, texEscape, fixed, type Table } from '../../src/index.js';
import { cyclohexaneChair } from '../helpers/newmanMolecules.js';

/** RFC 4180 reader for the test: fields, quotes, doubled quotes. */
function parseCsv(text: string): string[][] {
  const rows: string[][] = [];
  let row: string[] = [];
  let field = '';
  let quoted = false;
  for (let i = 0; i < text.length; i++) {
    const ch = text[i]!;
    if (quoted) {
      if (ch === '"' && text[i + 1] === '"') (field += '"'), i++;
      else if (ch === '"') quoted = false;
      else field += ch;
    } else if (ch === '"') quoted = true;
    else if (ch === ',') row.push(field), (field = '');
    else if (ch === '\n') row.push(field), rows.push(row), (row = []), (field = '');
    else field += ch;
  }
  if (field !== '' || row.length > 0) throw new Error('CSV does not end with a line break');
  return rows;
}

const awkward: Table = {
  kind: 'demo',
  caption: 'Values_with 5% & #1 {x} ~ ^',
  columns: [{ key: 'name', label: 'name_1' }, { key: 'angleDeg', label: 'torsion (°)', tex: 'torsion (\\textdegree)', digits: 1 }],
  rows: [['a_b, "c"', -0.04], ['50% & #2', 179.96], [null, null]],
};

describe('table text', () => {
  it('tableCsv parses back to the same cells, with fixed decimals and no -0', () => {
    const rows = parseCsv(tableCsv(awkward));
    expect(rows).toEqual([['name', 'angleDeg'], ['a_b, "c"', '0.0'], ['50% & #2', '180.0'], ['', '']]);
  });

  it('tableCsv defuses text that a spreadsheet would run as a formula, and leaves numbers and Klyne–Prelog labels alone', () => {
    const table: Table = { kind: 'demo', caption: '', columns: [{ key: 'title', label: 'title' }, { key: 'x', label: 'x', digits: 1 }], rows: [['=HYPERLINK("x")', -12.5], ['@sum', 3], ['+cmd|x!A0', -1], ['+sc', 2], ['-ac', 0]] };
    expect(parseCsv(tableCsv(table)).slice(1)).toEqual([["'=HYPERLINK(\"x\")", '-12.5'], ["'@sum", '3.0'], ["'+cmd|x!A0", '-1.0'], ['+sc', '2.0'], ['-ac', '0.0']]);
  });

  it('tableLatex uses booktabs rules and escapes _ % & # in text', () => {
    const tex = tableLatex(awkward);
    for (const rule of ['\\toprule', '\\midrule', '\\bottomrule']) expect(tex.split('\n').filter((l) => l === rule)).toHaveLength(1);
    expect(tex).toContain('\\caption{Values\\_with 5\\% \\& \\#1 \\{x\\} \\textasciitilde{} \\textasciicircum{}}');
    expect(tex).toContain('a\\_b, "c" & 0.0 \\\\');
    expect(tex).toContain('50\\% \\& \\#2 & 180.0 \\\\');
    expect(tex).toContain('name\\_1 & torsion (\\textdegree) \\\\');
    expect(tex).toContain('-- & -- \\\\');
    expect(tex).toContain('\\begin{tabular}{lr}');
    // every unescaped special character is gone from the body
    const body = tex.split('\n').filter((l) => !l.startsWith('%') && !l.startsWith('\\'));
    for (const line of body) expect(line.replace(/\\[&%#_{}$]/g, '').replace(/\\\\$/, '').replace(/ & /g, ' ')).not.toMatch(/[%#_]/);
    expect(texEscape('−5 °C in Å')).toBe('$-$5 \\textdegree{}C in \\AA{}');
  });

  it('tableLatex writes negative numbers as $-$ and plain digits, without siunitx', () => {
    const tex = tableLatex({ kind: 't', caption: 'c', columns: [{ key: 'x', label: 'x', digits: 2 }], rows: [[-54.937]] });
    expect(tex).toContain('$-$54.94 \\\\');
    expect(tex).not.toMatch(/\\(num|SI|si)\{/);
  });

  it('tableMarkdown writes a pipe table with units in the headers, numbers right-aligned', () => {
    const md = tableMarkdown(awkward).split('\n');
    expect(md[2]).toBe('| name_1 | torsion (°) |');
    expect(md[3]).toBe('| :--- | ---: |');
    expect(md[5]).toBe('| 50% & #2 | 180.0 |');
    expect(md[6]).toBe('| – | – |');
  });

  it('fixed never writes -0', () => {
    expect([fixed(-0.001, 2), fixed(-0, 0), fixed(-1.005, 1), fixed(2.5, 0)]).toEqual(['0.00', '0', '-1.0', '3']);
  });
});

describe('supportTables', () => {
  it('supportTables lists ring torsions with Klyne–Prelog labels, puckering and the drawn bonds of a cyclohexane chair', () => {
    const { mol } = cyclohexaneChair();
    const analysis = analyseRecord(prepareRecord(mol));
    const tables = supportTables([analysis]);
    expect(tables.map((t) => t.kind)).toEqual(['torsions', 'puckering', 'shapes', 'substituents', 'couplings']);
    const [torsions, puckering, shapes, , couplings] = tables;
    const ring = torsions!.rows.filter((r) => r[1] === 'ring 1');
    expect(ring).toHaveLength(6);
    for (const r of ring) {
      expect(Math.abs(r[3] as number)).toBeGreaterThan(50);
      expect(r[4]).toBe((r[3] as number) > 0 ? '+sc' : '-sc');
    }
    expect(torsions!.rows.filter((r) => String(r[1]).startsWith('bond '))).toHaveLength(6 * 9); // 3 × 3 pairs per ring bond
    const Q = puckering!.columns.findIndex((c) => c.key === 'Q');
    expect(puckering!.rows[0]![Q]).toBeGreaterThan(0.4);
    expect(shapes!.rows[0]![4]).toBe('chair');
    expect(couplings!.caption).toMatch(/Haasnoot, de Leeuw and Altona \(1980\)/);
    expect(tableCsv(puckering!).split('\n')[0]).toMatch(/^record,ring,size,atoms,Q,thetaDeg,phiDeg,q2,phi2Deg,q3,phi3Deg/);
  });
});
