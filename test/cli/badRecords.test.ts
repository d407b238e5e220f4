import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { spawnSync } from 'node:child_process';
import { mkdtempSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';

// runs the built binary: `npx tsc -p tsconfig.build.json` (or `npm test`) first
const run = (...args: string[]) => spawnSync('node', ['bin/conformark.js', ...args], { encoding: 'utf8' });

let dir = '';
let file = '';
/** The four glucoside conformers with atom 2 of record 2 moved to 0.38 Å from atom 1 (line 79). */
beforeAll(() => {
  dir = mkdtempSync(join(tmpdir(), 'conformark-badrec-'));
  const lines = readFileSync('examples/w3-methyl-glucoside.sdf', 'utf8').split('\n');
  // record 2 starts at line 73; its atom block at line 77, so atom 1 is line 77 and atom 2 line 78
  const first = lines[76]!.slice(0, 30).trim().split(/\s+/).map(Number);
  lines[77] = `${[first[0]! + 0.38, first[1]!, first[2]!].map((v) => v.toFixed(4).padStart(10)).join('')}${lines[77]!.slice(30)}`;
  file = join(dir, 'one-overlap.sdf');
  writeFileSync(file, lines.join('\n'));
});
afterAll(() => rmSync(dir, { recursive: true, force: true }));

describe('commands carry on past a bad record they do not need', () => {
  it('conformark inspect reports the bad record as an error line, analyses the other three and exits 1', () => {
    const r = run('inspect', file);
    expect(r.status).toBe(1);
    expect(r.stderr).toBe(`conformark: ${file}:78: atoms 1 (C) and 2 (O) are 0.38 Å apart, closer than 0.4 Å\n`);
    const lines = r.stdout.split('\n');
    expect(lines[0]).toBe(`${file} (sdf): 4 records (1 with an error, not analysed)`);
    expect(r.stdout).toContain(`\n\nrecord 2\n  error: ${file}:78: atoms 1 (C) and 2 (O) are 0.38 Å apart, closer than 0.4 Å\n\nrecord 3  "W3 methyl beta-D-glucopyranoside conformer 3"\n`);
    const doc = JSON.parse(run('inspect', file, '--json').stdout);
    expect(doc.records.map((x: { index: number }) => x.index)).toEqual([1, 3, 4]);
    expect(doc.errors).toEqual([{ record: 2, code: 'overlapping-atoms', file, line: 78, message: 'atoms 1 (C) and 2 (O) are 0.38 Å apart, closer than 0.4 Å' }]);
  });

  it('conformark newman --record 3 and chair --record 3 read past a bad record 2; --record 2 fails with its error (exit 2)', () => {
    const newman = run('newman', file, '--bond', '3-4', '--record', '3', '--json');
    expect(newman.status).toBe(0);
    expect(JSON.parse(newman.stdout).front.atom).toBe(3);
    const chair = run('chair', file, '--record', '3', '--json');
    expect(chair.status).toBe(0);
    expect(JSON.parse(chair.stdout).record).toBe(3);
    for (const args of [['newman', file, '--bond', '3-4'], ['chair', file]]) {
      const bad = run(...args, '--record', '2');
      expect(bad.status).toBe(2);
      expect(bad.stderr).toBe(`conformark: ${file}:78: atoms 1 (C) and 2 (O) are 0.38 Å apart, closer than 0.4 Å\n`);
    }
  });

  it('conformark newman --record 9 past the end still says how many records the file has, bad ones counted', () => {
    const r = run('newman', file, '--bond', '3-4', '--record', '9');
    expect(r.status).toBe(2);
    expect(r.stderr).toBe(`conformark: ${file}: record 9 does not exist (the file has 4 records)\n`);
  });
});
