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
    const broken = run('inspect', 'test/data/bad/wrong-count.xyz');
    expect(broken.status).toBe(2);
    expect(broken.stderr).toBe('conformark: test/data/bad/wrong-count.xyz:1: expected 3 atoms, found 2\n');
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
    // trans-diaxial H–C–C–H in a 4C1 chair: a large coupling (METHODS.md §6.3, from memory: 7.5–10 Hz in pyranoses)
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
