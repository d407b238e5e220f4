/**
 * Cremer–Pople puckering for one ring measured over and over (trajectories): the same formulas as
 * `cremerPople` (Cremer & Pople 1975, J. Am. Chem. Soc. 97, 1354; docs/methods.md#cremer-pople) with the sin/cos tables of
 * the ring size computed once and the results written into a caller-owned record, so the per-frame work
 * allocates nothing. Five-rings also get the Altona–Sundaralingam phase P and amplitude τm (Altona &
 * Sundaralingam 1972, J. Am. Chem. Soc. 94, 8205), as `analyzeRing` gives them by default: P from the closed
 * form, τm from ν2 / cos P, a least-squares fit near P = 90°/270°, or a blend between (altonaSundaralingamFit).
 */
import { torsionAt } from './torsionAt.js';
import { closedFormWeight } from './pseudorotation.js';

/** What the kernel writes for one frame. Fields are NaN where they do not apply. */
export class PuckerValues {
  /** Total amplitude Q, Å. */
  Q = NaN;
  /** Amplitude q2, Å. */
  q2 = NaN;
  /** Raw phase φ2 in [0, 360), deg (meaningless when q2 ≈ 0: callers withhold it). */
  phaseDeg = NaN;
  /** Six-rings: θ in [0, 180], deg. */
  thetaDeg = NaN;
  /** Five-rings: pseudorotation phase P in [0, 360), deg. */
  pDeg = NaN;
  /** Five-rings: τm, deg (closed form, least squares or blended, as altonaSundaralingamFit). */
  tauMDeg = NaN;
}

const SIN_SUM = Math.sin(Math.PI / 5) + Math.sin((2 * Math.PI) / 5);
const TWO_PI = 2 * Math.PI;
const DEG = 180 / Math.PI;

/**
 * A measuring routine for rings of `n` atoms (n ≥ 4).
 * @example const k = new PuckerKernel(6); const v = new PuckerValues(); k.measure(coords, ring, v); v.thetaDeg
 */
export class PuckerKernel {
  private readonly sin1: Float64Array;
  private readonly cos1: Float64Array;
  private readonly sin2: Float64Array;
  private readonly cos2: Float64Array;
  private readonly z: Float64Array;
  private readonly nu = new Float64Array(5);

  constructor(readonly n: number) {
    if (!Number.isInteger(n) || n < 4) throw new RangeError('a puckering kernel needs a ring of at least 4 atoms');
    this.sin1 = new Float64Array(n);
    this.cos1 = new Float64Array(n);
    this.sin2 = new Float64Array(n);
    this.cos2 = new Float64Array(n);
    this.z = new Float64Array(n);
    for (let j = 0; j < n; j++) {
      const a = (TWO_PI * j) / n;
      this.sin1[j] = Math.sin(a);
      this.cos1[j] = Math.cos(a);
      this.sin2[j] = Math.sin(2 * a);
      this.cos2[j] = Math.cos(2 * a);
    }
  }

  /** The displacements z (Å, ring order) of the last `measure`; overwritten by the next one. */
  get displacements(): Float64Array {
    return this.z;
  }

  /**
   * Measures the ring whose atoms (0-based, in bonded order) are `ring` in the flat xyz array `coords`.
   * Returns false (and leaves `out` as NaN) for a degenerate ring (collinear atoms) or non-finite input.
   */
  measure(coords: Float64Array, ring: Int32Array, out: PuckerValues): boolean {
    const n = this.n;
    out.Q = out.q2 = out.phaseDeg = out.thetaDeg = out.pDeg = out.tauMDeg = NaN;
    let cx = 0, cy = 0, cz = 0;
    for (let j = 0; j < n; j++) {
      const o = 3 * ring[j]!;
      cx += coords[o]!; cy += coords[o + 1]!; cz += coords[o + 2]!;
    }
    cx /= n; cy /= n; cz /= n;
    let ax = 0, ay = 0, az = 0, bx = 0, by = 0, bz = 0;
    for (let j = 0; j < n; j++) {
      const o = 3 * ring[j]!;
      const x = coords[o]! - cx, y = coords[o + 1]! - cy, w = coords[o + 2]! - cz;
      const s = this.sin1[j]!, c = this.cos1[j]!;
      ax += x * s; ay += y * s; az += w * s;
      bx += x * c; by += y * c; bz += w * c;
    }
    let nx = ay * bz - az * by, ny = az * bx - ax * bz, nz = ax * by - ay * bx;
    const len = Math.sqrt(nx * nx + ny * ny + nz * nz);
    if (!(len > 1e-12) || !Number.isFinite(len)) return false;
    nx /= len; ny /= len; nz /= len;
    const z = this.z;
    let sumSq = 0, c2 = 0, s2 = 0, alt = 0;
    for (let j = 0; j < n; j++) {
      const o = 3 * ring[j]!;
      const zj = (coords[o]! - cx) * nx + (coords[o + 1]! - cy) * ny + (coords[o + 2]! - cz) * nz;
      z[j] = zj;
      sumSq += zj * zj;
      c2 += zj * this.cos2[j]!;
      s2 += zj * this.sin2[j]!;
      alt += j % 2 === 0 ? zj : -zj;
    }
    const f = Math.sqrt(2 / n);
    c2 *= f;
    s2 *= -f;
    out.Q = Math.sqrt(sumSq);
    // For n = 4 the m = 2 mode is the alternating one (N/2), as in cremerPople.
    out.q2 = n === 4 ? alt / 2 : Math.sqrt(c2 * c2 + s2 * s2);
    if (n > 4) {
      const p = Math.atan2(s2, c2) * DEG;
      out.phaseDeg = p < 0 ? p + 360 : p;
    }
    if (n === 6) out.thetaDeg = Math.atan2(out.q2, alt / Math.sqrt(6)) * DEG;
    if (n === 5) this.pseudorotation(coords, ring, out);
    return true;
  }

  /** ν0 = (r5 r1 r2 r3), ν_k = (r_k r_k+1 r_k+2 r_k+3): the torsion starting at position k − 1. */
  private pseudorotation(coords: Float64Array, ring: Int32Array, out: PuckerValues): void {
    const nu = this.nu;
    for (let k = 0; k < 5; k++) {
      const j = (k + 4) % 5;
      nu[k] = torsionAt(coords, ring[j]!, ring[(j + 1) % 5]!, ring[(j + 2) % 5]!, ring[(j + 3) % 5]!);
      if (Number.isNaN(nu[k]!)) return;
    }
    const [n0, n1, n2, n3, n4] = nu as unknown as [number, number, number, number, number];
    // Altona–Sundaralingam closed-form P; τm as altonaSundaralingamFit (closed form, least squares, blended)
    const y = n4 + n1 - (n3 + n0);
    const x = 2 * n2 * SIN_SUM;
    if (Math.hypot(x, y) < 1e-9) return;
    const p = Math.atan2(y, x);
    const deg = p * DEG;
    out.pDeg = deg < 0 ? deg + 360 : deg;
    const c = Math.cos(p);
    const w = closedFormWeight(c);
    let fit = 0;
    if (w < 1) {
      for (let j = 0; j < 5; j++) fit += nu[j]! * Math.cos(p + ((144 * (j - 2)) / 180) * Math.PI);
      fit *= 0.4;
    }
    out.tauMDeg = w * (w > 0 ? n2 / c : 0) + (1 - w) * fit;
  }
}
