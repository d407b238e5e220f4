/**
 * XTC trajectories (GROMACS compressed coordinates), read frame by frame in constant memory. Each frame, in
 * XDR (big-endian 4-byte words): magic 1995, atom count, step, time (ps, 32-bit float), the box as three row
 * vectors (nm, nine floats), the atom count again, then either 3 × atoms plain floats (nine atoms or fewer) or
 * precision, minint[3], maxint[3], smallidx, a byte count and that many bytes of bit stream, padded to 4 bytes
 * (see xtcCoords.ts). Common practice, no source (format as the GROMACS xdrfile library writes it).
 */
import { ConformarkError } from '../model/errors.js';
import { BinaryStream } from './binaryStream.js';
import { decodeXtcCoords } from './xtcCoords.js';

export const XTC_MAGIC = 1995;

/** More atoms than any frame holds: a corrupted count, refused before memory is set aside for it. */
export const MAX_ATOMS = 100_000_000;

/** One frame of an XDR trajectory (XTC or TRR); `coords` (Å) is reused between frames. */
export interface XdrFrame {
  readonly index: number;
  readonly step: number;
  readonly timePs: number;
  readonly coords: Float64Array;
  /** Box row vectors (Å, nine numbers), or null when the file writes a zero box (no periodicity). */
  readonly box: Float64Array | null;
  /** File offset of the frame, for messages. */
  readonly offset: number;
}

function bad(file: string, message: string): ConformarkError {
  return new ConformarkError({ code: 'bad-xtc', file, line: null, message });
}

/** Reads nine floats (nm) at `at` as box vectors in Å, or null for an all-zero box. */
export function readBox(buf: Buffer, at: number, out: Float64Array, double = false): Float64Array | null {
  let any = false;
  for (let k = 0; k < 9; k++) {
    const v = (double ? buf.readDoubleBE(at + 8 * k) : buf.readFloatBE(at + 4 * k)) * 10;
    out[k] = v;
    if (v !== 0) any = true;
  }
  return any ? out : null;
}

/** The atom count of an XTC file (from its first frame). */
export async function xtcAtomCount(path: string): Promise<number> {
  const s = await BinaryStream.open(path);
  try {
    if (!(await s.ensure(8))) throw bad(path, 'too short for an XTC file');
    if (s.buffer.readInt32BE(0) !== XTC_MAGIC) throw bad(path, `not an XTC file (magic number ${s.buffer.readInt32BE(0)}, expected ${XTC_MAGIC})`);
    return s.buffer.readInt32BE(4);
  } finally {
    await s.close();
  }
}

/**
 * Yields the frames of an XTC file (coordinates in Å, buffer reused). A frame that does not decode, or a
 * file that ends inside a frame, is an error naming the frame and its byte offset.
 * @example for await (const f of xtcFrames('md.xtc')) use(f.coords, f.box, f.timePs)
 */
export async function* xtcFrames(path: string): AsyncGenerator<XdrFrame> {
  const s = await BinaryStream.open(path);
  try {
    let coords = new Float64Array(0);
    const box = new Float64Array(9);
    for (let index = 1; s.remaining > 0; index++) {
      const offset = s.offset;
      const where = `frame ${index} (byte ${offset})`;
      const cut = () => bad(path, `${where} is truncated (the file ends inside it)`);
      if (!(await s.ensure(56))) throw cut();
      let b = s.buffer;
      let at = s.at;
      const magic = b.readInt32BE(at);
      if (magic !== XTC_MAGIC) throw bad(path, `${where}: not an XTC frame (magic number ${magic}, expected ${XTC_MAGIC})`);
      const atoms = b.readInt32BE(at + 4);
      if (!(atoms > 0) || b.readInt32BE(at + 52) !== atoms) throw bad(path, `${where}: broken frame header (atom counts ${atoms} and ${b.readInt32BE(at + 52)})`);
      if (atoms > MAX_ATOMS) throw bad(path, `${where}: atom count ${atoms} is not plausible`);
      if (index === 1) coords = new Float64Array(3 * atoms);
      else if (3 * atoms !== coords.length) throw bad(path, `${where} has ${atoms} atoms, frame 1 had ${coords.length / 3}`);
      const step = b.readInt32BE(at + 8);
      const timePs = b.readFloatBE(at + 12);
      let frameBytes: number;
      if (atoms <= 9) {
        frameBytes = 56 + 12 * atoms;
        if (frameBytes > s.remaining || !(await s.ensure(frameBytes))) throw cut();
        b = s.buffer;
        at = s.at;
        for (let k = 0; k < 3 * atoms; k++) coords[k] = b.readFloatBE(at + 56 + 4 * k) * 10;
      } else {
        if (!(await s.ensure(92))) throw cut();
        b = s.buffer;
        at = s.at;
        const byteCount = b.readInt32BE(at + 88);
        if (!(byteCount >= 0)) throw bad(path, `${where}: negative byte count ${byteCount}`);
        frameBytes = 92 + 4 * Math.ceil(byteCount / 4);
        if (frameBytes > s.remaining || !(await s.ensure(frameBytes))) throw cut();
        b = s.buffer;
        at = s.at;
        const int = (k: number) => b.readInt32BE(at + 60 + 4 * k);
        const block = {
          precision: b.readFloatBE(at + 56),
          minint: [int(0), int(1), int(2)] as const,
          maxint: [int(3), int(4), int(5)] as const,
          smallidx: int(6),
          byteCount,
        };
        if (!(block.precision > 0)) throw bad(path, `${where}: precision ${block.precision} is not positive`);
        try {
          decodeXtcCoords(b, at + 92, block, atoms, coords, 10);
        } catch (err) {
          if (err instanceof RangeError) throw bad(path, `${where}: compressed coordinates do not decode (${err.message})`);
          throw err;
        }
      }
      const cell = readBox(b, at + 16, box);
      await s.skip(frameBytes);
      yield { index, step, timePs, coords, box: cell, offset };
    }
  } finally {
    await s.close();
  }
}
