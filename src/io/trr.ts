/**
 * TRR trajectories (GROMACS full-precision frames), read frame by frame in constant memory. Each frame, in
 * XDR (big-endian): magic 1993, the string length 13, the XDR string `GMX_trn_file` (length 12 + 12 bytes),
 * thirteen integers (byte sizes of input record, energies, box, virial, pressure, topology, symmetry,
 * positions, velocities and forces; atom count, step, energy count), then time and λ as reals, then the box,
 * virial, pressure, positions, velocities and forces blocks that have a non-zero size. Reals are 4 or 8 bytes
 * (single or double precision: box size / 9, or position size / 3 atoms). Units nm and ps. Frames without
 * positions are skipped. Common practice, no source (format as the GROMACS xdrfile library writes it).
 */
import { ConformarkError } from '../model/errors.js';
import { BinaryStream } from './binaryStream.js';
import { MAX_ATOMS, readBox, type XdrFrame } from './xtc.js';

export const TRR_MAGIC = 1993;

function bad(file: string, message: string): ConformarkError {
  return new ConformarkError({ code: 'bad-trr', file, line: null, message });
}

/** Byte sizes and counts of one TRR frame header. */
interface TrrHeader {
  readonly headerBytes: number;
  readonly real: 4 | 8;
  readonly box: number;
  readonly vir: number;
  readonly pres: number;
  readonly x: number;
  readonly v: number;
  readonly f: number;
  readonly atoms: number;
  readonly step: number;
  readonly timePs: number;
}

/** Parses the header at `s.at` (which must hold 92 bytes); throws a message for a non-TRR header. */
function header(b: Buffer, at: number, path: string, where: string): TrrHeader | string {
  const magic = b.readInt32BE(at);
  if (magic !== TRR_MAGIC) return `not a TRR frame (magic number ${magic}, expected ${TRR_MAGIC})`;
  const slen = b.readInt32BE(at + 8);
  if (slen < 0 || slen > 128) return `broken version string (length ${slen})`;
  let p = at + 12 + 4 * Math.ceil(slen / 4);
  const int = () => {
    const v = b.readInt32BE(p);
    p += 4;
    return v;
  };
  const [ir, e, box, vir, pres, top, sym, x, v, f, atoms, step] = Array.from({ length: 12 }, int) as number[];
  int(); // energy count
  if ([ir, e, top, sym].some((n) => n !== 0)) throw bad(path, `${where}: TRR frames with an input record, energies, topology or symmetry block are not read`);
  if (!(atoms! > 0) || atoms! > MAX_ATOMS) return `atom count ${atoms} is not plausible`;
  const real = box! > 0 ? box! / 9 : x! > 0 ? x! / (3 * atoms!) : v! > 0 ? v! / (3 * atoms!) : f! > 0 ? f! / (3 * atoms!) : 4;
  if (real !== 4 && real !== 8) return `block sizes fit neither single nor double precision (box ${box} bytes, positions ${x} bytes, ${atoms} atoms)`;
  if ([x, v, f].some((n) => n !== 0 && n !== 3 * atoms! * real) || [box, vir, pres].some((n) => n !== 0 && n !== 9 * real)) {
    return `block sizes do not fit ${atoms} atoms`;
  }
  const timePs = real === 8 ? b.readDoubleBE(p) : b.readFloatBE(p);
  p += 2 * real;
  return { headerBytes: p - at, real, box: box!, vir: vir!, pres: pres!, x: x!, v: v!, f: f!, atoms: atoms!, step: step!, timePs };
}

/** The atom count of a TRR file (from its first frame). */
export async function trrAtomCount(path: string): Promise<number> {
  const s = await BinaryStream.open(path);
  try {
    if (!(await s.ensure(Math.min(s.size, 108))) || s.size < 64) throw bad(path, 'too short for a TRR file');
    const h = header(s.buffer, 0, path, 'frame 1 (byte 0)');
    if (typeof h === 'string') throw bad(path, h.startsWith('not a TRR') ? h.replace('frame', 'file') : `frame 1 (byte 0): ${h}`);
    return h.atoms;
  } finally {
    await s.close();
  }
}

/**
 * Yields the frames of a TRR file that carry positions (Å, buffer reused); velocities and forces are skipped.
 * A broken or truncated frame is an error naming the frame and its byte offset.
 * @example for await (const f of trrFrames('md.trr')) use(f.coords, f.box, f.timePs)
 */
export async function* trrFrames(path: string): AsyncGenerator<XdrFrame> {
  const s = await BinaryStream.open(path);
  try {
    let coords: Float64Array | null = null;
    const boxBuf = new Float64Array(9);
    let index = 0;
    for (let frame = 1; s.remaining > 0; frame++) {
      const offset = s.offset;
      const where = `frame ${frame} (byte ${offset})`;
      const cut = () => bad(path, `${where} is truncated (the file ends inside it)`);
      if (!(await s.ensure(Math.min(108, s.remaining))) || s.remaining < 64) throw cut();
      const h = header(s.buffer, s.at, path, where);
      if (typeof h === 'string') throw bad(path, `${where}: ${h}`);
      const bytes = h.headerBytes + h.box + h.vir + h.pres + h.x + h.v + h.f;
      if (h.x === 0) {
        if (s.remaining < bytes) throw cut();
        await s.skip(bytes);
        continue;
      }
      if (s.remaining < bytes || !(await s.ensure(h.headerBytes + h.box + h.vir + h.pres + h.x))) throw cut();
      if (coords === null) coords = new Float64Array(3 * h.atoms);
      else if (coords.length !== 3 * h.atoms) throw bad(path, `${where} has ${h.atoms} atoms, the first frame had ${coords.length / 3}`);
      const b = s.buffer;
      const at = s.at + h.headerBytes;
      const box = h.box > 0 ? readBox(b, at, boxBuf, h.real === 8) : null;
      const xAt = at + h.box + h.vir + h.pres;
      if (h.real === 8) for (let k = 0; k < 3 * h.atoms; k++) coords[k] = b.readDoubleBE(xAt + 8 * k) * 10;
      else for (let k = 0; k < 3 * h.atoms; k++) coords[k] = b.readFloatBE(xAt + 4 * k) * 10;
      if (s.remaining < bytes) throw cut();
      await s.skip(bytes);
      yield { index: ++index, step: h.step, timePs: h.timePs, coords, box, offset };
    }
  } finally {
    await s.close();
  }
}
