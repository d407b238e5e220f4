import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { spawnSync } from 'node:child_process';
import { mkdtempSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { parseText } from '../../src/io/parseText.js';

// runs the built binary: `npx tsc -p tsconfig.build.json` (or `npm test`) first
const run = (...args: string[]) => spawnSync('node', ['bin/conformark.js', ...args], { encoding: 'utf8' });

let dir = '';
let pdb = '';
const SERIAL0 = 6401; // serials deliberately far from positions
beforeAll(() => {
  dir = mkdtempSync(join(tmpdir(), 'conformark-selection-'));
  pdb = join(dir, 'glc.pdb');
  // our methyl glucoside example written as residue B/GLC601 with names element+position
  const [m] = parseText(readFileSync('examples/w3-methyl-glucoside.sdf', 'utf8'), { file: 'w3.sdf' });
  const lines = m!.atoms.map((a, i) => {
    const name = `${a.element}${i + 1}`.padEnd(3);
    const xyz = [0, 1, 2].map((k) => m!.coords[3 * i + k]!.toFixed(3).padStart(8)).join('');
    return `HETATM${String(SERIAL0 + i).padStart(5)}  ${name} GLC B 601    ${xyz}  1.00  0.00          ${a.element.padStart(2)}`;
  });
  writeFileSync(pdb, `${lines.join('\n')}\nEND\n`);
});
afterAll(() => rmSync(dir, { recursive: true, force: true }));

describe('selections on the command line', () => {
  it('inspect --json gives each atom its residue and serial', () => {
    const r = run('inspect', pdb, '--json');
    expect(r.status).toBe(0);
    const atom = JSON.parse(r.stdout).records[0].atoms[2];
    expect(atom.residue).toEqual({ name: 'GLC', number: 601, insertion: '', chain: 'B' });
    expect(atom.serial).toBe(SERIAL0 + 2);
  });

  it('chair --ring B/GLC601/ and newman --bond with #serials pick the same atoms as positions', () => {
    const byResidue = run('chair', pdb, '--ring', 'B/GLC601/', '--json');
    const byNumber = run('chair', pdb, '--ring', '1', '--json');
    expect(byResidue.status).toBe(0);
    expect(byResidue.stdout).toBe(byNumber.stdout);
    const serials = run('newman', pdb, '--bond', `#${SERIAL0 + 2}-#${SERIAL0 + 11}`, '--json');
    const positions = run('newman', pdb, '--bond', '3-12', '--json');
    expect(serials.status).toBe(0);
    expect(serials.stdout).toBe(positions.stdout);
    const qualified = run('newman', pdb, '--bond', 'B/GLC601/C3-/601/C12', '--json');
    expect(qualified.stdout).toBe(positions.stdout);
  });

  it('a serial that is only a position is an error naming the serial range', () => {
    const r = run('newman', pdb, '--bond', '#3-#12');
    expect(r.status).toBe(2);
    expect(r.stderr.trim()).toBe(`conformark: ${pdb}: no atom has serial 3 (serials in the record run ${SERIAL0}–${SERIAL0 + 26})`);
  });
});
