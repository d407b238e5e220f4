import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { mkdtempSync, writeFileSync, readFileSync } from 'node:fs';
import { spawnSync } from 'node:child_process';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { gzipSync } from 'node:zlib';
import { readRecords, readRecordsSettled } from '../../src/io/readRecords.js';
import { readFrames } from '../../src/io/readFrames.js';
import { parseText } from '../../src/io/parseText.js';
import { LineSplitter } from '../../src/io/lines.js';
import { detectFormat } from '../../src/io/detectFormat.js';
import { ParseError } from '../../src/model/errors.js';
import type { Molecule } from '../../src/model/molecule.js';

const dir = mkdtempSync(join(tmpdir(), 'cfm-io-'));
const data = join(import.meta.dirname, '../data');
const frame = (k: number) => `3\nframe ${k} E=${-k}.5\nO 0 0 ${k}\nH 0.957 0 ${k}\nH -0.24 0.927 ${k}\n`;
const TRAJ = Array.from({ length: 50 }, (_, k) => frame(k + 1)).join('');

async function collect<T>(it: AsyncIterable<T>): Promise<T[]> {
  const out: T[] = [];
  for await (const x of it) out.push(x);
  return out;
}
const brief = (m: Molecule) => [m.title, m.source.index, m.source.line, [...m.coords]];

describe('readRecords', () => {
  it('readRecords(path.xyz.gz) gunzips transparently and equals parseText', async () => {
    writeFileSync(join(dir, 't.xyz.gz'), gzipSync(TRAJ));
    const mols = await collect(readRecords(join(dir, 't.xyz.gz')));
    expect(mols.map(brief)).toEqual(parseText(TRAJ, { file: 't.xyz' }).map(brief));
    expect(mols[0]!.source.file).toBe(join(dir, 't.xyz.gz'));
  });

  it('readRecords(gzip data under another name) is detected by its magic bytes and sniffed', async () => {
    writeFileSync(join(dir, 'noext'), gzipSync(readFileSync(join(data, 'good-water.sdf'))));
    const [m] = await collect(readRecords(join(dir, 'noext')));
    expect(m!.source.format).toBe('sdf');
    expect(m!.bonds).toHaveLength(2);
  });

  it('readRecords(damaged gzip) is a ParseError, not a zlib exception', async () => {
    const gz = gzipSync(TRAJ);
    writeFileSync(join(dir, 'cut.xyz.gz'), gz.subarray(0, gz.length - 30));
    await expect(collect(readRecords(join(dir, 'cut.xyz.gz')))).rejects.toThrow(ParseError);
  });

  it('readRecords(path, {onError}) reports a bad record and goes on; without it the first one throws', async () => {
    writeFileSync(join(dir, 'mixed.xyz'), frame(1) + '3\nbad\nO 0 0 0\nH x 0 0\nH 1 1 1\n' + frame(3));
    const errors: string[] = [];
    const mols = await collect(readRecords(join(dir, 'mixed.xyz'), { onError: (e) => errors.push(e.message) }));
    expect(mols.map((m) => m.source.index)).toEqual([1, 3]);
    expect(errors).toEqual([`${join(dir, 'mixed.xyz')}:9: x coordinate 'x' is not a number`]);
    await expect(collect(readRecords(join(dir, 'mixed.xyz')))).rejects.toThrow("x coordinate 'x' is not a number");
  });

  it('readRecordsSettled(path, {maxRecords}) stops with a fatal error after the limit', async () => {
    writeFileSync(join(dir, 't.xyz'), TRAJ);
    const got = await collect(readRecordsSettled(join(dir, 't.xyz'), { maxRecords: 2 }));
    expect(got.map((r) => (r.ok ? 'ok' : `${r.fatal} ${r.error.issues[0]!.line} ${r.error.issues[0]!.message}`))).toEqual([
      'ok', 'ok', 'true 11 more than 2 records (option maxRecords)',
    ]);
  });

  it('readRecordsSettled(path, {maxLineLength}) refuses a too-long line with its number', async () => {
    writeFileSync(join(dir, 'long.xyz'), `${frame(1)}3\n${'x'.repeat(5000)}\n`);
    const got = await collect(readRecordsSettled(join(dir, 'long.xyz'), { maxLineLength: 1000 }));
    const last = got.at(-1)!;
    expect(last.ok ? null : [last.error.code, last.error.issues[0]!.line, last.error.issues[0]!.message]).toEqual([
      'line-too-long', 7, 'line is longer than 1000 characters',
    ]);
  });

  it('readRecords(path, {maxAtoms}) limits atoms per record', async () => {
    writeFileSync(join(dir, 't.xyz'), TRAJ);
    await expect(collect(readRecords(join(dir, 't.xyz'), { maxAtoms: 2 }))).rejects.toThrow(
      'count line says 3 atoms; the limit is 2 (option maxAtoms)',
    );
  });

  it('readRecords("-") reads standard input and sniffs the format (child process)', () => {
    const sdf = readFileSync(join(data, 'good-water.sdf'));
    const script = `import { readRecords } from './src/io/readRecords.ts';
      for await (const m of readRecords('-')) console.log(m.source.format, m.title, m.atoms.length, m.bonds.length);`;
    const run = spawnSync(process.execPath, ['--import', 'tsx', '--input-type=module', '-e', script], {
      input: gzipSync(sdf),
      cwd: join(import.meta.dirname, '../..'),
      encoding: 'utf8',
    });
    expect(run.stderr).toBe('');
    expect(run.stdout).toBe('sdf water 3 2\n');
  });
});

describe('readRecords(standard input, PDB)', () => {
  it('readRecords("-") on a multi-model PDB with CONECT at the end gives what reading the file gives (spooled to a private file)', () => {
    const model = (m: number) => `MODEL        ${m}\nHETATM    1  O   HOH A   1       0.000   0.000   0.${m}00  1.00  0.00           O\nHETATM    2  H1  HOH A   1       0.957   0.000   0.000  1.00  0.00           H\nHETATM    3  H2  HOH A   1      -0.240   0.927   0.000  1.00  0.00           H\nENDMDL\n`;
    const pdb = `${[1, 2, 3].map(model).join('')}CONECT    1    2    3\nEND\n`;
    writeFileSync(join(dir, 'three.pdb'), pdb);
    const script = `import { readRecords } from './src/io/readRecords.ts';
      for await (const m of readRecords(process.argv[1])) console.log(m.source.file, m.source.index, m.source.line, m.atoms.length, JSON.stringify(m.bonds), m.coords[2]);`;
    const run = (arg: string, input?: string) => spawnSync(process.execPath, ['--import', 'tsx', '--input-type=module', '-e', script, arg], { input, cwd: join(import.meta.dirname, '../..'), encoding: 'utf8' });
    const piped = run('-', pdb);
    const file = run(join(dir, 'three.pdb'));
    expect(piped.stderr).toBe('');
    expect(piped.stdout.split('\n').filter(Boolean)).toHaveLength(3);
    expect(piped.stdout).toBe(file.stdout.split(join(dir, 'three.pdb')).join('-'));
  });
});

describe('readFrames', () => {
  it('readFrames(path) yields index, line, coords, title and properties of every frame', async () => {
    writeFileSync(join(dir, 't.xyz'), TRAJ);
    const seen = [];
    for await (const f of readFrames(join(dir, 't.xyz'))) seen.push([f.index, f.line, f.title, f.properties.E, f.coords[2]]);
    expect(seen).toHaveLength(50);
    expect(seen[49]).toEqual([50, 246, 'frame 50 E=-50.5', '-50.5', 50]);
  });

  it('readFrames(path, {reuse}) recycles coordinate buffers of consumed frames, values intact', async () => {
    const big = Array.from({ length: 30_000 }, (_, k) => frame(k + 1)).join(''); // more than one 1 MiB chunk
    writeFileSync(join(dir, 'big.xyz'), big);
    const buffers = new Set<Float64Array>();
    let n = 0;
    let wrong = 0;
    for await (const f of readFrames(join(dir, 'big.xyz'), { reuse: true })) {
      buffers.add(f.coords);
      n++;
      if (f.coords[2] !== f.index || f.coords[8] !== f.index) wrong++;
    }
    expect(n).toBe(30_000);
    expect(wrong).toBe(0);
    expect(buffers.size).toBeLessThan(n - 5_000); // frames of the second chunk reuse the first chunk's buffers
  });
});

describe('LineSplitter', () => {
  it('LineSplitter gives the same lines for any chunking of the bytes (CRLF, UTF-8 split mid-character)', () => {
    const text = 'a\r\nβγ line\n\nlast é';
    const bytes = new TextEncoder().encode(text);
    fc.assert(
      fc.property(fc.uniqueArray(fc.integer({ min: 1, max: bytes.length - 1 }), { maxLength: 6 }), (cuts) => {
        const s = new LineSplitter('f', 100);
        const points = [0, ...cuts.sort((a, b) => a - b), bytes.length];
        const lines: string[] = [];
        for (let k = 0; k + 1 < points.length; k++) lines.push(...s.pushBytes(bytes.subarray(points[k]!, points[k + 1]!)));
        lines.push(...s.end());
        expect(lines).toEqual(['a', 'βγ line', '', 'last é']);
        expect(s.lastLine).toBe(4);
      }),
      { seed: 7, numRuns: 200 },
    );
  });

  it('LineSplitter.pushBytes(invalid UTF-8) is one binary-input error', () => {
    const s = new LineSplitter('f.xyz', 100);
    expect(() => s.pushBytes(Uint8Array.from([0x33, 0x0a, 0xff, 0xfe]))).toThrow(
      'f.xyz:2: this is not a text file (NUL bytes or invalid UTF-8); expected XYZ, SDF/molfile or PDB text',
    );
  });
});

describe('detectFormat', () => {
  it('detectFormat(path) uses the extension, .gz stripped', () => {
    expect(['a.xyz', 'b.SDF', 'c.mol', 'd.sd', 'e.pdb.gz', 'f.ent', 'g.sdf.gz'].map((p) => detectFormat(p))).toEqual([
      'xyz', 'sdf', 'sdf', 'sdf', 'pdb', 'pdb', 'sdf',
    ]);
  });

  it('detectFormat("-", head) sniffs XYZ, molfile and PDB content, and refuses anything else', () => {
    expect(detectFormat('-', '3\nwater\nO 0 0 0\n')).toBe('xyz');
    expect(detectFormat('-', readFileSync(join(data, 'good-water.sdf'), 'utf8'))).toBe('sdf');
    expect(detectFormat('data.txt', readFileSync(join(data, 'good-water.pdb'), 'utf8'))).toBe('pdb');
    expect(() => detectFormat('notes.txt', 'hello world\n')).toThrow(/cannot tell the format/);
  });
});
