import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { spawnSync } from 'node:child_process';
import { mkdtempSync, readFileSync, rmSync, existsSync, copyFileSync, readdirSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import type { ExploreModel } from '../../src/index.js';
import { explorePageData } from '../helpers/explorePageData.js';

// runs the built binary: `npx tsc -p tsconfig.build.json` (or `npm test`) first
const run = (...args: string[]) => spawnSync('node', ['bin/conformark.js', ...args], { encoding: 'utf8' });
const W4 = 'examples/w4-methyloxolanol.sdf';

let dir = '';
let model: ExploreModel;
let html = '';
beforeAll(() => {
  dir = mkdtempSync(join(tmpdir(), 'conformark-explore-cli-'));
  const r = run('explore', W4, '-o', join(dir, 'w4.html'));
  expect(r.stderr).toBe('');
  expect(r.status).toBe(0);
  html = readFileSync(join(dir, 'w4.html'), 'utf8');
  model = explorePageData(html);
});
afterAll(() => rmSync(dir, { recursive: true, force: true }));

/** Runs a command copied from the page (plain words only here), writing into `dir`. */
function runCopied(command: string): string {
  const words = command.split(' ');
  expect(words[0]).toBe('conformark');
  const out = join(dir, words[words.length - 1]!);
  const r = spawnSync('node', ['bin/conformark.js', ...words.slice(1, -1), out], { encoding: 'utf8' });
  expect(r.status).toBe(0);
  return readFileSync(out, 'utf8');
}

describe('conformark explore', () => {
  it('conformark explore FILE -o page.html writes one page whose figures are the bytes their copied commands write', () => {
    expect(html.startsWith('<!DOCTYPE html>')).toBe(true);
    expect(model.rows).toHaveLength(3);
    const [first, , last] = model.rows;
    const bond = first!.bonds[0]!;
    expect(runCopied(bond.views[0]!.command)).toBe(bond.views[0]!.svg);
    expect(runCopied(bond.views[1]!.command)).toBe(bond.views[1]!.svg);
    const ring = last!.rings[0]!;
    expect(runCopied(ring.figure!.command)).toBe(ring.figure!.svg);
  });

  it('conformark explore gives the torsions newman --json gives for the same bond', () => {
    const row = model.rows[1]!;
    for (const bond of row.bonds.slice(0, 2)) {
      const v = bond.views[0]!;
      const r = run('newman', W4, '--record', String(row.record), '--bond', `${v.front}-${v.back}`, '--json');
      expect(r.status).toBe(0);
      const doc = JSON.parse(r.stdout) as { front: { atom: number }; back: { atom: number }; pairs: { front: number; back: number; torsionDeg: number; klynePrelog: string }[] };
      expect([doc.front.atom, doc.back.atom]).toEqual([v.front, v.back]);
      expect(bond.torsions.map((t) => [t.atoms[0], t.atoms[3], t.klynePrelog])).toEqual(doc.pairs.map((p) => [p.front, p.back, p.klynePrelog]));
      bond.torsions.forEach((t, i) => expect(t.angleDeg!).toBeCloseTo(doc.pairs[i]!.torsionDeg, 1));
    }
  });

  it('conformark explore --theme --angles --hydrogens draws every figure so, and the copied commands carry the flags', () => {
    const out = join(dir, 'slides.html');
    const r = run('explore', W4, '--theme', 'projector', '--angles', 'ideal', '--hydrogens', 'collapse', '-o', out);
    expect(r.status).toBe(0);
    const page = readFileSync(out, 'utf8');
    const data = explorePageData(page);
    const view = data.rows[0]!.bonds[0]!.views[0]!;
    expect(view.command).toMatch(/ --theme projector --angles ideal --hydrogens collapse -o /);
    expect(view.svg).toContain('theme-projector');
    expect(runCopied(view.command)).toBe(view.svg);
    const ring = data.rows[0]!.rings[0]!.figure!;
    expect(ring.command).toMatch(/ --ring 1 --theme projector -o /);
    expect(runCopied(ring.command)).toBe(ring.svg);
    const bad = run('explore', W4, '--theme', 'nope', '-o', join(dir, 'nope.html'));
    expect(bad.status).toBe(2);
    expect(bad.stderr.trim().split('\n')).toHaveLength(1);
    expect(existsSync(join(dir, 'nope.html'))).toBe(false);
  });

  it('conformark explore FILE without -o writes the page to standard output', () => {
    const r = run('explore', W4, '--title', 'W4 <draft>');
    expect(r.status).toBe(0);
    expect(r.stdout).toContain('<title>W4 &lt;draft&gt;</title>');
  });

  it('conformark explore --max-size keeps the first record and says on stderr how many are listed without figures', () => {
    const out = join(dir, 'small.html');
    const r = run('explore', W4, '--max-size', '0.01', '-o', out);
    expect(r.status).toBe(0);
    expect(r.stderr).toMatch(/^conformark: 2 of 3 records are listed without figures: the page stays under 0\.01 MB/);
    expect(readFileSync(out, 'utf8')).toContain('class="limit"');
  });

  it('conformark explore with a bad --max-size or a missing file prints one line and exits 2, writing nothing', () => {
    const bad = run('explore', W4, '--max-size', 'lots', '-o', join(dir, 'bad.html'));
    expect(bad.status).toBe(2);
    expect(bad.stderr.trim().split('\n')).toHaveLength(1);
    expect(bad.stderr).toMatch(/--max-size expects a number/);
    const missing = run('explore', join(dir, 'nothing.sdf'), '-o', join(dir, 'missing.html'));
    expect(missing.status).toBe(2);
    expect(missing.stderr.trim().split('\n')).toHaveLength(1);
    expect(existsSync(join(dir, 'bad.html')) || existsSync(join(dir, 'missing.html'))).toBe(false);
  });

  it('conformark explore refuses to write the page over its input', () => {
    const copy = join(dir, 'input.sdf');
    copyFileSync(W4, copy);
    const r = run('explore', copy, '-o', copy);
    expect(r.status).toBe(2);
    expect(readFileSync(copy, 'utf8')).toBe(readFileSync(W4, 'utf8'));
    expect(readdirSync(dir).filter((f) => f.includes('.tmp'))).toEqual([]);
  });
});
