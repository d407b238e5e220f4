import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { mkdtempSync, readdirSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { dcdFrames, dcdHeader } from '../../src/io/dcd.js';
import { analyzeTrajectory } from '../../src/api/trajectory/trajectory.js';
import { cremerPople } from '../../src/geometry/cremerPople.js';
import { ConformarkError } from '../../src/model/errors.js';
import type { Vec3 } from '../../src/geometry/vec3.js';

// written and read back by MDAnalysis 2.4.2 (Michaud-Agrawal et al. 2011, J. Comput. Chem. 32, 2319):
// scripts/fixtures/dcd.py
const FIX = join(__dirname, '..', 'fixtures', 'md');
const ref = JSON.parse(readFileSync(join(FIX, 'ring.dcd.json'), 'utf8')) as { natoms: number; frames: { time_ps: number; dimensions: number[]; positions: number[][] }[] };

/** The fixture with every number byte-swapped: the same file as a big-endian machine writes it. */
function bigEndian(le: Buffer): Buffer {
  const out = Buffer.from(le);
  let at = 0;
  const record = (swap: (payload: number, len: number) => void) => {
    const len = le.readInt32LE(at);
    out.writeInt32BE(len, at);
    swap(at + 4, len);
    out.writeInt32BE(len, at + 4 + len);
    at += len + 8;
  };
  const words = (from: number, to: number) => { for (let p = from; p < to; p += 4) out.writeInt32BE(le.readInt32LE(p), p); };
  record((p, len) => words(p + 4, p + len)); // CORD + 20 words
  record((p) => words(p, p + 4)); // title count, then text
  record((p) => words(p, p + 4)); // atoms
  while (at < le.length) {
    if (le.readInt32LE(at) === 48) record((p) => { for (let k = 0; k < 6; k++) out.writeDoubleBE(le.readDoubleLE(p + 8 * k), p + 8 * k); });
    for (let axis = 0; axis < 3; axis++) record((p, len) => { for (let q = p; q < p + len; q += 4) out.writeFloatBE(le.readFloatLE(q), q); });
  }
  return out;
}

/** The fixture without its unit-cell records (header word 11 set to 0), as a vacuum run writes it. */
function withoutCell(le: Buffer): Buffer {
  const parts: Buffer[] = [];
  const head = Buffer.from(le.subarray(0, 92));
  head.writeInt32LE(0, 8 + 40);
  parts.push(head);
  let at = 92;
  for (let k = 0; k < 2; k++) {
    const len = le.readInt32LE(at);
    parts.push(le.subarray(at, at + len + 8));
    at += len + 8;
  }
  while (at < le.length) {
    const len = le.readInt32LE(at);
    if (len !== 48) parts.push(le.subarray(at, at + len + 8));
    at += len + 8;
  }
  return Buffer.concat(parts);
}

let dir: string;
beforeAll(() => {
  dir = mkdtempSync(join(tmpdir(), 'conformark-dcd-'));
  const le = readFileSync(join(FIX, 'ring.dcd'));
  writeFileSync(join(dir, 'be.dcd'), bigEndian(le));
  writeFileSync(join(dir, 'cut.dcd'), le.subarray(0, le.length - 10));
  writeFileSync(join(dir, 'nocell.dcd'), withoutCell(le));
});
afterAll(() => rmSync(dir, { recursive: true, force: true }));

describe('dcdFrames', () => {
  for (const [name, file] of [['little-endian', () => join(FIX, 'ring.dcd')], ['big-endian', () => join(dir, 'be.dcd')]] as const) {
    it(`dcdFrames(${name}) decodes the coordinates and cells MDAnalysis reads`, async () => {
      const h = await dcdHeader(file());
      expect(h.atomCount).toBe(ref.natoms);
      expect(h.hasCell).toBe(true);
      expect(h.timestepPs).toBeCloseTo(ref.frames[1]!.time_ps - ref.frames[0]!.time_ps, 6);
      let k = 0;
      for await (const f of dcdFrames(file())) {
        const r = ref.frames[k++]!;
        expect(f.index).toBe(k);
        r.positions.forEach((p, i) => p.forEach((x, a) => expect(f.coords[3 * i + a]).toBeCloseTo(x, 5)));
        expect(f.cell!.map((x) => +x.toFixed(6))).toEqual(r.dimensions.map((x) => +x.toFixed(6)));
      }
      expect(k).toBe(ref.frames.length);
    });
  }

  it('dcdFrames(no unit cell) decodes the same coordinates with a null cell', async () => {
    expect((await dcdHeader(join(dir, 'nocell.dcd'))).hasCell).toBe(false);
    let k = 0;
    for await (const f of dcdFrames(join(dir, 'nocell.dcd'))) {
      const r = ref.frames[k++]!;
      expect(f.cell).toBeNull();
      r.positions.forEach((p, i) => p.forEach((x, a) => expect(f.coords[3 * i + a]).toBeCloseTo(x, 5)));
    }
    expect(k).toBe(ref.frames.length);
  });

  it('analyzeTrajectory(wrapped DCD without a cell) stops with the broken-ring error; --box joins it', async () => {
    const top = join(FIX, 'ring.pdb');
    const err = await analyzeTrajectory(join(dir, 'nocell.dcd'), { dir: join(dir, 'nc'), topology: top }).catch((e: unknown) => e);
    expect((err as ConformarkError).issues[0]!.message).toMatch(/^ring broken across the periodic box at frame 2/);
    const s = await analyzeTrajectory(join(dir, 'nocell.dcd'), { dir: join(dir, 'nc2'), topology: top, box: '20 20 20' });
    expect(s.box).toBe('option');
    expect(s.frames.analysed).toBe(ref.frames.length);
  });

  it('dcdFrames(truncated file) names the truncated frame', async () => {
    const err = await (async () => { for await (const _ of dcdFrames(join(dir, 'cut.dcd'))) void _; })().catch((e: unknown) => e);
    expect((err as ConformarkError).issues[0]!.message).toMatch(/frame 5 is truncated/);
  });
});

describe('analyzeTrajectory(DCD)', () => {
  it('analyzeTrajectory(dcd, topology) makes the wrapped ring whole with the DCD cell and gives its Q, time from the header', async () => {
    const out = join(dir, 'run');
    const s = await analyzeTrajectory(join(FIX, 'ring.dcd'), { dir: out, topology: join(FIX, 'ring.pdb') });
    expect(s.source.format).toBe('dcd');
    expect(s.box).toBe('file');
    expect(s.timestep!.value).toBeCloseTo(2, 5);
    const rows = readFileSync(join(out, 'puckering.csv'), 'utf8').trim().split('\n').slice(1).map((l) => l.split(','));
    expect(rows.length).toBe(ref.frames.length);
    rows.forEach((r, k) => {
      // the reference ring made whole here: each atom to the image nearest its predecessor in the 20 Å cube
      const p = ref.frames[k]!.positions.map((q) => [...q]);
      for (let i = 1; i < p.length; i++) for (let a = 0; a < 3; a++) p[i]![a]! -= 20 * Math.round((p[i]![a]! - p[i - 1]![a]!) / 20);
      const cp = cremerPople(p as unknown as Vec3[])!;
      expect(Number(r[2])).toBeCloseTo(cp.Q, 3);
      expect(Number(r[1])).toBeCloseTo(2 * k, 4);
    });
  });

  it('analyzeTrajectory(dcd, startTime 1 ns) shifts the time column by 1000 ps; a bad start time is refused', async () => {
    const out = join(dir, 'st');
    const s = await analyzeTrajectory(join(FIX, 'ring.dcd'), { dir: out, topology: join(FIX, 'ring.pdb'), startTime: '1 ns' });
    expect(s.startTime).toBe(1000);
    const times = readFileSync(join(out, 'puckering.csv'), 'utf8').trim().split('\n').slice(1).map((l) => Number(l.split(',')[1]));
    times.forEach((t, k) => expect(t).toBeCloseTo(1000 + 2 * k, 4));
    const err = await analyzeTrajectory(join(FIX, 'ring.dcd'), { dir: join(dir, 'st2'), topology: join(FIX, 'ring.pdb'), startTime: '-3 ps' }).catch((e: unknown) => e);
    expect((err as ConformarkError).issues[0]!.message).toMatch(/--start-time expects/);
  });

  it('analyzeTrajectory(truncated dcd) into a folder of an earlier run leaves that run byte for byte, no temporary files', async () => {
    const out = join(dir, 'kept');
    await analyzeTrajectory(join(FIX, 'ring.dcd'), { dir: out, topology: join(FIX, 'ring.pdb') });
    const before = Object.fromEntries(readdirSync(out).map((f) => [f, readFileSync(join(out, f), 'utf8')]));
    const err = await analyzeTrajectory(join(dir, 'cut.dcd'), { dir: out, topology: join(FIX, 'ring.pdb'), startTime: '1 ns' }).catch((e: unknown) => e);
    expect((err as ConformarkError).issues[0]!.message).toMatch(/frame 5 is truncated/);
    expect(Object.fromEntries(readdirSync(out).map((f) => [f, readFileSync(join(out, f), 'utf8')]))).toEqual(before);
  });

  it('analyzeTrajectory(dcd) without a topology asks for one', async () => {
    const err = await analyzeTrajectory(join(FIX, 'ring.dcd'), { dir: join(dir, 'x') }).catch((e: unknown) => e);
    expect((err as ConformarkError).code).toBe('no-topology');
  });
});
