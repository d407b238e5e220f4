/**
 * Periodic boxes: the three cell vectors from lengths and angles (a along x, b in the xy plane, the usual
 * crystallographic setting of PDB CRYST1 records; common practice, no source), the minimum image of a
 * displacement, and rings made whole across the box by walking along their bonds.
 */

/** A periodic cell: row vectors a, b, c (Å) at 0..2, 3..5, 6..8, and the inverse matrix. */
export interface PeriodicBox {
  /** a, b, c lengths (Å) and α, β, γ (degrees) as given. */
  readonly lengths: readonly [number, number, number];
  readonly anglesDeg: readonly [number, number, number];
  /** Row vectors a, b, c. */
  readonly vectors: Float64Array;
  /** Inverse of the row-vector matrix: fractional = cartesian · inverse. */
  readonly inverse: Float64Array;
}

const DEG = Math.PI / 180;

/**
 * The box of lengths a, b, c (Å) and angles α (b,c), β (a,c), γ (a,b) in degrees; `null` when the cell is
 * missing or unusable (a zero length, as some writers put for "no box", or angles that make no cell).
 * @example boxFromLengths(30, 30, 30, 90, 90, 90)!.vectors[4] // 30
 */
export function boxFromLengths(a: number, b: number, c: number, alpha = 90, beta = 90, gamma = 90): PeriodicBox | null {
  if (![a, b, c, alpha, beta, gamma].every(Number.isFinite) || !(a > 0 && b > 0 && c > 0)) return null;
  const ca = Math.cos(alpha * DEG), cb = Math.cos(beta * DEG), cg = Math.cos(gamma * DEG), sg = Math.sin(gamma * DEG);
  // exact right angles print as 90 but cos(90°) is 6e-17: snap so orthorhombic boxes stay orthorhombic
  const snap = (x: number) => (Math.abs(x) < 1e-12 ? 0 : x);
  if (!(Math.abs(sg) > 1e-9)) return null;
  const cx = c * snap(cb);
  const cy = (c * (snap(ca) - snap(cb) * snap(cg))) / sg;
  const cz2 = c * c - cx * cx - cy * cy;
  if (!(cz2 > 1e-9)) return null;
  const v = Float64Array.of(a, 0, 0, b * snap(cg), b * sg, 0, cx, cy, Math.sqrt(cz2));
  return { lengths: [a, b, c], anglesDeg: [alpha, beta, gamma], vectors: v, inverse: invert(v) };
}

/**
 * The box of three row vectors a, b, c (Å, nine numbers) as GROMACS-style files give it (a along x, b in the
 * xy plane: lower triangular); any other orientation is rebuilt from its lengths and angles (the same cell, in
 * the setting of `boxFromLengths`). `null` for a zero or flat box (vacuum runs write zeros).
 * @example boxFromVectors([30, 0, 0, 0, 30, 0, 0, 0, 30])!.lengths // [30, 30, 30]
 */
export function boxFromVectors(v: ArrayLike<number>): PeriodicBox | null {
  const len = (k: number) => Math.hypot(v[k]!, v[k + 1]!, v[k + 2]!);
  const angle = (i: number, j: number) => (Math.acos((v[i]! * v[j]! + v[i + 1]! * v[j + 1]! + v[i + 2]! * v[j + 2]!) / (len(i) * len(j))) * 180) / Math.PI;
  const a = len(0), b = len(3), c = len(6);
  if (!(a > 0 && b > 0 && c > 0)) return null;
  const alpha = angle(3, 6), beta = angle(0, 6), gamma = angle(0, 3);
  const lower = v[1] === 0 && v[2] === 0 && v[5] === 0 && v[0]! > 0 && v[4]! > 0 && v[8]! > 0;
  if (!lower) return boxFromLengths(a, b, c, alpha, beta, gamma);
  const vectors = Float64Array.from(v as ArrayLike<number>);
  return { lengths: [a, b, c], anglesDeg: [alpha, beta, gamma], vectors, inverse: invert(vectors) };
}

/** Inverse of a lower-triangular 3×3 row-vector matrix (the form `boxFromLengths` builds). */
function invert(m: Float64Array): Float64Array {
  const [a, , , bx, by, , cx, cy, cz] = m as unknown as number[];
  const ia = 1 / a!, iby = 1 / by!, icz = 1 / cz!;
  // rows: inverse of [[a,0,0],[bx,by,0],[cx,cy,cz]]
  const r10 = -bx! * ia * iby;
  const r20 = (bx! * cy! - by! * cx!) * ia * iby * icz;
  const r21 = -cy! * iby * icz;
  return Float64Array.of(ia, 0, 0, r10, iby, 0, r20, r21, icz);
}

/**
 * Moves atom `to` by whole cell vectors to the image nearest atom `from` (minimum image through fractional
 * coordinates, exact for orthorhombic cells and for the bond-length displacements of a ring in any cell of
 * sensible shape). Edits `coords` in place.
 */
export function nearestImage(coords: Float64Array, from: number, to: number, box: PeriodicBox): void {
  const v = box.vectors, w = box.inverse;
  const dx = coords[3 * to]! - coords[3 * from]!;
  const dy = coords[3 * to + 1]! - coords[3 * from + 1]!;
  const dz = coords[3 * to + 2]! - coords[3 * from + 2]!;
  // fractional = d · inverse (row vector times matrix)
  const fa = Math.round(dx * w[0]! + dy * w[3]! + dz * w[6]!);
  const fb = Math.round(dx * w[1]! + dy * w[4]! + dz * w[7]!);
  const fc = Math.round(dx * w[2]! + dy * w[5]! + dz * w[8]!);
  if (fa === 0 && fb === 0 && fc === 0) return;
  coords[3 * to] = coords[3 * to]! - (fa * v[0]! + fb * v[3]! + fc * v[6]!);
  coords[3 * to + 1] = coords[3 * to + 1]! - (fa * v[1]! + fb * v[4]! + fc * v[7]!);
  coords[3 * to + 2] = coords[3 * to + 2]! - (fa * v[2]! + fb * v[5]! + fc * v[8]!);
}

/**
 * Makes a chain of bonded atoms whole: each atom after the first is moved to the image nearest its
 * predecessor (for a ring in cyclic order, the ring is then whole). Edits `coords` in place.
 * @example makeWhole(frame.coords, ring, box)
 */
export function makeWhole(coords: Float64Array, chain: ArrayLike<number>, box: PeriodicBox): void {
  for (let k = 1; k < chain.length; k++) nearestImage(coords, chain[k - 1]!, chain[k]!, box);
}

/**
 * The first bond of the cyclic `ring` longer than its limit (`limits[k]` for the bond ring[k]–ring[k+1]),
 * or -1 when every bond is within its limit.
 */
export function longRingBond(coords: Float64Array, ring: ArrayLike<number>, limits: ArrayLike<number>): number {
  const n = ring.length;
  for (let k = 0; k < n; k++) {
    const i = ring[k]!, j = ring[(k + 1) % n]!;
    const dx = coords[3 * j]! - coords[3 * i]!, dy = coords[3 * j + 1]! - coords[3 * i + 1]!, dz = coords[3 * j + 2]! - coords[3 * i + 2]!;
    const lim = limits[k]!;
    if (dx * dx + dy * dy + dz * dz > lim * lim) return k;
  }
  return -1;
}
