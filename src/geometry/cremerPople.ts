/**
 * Cremer–Pople ring puckering coordinates (Cremer & Pople 1975, J. Am. Chem. Soc. 97, 1354), for rings of any
 * size N ≥ 4, with the atoms in bonded order. Formulas as docs/methods.md#cremer-pople gives them (working formulas from
 * memory there, internally consistent: mean-plane conditions, Q² = Σq², exact inverse).
 *
 * Conventions: the geometric centroid; n = R′ × R″ normalised, which points toward the viewer who sees the
 * numbering run clockwise; φ_m in [0, 360); for six-rings θ = atan2(q2, q3) in [0, 180].
 */
import type { Vec3 } from '../model/molecule.js';
import { centroid, cross, dot, scale, sub, unit, add, DEG, RAD, wrap360 } from './vec3.js';

/** One puckering mode m with amplitude `q` (Å) and phase (deg); `phaseDeg` null for the last mode of even N. */
export interface PuckeringMode {
  readonly m: number;
  /** Amplitude in Å; signed for the m = N/2 mode of even rings. */
  readonly q: number;
  readonly phaseDeg: number | null;
}

/** Cremer–Pople puckering of one ring. */
export interface Puckering {
  /** Total puckering amplitude Q in Å. */
  readonly Q: number;
  readonly amplitudes: readonly PuckeringMode[];
  /** Six-rings only: θ in [0, 180]; otherwise null. */
  readonly thetaDeg: number | null;
  /** φ2 in [0, 360), or null when q2 is below `phaseThreshold` (no meaning) or N = 4. */
  readonly phiDeg: number | null;
  /** Unit mean-plane normal (Cremer–Pople n). */
  readonly normal: Vec3;
  readonly centre: Vec3;
  /** Displacements z_j of each ring atom from the mean plane, Å. */
  readonly z: readonly number[];
}

/** Below this q2 (Å) φ2 is not reported (docs/methods.md#cremer-pople, common practice, no source). */
export const PHASE_THRESHOLD = 0.05;

/** Mean-plane frame of a ring: centroid, Cremer–Pople normal and displacements; `null` if degenerate. */
export function meanPlane(points: readonly Vec3[]): { centre: Vec3; normal: Vec3; z: number[] } | null {
  const n = points.length;
  const centre = centroid(points);
  let r1: Vec3 = [0, 0, 0];
  let r2: Vec3 = [0, 0, 0];
  points.forEach((p, j) => {
    const rj = sub(p, centre);
    const a = (2 * Math.PI * j) / n;
    r1 = add(r1, scale(rj, Math.sin(a)));
    r2 = add(r2, scale(rj, Math.cos(a)));
  });
  const normal = unit(cross(r1, r2));
  if (!normal) return null;
  return { centre, normal, z: points.map((p) => dot(sub(p, centre), normal)) };
}

/**
 * Cremer–Pople coordinates of a ring given in bonded order; `null` when the ring is degenerate
 * (fewer than 4 atoms, or all atoms collinear).
 * @example cremerPople(chairAtoms).thetaDeg // ≈ 0 for a chair whose atom 1 is above the plane
 */
export function cremerPople(points: readonly Vec3[], phaseThreshold = PHASE_THRESHOLD): Puckering | null {
  const n = points.length;
  if (n < 4) return null;
  const plane = meanPlane(points);
  if (!plane) return null;
  const { z } = plane;
  const amplitudes: PuckeringMode[] = [];
  const last = n % 2 === 1 ? (n - 1) / 2 : n / 2 - 1;
  for (let m = 2; m <= last; m++) {
    let c = 0;
    let s = 0;
    z.forEach((zj, j) => {
      const a = (2 * Math.PI * m * j) / n;
      c += zj * Math.cos(a);
      s += zj * Math.sin(a);
    });
    c *= Math.sqrt(2 / n);
    s *= -Math.sqrt(2 / n);
    amplitudes.push({ m, q: Math.hypot(c, s), phaseDeg: wrap360(Math.atan2(s, c) * DEG) });
  }
  if (n % 2 === 0) {
    const q = z.reduce((acc, zj, j) => acc + (j % 2 === 0 ? zj : -zj), 0) / Math.sqrt(n);
    amplitudes.push({ m: n / 2, q, phaseDeg: null });
  }
  const Q = Math.sqrt(z.reduce((acc, zj) => acc + zj * zj, 0));
  const mode2 = amplitudes[0]!;
  let thetaDeg: number | null = null;
  if (n === 6) thetaDeg = Math.atan2(mode2.q, amplitudes[1]!.q) * DEG;
  const phiDeg = n === 4 || mode2.phaseDeg === null || mode2.q < phaseThreshold ? null : mode2.phaseDeg;
  return { Q, amplitudes, thetaDeg, phiDeg, normal: plane.normal, centre: plane.centre, z };
}

/**
 * Inverse Cremer–Pople formula (docs/methods.md#cremer-pople, step 6): displacements z_j for a ring of `n` atoms from its
 * modes. For six-rings use `sixRingModes(Q, θ, φ)`.
 */
export function displacementsFromModes(n: number, modes: readonly PuckeringMode[]): number[] {
  return Array.from({ length: n }, (_, j) => {
    let zj = 0;
    for (const { m, q, phaseDeg } of modes) {
      if (n % 2 === 0 && m === n / 2) zj += (q / Math.sqrt(n)) * (j % 2 === 0 ? 1 : -1);
      else zj += Math.sqrt(2 / n) * q * Math.cos((phaseDeg ?? 0) * RAD + (2 * Math.PI * m * j) / n);
    }
    return zj;
  });
}

/** Six-ring modes (q2, φ2, q3) from spherical (Q, θ, φ) in Å and degrees. */
export function sixRingModes(Q: number, thetaDeg: number, phiDeg: number): PuckeringMode[] {
  return [
    { m: 2, q: Q * Math.sin(thetaDeg * RAD), phaseDeg: phiDeg },
    { m: 3, q: Q * Math.cos(thetaDeg * RAD), phaseDeg: null },
  ];
}

/**
 * Ideal ring coordinates with the given displacements: atoms on a regular polygon of circumradius `radius`
 * (Å) in the xy plane, placed clockwise as seen from +z so that the Cremer–Pople normal is +z, each lifted by
 * its z_j. Useful for building test rings and for reshaping a real ring.
 */
export function ringFromDisplacements(z: readonly number[], radius = 1.45): Vec3[] {
  const n = z.length;
  return z.map((zj, j) => {
    const a = (-2 * Math.PI * j) / n; // clockwise seen from +z
    return [radius * Math.cos(a), radius * Math.sin(a), zj] as Vec3;
  });
}
