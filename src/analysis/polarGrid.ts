/**
 * A 2D histogram on a disc with cells of equal area: ring k of K (radius k/K … (k+1)/K of the disc) is cut
 * into 6(2k + 1) sectors, and an annulus's area grows as 2k + 1, so every cell covers π/(6K²) of the unit
 * disc. On an equal-area map of a hemisphere that makes every cell the same solid angle, so counts compare
 * directly. Fixed memory (6K² counters) whatever the number of points.
 */

/** Geometry of one cell: radii as fractions of the disc radius, angles in degrees clockwise from 12 o'clock. */
export interface PolarCell {
  readonly ring: number;
  readonly inner: number;
  readonly outer: number;
  readonly startDeg: number;
  readonly endDeg: number;
  readonly count: number;
}

/**
 * Equal-area polar histogram.
 * @example const g = new PolarGrid(12); g.add(0.5, 30); g.total // 1
 */
export class PolarGrid {
  readonly counts: Uint32Array;
  /** Points added (points beyond the rim are counted in the outer ring). */
  total = 0;
  /** Points that were beyond the rim (r > 1) and were put in the outer ring. */
  clamped = 0;

  constructor(readonly rings: number) {
    if (!Number.isInteger(rings) || rings < 1) throw new RangeError('a polar grid needs at least one ring');
    this.counts = new Uint32Array(6 * rings * rings);
  }

  /** Sectors in ring k. */
  static sectors(k: number): number {
    return 6 * (2 * k + 1);
  }

  /** Adds a point at radius `r` (fraction of the disc radius, ≥ 0) and angle `angleDeg` (any real). */
  add(r: number, angleDeg: number): void {
    const K = this.rings;
    if (r > 1) this.clamped++;
    let k = Math.floor(r * K);
    if (k >= K) k = K - 1;
    if (k < 0) k = 0;
    const m = 6 * (2 * k + 1);
    let a = angleDeg % 360;
    if (a < 0) a += 360;
    let s = Math.floor((a / 360) * m);
    if (s >= m) s = m - 1;
    this.counts[6 * k * k + s]!++;
    this.total++;
  }

  /** Every cell with at least one point. */
  cells(): PolarCell[] {
    const out: PolarCell[] = [];
    const K = this.rings;
    for (let k = 0; k < K; k++) {
      const m = 6 * (2 * k + 1);
      for (let s = 0; s < m; s++) {
        const count = this.counts[6 * k * k + s]!;
        if (count === 0) continue;
        out.push({ ring: k, inner: k / K, outer: (k + 1) / K, startDeg: (360 * s) / m, endDeg: (360 * (s + 1)) / m, count });
      }
    }
    return out;
  }
}
