import { describe, expect, it } from 'vitest';
import { spawnSync } from 'node:child_process';
import { existsSync, mkdtempSync, readFileSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { Molecule as OclMolecule } from 'openchemlib';

// runs the built binary: `npx tsc -p tsconfig.build.json` (or `npm test`) first
const run = (...args: string[]) => spawnSync('node', ['bin/conformark.js', ...args], { encoding: 'utf8' });

describe('conformark build', () => {
  it('conformark build C1CCCCC1 --ring-forms writes a chair and a twist-boat with energies', () => {
    const dir = mkdtempSync(join(tmpdir(), 'conformark-build-'));
    try {
      const out = join(dir, 'x.sdf');
      const r = run('build', 'C1CCCCC1', '--ring-forms', '--title', 'cyclohexane', '-o', out);
      expect(r.status).toBe(0);
      expect(r.stderr).toContain('wrote 2 conformers');
      const records = readFileSync(out, 'utf8').split('$$$$\n').filter((s) => s.trim() !== '');
      expect(records).toHaveLength(2);
      expect(records[0]!.split('\n')[0]).toBe('cyclohexane conformer 1');
      expect(records[1]).toMatch(/> <MMFF94s energy \(kcal\/mol\)>\n-?\d+\.\d{4}\n/);
      expect(records.map((t) => /> <six-ring shapes>\n(.*)\n/.exec(t)![1])).toEqual(['chair', 'twist-boat']);
      expect(OclMolecule.fromMolfile(records[1]!).getAllAtoms()).toBe(18);
    } finally {
      rmSync(dir, { recursive: true, force: true });
    }
  });

  it('conformark build with a bad SMILES or a bad option exits 2 with one line and writes no file', () => {
    const dir = mkdtempSync(join(tmpdir(), 'conformark-build-'));
    try {
      const out = join(dir, 'y.sdf');
      const bad = run('build', 'C1CC((', '-o', out);
      expect(bad.status).toBe(2);
      expect(bad.stderr).toMatch(/^conformark: cannot read SMILES "C1CC\(\(": .+\n$/);
      expect(existsSync(out)).toBe(false);
      const option = run('build', 'CC', '--conformers', 'many', '-o', out);
      expect(option.status).toBe(2);
      expect(option.stderr).toContain('--conformers expects an integer');
      expect(existsSync(out)).toBe(false);
    } finally {
      rmSync(dir, { recursive: true, force: true });
    }
  });

  it('conformark build -o - writes the SD file to standard output', () => {
    const r = run('build', 'CO', '--conformers', '1', '-o', '-');
    expect(r.status).toBe(0);
    expect(r.stdout.split('\n')[0]).toBe('CO conformer 1');
    expect(r.stdout.endsWith('$$$$\n')).toBe(true);
  });
});
