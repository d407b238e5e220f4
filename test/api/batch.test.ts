import { mkdtempSync, readdirSync, readFileSync, rmSync, writeFileSync, existsSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { batchFile, formatSdf, type BatchManifest, type Molecule } from '../../src/index.js';
import { xmlProblems } from '../helpers/xmlWellFormed.js';
import { cyclohexaneEnsembles } from '../helpers/ensembleFiles.js';

const dirs: string[] = [];
const temp = () => {
  const d = mkdtempSync(join(tmpdir(), 'cmk-batch-'));
  dirs.push(d);
  return d;
};
afterAll(() => dirs.forEach((d) => rmSync(d, { recursive: true, force: true })));

let mols: Molecule[] = [];
let input = '';
beforeAll(async () => {
  const { mch, dmch } = await cyclohexaneEnsembles();
  mols = [...mch, ...dmch];
  input = join(temp(), 'ensemble.sdf');
  writeFileSync(input, formatSdf(mols));
}, 120_000);

const readManifest = (dir: string): BatchManifest => JSON.parse(readFileSync(join(dir, 'manifest.json'), 'utf8'));

describe('batchFile', () => {
  it('batchFile run again into the same folder removes what the earlier run wrote and this one did not, and nothing else', async () => {
    const dir = temp();
    await batchFile(input, dir, { tables: ['csv'] });
    writeFileSync(join(dir, 'notes.txt'), 'my own file');
    const { manifest } = await batchFile(input, dir, { bonds: '1-2', tables: [], sheet: false });
    const listed = [...manifest.figures, ...manifest.tables].map((f) => f.path);
    expect(readdirSync(dir).sort()).toEqual([...listed, 'manifest.json', 'notes.txt'].sort());
  });

  it('batchFile refuses energies without a unit (one line asking for --energy-unit) before writing anything', async () => {
    const dir = join(temp(), 'out');
    const path = join(temp(), 'nounit.sdf');
    writeFileSync(path, formatSdf(mols.slice(0, 2).map((m, k) => ({ ...m, properties: { energy: String(k) } }))));
    await expect(batchFile(path, dir, { sheet: false })).rejects.toMatchObject({ code: 'energy-unit-unknown' });
    expect(existsSync(dir)).toBe(false);
    const { manifest } = await batchFile(path, dir, { sheet: false, energy: { unit: 'kJ/mol' } });
    expect(manifest.errors).toEqual([]);
  });

  it('batchFile draws one Newman projection per ring bond of every record, named by record and bond', async () => {
    const dir = temp();
    const { manifest, errors } = await batchFile(input, dir);
    expect(errors).toEqual([]);
    const newman = manifest.figures.filter((f) => f.kind === 'newman');
    expect(newman).toHaveLength(6 * mols.length);
    const rings = manifest.figures.filter((f) => f.kind === 'ring');
    expect(rings.map((f) => f.path)).toEqual(mols.map((m, k) => `r${String(k + 1).padStart(2, '0')}-ring1-${m.properties['six-ring shapes']}.svg`));
    for (let r = 1; r <= mols.length; r++) {
      const own = newman.filter((f) => f.record === r);
      expect(own).toHaveLength(6);
      for (const f of own) expect(f.path).toBe(`r${String(r).padStart(2, '0')}-newman-${f.bond![0]}-${f.bond![1]}.svg`);
      // the six bonds close the ring: every ring atom is a front atom once and a back atom once
      expect(new Set(own.map((f) => f.bond![0]))).toEqual(new Set(own.map((f) => f.bond![1])));
    }
    expect(manifest.schema).toBe('conformark/batch@1');
    expect(manifest.errors).toEqual([]);
  }, 60_000);

  it('batchFile writes well-formed SVG, a complete manifest and the same bytes on a rerun', async () => {
    const a = temp();
    const b = temp();
    await batchFile(input, a);
    await batchFile(input, b);
    const manifest = readManifest(a);
    const listed = [...manifest.figures.map((f) => f.path), ...manifest.tables.map((t) => t.path)];
    const files = readdirSync(a).filter((f) => f !== 'manifest.json').sort();
    expect([...listed].sort()).toEqual(files);
    expect(new Set(listed).size).toBe(listed.length);
    const sheets = manifest.figures.filter((f) => f.kind === 'sheet');
    expect(sheets.length).toBeGreaterThan(1); // one row per record, rows onto further sheets below 24 cm
    expect(sheets.map((s) => s.path)).toEqual(sheets.map((_, k) => `sheet-${k + 1}.svg`));
    for (const f of files.filter((x) => x.endsWith('.svg'))) {
      const svg = readFileSync(join(a, f), 'utf8');
      expect(xmlProblems(svg), f).toEqual([]);
      const ids = [...svg.matchAll(/\sid="([^"]+)"/g)].map((m) => m[1]);
      expect(new Set(ids).size, `${f}: ids unique`).toBe(ids.length);
    }
    for (const f of [...files, 'manifest.json']) expect(readFileSync(join(b, f)).equals(readFileSync(join(a, f))), f).toBe(true);
  }, 120_000);

  it('batchFile puts one record per sheet row (ring figure first, informative Newmans), at most 17 cm wide', async () => {
    const dir = temp();
    const { manifest } = await batchFile(input, dir, { tables: [] });
    const sheets = manifest.figures.filter((f) => f.kind === 'sheet').map((f) => readFileSync(join(dir, f.path), 'utf8'));
    const headings = sheets.flatMap((svg) => [...svg.matchAll(/class="row-heading"/g)]);
    expect(headings).toHaveLength(mols.length);
    for (const svg of sheets) {
      const widthPt = Number(/^<svg[^>]*\swidth="([\d.]+)pt"/.exec(svg)![1]);
      expect(widthPt).toBeLessThanOrEqual((17 / 2.54) * 72 + 0.01);
      const panels = [...svg.matchAll(/<svg x="([\d.]+)" y="([\d.]+)"[^>]*class="panel conformark ([a-z-]+)/g)];
      // rows: panels sharing a y; each starts with the ring figure and holds no second ring figure
      const rows = new Map<string, string[]>();
      for (const p of panels) rows.set(p[2]!, [...(rows.get(p[2]!) ?? []), p[3]!]);
      expect(rows.size).toBe([...svg.matchAll(/class="row-heading"/g)].length);
      for (const kinds of rows.values()) {
        expect(kinds[0]).not.toBe('newman');
        expect(kinds.slice(1).every((k) => k === 'newman')).toBe(true);
        expect(kinds.length).toBeLessThan(7); // not all six ring bonds
      }
    }
    expect(sheets[0]).toContain('ΔE 0.00 kcal/mol');
  }, 60_000);

  it('batchFile with --bonds rotatable draws the methyl-free bonds only, and a bond list draws those bonds', async () => {
    const rot = temp();
    const { manifest } = await batchFile(input, rot, { bonds: 'rotatable', sheet: false, tables: [] });
    expect(manifest.figures.filter((f) => f.kind === 'newman')).toEqual([]); // ring-to-methyl bonds end at a terminal CH3: not rotatable
    const list = temp();
    const listed = await batchFile(input, list, { bonds: '1-2', sheet: false, tables: [] });
    expect(listed.manifest.figures.filter((f) => f.kind === 'newman').map((f) => f.path).slice(0, 2)).toEqual(['r01-newman-1-2.svg', 'r02-newman-1-2.svg']);
  }, 60_000);

  it('batchFile writes the rest of a file with a broken record and reports the broken one', async () => {
    const records = formatSdf(mols.slice(0, 3)).split('$$$$\n');
    const lines = records[1]!.split('\n');
    lines[4] = '    0.0000    oops    0.0000 C   0  0  0  0  0  0  0  0  0  0  0  0';
    records[1] = lines.join('\n');
    const path = join(temp(), 'broken.sdf');
    writeFileSync(path, records.join('$$$$\n'));
    const badLine = records[0]!.split('\n').length + 5; // record 1's lines, its $$$$ line, then line 5 of record 2
    const dir = temp();
    const { manifest, errors } = await batchFile(path, dir, { tables: ['csv'] });
    expect(errors).toHaveLength(1);
    expect(manifest.errors).toEqual([{ record: 2, code: errors[0]!.code, line: badLine, message: errors[0]!.message }]);
    expect(errors[0]!.file).toBe(path);
    expect([...new Set(manifest.figures.filter((f) => f.record !== null).map((f) => f.record))]).toEqual([1, 3]);
    expect(existsSync(join(dir, 'r03-newman-2-3.svg'))).toBe(true);
  }, 60_000);

  it('batchFile writes every figure in every requested format', async () => {
    const path = join(temp(), 'one.sdf');
    writeFileSync(path, formatSdf(mols.slice(0, 1)));
    const dir = temp();
    const { manifest } = await batchFile(path, dir, { formats: ['svg', 'png', 'pdf'], tables: [] });
    expect(manifest.figures).toHaveLength(3 * 8); // 6 Newman + 1 ring + 1 sheet, three formats each
    expect(readFileSync(join(dir, 'r01-newman-2-3.png')).subarray(1, 4).toString()).toBe('PNG');
    expect(readFileSync(join(dir, 'sheet-1.pdf')).subarray(0, 5).toString()).toBe('%PDF-');
  }, 60_000);
});
