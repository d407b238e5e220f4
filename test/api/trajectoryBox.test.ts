/**
 * Rings split across a periodic box are made whole by the minimum image along their bonds (common practice, no
 * source); the reference is the same frames left whole, analysed the same way (derived: wrapping moves atoms by
 * whole cell vectors only, so the puckering must not change).
 */
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { mkdtempSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { analyzeTrajectory } from '../../src/api/trajectory/trajectory.js';
import { boxFromLengths, type PeriodicBox } from '../../src/geometry/periodicBox.js';
import { ConformarkError } from '../../src/model/errors.js';
import { sixRingWalk, walkXyz } from '../helpers/puckerWalk.js';

interface XyzFrame { elements: string[]; xyz: number[][] }

function parseXyz(text: string): XyzFrame[] {
  const lines = text.trim().split('\n');
  const frames: XyzFrame[] = [];
  for (let i = 0; i < lines.length; ) {
    const n = Number(lines[i]);
    const atoms = lines.slice(i + 2, i + 2 + n).map((l) => l.trim().split(/\s+/));
    frames.push({ elements: atoms.map((a) => a[0]!), xyz: atoms.map((a) => a.slice(1).map(Number)) });
    i += n + 2;
  }
  return frames;
}

/** Moves each frame so its first six atoms (the ring) centre on `centre`, then wraps atom by atom into the box. */
function wrapped(frames: XyzFrame[], box: PeriodicBox, centreOf: (k: number) => number[], wrap: (k: number) => boolean): XyzFrame[] {
  const v = box.vectors, w = box.inverse;
  return frames.map((f, k) => {
    const c = [0, 1, 2].map((a) => f.xyz.slice(0, 6).reduce((s, p) => s + p[a]!, 0) / 6);
    const target = centreOf(k);
    const xyz = f.xyz.map((p) => {
      const r = p.map((x, a) => x - c[a]! + target[a]!);
      if (!wrap(k)) return r;
      // fractional coordinates, each brought into [0, 1): moves atoms by whole cell vectors only
      const fr = [0, 1, 2].map((j) => r[0]! * w[j]! + r[1]! * w[3 + j]! + r[2]! * w[6 + j]!).map((x) => Math.floor(x));
      return r.map((x, a) => x - (fr[0]! * v[a]! + fr[1]! * v[3 + a]! + fr[2]! * v[6 + a]!));
    });
    return { elements: f.elements, xyz };
  });
}

const xyzText = (frames: XyzFrame[]) => frames.map((f) => [String(f.elements.length), 'frame', ...f.elements.map((e, i) => `${e} ${f.xyz[i]!.map((x) => x.toFixed(6)).join(' ')}`)].join('\n')).join('\n') + '\n';

function pdbText(frames: XyzFrame[], cell: string): string {
  const out: string[] = [];
  frames.forEach((f, k) => {
    out.push(`MODEL     ${String(k + 1).padStart(4)}`, `CRYST1${cell}P 1           1`);
    f.elements.forEach((e, i) => {
      const [x, y, z] = f.xyz[i]!.map((t) => t.toFixed(3).padStart(8));
      out.push(`HETATM${String(i + 1).padStart(5)} ${(e + String(i + 1)).padEnd(4)} LIG A   1    ${x}${y}${z}  1.00  0.00          ${e.padStart(2)}`);
    });
    out.push('ENDMDL');
  });
  return `${out.join('\n')}\nEND\n`;
}

function csv(path: string): string[][] {
  return readFileSync(path, 'utf8').trim().split('\n').slice(1).map((l) => l.split(','));
}

let dir: string;
const walk = parseXyz(walkXyz(sixRingWalk()));
const cube = boxFromLengths(12, 12, 12)!;
const tric = boxFromLengths(14, 15, 16, 80, 75, 70)!;
// frame 1 whole inside the box, every later frame centred on a box corner and wrapped atom by atom
const atCorner = (k: number) => (k === 0 ? [6, 6, 6] : [0.3 * Math.sin(k), 0.2, -0.1]);

beforeAll(() => {
  dir = mkdtempSync(join(tmpdir(), 'conformark-box-'));
  writeFileSync(join(dir, 'whole.xyz'), xyzText(wrapped(walk, cube, atCorner, () => false)));
  writeFileSync(join(dir, 'cube.xyz'), xyzText(wrapped(walk, cube, atCorner, (k) => k > 0)));
  writeFileSync(join(dir, 'tric.xyz'), xyzText(wrapped(walk, tric, atCorner, (k) => k > 0)));
  const cubeFrames = wrapped(walk, cube, atCorner, (k) => k > 0);
  writeFileSync(join(dir, 'cube.pdb'), pdbText(cubeFrames, '   12.000   12.000   12.000  90.00  90.00  90.00 '));
});
afterAll(() => rmSync(dir, { recursive: true, force: true }));

describe('analyzeTrajectory with a periodic box', () => {
  it('analyzeTrajectory(wrapped, --box) gives the puckering of the whole trajectory frame by frame (cubic and triclinic)', async () => {
    await analyzeTrajectory(join(dir, 'whole.xyz'), { dir: join(dir, 'w'), torsions: ['1-2-3-4'] });
    const s = await analyzeTrajectory(join(dir, 'cube.xyz'), { dir: join(dir, 'c'), box: '12 12 12', torsions: ['1-2-3-4'] });
    await analyzeTrajectory(join(dir, 'tric.xyz'), { dir: join(dir, 't'), box: '14 15 16 80 75 70', torsions: ['1-2-3-4'] });
    expect(s.box).toBe('option');
    const whole = csv(join(dir, 'w', 'puckering.csv'));
    expect(whole.length).toBe(walk.length);
    for (const name of ['c', 't']) {
      const rows = csv(join(dir, name, 'puckering.csv'));
      expect(rows.length).toBe(whole.length);
      rows.forEach((r, i) => {
        const ref = whole[i]!;
        // frame, Q, θ, φ, shape, descriptor, torsion: equal within the 6-decimal rounding of the files
        expect(Math.abs(Number(r[1]) - Number(ref[1]))).toBeLessThan(2e-4);
        expect(Math.abs(Number(r[2]) - Number(ref[2]))).toBeLessThan(0.02);
        expect(r[4]).toBe(ref[4]);
        expect(Math.abs(Number(r.at(-1)) - Number(ref.at(-1)))).toBeLessThan(0.02);
      });
    }
  });

  it('analyzeTrajectory(wrapped PDB with CRYST1) takes the box from the file', async () => {
    const s = await analyzeTrajectory(join(dir, 'cube.pdb'), { dir: join(dir, 'p') });
    expect(s.box).toBe('file');
    const whole = csv(join(dir, 'w', 'puckering.csv'));
    csv(join(dir, 'p', 'puckering.csv')).forEach((r, i) => {
      expect(Math.abs(Number(r[1]) - Number(whole[i]![1]))).toBeLessThan(3e-3);
      expect(r[4]).toBe(whole[i]![4]);
    });
  });

  it('analyzeTrajectory(wrapped, no box) stops with the broken-ring error naming the frame, never a number', async () => {
    const err = await analyzeTrajectory(join(dir, 'cube.xyz'), { dir: join(dir, 'n') }).catch((e: unknown) => e);
    expect(err).toBeInstanceOf(ConformarkError);
    expect((err as ConformarkError).code).toBe('ring-broken');
    expect((err as ConformarkError).issues[0]!.message).toMatch(/^ring broken across the periodic box at frame 2 \(ring bond \d+-\d+ is [\d.]+ Å\): give the box/);
  });

  it('analyzeTrajectory(wrapped, wrong box) says the ring is broken even at the nearest image', async () => {
    const err = await analyzeTrajectory(join(dir, 'cube.xyz'), { dir: join(dir, 'x'), box: '30 30 30' }).catch((e: unknown) => e);
    expect((err as ConformarkError).issues[0]!.message).toMatch(/^ring broken at frame 2: .*\(wrong box\?\)/);
  });

  it('analyzeTrajectory refuses an unusable --box', async () => {
    const err = await analyzeTrajectory(join(dir, 'cube.xyz'), { dir: join(dir, 'y'), box: '12 12' }).catch((e: unknown) => e);
    expect((err as ConformarkError).message).toMatch(/--box expects/);
  });
});
