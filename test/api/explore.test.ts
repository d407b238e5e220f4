/** The explorer page model and its HTML: rows, bonds, rings, the embedded figures, commands, limits, escaping. */
import { beforeAll, describe, expect, it } from 'vitest';
import {
  chairFigure,
  ensembleFile,
  exploreFile,
  exploreModel,
  explorePage,
  figureBonds,
  figureCommand,
  newmanFigure,
  prepareRecord,
  readRecords,
  shellWord,
  analyzeRing,
  type ExploreModel,
  type Molecule,
} from '../../src/index.js';
import { descriptorText } from '../../src/api/explore/descriptorText.js';
import { escapeHtml, scriptJson } from '../../src/api/explore/escapeHtml.js';
import { packDetail } from '../../src/api/explore/packDetail.js';
import { depictionSvg } from '../../src/api/explore/depictionSvg.js';
import { butane } from '../helpers/newmanMolecules.js';
import { xmlProblems } from '../helpers/xmlWellFormed.js';
import { explorePageData as pageData } from '../helpers/explorePageData.js';

const W2 = 'examples/w2-methylcyclohexanol.sdf';
const W3 = 'examples/w3-methyl-glucoside.sdf';

async function records(path: string): Promise<Molecule[]> {
  const out: Molecule[] = [];
  for await (const m of readRecords(path)) out.push(m);
  return out;
}

let w2: ExploreModel;
let w2Records: Molecule[];
beforeAll(async () => {
  w2Records = await records(W2);
  w2 = await exploreModel(w2Records, { file: W2 });
}, 120_000);

describe('exploreModel', () => {
  it('exploreModel lists the records in the ensemble order with energy, ΔE, population and ring shapes', async () => {
    const { report } = await ensembleFile(W2);
    expect(w2.ensemble).toBe(true);
    expect(w2.temperatureK).toBe(298.15);
    expect(w2.rows.map((r) => r.record)).toEqual(report.conformers.map((c) => c.record));
    w2.rows.forEach((row, i) => {
      const c = report.conformers[i]!;
      expect(row.energy).toBeCloseTo(c.energy, 3);
      expect(row.relativeEnergy).toBeCloseTo(c.relativeEnergy, 3);
      expect(row.population).toBeCloseTo(c.population, 5);
      expect(row.duplicateOf).toBe(c.duplicateOf);
      expect(row.shapes).toEqual(c.rings.map((g) => (g.descriptor ? `${g.shape}\u00a0${descriptorText(g.descriptor)}` : g.shape)));
    });
    expect(w2.rows[0]!.relativeEnergy).toBe(0);
  });

  it('exploreModel gives every record the bonds of figureBonds "all", keyed by their 1-based atoms, the same keys in every conformer', () => {
    const first = w2.rows[0]!;
    const p = prepareRecord(w2Records.find((m) => m.source.index === first.record)!);
    const ordered = p.rings.map((ring, k) => analyzeRing(p.molecule, p.graph, ring, { id: k + 1 }).atoms);
    const expected = figureBonds(p.molecule, p.graph, ordered, 'all').map(([a, b]) => (a < b ? `${a + 1}-${b + 1}` : `${b + 1}-${a + 1}`));
    expect(first.bonds.map((b) => b.key)).toEqual(expected);
    for (const row of w2.rows) expect(row.bonds.map((b) => b.key).sort()).toEqual([...expected].sort());
    expect(new Set(w2.rows.map((r) => r.depiction))).toEqual(new Set([0]));
    expect(w2.depictions).toHaveLength(1);
  });

  it('exploreModel embeds the exact SVG bytes newman and chair write, both ways along each bond, with the command that writes them', () => {
    const row = w2.rows[1]!;
    const p = prepareRecord(w2Records.find((m) => m.source.index === row.record)!);
    for (const bond of row.bonds) {
      expect(bond.error).toBeNull();
      expect(bond.views).toHaveLength(2);
      const [there, back] = bond.views;
      expect([there!.back, there!.front]).toEqual([back!.front, back!.back]);
      for (const v of bond.views) {
        const { svg } = newmanFigure(p.molecule, { bond: [v.front - 1, v.back - 1], graph: p.graph, rings: p.rings });
        expect(v.svg).toBe(`${svg}\n`);
        expect(v.svg).toContain('class="conformark newman');
        expect(v.command).toBe(`conformark newman ${W2} --record ${row.record} --bond ${v.front}-${v.back} -o ${v.file}`);
      }
    }
    const ring = row.rings[0]!;
    // the options `conformark chair FILE --ring 1` passes (test/cli/explore.test.ts compares with the CLI's own bytes)
    const { svg } = chairFigure(p.molecule, { graph: p.graph, rings: p.rings, ring: 1, ordered: false, hydrogens: 'stereo', labels: 'element', caption: true });
    expect(ring.figure!.svg).toBe(`${svg}\n`);
    expect(ring.figure!.command).toBe(`conformark chair ${W2} --record ${row.record} --ring 1 -o chair-r${row.record}-ring1.svg`);
  });

  it('exploreModel gives each ring its shape, Q/θ/φ and substituents, and each bond its torsions with ³J for H/H pairs', () => {
    const row = w2.rows[0]!;
    const ring = row.rings[0]!;
    expect(ring.shape).toBe('chair');
    expect(ring.Q).toBeGreaterThan(0.4);
    expect(ring.Q).toBeLessThan(0.7);
    expect(ring.thetaDeg === null || ring.thetaDeg < 20 || ring.thetaDeg > 160).toBe(true);
    expect(ring.substituents.length).toBeGreaterThanOrEqual(6);
    expect(ring.substituents.every((s) => ['axial', 'equatorial'].includes(s.position ?? ''))).toBe(true);
    const ringBond = row.bonds.find((b) => ring.atoms.includes(Number(b.key.split('-')[0])) && ring.atoms.includes(Number(b.key.split('-')[1])))!;
    expect(ringBond.torsions.length).toBeGreaterThanOrEqual(4);
    const hh = ringBond.torsions.filter((t) => t.label.startsWith('H') && /–H[^–]*$/.test(t.label));
    expect(hh.length).toBeGreaterThan(0);
    for (const t of hh) expect(t.jHz).toBeGreaterThan(0);
    for (const t of ringBond.torsions.filter((x) => x.heavy)) expect(t.jHz).toBeNull();
    for (const t of ringBond.torsions) expect(Math.abs(t.angleDeg!)).toBeLessThanOrEqual(180);
  });

  it('exploreModel keeps the first records within the size limit and lists the rest without figures, with a note', async () => {
    // the page's reserve, the picture, ten rows, and about three and a half packed records
    const packed = packDetail({ bonds: w2.rows[0]!.bonds, rings: w2.rows[0]!.rings }).length;
    const maxBytes = 64_000 + Buffer.byteLength(depictionSvg(w2.depictions[0]!)) + 10 * 400 + Math.round(packed * 3.5);
    const small = await exploreModel(w2Records, { file: W2, maxBytes });
    expect(Buffer.byteLength(explorePage(small))).toBeLessThanOrEqual(maxBytes);
    const embedded = small.rows.filter((r) => r.embedded);
    expect(embedded.length).toBeGreaterThanOrEqual(2);
    expect(embedded.length).toBeLessThan(small.rows.length);
    // embedded records come first; the rest keep their row (energy, shapes) but no figures
    expect(small.rows.slice(0, embedded.length).every((r) => r.embedded)).toBe(true);
    for (const r of small.rows.filter((x) => !x.embedded)) {
      expect(r.bonds).toEqual([]);
      expect(r.shapes.length).toBe(1);
      expect(r.energy).not.toBeNull();
    }
    expect(small.limitNote).toMatch(new RegExp(`^${small.rows.length - embedded.length} of ${small.rows.length} records are listed without figures`));
    expect(small.notes).toContain(small.limitNote);
    // the first record is kept even when it alone is over the limit
    const tiny = await exploreModel(w2Records, { file: W2, maxBytes: 10 });
    expect(tiny.rows.map((r) => r.embedded)).toEqual(w2Records.map((_, i) => i === 0));
    expect(w2.limitNote).toBeNull();
  });

  it('exploreModel keeps file order and leaves energies empty when a record has no energy', async () => {
    const mols = [180, 60, -60].map((t, i) => ({ ...butane(t), title: `butane ${t}`, source: { ...butane(t).source, index: i + 1 } }));
    const model = await exploreModel(mols, { file: 'butane.sdf' });
    expect(model.ensemble).toBe(false);
    expect(model.rows.map((r) => [r.record, r.energy, r.population])).toEqual([[1, null, null], [2, null, null], [3, null, null]]);
    expect(model.notes[0]).toMatch(/no energies to rank by/);
    const central = model.rows[1]!.bonds.find((b) => b.key === '2-3')!;
    const heavy = central.torsions.filter((t) => t.heavy);
    expect(heavy).toHaveLength(1);
    expect(heavy[0]!.angleDeg).toBeCloseTo(60, 1);
    expect(heavy[0]!.klynePrelog).toBe('+sc');
  });
});

describe('explorePage', () => {
  it('explorePage writes one self-contained page: no external reference, a CSP that forbids fetching, the script allowed by its hash', () => {
    const html = explorePage(w2);
    expect(html.startsWith('<!DOCTYPE html>')).toBe(true);
    expect(html).not.toMatch(/\s(?:src|href)=["'](?:https?:)?\/\//);
    expect(html).not.toMatch(/<link\b/);
    expect(html).not.toMatch(/@import|url\(/);
    expect(html).toMatch(/<meta http-equiv="Content-Security-Policy" content="default-src &#39;none&#39;;[^"]*script-src &#39;sha256-[A-Za-z0-9+/=]+&#39;/);
    expect(html).toContain('<div class="depiction-box" data-depiction="0"><svg');
    const data = pageData(html);
    expect(data.rows.length).toBe(w2.rows.length);
    expect(data).not.toHaveProperty('depictions');
    // the packed records read back as the model's own
    expect(data.rows.map((r) => ({ bonds: r.bonds, rings: r.rings }))).toEqual(w2.rows.map((r) => ({ bonds: r.bonds, rings: r.rings })));
  });

  it('explorePage escapes titles and file names in the HTML, and the JSON data cannot end its script element', async () => {
    const nasty = '</script><img src=x onerror=alert(1)> & "quotes" \u2028';
    const mol = { ...butane(60), title: nasty, source: { ...butane(60).source, index: 1 } };
    const model = await exploreModel([mol], { file: `a'b </script>.sdf` });
    const html = explorePage(model, { title: nasty });
    expect(html.match(/<\/script>/g)).toHaveLength(2); // the data element's and the page script's own
    // outside the JSON (script data, never parsed as markup) no tag from the input appears
    expect(html.replace(/<script type="application\/json" id="explore-data">[\s\S]*?<\/script>/, '')).not.toContain('<img');
    expect(html).toContain('&lt;/script&gt;&lt;img src=x onerror=alert(1)&gt; &amp; &quot;quotes&quot;');
    const data = pageData(html);
    expect(data.rows[0]!.title).toBe(nasty);
    expect(data.rows[0]!.bonds[0]!.views[0]!.command).toContain(`'a'\\''b </script>.sdf'`);
    // every depiction is well-formed XML
    const svg = /<div class="depiction-box" data-depiction="0">([\s\S]*?)<\/div>/.exec(html)![1]!;
    expect(xmlProblems(svg)).toEqual([]);
  });

  it('exploreFile reads a file into the same model and page', async () => {
    const { model, html, errors } = await exploreFile(W3);
    expect(errors).toEqual([]);
    expect(model.rows).toHaveLength(4);
    expect(model.rows[0]!.rings[0]!.descriptorText).toBe('⁴C₁');
    expect(model.depictions[0]!.atoms.filter((a) => a.label !== '').map((a) => a.label).sort()).toEqual(['O', 'O', 'OH', 'OH', 'OH', 'OH']);
    expect(html).toContain('conformark explorer: examples/w3-methyl-glucoside.sdf');
  });
});

describe('depiction', () => {
  it('depiction draws every heavy-atom bond once at about one bond length, and every ring as a target', () => {
    const d = w2.depictions[0]!;
    const mol = w2Records[0]!;
    const p = prepareRecord(mol);
    const heavyBonds = p.molecule.bonds!.filter((b) => mol.atoms[b.a]!.element !== 'H' && mol.atoms[b.b]!.element !== 'H');
    expect(d.bonds).toHaveLength(heavyBonds.length);
    expect(d.atoms).toHaveLength(mol.atoms.filter((a) => a.element !== 'H').length);
    const at = new Map(d.atoms.map((a) => [a.id, a]));
    for (const b of d.bonds) {
      const len = Math.hypot(at.get(b.a)!.x - at.get(b.b)!.x, at.get(b.a)!.y - at.get(b.b)!.y);
      expect(len).toBeGreaterThan(30);
      expect(len).toBeLessThan(70);
    }
    for (const a of d.atoms) {
      expect(a.x).toBeGreaterThan(0);
      expect(a.y).toBeGreaterThan(0);
      expect(a.x).toBeLessThan(d.width);
      expect(a.y).toBeLessThan(d.height);
    }
    expect(d.rings.map((r) => r.key)).toEqual(w2.rows[0]!.rings.map((r) => r.key));
  });
});

describe('figureCommand, shellWord, descriptorText, escapeHtml, scriptJson', () => {
  it('shellWord leaves plain words bare and single-quotes the rest', () => {
    expect(shellWord('examples/w2.sdf')).toBe('examples/w2.sdf');
    expect(shellWord('my file.sdf')).toBe(`'my file.sdf'`);
    expect(shellWord(`it's`)).toBe(`'it'\\''s'`);
    expect(shellWord('$(rm -rf x)')).toBe(`'$(rm -rf x)'`);
    expect(shellWord('')).toBe(`''`);
    expect(figureCommand({ file: 'a b.sdf', record: 3, kind: 'chair', flags: ['--ring', '2'], output: 'c.svg' })).toBe(`conformark chair 'a b.sdf' --record 3 --ring 2 -o c.svg`);
  });

  it('descriptorText typesets locants as super- and subscripts and keeps what it cannot typeset', () => {
    expect(descriptorText('4C1')).toBe('⁴C₁');
    expect(descriptorText('1S3')).toBe('¹S₃');
    expect(descriptorText('E3')).toBe('E₃');
    expect(descriptorText('OS2')).toBe('ᴼS₂');
    expect(descriptorText('2,5B')).toBe('²˒⁵B');
    expect(descriptorText('E0')).toBe('E₀');
    expect(descriptorText('1EO')).toBe('1EO');
    expect(descriptorText('chair')).toBe('chair');
  });

  it('escapeHtml and scriptJson escape every character that could change the markup', () => {
    expect(escapeHtml(`<a href="x" title='y'>&</a>`)).toBe('&lt;a href=&quot;x&quot; title=&#39;y&#39;&gt;&amp;&lt;/a&gt;');
    const text = '</script><!-- & \u2028\u2029';
    const json = scriptJson({ text });
    expect(json).not.toMatch(/<\/|<!|[\u2028\u2029]/);
    expect(JSON.parse(json)).toEqual({ text });
  });
});
