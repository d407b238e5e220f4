import { describe, expect, it } from 'vitest';
import { spawnSync } from 'node:child_process';
import { mkdtempSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';

// runs the built binary: `npx tsc -p tsconfig.build.json` (or `npm test`) first
const run = (...args: string[]) => spawnSync('node', ['bin/conformark.js', ...args], { encoding: 'utf8' });
const GLUCOSIDE = 'examples/w3-methyl-glucoside.sdf';

describe('conformark inspect', () => {
  it('conformark inspect --json prints the report@1 document for every record', () => {
    const r = run('inspect', GLUCOSIDE, '--json');
    expect(r.status).toBe(0);
    const doc = JSON.parse(r.stdout);
    expect(doc.schema).toBe('conformark/report@1');
    expect(doc.records).toHaveLength(4);
    expect(doc.records[0].rings[0].descriptor).toBe('4C1');
    expect(doc.records[0].couplings).toBeUndefined();
  });

  it('conformark inspect --couplings lists ring H–H couplings with the method named', () => {
    const r = run('inspect', GLUCOSIDE, '--couplings');
    expect(r.status).toBe(0);
    expect(r.stdout).toContain('³J(H,H) predictions, Haasnoot–de Leeuw–Altona (1980) (estimates, typical error about 1 Hz)');
    expect(r.stdout).toMatch(/ring 1 {2}H\d+–H\d+ +\d+\.\d Hz/);
  });

  it('conformark inspect reads standard input and sniffs the format', () => {
    const r = spawnSync('node', ['bin/conformark.js', 'inspect', '-'], { input: readFileSync(GLUCOSIDE), encoding: 'utf8' });
    expect(r.status).toBe(0);
    expect(r.stdout.split('\n')[0]).toBe('- (sdf): 4 records');
  });

  it('conformark inspect on a missing file or a broken file prints one line and exits 2', () => {
    const missing = run('inspect', 'no/such/file.xyz');
    expect(missing.status).toBe(2);
    expect(missing.stderr).toBe('conformark: no/such/file.xyz: no such file\n');
    const broken = run('inspect', 'test/data/bad/truncated.xyz');
    expect(broken.status).toBe(2);
    expect(broken.stderr).toBe('conformark: test/data/bad/truncated.xyz:1: expected 3 atoms, found 2\n');
    expect(broken.stdout).toBe('');
  });
});

describe('conformark newman', () => {
  it('conformark newman --json includes predicted couplings for the H/H pairs (HLA 1980)', () => {
    const r = run('newman', GLUCOSIDE, '--bond', '5-8', '--json');
    expect(r.status).toBe(0);
    const doc = JSON.parse(r.stdout);
    expect(doc.schema).toBe('conformark/newman@1');
    expect(doc.couplings).toHaveLength(1);
    expect(doc.couplings[0].method).toBe('haasnoot-1980');
    // trans-diaxial H–C–C–H in a 4C1 chair: a large coupling (docs/methods.md#observed-couplings, from memory: 7.5–10 Hz in pyranoses)
    expect(Math.abs(doc.couplings[0].torsionDeg)).toBeGreaterThan(160);
    expect(doc.couplings[0].jHz).toBeGreaterThan(7.5);
  });

  it('conformark newman --couplings prints each J under the drawing; -o writes SVG atomically', () => {
    const dir = mkdtempSync(join(tmpdir(), 'conformark-newman-'));
    try {
      const out = join(dir, 'n.svg');
      const r = run('newman', GLUCOSIDE, '--bond', '5-8', '--couplings', '-o', out);
      expect(r.status).toBe(0);
      const svg = readFileSync(out, 'utf8');
      expect(svg).toMatch(/<text[^>]*class="coupling-label"[^>]*>³J\(H\d+,H\d+\) \d+\.\d Hz/);
      expect(svg).not.toMatch(/NaN/);
      const bad = run('newman', GLUCOSIDE, '--bond', '5-99', '-o', out);
      expect(bad.status).toBe(2);
      expect(readFileSync(out, 'utf8')).toBe(svg);
    } finally {
      rmSync(dir, { recursive: true, force: true });
    }
  });

  it('conformark newman takes several bonds: one JSON array, one figure each with -d or an -o pattern, else a usage error', () => {
    const dir = mkdtempSync(join(tmpdir(), 'conformark-newman-'));
    try {
      const json = run('newman', GLUCOSIDE, '--bond', '5-8', '--bond', '1-2,2-3', '--json');
      expect(json.status).toBe(0);
      const docs = JSON.parse(json.stdout);
      expect(docs.map((d: { front: { atom: number }; back: { atom: number } }) => [d.front.atom, d.back.atom])).toEqual([[5, 8], [1, 2], [2, 3]]);
      // 4 decimals, as every JSON document
      expect(Math.max(...docs.flatMap((d: { pairs: { torsionDeg: number }[] }) => d.pairs.map((p) => (String(p.torsionDeg).split('.')[1] ?? '').length)))).toBeGreaterThan(2);
      const d = run('newman', GLUCOSIDE, '--bond', '5-8', '--bond', '1-2', '-d', join(dir, 'figs'));
      expect(d.status).toBe(0);
      const a = readFileSync(join(dir, 'figs', 'newman-5-8.svg'), 'utf8');
      const b = readFileSync(join(dir, 'figs', 'newman-1-2.svg'), 'utf8');
      expect(a).toContain('id="newman-5-8-');
      expect(b).toContain('id="newman-1-2-');
      const o = run('newman', GLUCOSIDE, '--bond', '5-8,1-2', '-o', join(dir, 'fig-{bond}.svg'));
      expect(o.status).toBe(0);
      expect(readFileSync(join(dir, 'fig-5-8.svg'), 'utf8')).toBe(a);
      const bad = run('newman', GLUCOSIDE, '--bond', '5-8', '--bond', '1-2');
      expect(bad.status).toBe(2);
      expect(bad.stderr).toBe('conformark: 2 bonds give 2 figures: write them with -d DIR or -o with {bond} in the name, e.g. -o newman-{bond}.svg\n');
    } finally {
      rmSync(dir, { recursive: true, force: true });
    }
  });

  it('conformark newman --couplings and inspect --couplings on a hydrogen-free file say why nothing is predicted', () => {
    const dir = mkdtempSync(join(tmpdir(), 'conformark-newman-'));
    try {
      const heavy = join(dir, 'heavy.xyz');
      // cyclohexane carbons only (a chair, 1.53 Å bonds)
      const atoms = Array.from({ length: 6 }, (_, j) => {
        const t = (j * Math.PI) / 3;
        return `C ${(1.45 * Math.cos(t)).toFixed(4)} ${(1.45 * Math.sin(t)).toFixed(4)} ${(j % 2 ? 0.25 : -0.25).toFixed(4)}`;
      });
      writeFileSync(heavy, `6\ncarbons only\n${atoms.join('\n')}\n`);
      const n = run('newman', heavy, '--bond', '1-2', '--couplings', '-o', join(dir, 'n.svg'));
      expect(n.status).toBe(0);
      expect(n.stderr).toContain('conformark: warning: the file has no hydrogen atoms: ³J(H,H) needs explicit hydrogens, so no couplings are predicted');
      const i = run('inspect', heavy, '--couplings');
      expect(i.stdout).toContain('warning: the file has no hydrogen atoms');
    } finally {
      rmSync(dir, { recursive: true, force: true });
    }
  });

  it('conformark newman refuses to write over its input', () => {
    const dir = mkdtempSync(join(tmpdir(), 'conformark-newman-'));
    try {
      const input = join(dir, 'in.sdf');
      writeFileSync(input, readFileSync(GLUCOSIDE));
      const r = run('newman', input, '--bond', '5-8', '--json', '-o', input);
      expect(r.status).toBe(2);
      expect(r.stderr).toContain('refusing to overwrite the input file');
      expect(readFileSync(input, 'utf8')).toBe(readFileSync(GLUCOSIDE, 'utf8'));
    } finally {
      rmSync(dir, { recursive: true, force: true });
    }
  });
});
