import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { mkdtempSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { xtcAtomCount, xtcFrames } from '../../src/io/xtc.js';
import { trrFrames } from '../../src/io/trr.js';
import fc from 'fast-check';
import { ConformarkError } from '../../src/model/errors.js';

// written and read back by MDAnalysis 2.4.2 (Michaud-Agrawal et al. 2011, J. Comput. Chem. 32, 2319), checked
// against mdtraj 1.9.7 (McGibbon et al. 2015, Biophys. J. 109, 1528): scripts/fixtures/gromacs.py
const FIX = join(__dirname, '..', 'fixtures', 'md');
interface RefFrame { time_ps: number; step: number; dimensions: number[]; positions: number[][] }
const ref = JSON.parse(readFileSync(join(FIX, 'gromacs.json'), 'utf8')) as { natoms: number; xtc: RefFrame[]; trr: RefFrame[]; ring6: number[][][]; far: number[][][] };

async function collect(frames: AsyncGenerator<{ coords: Float64Array; timePs: number; step: number; box: Float64Array | null; offset: number }>) {
  const out: { coords: number[]; timePs: number; step: number; box: number[] | null; offset: number }[] = [];
  for await (const f of frames) out.push({ coords: Array.from(f.coords), timePs: f.timePs, step: f.step, box: f.box && Array.from(f.box), offset: f.offset });
  return out;
}

function worst(coords: number[], positions: number[][]): number {
  return Math.max(...positions.flatMap((p, i) => p.map((x, a) => Math.abs(coords[3 * i + a]! - x))));
}

let dir: string;
beforeAll(() => {
  dir = mkdtempSync(join(tmpdir(), 'conformark-xtc-'));
});
afterAll(() => rmSync(dir, { recursive: true, force: true }));

describe('xtcFrames', () => {
  it('xtcFrames(compressed frames) decodes the coordinates MDAnalysis reads, to its 0.01 Å precision, with times, steps and box', async () => {
    expect(await xtcAtomCount(join(FIX, 'rings.xtc'))).toBe(ref.natoms);
    const frames = await collect(xtcFrames(join(FIX, 'rings.xtc')));
    expect(frames.length).toBe(ref.xtc.length);
    frames.forEach((f, k) => {
      const r = ref.xtc[k]!;
      // the same integers decoded: equal to the printed 5 decimals, far inside the 0.005 Å rounding of the format
      expect(worst(f.coords, r.positions)).toBeLessThan(1e-4);
      expect(f.timePs).toBeCloseTo(r.time_ps, 6);
      expect(f.step).toBe(r.step);
      expect(f.box).toEqual([30, 0, 0, 0, 30, 0, 0, 0, 30]);
    });
  });

  it('xtcFrames(nine atoms or fewer) reads the plain-float frames', async () => {
    const frames = await collect(xtcFrames(join(FIX, 'ring6.xtc')));
    expect(frames.length).toBe(ref.ring6.length);
    frames.forEach((f, k) => expect(worst(f.coords, ref.ring6[k]!)).toBeLessThan(1e-4));
  });

  it('xtcFrames(an atom 20,000 nm away) decodes the large-range bit fields', async () => {
    const frames = await collect(xtcFrames(join(FIX, 'far.xtc')));
    expect(frames.length).toBe(2);
    frames.forEach((f, k) => expect(worst(f.coords, ref.far[k]!)).toBeLessThan(1e-4));
    expect(f0(frames)).toBeCloseTo(200000, 3);
  });

  it('xtcFrames(truncated file) names the frame and its byte offset', async () => {
    const whole = readFileSync(join(FIX, 'rings.xtc'));
    const frames = await collect(xtcFrames(join(FIX, 'rings.xtc')));
    writeFileSync(join(dir, 'cut.xtc'), whole.subarray(0, whole.length - 7));
    const err = await collect(xtcFrames(join(dir, 'cut.xtc'))).catch((e: unknown) => e);
    expect(err).toBeInstanceOf(ConformarkError);
    expect((err as ConformarkError).issues[0]!.message).toBe(`frame 5 (byte ${frames[4]!.offset}) is truncated (the file ends inside it)`);
  });

  it('xtcFrames(a corrupted bit stream or magic number) is an error naming the frame, never wrong numbers', async () => {
    const bytes = Buffer.from(readFileSync(join(FIX, 'rings.xtc')));
    const frames = await collect(xtcFrames(join(FIX, 'rings.xtc')));
    const second = frames[1]!.offset;
    const bad = Buffer.from(bytes);
    bad.writeInt32BE(1234, second);
    writeFileSync(join(dir, 'magic.xtc'), bad);
    const e1 = await collect(xtcFrames(join(dir, 'magic.xtc'))).catch((e: unknown) => e);
    expect((e1 as ConformarkError).issues[0]!.message).toBe(`frame 2 (byte ${second}): not an XTC frame (magic number 1234, expected 1995)`);
    const idx = Buffer.from(bytes);
    idx.writeInt32BE(200, second + 84); // small-size index beyond the table
    writeFileSync(join(dir, 'idx.xtc'), idx);
    const e2 = await collect(xtcFrames(join(dir, 'idx.xtc'))).catch((e: unknown) => e);
    expect((e2 as ConformarkError).issues[0]!.message).toMatch(/^frame 2 \(byte \d+\): compressed coordinates do not decode/);
    await expect(xtcAtomCount(join(FIX, 'ring.dcd'))).rejects.toThrow(/not an XTC file/);
  });
});

function f0(frames: { coords: number[] }[]): number {
  return frames[0]!.coords[33]!;
}

describe('trrFrames', () => {
  it('trrFrames(positions, velocities, forces) reads the positions MDAnalysis reads, times, steps and the triclinic box', async () => {
    const frames = await collect(trrFrames(join(FIX, 'rings.trr')));
    expect(frames.length).toBe(ref.trr.length);
    frames.forEach((f, k) => {
      const r = ref.trr[k]!;
      expect(worst(f.coords, r.positions)).toBeLessThan(2e-5);
      expect(f.timePs).toBeCloseTo(r.time_ps, 6);
      expect(f.step).toBe(r.step);
      // a = 30 x; b = 30 at 60° from a in the xy plane; c = 30 z
      [30, 0, 0, 15, 15 * Math.sqrt(3), 0, 0, 0, 30].forEach((v, i) => expect(f.box![i]).toBeCloseTo(v, 4));
    });
  });

  it('trrFrames(truncated file, bad magic) names the frame and byte offset', async () => {
    const whole = readFileSync(join(FIX, 'rings.trr'));
    const frames = await collect(trrFrames(join(FIX, 'rings.trr')));
    writeFileSync(join(dir, 'cut.trr'), whole.subarray(0, whole.length - 100));
    const e1 = await collect(trrFrames(join(dir, 'cut.trr'))).catch((e: unknown) => e);
    expect((e1 as ConformarkError).issues[0]!.message).toBe(`frame 5 (byte ${frames[4]!.offset}) is truncated (the file ends inside it)`);
    const bad = Buffer.from(whole);
    bad.writeInt32BE(7, frames[2]!.offset);
    writeFileSync(join(dir, 'magic.trr'), bad);
    const e2 = await collect(trrFrames(join(dir, 'magic.trr'))).catch((e: unknown) => e);
    expect((e2 as ConformarkError).issues[0]!.message).toBe(`frame 3 (byte ${frames[2]!.offset}): not a TRR frame (magic number 7, expected 1993)`);
  });
});

describe('XDR readers on corrupted files', () => {
  it('xtcFrames and trrFrames(random byte damage) either read finite coordinates or stop with one error naming the frame', async () => {
    const files = { xtc: readFileSync(join(FIX, 'rings.xtc')), trr: readFileSync(join(FIX, 'rings.trr')) };
    let k = 0;
    await fc.assert(
      fc.asyncProperty(fc.constantFrom('xtc', 'trr'), fc.array(fc.tuple(fc.nat(), fc.nat(255)), { minLength: 1, maxLength: 6 }), fc.nat(), async (kind, edits, cut) => {
        const bytes = Buffer.from(files[kind as 'xtc' | 'trr']);
        for (const [at, v] of edits) bytes[at % bytes.length] = v;
        const path = join(dir, `fuzz${k++}.${kind}`);
        writeFileSync(path, cut % 3 === 0 ? bytes.subarray(0, cut % bytes.length) : bytes);
        try {
          for await (const f of kind === 'xtc' ? xtcFrames(path) : trrFrames(path)) {
            if (kind === 'xtc') expect(f.coords.every(Number.isFinite)).toBe(true);
          }
        } catch (err) {
          expect(err).toBeInstanceOf(ConformarkError);
          expect((err as ConformarkError).issues[0]!.message).toMatch(/frame \d+ \(byte \d+\)|not an? (XTC|TRR) file|too short/);
        }
      }),
      { seed: 16, numRuns: 200 },
    );
  });
});
