/**
 * Decompression of XTC coordinates (the GROMACS "xdr3dfcoord" scheme of F. van Hoesel; common practice, no
 * published source; written here from the format's description). Coordinates are integers in units of
 * 1/precision nm; each frame gives the integer range (minint…maxint per axis) and a bit stream, most significant
 * bit first. Every atom is either written in full — three integers packed as one mixed-radix number of
 * `bitsize` bits (or, for ranges beyond 2^24, as three plain bit fields) — or follows the previous atom as a
 * small difference in a run. A 1-bit flag after each full atom announces a run: 5 bits give its length (times
 * 3) plus a change of the small-difference size (−1, 0, +1 step in a table of sizes growing by 2^(1/3)); each
 * run atom is three integers of that size packed into `smallidx` bits, offset by half the size. The first atom
 * of a run is swapped with the full atom before it (water O–H order). Nine atoms or fewer are stored as plain
 * floats instead.
 */

/** Sizes of small differences; index i packs three of them into about i bits; halves are integer halves (rounded down). */
const MAGIC = [
  0, 0, 0, 0, 0, 0, 0, 0, 0, 8, 10, 12, 16, 20, 25, 32, 40, 50, 64, 80, 101, 128, 161, 203, 256, 322, 406, 512, 645, 812, 1024, 1290,
  1625, 2048, 2580, 3250, 4096, 5060, 6501, 8192, 10321, 13003, 16384, 20642, 26007, 32768, 41285, 52015, 65536, 82570, 104031, 131072,
  165140, 208063, 262144, 330280, 416127, 524287, 660561, 832255, 1048576, 1321122, 1664510, 2097152, 2642245, 3329021, 4194304, 5284491,
  6658042, 8388607, 10568983, 13316085, 16777216,
];
const FIRST = 9;

/** Bits needed to write every integer below `size` (the bit length of `size`). */
function bitsOf(size: number): number {
  let bits = 0;
  while (bits < 32 && size >= 2 ** bits) bits++;
  return bits;
}

/** Bits of the product of three sizes (each below 2^24), as the packed number needs. */
function bitsOfProduct(a: number, b: number, c: number): number {
  const p = BigInt(a) * BigInt(b) * BigInt(c);
  return p.toString(2).length;
}

/** A most-significant-bit-first reader over `bytes[from, to)`. */
class Bits {
  private pos: number;
  private acc = 0;
  private have = 0;
  constructor(
    private readonly bytes: Uint8Array,
    from: number,
    private readonly to: number,
  ) {
    this.pos = from;
  }

  /** The next `n` bits (n ≤ 32) as an unsigned number; throws past the end of the stream. */
  read(n: number): number {
    let out = 0;
    while (n > 0) {
      if (this.have === 0) {
        if (this.pos >= this.to) throw new RangeError('compressed coordinates end early');
        this.acc = this.bytes[this.pos++]!;
        this.have = 8;
      }
      const take = n < this.have ? n : this.have;
      const shift = this.have - take;
      out = out * (1 << take) + ((this.acc >> shift) & ((1 << take) - 1));
      this.have = shift;
      n -= take;
    }
    return out;
  }

  /**
   * Three integers packed as one number of `bits` bits, least significant byte first, in mixed radix
   * `sizes` (the last size varies fastest); written to `out[0..2]`.
   */
  readPacked(bits: number, s0: number, s1: number, s2: number, out: Int32Array): void {
    const bytes = PACK;
    let count = 0;
    while (bits > 8) {
      bytes[count++] = this.read(8);
      bits -= 8;
    }
    if (bits > 0) bytes[count++] = this.read(bits);
    out[2] = divideBytes(bytes, count, s2);
    out[1] = divideBytes(bytes, count, s1);
    let n = 0;
    for (let j = count - 1; j >= 0; j--) n = n * 256 + bytes[j]!;
    out[0] = n;
  }
}

const PACK = new Int32Array(32);

/** Divides the little-endian byte number in place by `size`; returns the remainder. */
function divideBytes(bytes: Int32Array, count: number, size: number): number {
  let rest = 0;
  for (let j = count - 1; j >= 0; j--) {
    const num = rest * 256 + bytes[j]!;
    const q = Math.floor(num / size);
    bytes[j] = q;
    rest = num - q * size;
  }
  return rest;
}

/** The fixed part of a compressed block: precision, integer range, first small size, byte count. */
export interface XtcBlock {
  readonly precision: number;
  readonly minint: readonly [number, number, number];
  readonly maxint: readonly [number, number, number];
  readonly smallidx: number;
  readonly byteCount: number;
}

const THIS = new Int32Array(3);
const RUN = new Int32Array(3);

/**
 * Decodes the bit stream `bytes[from, from + block.byteCount)` of `atoms` atoms into `out` (x, y, z of atom i at
 * 3i…), multiplied by `scale` (10 for Å from nm). Throws `RangeError` on a stream that does not fit.
 */
export function decodeXtcCoords(bytes: Uint8Array, from: number, block: XtcBlock, atoms: number, out: Float64Array, scale: number): void {
  const [m0, m1, m2] = block.minint;
  const s0 = block.maxint[0] - m0 + 1, s1 = block.maxint[1] - m1 + 1, s2 = block.maxint[2] - m2 + 1;
  if (!(s0 > 0 && s1 > 0 && s2 > 0)) throw new RangeError('the coordinate range is empty');
  const large = s0 > 0xffffff || s1 > 0xffffff || s2 > 0xffffff;
  const b0 = bitsOf(s0), b1 = bitsOf(s1), b2 = bitsOf(s2);
  const bitsize = large ? 0 : bitsOfProduct(s0, s1, s2);
  let smallidx = block.smallidx;
  if (smallidx < FIRST || smallidx >= MAGIC.length) throw new RangeError(`small-size index ${smallidx} is outside the table`);
  let smaller = MAGIC[Math.max(FIRST, smallidx - 1)]! >> 1;
  let smallnum = MAGIC[smallidx]! >> 1;
  let sizesmall = MAGIC[smallidx]!;
  const bits = new Bits(bytes, from, from + block.byteCount);
  const f = scale / block.precision;
  let i = 0;
  let w = 0;
  let run = 0;
  while (i < atoms) {
    if (bitsize === 0) {
      THIS[0] = bits.read(b0);
      THIS[1] = bits.read(b1);
      THIS[2] = bits.read(b2);
    } else bits.readPacked(bitsize, s0, s1, s2, THIS);
    i++;
    let px = THIS[0]! + m0, py = THIS[1]! + m1, pz = THIS[2]! + m2;
    let isSmaller = 0;
    if (bits.read(1) === 1) {
      run = bits.read(5);
      isSmaller = (run % 3) - 1;
      run -= run % 3;
    }
    if (run > 0) {
      if (i + run / 3 > atoms) throw new RangeError('a run goes past the last atom');
      for (let k = 0; k < run; k += 3) {
        bits.readPacked(smallidx, sizesmall, sizesmall, sizesmall, RUN);
        i++;
        const x = RUN[0]! + px - smallnum, y = RUN[1]! + py - smallnum, z = RUN[2]! + pz - smallnum;
        if (k === 0) {
          // the first run atom was written before the full one (water: O after its first H)
          out[w++] = x * f;
          out[w++] = y * f;
          out[w++] = z * f;
          out[w++] = px * f;
          out[w++] = py * f;
          out[w++] = pz * f;
        } else {
          out[w++] = x * f;
          out[w++] = y * f;
          out[w++] = z * f;
        }
        px = x;
        py = y;
        pz = z;
      }
    } else {
      out[w++] = px * f;
      out[w++] = py * f;
      out[w++] = pz * f;
    }
    smallidx += isSmaller;
    if (isSmaller < 0) {
      smallnum = smaller;
      smaller = smallidx > FIRST ? MAGIC[smallidx - 1]! >> 1 : 0;
    } else if (isSmaller > 0) {
      smaller = smallnum;
      smallnum = MAGIC[smallidx]! >> 1;
    }
    sizesmall = MAGIC[smallidx]!;
    if (sizesmall === undefined || smallidx < FIRST) throw new RangeError(`small-size index ${smallidx} is outside the table`);
  }
}
