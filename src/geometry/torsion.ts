/**
 * IUPAC torsion angle A–B–C–D (IUPAC 1996, PAC 68, 2193, p. 2220; Klyne & Prelog 1960): looking along B→C,
 * positive when B–A turns clockwise by less than 180° to eclipse C–D. Range (−180, 180], ±180 → +180.
 */
import type { Vec3 } from '../model/molecule.js';
import { cross, dot, norm, perpendicular, sub, unit, DEG } from './vec3.js';

/** Below this length (Å) a projected bond is treated as lying on the axis: the torsion is undefined. */
export const COLLINEAR_EPS = 1e-6;

/**
 * Torsion A–B–C–D in radians, or `null` when A–B–C or B–C–D is collinear or B and C coincide.
 * Formula: docs/methods.md#torsion (b1 = unit(C−B); v, w = A−B, D−C projected ⊥ b1; τ = atan2((b1×v)·w, v·w)).
 */
export function torsionRad(a: Vec3, b: Vec3, c: Vec3, d: Vec3): number | null {
  const b1 = unit(sub(c, b));
  if (!b1) return null;
  const v = perpendicular(sub(a, b), b1);
  const w = perpendicular(sub(d, c), b1);
  if (norm(v) < COLLINEAR_EPS || norm(w) < COLLINEAR_EPS) return null;
  const t = Math.atan2(dot(cross(b1, v), w), dot(v, w));
  return t <= -Math.PI ? Math.PI : t;
}

/**
 * Torsion A–B–C–D in degrees, (−180, 180], or `null` when undefined (collinear atoms).
 * @example torsion([1,0,0],[0,0,0],[0,0,1],[0,1,1]) // 90
 */
export function torsion(a: Vec3, b: Vec3, c: Vec3, d: Vec3): number | null {
  const t = torsionRad(a, b, c, d);
  if (t === null) return null;
  const deg = t * DEG;
  return deg <= -180 ? 180 : deg;
}
