import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { spawnSync } from 'node:child_process';
import { mkdtempSync, readFileSync, rmSync, writeFileSync, existsSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { readLines } from '../helpers/svgRead.js';

// runs the built binary: `npx tsc -p tsconfig.build.json` (or `npm test`) first
const run = (...args: string[]) => spawnSync('node', ['bin/conformark.js', ...args], { encoding: 'utf8' });

let dir = '';
let sdf = '';
beforeAll(() => {
  dir = mkdtempSync(join(tmpdir(), 'conformark-chair-'));
  sdf = join(dir, 'cyclohexane.sdf');
  // record 1 a chair, record 2 a twist-boat (MMFF94s, made by our own build command)
  expect(run('build', 'C1CCCCC1', '--ring-forms', '-o', sdf).status).toBe(0);
});
afterAll(() => rmSync(dir, { recursive: true, force: true }));

describe('conformark chair', () => {
  it('conformark chair FILE draws the first record as a chair template on stdout, ring CH2 hydrogens left out by default', () => {
    const r = run('chair', sdf);
    expect(r.status).toBe(0);
    expect(r.stdout).toMatch(/^<svg[^>]*class="conformark chair theme-column"/);
    expect(readLines(r.stdout).filter((l) => l.cls === 'axial' || l.cls === 'equatorial')).toHaveLength(0);
    const all = run('chair', sdf, '--hydrogens', 'all');
    const lines = readLines(all.stdout);
    expect(lines.filter((l) => l.cls === 'axial')).toHaveLength(6);
    expect(lines.filter((l) => l.cls === 'equatorial')).toHaveLength(6);
  });

  it('conformark chair --record 2 picks the projected view for the twist-boat; --view template refuses it', () => {
    const r = run('chair', sdf, '--record', '2', '--hydrogens', 'hide', '--labels', 'id');
    expect(r.status).toBe(0);
    expect(r.stdout).toContain('class="conformark ring-projection');
    const bad = run('chair', sdf, '--record', '2', '--view', 'template');
    expect(bad.status).toBe(2);
    expect(bad.stderr).toMatch(/^conformark: .*ring 1 is a twist-boat \(.+\), not a chair: use --view projected\n$/);
    expect(bad.stderr.startsWith(`conformark: ${sdf}:`)).toBe(true); // the refusal names the file
  });

  it('conformark chair --json prints the ring report and the 2D placement', () => {
    const r = run('chair', sdf, '--json', '--ring', '1');
    expect(r.status).toBe(0);
    const json = JSON.parse(r.stdout);
    expect(json.schema).toBe('conformark/chair@1');
    expect(json.ring.shape).toBe('chair');
    expect(json.ring.atoms).toHaveLength(6);
    expect(json.placement.view).toBe('template');
    expect(json.placement.bonds.filter((b: { role: string }) => b.role === 'ring-bond')).toHaveLength(6);
  });

  it('conformark chair -o writes PNG and PDF figures', () => {
    for (const ext of ['png', 'pdf']) {
      const out = join(dir, `c.${ext}`);
      const r = run('chair', sdf, '--view', 'projected', '--elevation', '30', '--theme', 'contrast', '-o', out);
      expect(r.status).toBe(0);
      const head = readFileSync(out).subarray(0, 4).toString('latin1');
      expect(head).toBe(ext === 'png' ? '\x89PNG' : '%PDF');
    }
  });

  it('conformark chair on a record without rings exits 2 with "no ring to draw in record 1"', () => {
    const xyz = join(dir, 'ethane.xyz');
    writeFileSync(xyz, '2\nethane carbons\nC 0 0 0\nC 1.54 0 0\n');
    const r = run('chair', xyz, '-o', join(dir, 'none.svg'));
    expect(r.status).toBe(2);
    expect(r.stderr).toBe(`conformark: ${xyz}: no ring to draw in record 1\n`);
    expect(existsSync(join(dir, 'none.svg'))).toBe(false);
  });

  it('conformark chair rejects bad option values in one line', () => {
    const r = run('chair', sdf, '--elevation', 'steep');
    expect(r.status).toBe(2);
    expect(r.stderr).toMatch(/^conformark: --elevation expects a number between -90 and 90, got "steep"\n$/);
  });
});
