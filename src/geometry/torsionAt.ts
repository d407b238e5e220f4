/**
 * Torsion A–B–C–D (IUPAC sign, docs/methods.md#torsion) straight from a flat xyz array, without building vectors:
 * the per-frame form of `torsion` for trajectories.
 */

const DEG = 180 / Math.PI;
const COLLINEAR_EPS = 1e-6;

/**
 * Torsion of atoms a, b, c, d (0-based) in `coords` (x, y, z of atom i at 3i…3i+2), degrees in (−180, 180];
 * NaN when A–B–C or B–C–D is collinear (the same cases where `torsion` returns null).
 * @example torsionAt(frame.coords, 0, 1, 2, 3)
 */
export function torsionAt(coords: Float64Array, a: number, b: number, c: number, d: number): number {
  const bx = coords[3 * b]!, by = coords[3 * b + 1]!, bz = coords[3 * b + 2]!;
  const cx = coords[3 * c]!, cy = coords[3 * c + 1]!, cz = coords[3 * c + 2]!;
  let ux = cx - bx, uy = cy - by, uz = cz - bz;
  const ul = Math.sqrt(ux * ux + uy * uy + uz * uz);
  if (!(ul > 1e-12)) return NaN;
  ux /= ul; uy /= ul; uz /= ul;
  // v = (A − B) ⊥ u, w = (D − C) ⊥ u
  let vx = coords[3 * a]! - bx, vy = coords[3 * a + 1]! - by, vz = coords[3 * a + 2]! - bz;
  let t = vx * ux + vy * uy + vz * uz;
  vx -= t * ux; vy -= t * uy; vz -= t * uz;
  let wx = coords[3 * d]! - cx, wy = coords[3 * d + 1]! - cy, wz = coords[3 * d + 2]! - cz;
  t = wx * ux + wy * uy + wz * uz;
  wx -= t * ux; wy -= t * uy; wz -= t * uz;
  if (Math.sqrt(vx * vx + vy * vy + vz * vz) < COLLINEAR_EPS || Math.sqrt(wx * wx + wy * wy + wz * wz) < COLLINEAR_EPS) return NaN;
  const px = uy * vz - uz * vy, py = uz * vx - ux * vz, pz = ux * vy - uy * vx;
  const r = Math.atan2(px * wx + py * wy + pz * wz, vx * wx + vy * wy + vz * wz) * DEG;
  return r <= -180 ? 180 : r;
}
