import { describe, expect, it } from 'vitest';
import { spawnSync } from 'node:child_process';

// runs the built binary: `npx tsc -p tsconfig.build.json` (or `npm test`) first
const run = (...args: string[]) => spawnSync('node', ['bin/conformark.js', ...args], { encoding: 'utf8' });
// made-up geometry from scripts/fixtures/ring_scope_structures.py
const CYSTINE = 'test/data/structures/cystine-loop.pdb';
const ZINC = 'test/data/structures/zinc-loop.pdb';
const SODIUM = 'test/data/structures/sodium-acetate.xyz';

describe('conformark inspect: rings that are not rings', () => {
  it('conformark inspect lists a disulfide loop as not analysed, and --ss-rings with --max-ring-size analyses it', () => {
    const r = run('inspect', CYSTINE);
    expect(r.status).toBe(0);
    expect(r.stdout.split('\n').slice(3)).toEqual([
      '  14 atoms · 14 bonds perceived from coordinates · 0 rings (+1 not analysed)',
      '  not analysed: 14-atom ring through the S–S bond A/CYS1/SG (atom 1)–A/CYS4/SG (atom 14): a disulfide loop, listed but not analysed (--ss-rings, option disulfideRings, analyses it)',
      '',
    ]);
    expect(run('inspect', '--ss-rings', CYSTINE).stdout).toContain('not analysed: 14-atom ring: larger than 12 atoms');
    const both = run('inspect', '--ss-rings', '--max-ring-size', '14', CYSTINE, '--json');
    expect(JSON.parse(both.stdout).records[0].rings[0].size).toBe(14);
  });

  it('conformark inspect keeps zinc contacts as coordination bonds that close no ring; --metal-rings closes the chelate', () => {
    const r = run('inspect', ZINC, '--json');
    expect(r.status).toBe(0);
    const record = JSON.parse(r.stdout).records[0];
    expect(record.bonds.filter((b: { coordination: boolean }) => b.coordination).map((b: { atoms: number[] }) => b.atoms)).toEqual([[1, 15], [14, 15]]);
    expect(record.rings.map((x: { atoms: number[] }) => x.atoms)).toEqual([[16, 17, 18, 19, 20]]);
    expect(record.setAsideRings).toEqual([]);
    const text = run('inspect', ZINC).stdout;
    expect(text).toContain('  20 atoms · 20 bonds perceived from coordinates (2 to metals) · 1 ring\n');
    const chelate = JSON.parse(run('inspect', ZINC, '--metal-rings', '--json').stdout).records[0];
    expect(chelate.rings).toHaveLength(1);
    expect(chelate.setAsideRings.map((x: { size: number; reason: string }) => [x.size, x.reason])).toEqual([[15, 'too-large']]);
  });

  it('conformark inspect bonds Na+ to the carboxylate oxygens (2.40, 2.44 Å) but not to the carbon 2.79 Å away', () => {
    const record = JSON.parse(run('inspect', SODIUM, '--json').stdout).records[0];
    expect(record.bonds.filter((b: { atoms: number[] }) => b.atoms.includes(8)).map((b: { atoms: number[] }) => b.atoms)).toEqual([[3, 8], [4, 8]]);
    expect(record.rings).toEqual([]);
    expect(JSON.parse(run('inspect', SODIUM, '--metal-rings', '--json').stdout).records[0].rings[0].atoms).toEqual([2, 3, 8, 4]);
  });

  it('conformark --max-ring-size below 3 is a usage error (exit 2, one line)', () => {
    const r = run('inspect', '--max-ring-size', '2', CYSTINE);
    expect(r.status).toBe(2);
    expect(r.stderr).toBe('conformark: --max-ring-size expects a whole number from 3, got "2"\n');
  });
});
