/**
 * DCD trajectories (the CHARMM/NAMD binary format): Fortran unformatted records, each payload between two
 * 4-byte length markers. Header record `CORD` + 20 integers (frames, first step, steps between frames, …,
 * step length as a 32-bit float in AKMA time units at word 10, unit-cell flag at word 11, CHARMM version at
 * word 20), a title record, the atom count; then per frame an optional cell record (six 64-bit floats in the
 * order a, γ, b, β, α, c; angles as cosines in older CHARMM files) and three records of 32-bit x, y and z.
 * Byte order from the first marker (84). Frames are read one at a time at known offsets: constant memory, any
 * file size. Common practice, no source (format as documented for CHARMM and NAMD).
 */
import { open, type FileHandle } from 'node:fs/promises';
import { ConformarkError } from '../model/errors.js';

/** AKMA time unit in ps (CHARMM: √(Å² amu / (kcal/mol)) = 48.88821 fs). */
export const AKMA_PS = 0.04888821;

/** What the header says. */
export interface DcdHeader {
  readonly atomCount: number;
  /** Frames the header announces (0 in some unfinished files); the reader counts from the file size. */
  readonly frameCount: number;
  readonly littleEndian: boolean;
  readonly hasCell: boolean;
  /** Time between frames and of frame 1, ps (null when the header has no step length). */
  readonly timestepPs: number | null;
  readonly startPs: number | null;
  readonly title: string;
}

/** One DCD frame; `coords` is reused between frames. */
export interface DcdFrame {
  readonly index: number;
  readonly coords: Float64Array;
  /** a, b, c (Å), α, β, γ (degrees), or null. */
  readonly cell: readonly [number, number, number, number, number, number] | null;
}

function bad(file: string, message: string): ConformarkError {
  return new ConformarkError({ code: 'bad-dcd', file, line: null, message });
}

interface Layout extends DcdHeader {
  readonly firstFrame: number;
  readonly frameBytes: number;
}

async function readHeader(fh: FileHandle, file: string, size: number): Promise<Layout> {
  const head = Buffer.alloc(Math.min(size, 4096));
  await fh.read(head, 0, head.length, 0);
  if (head.length < 100) throw bad(file, 'too short for a DCD file');
  const le = head.readInt32LE(0) === 84;
  if (!le && head.readInt32BE(0) !== 84) throw bad(file, 'not a DCD file (the first record is not 84 bytes)');
  const int = (at: number) => (le ? head.readInt32LE(at) : head.readInt32BE(at));
  if (head.toString('latin1', 4, 8) !== 'CORD') throw bad(file, 'not a DCD coordinate file (no CORD tag)');
  const word = (k: number) => int(8 + 4 * k);
  const nset = word(0), istart = word(1), nsavc = word(2), fixed = word(8);
  const charmm = word(19) !== 0;
  const delta = le ? head.readFloatLE(8 + 36) : head.readFloatBE(8 + 36);
  const hasCell = charmm && word(10) !== 0;
  if (charmm && word(11) !== 0) throw bad(file, 'DCD files with a fourth dimension are not read');
  if (fixed !== 0) throw bad(file, `DCD with ${fixed} fixed atoms is not read: write all atoms in every frame`);
  let at = 92;
  const titleBytes = int(at);
  const lines = int(at + 4);
  const title = head.toString('latin1', at + 8, at + 8 + Math.max(0, Math.min(80 * lines, titleBytes - 4))).replace(/\0/g, ' ').trim();
  at += 8 + titleBytes;
  if (at + 12 > head.length || int(at) !== 4) throw bad(file, 'broken DCD header (the atom-count record)');
  const atomCount = int(at + 4);
  at += 12;
  if (!(atomCount > 0)) throw bad(file, `DCD header gives ${atomCount} atoms`);
  const frameBytes = (hasCell ? 56 : 0) + 3 * (8 + 4 * atomCount);
  const timestepPs = Number.isFinite(delta) && delta > 0 ? delta * AKMA_PS * Math.max(1, nsavc) : null;
  const startPs = timestepPs === null ? null : delta * AKMA_PS * istart;
  return { atomCount, frameCount: nset, littleEndian: le, hasCell, timestepPs, startPs, title, firstFrame: at, frameBytes };
}

/**
 * Reads a DCD header.
 * @example (await dcdHeader('md.dcd')).atomCount
 */
export async function dcdHeader(path: string): Promise<DcdHeader> {
  const fh = await open(path, 'r');
  try {
    return await readHeader(fh, path, (await fh.stat()).size);
  } finally {
    await fh.close();
  }
}

/**
 * Yields the frames of a DCD file one by one (coordinates in Å; the buffer is reused). A truncated last
 * frame is an error naming the frame.
 * @example for await (const f of dcdFrames('md.dcd')) use(f.coords, f.cell)
 */
export async function* dcdFrames(path: string): AsyncGenerator<DcdFrame> {
  const fh = await open(path, 'r');
  try {
    const size = (await fh.stat()).size;
    const h = await readHeader(fh, path, size);
    const n = h.atomCount;
    const buf = Buffer.alloc(h.frameBytes);
    const coords = new Float64Array(3 * n);
    const le = h.littleEndian;
    const frames = Math.floor((size - h.firstFrame) / h.frameBytes);
    for (let f = 0; f < frames; f++) {
      await fh.read(buf, 0, h.frameBytes, h.firstFrame + f * h.frameBytes);
      const int = (at: number) => (le ? buf.readInt32LE(at) : buf.readInt32BE(at));
      let at = 0;
      let cell: DcdFrame['cell'] = null;
      if (h.hasCell) {
        if (int(0) !== 48) throw bad(path, `frame ${f + 1}: broken unit-cell record`);
        const d = (k: number) => (le ? buf.readDoubleLE(4 + 8 * k) : buf.readDoubleBE(4 + 8 * k));
        const [a, g, b, be, al, c] = [d(0), d(1), d(2), d(3), d(4), d(5)];
        const cosines = [g, be, al].every((x) => Math.abs(x) <= 1);
        const ang = (x: number) => (cosines ? (Math.acos(x) * 180) / Math.PI : x);
        cell = [a, b, c, ang(al), ang(be), ang(g)];
        at = 56;
      }
      for (let axis = 0; axis < 3; axis++) {
        if (int(at) !== 4 * n) throw bad(path, `frame ${f + 1}: broken coordinate record`);
        at += 4;
        for (let i = 0; i < n; i++) coords[3 * i + axis] = le ? buf.readFloatLE(at + 4 * i) : buf.readFloatBE(at + 4 * i);
        at += 4 * n + 4;
      }
      yield { index: f + 1, coords, cell };
    }
    if (size > h.firstFrame + frames * h.frameBytes) throw bad(path, `frame ${frames + 1} is truncated (the file ends inside it)`);
  } finally {
    await fh.close();
  }
}
