import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { mkdtempSync, readFileSync, rmSync, writeFileSync, existsSync } from 'node:fs';
import { gzipSync } from 'node:zlib';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { analyzeTrajectory } from '../../src/api/trajectory/trajectory.js';
import { ConformarkError } from '../../src/model/errors.js';
import { fiveRingWalk, sixRingWalk, walkXyz, type WalkFrame } from '../helpers/puckerWalk.js';

let dir: string;
const six = sixRingWalk();
const five = fiveRingWalk();
const angleDiff = (a: number, b: number) => Math.abs(((a - b + 540) % 360) - 180);

function csvRows(path: string): Record<string, string>[] {
  const [head, ...lines] = readFileSync(path, 'utf8').trim().split('\n');
  const names = head!.split(',');
  // descriptors with a comma are quoted: split on commas outside quotes
  return lines.map((l) => {
    const cells = l.match(/("([^"]|"")*"|[^,]*)(,|$)/g)!.map((c) => c.replace(/,$/, '').replace(/^"|"$/g, ''));
    return Object.fromEntries(names.map((n, i) => [n, cells[i] ?? '']));
  });
}

/** Occupancy, transitions and runs of a planned walk, counted here independently. */
function expected(frames: readonly WalkFrame[]) {
  const counts: Record<string, number> = {};
  const transitions: Record<string, Record<string, number>> = {};
  const runs: Record<string, number[]> = {};
  frames.forEach((f, i) => {
    counts[f.shape] = (counts[f.shape] ?? 0) + 1;
    const prev = frames[i - 1]?.shape;
    if (prev !== f.shape) (runs[f.shape] ??= []).push(1);
    else runs[f.shape]![runs[f.shape]!.length - 1]!++;
    if (prev !== undefined && prev !== f.shape) (transitions[prev] ??= {})[f.shape] = (transitions[prev]![f.shape] ?? 0) + 1;
  });
  return { counts, transitions, runs };
}

beforeAll(() => {
  dir = mkdtempSync(join(tmpdir(), 'conformark-traj-'));
  writeFileSync(join(dir, 'six.xyz'), walkXyz(six));
  writeFileSync(join(dir, 'six.xyz.gz'), gzipSync(walkXyz(six)));
  writeFileSync(join(dir, 'five.xyz'), walkXyz(five, { size: 5 }));
});
afterAll(() => rmSync(dir, { recursive: true, force: true }));

describe('analyzeTrajectory', () => {
  it('analyzeTrajectory names seven- and eight-ring forms as inspect does (ideal forms and MMFF94s minima, docs/methods.md#medium-rings)', async () => {
    const { parseText } = await import('../../src/io/parseText.js');
    const { prepareRecord } = await import('../../src/api/prepare.js');
    const { analyzeRing } = await import('../../src/analysis/ringAnalysis.js');
    for (const name of ['ideal-7', 'mmff-8']) {
      const text = readFileSync(`test/data/medium-rings/${name}.xyz`, 'utf8');
      const single = parseText(text, { file: `${name}.xyz` }).map((mol) => {
        const { molecule, graph, rings } = prepareRecord(mol);
        return analyzeRing(molecule, graph, rings[0]!).shape;
      });
      expect(single.filter((s) => s === 'puckered')).toEqual([]);
      writeFileSync(join(dir, `${name}.xyz`), text);
      const out = join(dir, `medium-${name}`);
      await analyzeTrajectory(join(dir, `${name}.xyz`), { dir: out, ring: '1' });
      expect(csvRows(join(out, 'puckering.csv')).map((r) => r.shape)).toEqual(single);
    }
  });

  it('analyzeTrajectory(six-ring walk) recovers θ and φ of every frame within the noise (derived, inverse Cremer–Pople)', async () => {
    const out = join(dir, 'a');
    const s = await analyzeTrajectory(join(dir, 'six.xyz'), { dir: out, ring: '1', timestep: '2 ps', torsions: ['1-2-3-4'] });
    const rows = csvRows(join(out, 'puckering.csv'));
    expect(rows.length).toBe(six.length);
    rows.forEach((r, i) => {
      const f = six[i]!;
      expect(Number(r.frame)).toBe(i + 1);
      expect(Number(r.time_ps)).toBeCloseTo(2 * i, 9);
      expect(Number(r.Q)).toBeCloseTo(0.55, 1);
      expect(Math.abs(Number(r.thetaDeg) - f.thetaDeg)).toBeLessThan(2);
      expect(r.shape).toBe(f.shape);
      if (f.shape === 'chair') expect(r.phiDeg).toBe(''); // q2 = Q sin θ < 0.05 Å: φ has no meaning
      else expect(angleDiff(Number(r.phiDeg), f.phiDeg)).toBeLessThan(2);
      expect(r.torsion_1_2_3_4).toMatch(/^-?\d+(\.\d+)?$/);
    });
    expect(s.frames).toMatchObject({ read: 128, analysed: 128, first: 1, last: 128, stride: 1 });
    expect(s.ring.atoms).toEqual([1, 2, 3, 4, 5, 6]);
  });

  it('analyzeTrajectory gives occupancy, transitions and dwell equal to the construction', async () => {
    const out = join(dir, 'b');
    const s = await analyzeTrajectory(join(dir, 'six.xyz'), { dir: out, timestep: { value: 2, unit: 'ps' } });
    const e = expected(six);
    for (const [shape, n] of Object.entries(e.counts)) expect(s.occupancy[shape]).toBeCloseTo(n / six.length, 12);
    expect(s.transitions).toEqual(e.transitions);
    for (const [shape, runs] of Object.entries(e.runs)) {
      expect(s.dwell[shape]).toMatchObject({ runs: runs.length, longestFrames: Math.max(...runs), longestTime: 2 * Math.max(...runs) });
      expect(s.dwell[shape]!.meanFrames).toBeCloseTo(e.counts[shape]! / runs.length, 12);
    }
    // the chair flip is visible by ring form: 1C4 (θ ≈ 0) → 4C1 (θ ≈ 180) → 1C4
    expect(s.forms.transitions['4C1']).toEqual({ '1C4': 1 });
    const summary = JSON.parse(readFileSync(join(out, 'summary.json'), 'utf8'));
    expect(summary.occupancy).toEqual(JSON.parse(JSON.stringify(summary.occupancy)));
    expect(summary.transitions).toEqual(e.transitions);
    expect(summary.schema).toBe('conformark/trajectory@1');
  });

  it('analyzeTrajectory reads gzipped XYZ the same as plain XYZ', async () => {
    await analyzeTrajectory(join(dir, 'six.xyz'), { dir: join(dir, 'p') });
    await analyzeTrajectory(join(dir, 'six.xyz.gz'), { dir: join(dir, 'g') });
    expect(readFileSync(join(dir, 'g', 'puckering.csv'), 'utf8')).toBe(readFileSync(join(dir, 'p', 'puckering.csv'), 'utf8'));
  });

  it('analyzeTrajectory honours from, to and stride (frames counted from 1 in file order)', async () => {
    const out = join(dir, 'c');
    const s = await analyzeTrajectory(join(dir, 'six.xyz'), { dir: out, from: 20, to: 100, stride: 3 });
    const frames = csvRows(join(out, 'puckering.csv')).map((r) => Number(r.frame));
    const want = Array.from({ length: 27 }, (_, k) => 20 + 3 * k);
    expect(frames).toEqual(want);
    expect(s.frames).toMatchObject({ analysed: 27, first: 20, last: 98, from: 20, to: 100, stride: 3 });
  });

  it('analyzeTrajectory writes the CSV header with time, descriptor and torsion columns', async () => {
    const out = join(dir, 'h');
    await analyzeTrajectory(join(dir, 'six.xyz'), { dir: out, timestep: '0.5ns', torsions: ['2-3-4-5', '6-1-2-3'] });
    const head = readFileSync(join(out, 'puckering.csv'), 'utf8').split('\n')[0];
    expect(head).toBe('frame,time_ns,Q,thetaDeg,phiDeg,shape,descriptor,torsion_2_3_4_5,torsion_6_1_2_3');
  });

  it('analyzeTrajectory(five-ring walk) gives P ≈ φ2 + 90 and the envelope/twist shapes (docs/methods.md#five-ring-forms, derived)', async () => {
    const out = join(dir, 'f');
    const s = await analyzeTrajectory(join(dir, 'five.xyz'), { dir: out });
    const rows = csvRows(join(out, 'puckering.csv'));
    expect(Object.keys(rows[0]!)).toEqual(['frame', 'Q', 'thetaDeg', 'phiDeg', 'P', 'tauM', 'shape', 'descriptor']);
    rows.forEach((r, i) => {
      expect(angleDiff(Number(r.P), five[i]!.phiDeg + 90)).toBeLessThan(2.5);
      expect(angleDiff(Number(r.phiDeg), five[i]!.phiDeg)).toBeLessThan(2);
      expect(r.shape).toBe(five[i]!.shape);
      expect(Number(r.tauM)).toBeGreaterThan(30);
    });
    expect(s.occupancy).toEqual({ envelope: 0.5, twist: 0.5 });
    expect(readFileSync(join(out, 'pucker-map.svg'), 'utf8')).toContain('Pseudorotation wheel');
  });

  it('analyzeTrajectory writes well-formed figures and JSON without NaN', async () => {
    const out = join(dir, 'w');
    await analyzeTrajectory(join(dir, 'six.xyz'), { dir: out, formats: ['svg', 'png'], theme: 'contrast' });
    for (const name of ['pucker-map', 'time-series', 'occupancy']) {
      const svg = readFileSync(join(out, `${name}.svg`), 'utf8');
      expect(svg.startsWith('<svg')).toBe(true);
      expect(svg.trimEnd().endsWith('</svg>')).toBe(true);
      expect(svg).not.toMatch(/NaN|Infinity|undefined/);
      expect(svg).toContain('<title');
      expect(readFileSync(join(out, `${name}.png`)).subarray(1, 4).toString()).toBe('PNG');
    }
    const map = readFileSync(join(out, 'pucker-map.svg'), 'utf8');
    expect(map).toMatch(/class="density-\d"/);
    expect(map).toContain('⁴C₁');
    const series = readFileSync(join(out, 'time-series.svg'), 'utf8');
    expect(series).toContain('class="band-chair"');
    expect(series).toContain('class="series"');
    expect(readFileSync(join(out, 'summary.json'), 'utf8')).not.toMatch(/NaN|null,\s*$/);
  });

  it('analyzeTrajectory reports a frame with a different atom count by frame number and line', async () => {
    const lines = walkXyz(six.slice(0, 60)).split('\n');
    // frame 50 starts at line 49 × 20 + 1; drop its last hydrogen
    const start = 49 * 20;
    lines[start] = '17';
    lines.splice(start + 19, 1);
    const file = join(dir, 'short.xyz');
    writeFileSync(file, lines.join('\n'));
    const out = join(dir, 'e1');
    const err = await analyzeTrajectory(file, { dir: out }).catch((e: unknown) => e);
    expect(err).toBeInstanceOf(ConformarkError);
    const issue = (err as ConformarkError).issues[0]!;
    expect(issue.message).toBe('frame 50 has 17 atoms, frame 1 had 18');
    expect(issue.line).toBe(start + 1);
    expect(issue.file).toBe(file);
    expect(existsSync(join(out, 'puckering.csv'))).toBe(false); // nothing half-written
  });

  it('analyzeTrajectory reports a frame with a missing ring atom and non-finite coordinates by frame number', async () => {
    const lines = walkXyz(six.slice(0, 40)).split('\n');
    lines[29 * 20 + 2 + 3] = 'C nan 0 0';
    const file = join(dir, 'nan.xyz');
    writeFileSync(file, lines.join('\n'));
    const err = (await analyzeTrajectory(file, { dir: join(dir, 'e2') }).catch((e: unknown) => e)) as ConformarkError;
    expect(err.issues[0]!.message).toMatch(/^frame 30: x coordinate 'nan' is not a number/);
    expect(err.issues[0]!.line).toBe(29 * 20 + 2 + 3 + 1);
    const cut = walkXyz(six.slice(0, 12)).split('\n');
    const two = walkXyz(six.slice(0, 1)).split('\n').slice(0, 6); // a frame of 4 atoms
    two[0] = '4';
    const file2 = join(dir, 'fewer.xyz');
    writeFileSync(file2, [...cut.slice(0, -1), ...two, ''].join('\n'));
    const err2 = (await analyzeTrajectory(file2, { dir: join(dir, 'e3') }).catch((e: unknown) => e)) as ConformarkError;
    expect(err2.issues[0]!.message).toBe('frame 13 has 4 atoms, frame 1 had 18 (atom 6, used by the analysis, is missing)');
  });

  it('analyzeTrajectory refuses an empty frame range and a bad timestep', async () => {
    await expect(analyzeTrajectory(join(dir, 'six.xyz'), { dir: join(dir, 'e4'), from: 500 })).rejects.toThrow(/no frames to analyse from frame 500: the file has 128 frames/);
    await expect(analyzeTrajectory(join(dir, 'six.xyz'), { dir: join(dir, 'e5'), timestep: '2 parsecs' })).rejects.toThrow(/--timestep expects/);
  });
});
