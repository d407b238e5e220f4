/**
 * End-to-end robustness of the built CLI (`npx tsc -p tsconfig.build.json` first): every broken file of
 * test/data/bad gives one line naming file and line, exit 2, nothing on stdout, and leaves an existing output
 * file byte for byte as it was; CRLF, BOM and tab files work; limits and bad selections have clear errors.
 * Tables run the built `main` in this process (`cliInProcess`, what bin/conformark.js calls) to keep the suite
 * fast on a loaded machine; argument parsing, stdin, protection of inputs and every command's output on
 * degenerate input also run through the binary itself (`cli`).
 */
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { linkSync, mkdirSync, mkdtempSync, readdirSync, readFileSync, rmSync, symlinkSync, writeFileSync, copyFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { spawnSync } from 'node:child_process';
import { gzipSync } from 'node:zlib';
import { COMMANDS } from '../../src/cli/commands/index.js';
import { cli, cliInProcess, degenerateXyz, leaks, unsafeMarkup } from './robustnessHelpers.js';

const BAD = 'test/data/bad';
const SENTINEL = 'sentinel: an older output that a failed run must not touch\n';

/** file → the one stderr line `inspect` prints (after `conformark: test/data/bad/`). */
const CORPUS: readonly (readonly [string, string])[] = [
  ['bad-bond.sdf', 'bad-bond.sdf:9: bond 2 refers to atom 4, but the record has 3 atoms'],
  ['bad-charge.sdf', 'bad-charge.sdf:10: charge given for atom 9, but the record has 3 atoms'],
  ['bad-conect-text.pdb', "bad-conect-text.pdb:5: expected atom serial numbers in CONECT, found 'two'"],
  ['bad-conect.pdb', 'bad-conect.pdb:5: CONECT refers to atom serial 99, which is not in the file'],
  ['bad-coords.pdb', "bad-coords.pdb:3: x coordinate 'x.957' is not a number (columns 31-38)"],
  ['few-bonds.sdf', 'few-bonds.sdf:4: counts line says 1 bond, but a bond line follows them (line 9)'],
  ['few-atoms.sdf', 'few-atoms.sdf:4: counts line says 2 atoms, but an atom line follows them (line 7)'],
  ['bad-counts.sdf', "bad-counts.sdf:4: expected a counts line (atoms, bonds, ..., V2000), found 'x  y  0  0  0  0  0  0  0  0999 V2000'"],
  ['blank.xyz', 'blank.xyz: the file is empty'],
  ['empty.xyz', 'empty.xyz: the file is empty'],
  ['extra-atoms.xyz', 'extra-atoms.xyz:6: more atom lines than the count line of frame 1 says (3)'],
  ['garbage.bin', 'garbage.bin:1: this is not a text file (NUL bytes or invalid UTF-8); expected XYZ, SDF/molfile or PDB text'],
  ['random.xyz', 'random.xyz:1: this is not a text file (NUL bytes or invalid UTF-8); expected XYZ, SDF/molfile or PDB text'],
  ['latin1.xyz', 'latin1.xyz:2: this is not a text file (NUL bytes or invalid UTF-8); expected XYZ, SDF/molfile or PDB text'],
  ['huge-count.xyz', 'huge-count.xyz:1: count line says 999999999999 atoms; the limit is 1000000 (option maxAtoms)'],
  ['infinite.xyz', "infinite.xyz:4: x coordinate '1e999' is not finite"],
  ['nan.sdf', "nan.sdf:6: x coordinate 'NaN' is not a number"],
  ['nan.xyz', "nan.xyz:4: x coordinate 'NaN' is not a number"],
  ['negative-count.xyz', "negative-count.xyz:1: expected an atom count, found '-3'"],
  ['no-count.xyz', "no-count.xyz:1: expected an atom count, found 'water'"],
  ['no-m-end.sdf', 'no-m-end.sdf:4: record ends before M  END'],
  ['not-a-number.xyz', "not-a-number.xyz:4: y coordinate 'abc' is not a number"],
  ['overlap.pdb', 'overlap.pdb:3: atoms A/HOH1/O (atom 1) and A/HOH1/H1 (atom 2) are 0.10 Å apart inside one residue, closer than 0.4 Å'],
  ['overlap.xyz', 'overlap.xyz:5: atoms 2 (H) and 3 (H) are 0.12 Å apart, closer than 0.4 Å'],
  ['short-line.xyz', "short-line.xyz:3: expected an element and x y z, found 'O 0.000 0.000'"],
  ['truncated-bonds.sdf', 'truncated-bonds.sdf:4: expected 2 bonds, found 1'],
  ['truncated.sdf', 'truncated.sdf:4: expected 3 atoms, found 2'],
  ['truncated.xyz', 'truncated.xyz:1: expected 3 atoms, found 2'],
  ['unknown-element.pdb', "unknown-element.pdb:3: unknown element 'XX' (columns 77-78)"],
  ['unknown-element.sdf', "unknown-element.sdf:6: unknown element 'Qq'"],
  ['unknown-element.xyz', "unknown-element.xyz:4: unknown element 'Qz'"],
  ['v3000-bad-bond.sdf', 'v3000-bad-bond.sdf:14: bond 2 refers to atom 5, which is not in the atom block'],
  ['v3000-huge-count.sdf', 'v3000-huge-count.sdf:6: counts line says 999999999999 atoms; the limit is 1000000 (option maxAtoms)'],
  ['v3000-truncated.sdf', 'v3000-truncated.sdf:16: the V3000 table ends without END CTAB'],
  ['v3000-wrong-count.sdf', 'v3000-wrong-count.sdf:6: expected 3 atoms, found 2'],
  ['wrong-count.sdf', 'wrong-count.sdf:4: expected 4 atoms, found 3'],
  ['wrong-count.xyz', 'wrong-count.xyz:1: expected 3 atoms, found 2'],
];

/** One broken file per reader and failure kind, also run through `newman` (record 1 is the bad one). */
const NEWMAN_CORPUS = ['empty.xyz', 'garbage.bin', 'latin1.xyz', 'huge-count.xyz', 'nan.sdf', 'v3000-truncated.sdf', 'bad-coords.pdb', 'overlap.xyz'];

let dir = '';
beforeAll(() => {
  dir = mkdtempSync(join(tmpdir(), 'conformark-robust-'));
});
afterAll(() => rmSync(dir, { recursive: true, force: true }));

/** A fresh folder holding a sentinel output file; returns both paths. */
function sentinelIn(name: string, file = 'out.txt'): { folder: string; out: string } {
  const folder = mkdtempSync(join(dir, `${name.replace(/\W/g, '_')}-`));
  const out = join(folder, file);
  writeFileSync(out, SENTINEL);
  return { folder, out };
}

/** The sentinel is unchanged and no temporary file was left beside it. */
function expectUntouched(folder: string, out: string): void {
  expect(readFileSync(out, 'utf8')).toBe(SENTINEL);
  expect(readdirSync(folder).filter((f) => f.endsWith('.tmp'))).toEqual([]);
}

describe('conformark on the bad-input corpus', () => {
  /** Files with a good record beside the bad one: inspect reports both and exits 1 (the bad one on stderr). */
  const PARTLY_GOOD = new Set(['extra-atoms.xyz', 'wrong-count.xyz']);

  it.each(CORPUS.filter(([f]) => !PARTLY_GOOD.has(f)))('conformark inspect %s -o FILE prints one line, exits 2 and keeps FILE', async (file, message) => {
    const { folder, out } = sentinelIn(file);
    const r = await cliInProcess(['inspect', `${BAD}/${file}`, '-o', out]);
    expect(r.stderr).toBe(`conformark: ${BAD}/${message}\n`);
    expect(r.status).toBe(2);
    expect(r.stdout).toBe('');
    expectUntouched(folder, out);
  });

  it.each(CORPUS.filter(([f]) => PARTLY_GOOD.has(f)))('conformark inspect %s -o FILE reports the good record, prints the bad one and exits 1', async (file, message) => {
    const { out } = sentinelIn(file);
    const r = await cliInProcess(['inspect', `${BAD}/${file}`, '-o', out]);
    expect(r.stderr).toBe(`conformark: ${BAD}/${message}\n`);
    expect(r.status).toBe(1);
    expect(readFileSync(out, 'utf8')).toContain(`  error: ${BAD}/${message}\n`);
  });

  it('conformark inspect one-bad-of-three.sdf -o FILE writes the two good records, prints the bad one and exits 1', async () => {
    const { out } = sentinelIn('one-bad-of-three.sdf');
    const r = await cliInProcess(['inspect', `${BAD}/one-bad-of-three.sdf`, '-o', out]);
    expect(r.stderr).toBe(`conformark: ${BAD}/one-bad-of-three.sdf:20: bond 2 refers to atom 7, but the record has 3 atoms\n`);
    expect(r.status).toBe(1);
    expect(readFileSync(out, 'utf8')).toContain(`record 2\n  error: ${BAD}/one-bad-of-three.sdf:20: bond 2 refers to atom 7`);
  });

  it.each(NEWMAN_CORPUS)('conformark newman %s --bond 1-2 -o FILE.svg prints the reader error and keeps FILE.svg', async (file) => {
    const { folder, out } = sentinelIn(file, 'figure.svg');
    const r = await cliInProcess(['newman', `${BAD}/${file}`, '--bond', '1-2', '-o', out]);
    expect(r.stderr).toBe(`conformark: ${BAD}/${CORPUS.find(([f]) => f === file)![1]}\n`);
    expect(r.status).toBe(2);
    expect(r.stdout).toBe('');
    expectUntouched(folder, out);
  });

  it.each(['good-bom-crlf-tabs.xyz', 'good-crlf.sdf', 'good-bom-crlf.pdb', 'good-water.sdf'])(
    'conformark inspect and newman read %s (BOM, CRLF, tabs are fine)',
    async (file) => {
      const inspect = await cliInProcess(['inspect', `test/data/${file}`, '--json']);
      expect(inspect.stderr).toBe('');
      expect(inspect.status).toBe(0);
      const report = JSON.parse(inspect.stdout) as { records: { atoms: { element: string }[]; bonds: unknown[] }[] };
      expect(report.records[0]!.atoms.map((a) => a.element)).toEqual(['O', 'H', 'H']);
      expect(report.records[0]!.bonds).toHaveLength(2);
      const newman = await cliInProcess(['newman', `test/data/${file}`, '--bond', '1-2', '--json']);
      expect(newman.status).toBe(0);
      expect(JSON.parse(newman.stdout)).toMatchObject({ front: { atom: 1, element: 'O' }, back: { atom: 2, element: 'H' } });
    },
  );
});

describe('conformark limits', () => {
  it('conformark inspect on a 10 MB single line stops with line-too-long at line 1 (file and stdin)', async () => {
    const path = join(dir, 'one-line.xyz');
    const line = `3 ${'x'.repeat(10 * 1024 * 1024)}\n`;
    writeFileSync(path, line);
    const r = await cli(['inspect', path]);
    expect(r.stderr).toBe(`conformark: ${path}:1: line is longer than 100000 characters\n`);
    expect(r.status).toBe(2);
    const piped = await cli(['inspect', '-'], { input: line });
    expect(piped.stderr).toBe('conformark: -:1: line is longer than 100000 characters\n');
    expect(piped.status).toBe(2);
  });

  it('conformark inspect on a gzip text bomb (400 MB of comment lines in 4,000 records) stops at the text limit under a 256 MB heap', async () => {
    // each record: a water with a 99,000-character comment; gzip members concatenated (RFC 1952 §2.2)
    const record = gzipSync(`3\n${'c'.repeat(99_000)}\nO 0 0 0\nH 0.96 0 0\nH -0.24 0.93 0\n`);
    const path = join(dir, 'bomb.xyz.gz');
    writeFileSync(path, Buffer.concat(Array.from({ length: 4000 }, () => record)));
    const bin = new URL('../../bin/conformark.js', import.meta.url).pathname;
    const r = spawnSync(process.execPath, ['--max-old-space-size=256', bin, 'inspect', path], { encoding: 'utf8' });
    // 64,000,000 characters at 99,000 per record: record 647 (its count line is line 5 × 646 + 1) passes the limit
    expect(r.stderr).toBe(`conformark: ${path}:${5 * 646 + 1}: record 647: more than 64000000 characters of titles and data fields in all records to hold at once (raise with --max-total-text, option maxTotalText)\n`);
    expect(r.status).toBe(2);
  }, 60_000);

  it('conformark newman - on a 600-model PDB from standard input streams it under a 96 MB heap (spooled, as a file is read); the spool is removed', () => {
    // 600 models × 1,000 atoms, CONECT after the last model (so the models cannot be released as they are read)
    const atom = (k: number) => {
      const [x, y, z] = [k === 1 ? 1.5 : 3 * (k % 20), (3 * Math.floor(k / 20)) % 60, 3 * Math.floor(k / 400)];
      return `HETATM${String(k + 1).padStart(5)}  C   LIG A${String(1 + Math.floor(k / 10)).padStart(4)}    ${x.toFixed(3).padStart(8)}${y.toFixed(3).padStart(8)}${z.toFixed(3).padStart(8)}  1.00  0.00           C  `;
    };
    const body = Array.from({ length: 1000 }, (_, k) => atom(k)).join('\n');
    const models = Array.from({ length: 600 }, (_, m) => `MODEL     ${String(m + 1).padStart(4)}\n${body}\nENDMDL`);
    const input = gzipSync(`${models.join('\n')}\nCONECT    1    2\nEND\n`);
    const tmp = join(dir, 'spool-tmp');
    mkdirSync(tmp);
    const bin = new URL('../../bin/conformark.js', import.meta.url).pathname;
    const r = spawnSync(process.execPath, ['--max-old-space-size=96', bin, 'newman', '-', '--bond', '1-2'], { input, encoding: 'utf8', env: { ...process.env, TMPDIR: tmp } });
    expect(r.stderr).toBe('');
    expect(r.status).toBe(0);
    expect(r.stdout).toMatch(/^<svg /);
    expect(readdirSync(tmp)).toEqual([]);
  }, 60_000);

  it('conformark inspect on an SD record with a 1.2 MB data field stops with data-too-long at the line it passes the cap', async () => {
    const path = join(dir, 'big-field.sdf');
    const water = readFileSync('test/data/good-water.sdf', 'utf8');
    writeFileSync(path, water.replace('$$$$', `> <notes>\n${`${'x'.repeat(999)}\n`.repeat(1200)}\n$$$$`));
    const r = await cliInProcess(['inspect', path]);
    const line = water.split('\n').findIndex((l) => l === '$$$$') + 1 + 1000; // the field name line, then 1000 lines of 1000 characters
    expect(r.stderr).toBe(`conformark: ${path}:${line}: the SD data fields of record 1 are longer than 1000000 characters (10 × option maxLineLength)\n`);
    expect(r.status).toBe(2);
  });

  it('conformark --max-records / --max-total-atoms / --max-atoms / --max-line-length stop with the limit named', async () => {
    const path = join(dir, 'three.xyz');
    writeFileSync(path, '3\nw1\nO 0 0 0\nH 0.96 0 0\nH -0.24 0.93 0\n'.repeat(3));
    const cases: [string[], string][] = [
      [['inspect', path, '--max-records', '2'], `${path}:11: more than 2 records (option maxRecords)`],
      [['--max-total-atoms', '5', 'inspect', path], `${path}:6: record 2: more than 5 atoms in all records to hold at once (raise with --max-total-atoms, option maxTotalAtoms)`],
      [['newman', path, '--bond', '1-2', '--max-atoms', '2'], `${path}:1: count line says 3 atoms; the limit is 2 (option maxAtoms)`],
      [['newman', path, '--bond', '1-2', '--max-line-length', '5'], `${path}:3: line is longer than 5 characters`],
      [['--max-total-text', '5', 'inspect', path], `${path}:11: record 3: more than 5 characters of titles and data fields in all records to hold at once (raise with --max-total-text, option maxTotalText)`],
      [['inspect', path, '--max-records', 'lots'], '--max-records expects a whole number from 1, got "lots"'],
    ];
    for (const [args, message] of cases) {
      const r = await cliInProcess(args);
      expect(r.stderr).toBe(`conformark: ${message}\n`);
      expect(r.status).toBe(2);
      expect(r.stdout).toBe('');
    }
    expect((await cliInProcess(['inspect', path, '--max-records', '3'])).status).toBe(0);
  });
});

describe('conformark bad selections and usage', () => {
  const water = 'test/data/good-water.sdf';
  /** arguments → the exact stderr line (without `conformark: `). */
  const CASES: readonly (readonly [string, readonly string[], string])[] = [
    ['atom out of range', ['newman', water, '--bond', '1-9'], `${water}: atom 9 does not exist (the record has 3 atoms)`],
    ['atoms not bonded', ['newman', water, '--bond', '2-3'], `${water}: atoms 2 and 3 are not bonded`],
    ['record out of range', ['newman', water, '--bond', '1-2', '--record', '4'], `${water}: record 4 does not exist (the file has 1 record)`],
    ['record not a number', ['newman', water, '--bond', '1-2', '--record', 'two'], '--record expects a whole number from 1, got "two"'],
    ['unparseable selection', ['newman', water, '--bond', '1--2'], `${water}: bond '1--2' should be two atoms joined by '-', e.g. 3-4`],
    ['unknown theme', ['newman', water, '--bond', '1-2', '--theme', 'neon'], 'unknown theme "neon" (built-in: column, projector, contrast; or give a path to a .json file)'],
    ['no ring to draw', ['chair', water], `${water}: no ring to draw in record 1`],
    ['missing file', ['inspect', 'no/such/file.xyz'], 'no/such/file.xyz: no such file'],
    ['a folder as input', ['inspect', 'test/data'], 'test/data: is a folder, not a file'],
    ['unknown option value', ['newman', water, '--bond', '1-2', '--angles', 'wobbly'], '--angles expects one of true, ideal, got "wobbly"'],
    ['unknown figure format', ['newman', water, '--bond', '1-2', '-o', 'figure.gif'], 'cannot tell the figure format from "figure.gif": use .svg, .png or .pdf'],
    ['unknown command', ['inpsect', water], "unknown command 'inpsect' (did you mean inspect?); see conformark --help"],
    ['unknown option', ['inspect', water, '--jsn'], "unknown option '--jsn' (did you mean --json?); see conformark inspect --help"],
    ['missing argument', ['inspect'], 'missing the <file> argument; see conformark inspect --help'],
    ['missing required option', ['newman', water], '--bond <A-B> is required; see conformark newman --help'],
    ['option without its value', ['newman', water, '--bond'], '--bond needs a value; see conformark newman --help'],
    ['no command', [], `no command given (commands: ${[...COMMANDS.keys()].join(', ')}); see conformark --help`],
    ['user error with --debug: still one line', ['--debug', 'newman', water, '--bond', '1-9'], `${water}: atom 9 does not exist (the record has 3 atoms)`],
    ['--debug after the command', ['newman', water, '--bond', '2-3', '--debug'], `${water}: atoms 2 and 3 are not bonded`],
  ];

  it.each(CASES)('%s: one exact line on stderr, nothing on stdout, exit 2', async (_what, args, message) => {
    const r = await cliInProcess(args);
    expect(r.stderr).toBe(`conformark: ${message}\n`);
    expect(r.stdout).toBe('');
    expect(r.status).toBe(2);
  });

  it.concurrent.each(CASES.filter(([what]) => /command|debug|option/.test(what)))('%s, through the binary: the same line', async (_what, args, message) => {
    const r = await cli(args);
    expect(r.stderr).toBe(`conformark: ${message}\n`);
    expect(r.stdout).toBe('');
    expect(r.status).toBe(2);
  });

  it('--debug before or after the command leaves a good run unchanged', async () => {
    const plain = await cli(['newman', water, '--bond', '1-2', '--json']);
    const before = await cli(['--debug', 'newman', water, '--bond', '1-2', '--json']);
    const after = await cli(['newman', water, '--bond', '1-2', '--json', '--debug']);
    expect(plain.status).toBe(0);
    expect(before).toEqual(plain);
    expect(after).toEqual(plain);
  });
});

describe.concurrent('conformark never overwrites its input', () => {
  it('conformark inspect -o refuses the input itself, through ./, .., an absolute path, a symlink and a hard link', async () => {
    const folder = mkdtempSync(join(dir, 'self-'));
    const input = join(folder, 'in.xyz');
    copyFileSync('test/data/good-bom-crlf-tabs.xyz', input);
    const bytes = readFileSync(input);
    symlinkSync(input, join(folder, 'soft.xyz'));
    linkSync(input, join(folder, 'hard.xyz'));
    const outputs = ['in.xyz', './in.xyz', `../${folder.split('/').pop()}/in.xyz`, input, 'soft.xyz', 'hard.xyz'];
    for (const out of outputs) {
      const r = await cli(['inspect', 'in.xyz', '--json', '-o', out], { cwd: folder });
      expect(r.stderr).toBe(`conformark: ${out}: refusing to overwrite the input file\n`);
      expect(r.status).toBe(2);
    }
    const viaLink = await cli(['newman', 'soft.xyz', '--bond', '1-2', '--json', '-o', 'in.xyz'], { cwd: folder });
    expect(viaLink.status).toBe(2);
    expect(readFileSync(input)).toEqual(bytes);
    expect(readdirSync(folder).sort()).toEqual(['hard.xyz', 'in.xyz', 'soft.xyz']);
  });

  it('conformark -o a folder, or a path through a file, is a one-line error', async () => {
    const { folder, out } = sentinelIn('folder-out');
    const water = 'test/data/good-water.sdf';
    const intoFolder = await cli(['inspect', water, '-o', folder]);
    expect(intoFolder.stderr).toBe(`conformark: ${folder}: is a folder; give a file name to write to\n`);
    const throughFile = await cli(['inspect', water, '-o', join(out, 'x.txt')]);
    expect(throughFile.stderr).toBe(`conformark: ${join(out, 'x.txt')}: cannot write: a part of the path is not a folder\n`);
    expect(throughFile.status).toBe(2);
    expectUntouched(folder, out);
  });

  it('conformark batch and ensemble -d into the folder that holds the input write beside it and keep it', async () => {
    const folder = mkdtempSync(join(dir, 'beside-'));
    const input = join(folder, 'frames.xyz');
    writeFileSync(input, degenerateXyz());
    const bytes = readFileSync(input);
    const batch = await cli(['batch', input, '-d', folder, '--tables', 'csv']);
    expect(batch.status).toBe(0);
    const ensemble = await cli(['ensemble', input, '-d', folder, '--json']);
    expect(ensemble.status).toBe(0);
    expect(readFileSync(input)).toEqual(bytes);
    expect(readdirSync(folder)).toContain('manifest.json');
  });
});

describe('conformark trajectory never overwrites its input', () => {
  it('conformark trajectory puckering.csv -d . refuses to replace the input with its table', async () => {
    const folder = mkdtempSync(join(dir, 'trajectory-'));
    const frames = degenerateXyz().split('\n').slice(6, 34).join('\n'); // the two flat six-ring frames
    writeFileSync(join(folder, 'puckering.csv'), `${frames}\n`);
    const r = await cliInProcess(['trajectory', join(folder, 'puckering.csv'), '--ring', '1', '-d', folder]);
    expect(r.stderr).toBe(`conformark: ${join(folder, 'puckering.csv')}: refusing to overwrite the input file\n`);
    expect(r.status).toBe(2);
    expect(readFileSync(join(folder, 'puckering.csv'), 'utf8')).toBe(`${frames}\n`);
    expect(readdirSync(folder).filter((f) => f.endsWith('.tmp'))).toEqual([]);
  });
});

describe('conformark on degenerate geometry', () => {
  let input = '';
  beforeAll(() => {
    input = join(dir, 'degenerate.xyz');
    writeFileSync(input, degenerateXyz());
  });

  const RUNS: readonly (readonly string[])[] = [
    ['inspect', '--json'],
    ['inspect'],
    ['ensemble', '--json'],
    ['newman', '--bond', '2-3', '--record', '1'],
    ['newman', '--bond', '2-3', '--record', '1', '--json'],
    ['newman', '--bond', '1-2', '--record', '2', '--couplings'],
    ['newman', '--bond', '1-2', '--record', '3', '--json', '--couplings'],
    ['newman', '--bond', '1-2', '--record', '4'],
    ['newman', '--bond', '1-2', '--record', '5', '--json'],
    ['chair', '--record', '2'],
    ['chair', '--record', '3', '--json'],
    ['chair', '--record', '4', '--view', 'projected'],
  ];

  it('conformark trajectory on flat and nearly flat six-rings writes clean tables and figures', async () => {
    const out = mkdtempSync(join(dir, 'trajectory-degenerate-'));
    const frames = degenerateXyz().split('\n').slice(6, 34).join('\n');
    writeFileSync(join(out, 'flat.xyz'), `${frames}\n`);
    const r = await cliInProcess(['trajectory', join(out, 'flat.xyz'), '--ring', '1', '-d', join(out, 'result')]);
    expect(r.status).toBe(0);
    for (const file of readdirSync(join(out, 'result'))) {
      const text = readFileSync(join(out, 'result', file), 'utf8');
      expect(leaks(text), file).toEqual([]);
      expect(unsafeMarkup(text), file).toEqual([]);
    }
  });

  it.each(RUNS)('conformark %s … writes no NaN, Infinity or undefined and says what is wrong', async (command, ...rest) => {
    const r = await cliInProcess([command!, input, ...rest]);
    expect(r.status).toBe(0);
    expect(leaks(r.stdout)).toEqual([]);
    expect(unsafeMarkup(r.stdout)).toEqual([]);
    if (rest.includes('--json')) expect(() => JSON.parse(r.stdout)).not.toThrow();
    for (const line of r.stderr.split('\n').filter(Boolean)) expect(line).toMatch(/^conformark: (warning: |wrote )/);
  });

  it('conformark newman on collinear torsion atoms warns that the azimuth is undefined', async () => {
    const r = await cliInProcess(['newman', input, '--bond', '2-3', '--record', '1', '--json']);
    expect(r.stderr).toContain('conformark: warning: the bond C2-H1 lies on the C2-C3 axis: its azimuth and torsions are undefined');
    expect(leaks(r.stdout)).toEqual([]);
  });

  it('conformark batch on degenerate geometry writes clean figures, tables and manifest', async () => {
    const out = mkdtempSync(join(dir, 'batch-degenerate-'));
    const r = await cli(['batch', input, '-d', out]);
    expect(r.status).toBe(0);
    // the flat frames make the file read as 2D: one 2D warning replaces the per-ring "nearly planar" ones
    expect(r.stderr).toContain('2D coordinates: conformations need 3D input');
    for (const file of readdirSync(out)) {
      const text = readFileSync(join(out, file), 'utf8');
      expect(leaks(text), file).toEqual([]);
      expect(unsafeMarkup(text), file).toEqual([]);
    }
  });
});
