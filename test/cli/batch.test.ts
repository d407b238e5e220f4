import { spawnSync } from 'node:child_process';
import { mkdtempSync, readdirSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { availableParallelism, tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { formatSdf, type Molecule } from '../../src/index.js';
import { cyclohexaneEnsembles, withProperties } from '../helpers/ensembleFiles.js';
import { butane } from '../helpers/newmanMolecules.js';

// runs the built binary: `npx tsc -p tsconfig.build.json` (or `npm test`) first
const run = (...args: string[]) => spawnSync('node', ['bin/conformark.js', ...args], { encoding: 'utf8' });

const root = mkdtempSync(join(tmpdir(), 'cmk-cli-batch-'));
afterAll(() => rmSync(root, { recursive: true, force: true }));
let mols: Molecule[] = [];
beforeAll(async () => {
  const { mch, dmch } = await cyclohexaneEnsembles();
  mols = [...mch, ...dmch];
}, 120_000);

const sameTree = (a: string, b: string) => {
  const files = readdirSync(a).sort();
  expect(readdirSync(b).sort()).toEqual(files);
  for (const f of files) expect(readFileSync(join(b, f)).equals(readFileSync(join(a, f))), f).toBe(true);
};

describe('conformark batch', () => {
  it('conformark batch writes the same bytes with and without worker threads', () => {
    const input = join(root, 'all.sdf');
    writeFileSync(input, formatSdf(mols)); // 11 records × 6 ring bonds: above the 40-figure worker threshold
    const one = run('batch', input, '-d', join(root, 'one'), '--jobs', '1');
    const two = run('batch', input, '-d', join(root, 'two'), '--jobs', '2');
    expect(one.status, one.stderr).toBe(0);
    expect(two.status, two.stderr).toBe(0);
    expect(one.stderr).toMatch(/wrote 81 figure files and 15 tables/);
    sameTree(join(root, 'one'), join(root, 'two'));
  }, 120_000);

  it('conformark batch --max-pixels over the figures stops with one line from the worker threads; --jobs above the cores is capped with a note', () => {
    const input = join(root, 'all.sdf');
    writeFileSync(input, formatSdf(mols));
    const out = join(root, 'capped');
    const r = run('batch', input, '-d', out, '--formats', 'png', '--max-pixels', '1000', '--jobs', '2');
    expect(r.status).toBe(2);
    expect(r.stderr).toMatch(/^conformark: the PNG would be \d+ × \d+ pixels \([\d.]+ megapixels\), more than the limit of 1000 \(raise with --max-pixels/);
    expect(r.stderr.trim().split('\n')).toHaveLength(1);
    expect(readdirSync(root)).not.toContain('capped'); // the refused run removes the folder it created
    const many = run('batch', input, '-d', join(root, 'many'), '--jobs', '100000', '--tables', 'none', '--no-sheet');
    expect(many.status, many.stderr).toBe(0);
    expect(many.stderr).toMatch(new RegExp(`note: jobs 100000 is more than the ${availableParallelism()} cores here: using ${availableParallelism()}`));
  }, 120_000);

  it('conformark batch with one broken record writes the rest, names file and line on stderr and exits 1', () => {
    const records = formatSdf(mols.slice(0, 3)).split('$$$$\n');
    const lines = records[1]!.split('\n');
    lines[5] = '    0.0000    0.0000    0.0000 Xx  0  0  0  0  0  0  0  0  0  0  0  0';
    records[1] = lines.join('\n');
    const input = join(root, 'broken.sdf');
    writeFileSync(input, records.join('$$$$\n'));
    const dir = join(root, 'broken');
    const r = run('batch', input, '-d', dir, '--tables', 'csv');
    expect(r.status).toBe(1);
    const errorLines = r.stderr.split('\n').filter((l) => l.startsWith(`conformark: ${input}:`));
    expect(errorLines).toHaveLength(1);
    expect(errorLines[0]).toMatch(new RegExp(`^conformark: ${input}:${records[0]!.split('\n').length + 6}: `));
    const manifest = JSON.parse(readFileSync(join(dir, 'manifest.json'), 'utf8'));
    expect(manifest.errors).toHaveLength(1);
    expect(manifest.errors[0].record).toBe(2);
    expect(manifest.figures.filter((f: { kind: string }) => f.kind === 'newman')).toHaveLength(12);
    expect(readdirSync(dir)).toContain('r03-newman-2-3.svg');
  }, 60_000);

  it('conformark batch rejects an unknown format or bond set with exit 2 and one line', () => {
    const input = join(root, 'butane.sdf');
    writeFileSync(input, formatSdf([butane(65)]));
    const bad = run('batch', input, '-d', join(root, 'x'), '--formats', 'svg,gif');
    expect(bad.status).toBe(2);
    expect(bad.stderr).toBe('conformark: --formats expects one of svg, png, pdf, got "gif"\n');
    const bonds = run('batch', input, '-d', join(root, 'x'), '--bonds', 'some');
    expect(bonds.status).toBe(1); // every record fails its bond selection: reported per record
    expect(bonds.stderr).toMatch(/record 1: bond 'some' should be two atoms/);
  });
});

describe('conformark ensemble', () => {
  it('conformark ensemble --json gives the populations and notes; -d writes the sheet and the ladder', () => {
    const input = join(root, 'butane-e.sdf');
    const anti = withProperties(butane(180), { energy_kcal: '0', g: '1' }, 'anti');
    const gauche = withProperties(butane(65), { energy_kcal: '0.66', g: '2' }, 'gauche');
    writeFileSync(input, formatSdf([anti, gauche]));
    const dir = join(root, 'ens');
    const r = run('ensemble', input, '--degeneracy-field', 'g', '--json', '-d', dir);
    expect(r.status, r.stderr).toBe(0);
    const report = JSON.parse(r.stdout);
    expect(report.schema).toBe('conformark/ensemble@1');
    expect(report.temperatureK).toBe(298.15);
    expect(report.conformers[1].population).toBeCloseTo(0.3963, 4); // derived, docs/methods.md#boltzmann
    expect(report.notes.some((n: string) => /not free energies/.test(n))).toBe(true);
    expect(readdirSync(dir).sort()).toEqual(['energy-ladder.svg', 'ensemble-sheet-1.svg']);
    const text = run('ensemble', input, '--degeneracy-field', 'g', '--temperature', '500');
    expect(text.stdout).toMatch(/Boltzmann populations at 500\.00 K/);
    expect(text.stdout).toMatch(/^ +1 +r01 +anti /m);
    expect(text.stdout).toMatch(/note: populations from energies/);
  });
});
