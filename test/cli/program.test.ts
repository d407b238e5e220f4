import { describe, expect, it } from 'vitest';
import { spawnSync } from 'node:child_process';
import { buildProgram } from '../../src/cli/main.js';

// the built binary: `npx tsc -p tsconfig.build.json` (or `npm test`) first
const run = (...args: string[]) => spawnSync('node', ['bin/conformark.js', ...args], { encoding: 'utf8' });

describe('buildProgram', () => {
  it('buildProgram registers every command the README documents', () => {
    const names = buildProgram().commands.map((c) => c.name()).sort();
    expect(names).toEqual(['batch', 'build', 'chair', 'demo', 'ensemble', 'explore', 'inspect', 'newman', 'trajectory']);
  });

  it('buildProgram gives each command the options the README names', () => {
    const options = (name: string) =>
      buildProgram().commands.find((c) => c.name() === name)!.options.map((o) => o.long);
    expect(options('inspect')).toEqual(expect.arrayContaining(['--json', '--couplings']));
    expect(options('newman')).toEqual(expect.arrayContaining(['--bond', '--json', '--output', '--angles', '--up', '--mark', '--hydrogens', '--couplings', '--theme', '--id-prefix']));
    expect(options('chair')).toEqual(expect.arrayContaining(['--ring', '--view', '--output']));
    expect(options('batch')).toEqual(expect.arrayContaining(['--dir', '--bonds', '--formats']));
    expect(options('ensemble')).toEqual(expect.arrayContaining(['--temperature', '--json']));
    expect(options('trajectory')).toEqual(expect.arrayContaining(['--ring', '--dir', '--stride', '--from', '--to', '--timestep', '--torsion']));
    expect(options('build')).toEqual(expect.arrayContaining(['--output', '--conformers', '--seed', '--ring-forms']));
    expect(options('demo')).toEqual(expect.arrayContaining(['--dir']));
    expect(options('explore')).toEqual(expect.arrayContaining(['--output', '--title', '--max-size', '--temperature', '--energy-field', '--energy-unit', '--theme', '--angles', '--hydrogens']));
  });
});

describe('conformark (built binary)', () => {
  it('conformark --version prints the version and exits 0', () => {
    const r = run('--version');
    expect(r.status).toBe(0);
    expect(r.stdout.trim()).toMatch(/^\d+\.\d+\.\d+$/);
  });

  it('conformark with an unknown command prints one error line and exits 2', () => {
    const r = run('draw', 'x.xyz');
    expect(r.status).toBe(2);
    expect(r.stdout).toBe('');
    expect(r.stderr.trim().split('\n')[0]).toMatch(/unknown command 'draw'/);
  });

  it('conformark newman without --bond says which option is missing and exits 2', () => {
    const r = run('newman', 'examples/w3-methyl-glucoside.sdf');
    expect(r.status).toBe(2);
    expect(r.stderr).toMatch(/--bond/);
  });
});
