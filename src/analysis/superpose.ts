/**
 * Optimal rigid superposition of two point sets (proper rotation + translation, no reflection) by Horn's
 * closed-form unit-quaternion method (Horn 1987, J. Opt. Soc. Am. A 4, 629 — from memory): the rotation is
 * the eigenvector of the largest eigenvalue of a 4×4 symmetric matrix built from the cross-covariance of the
 * centred sets. The eigenproblem is solved with Jacobi rotations (symmetricEigen.ts), not Theobald's QCP.
 */
import type { Vec3 } from '../model/molecule.js';
import { centroid, sub } from '../geometry/vec3.js';
import { symmetricEigen } from './symmetricEigen.js';

/** Row-major 3×3 rotation matrix. */
export type Mat3 = readonly [Vec3, Vec3, Vec3];

/** Result of `superpose`: `target_i ≈ rotation · mobile_i + translation`. */
export interface Superposition {
  /** Root-mean-square deviation after superposition, Å. */
  readonly rmsdA: number;
  readonly rotation: Mat3;
  /** Å. */
  readonly translation: Vec3;
}

/** Applies a 3×3 matrix to a vector. */
export function applyMat3(m: Mat3, p: Vec3): Vec3 {
  return [
    m[0][0] * p[0] + m[0][1] * p[1] + m[0][2] * p[2],
    m[1][0] * p[0] + m[1][1] * p[1] + m[1][2] * p[2],
    m[2][0] * p[0] + m[2][1] * p[1] + m[2][2] * p[2],
  ];
}

function quaternionToMatrix(q: readonly number[]): Mat3 {
  const [w = 1, x = 0, y = 0, z = 0] = q;
  return [
    [w * w + x * x - y * y - z * z, 2 * (x * y - w * z), 2 * (x * z + w * y)],
    [2 * (x * y + w * z), w * w - x * x + y * y - z * z, 2 * (y * z - w * x)],
    [2 * (x * z - w * y), 2 * (y * z + w * x), w * w - x * x - y * y + z * z],
  ];
}

/**
 * Superposes `mobile` onto `target` (same length, same order) minimising the RMSD.
 * @example superpose(points, points).rmsdA // 0
 */
export function superpose(mobile: readonly Vec3[], target: readonly Vec3[]): Superposition {
  if (mobile.length !== target.length) throw new RangeError('superpose needs two point sets of the same length');
  const n = mobile.length;
  if (n === 0) return { rmsdA: 0, rotation: quaternionToMatrix([1, 0, 0, 0]), translation: [0, 0, 0] };
  const cm = centroid(mobile);
  const ct = centroid(target);
  // cross-covariance S_ij = Σ m_i t_j over the centred coordinates
  let sxx = 0, sxy = 0, sxz = 0, syx = 0, syy = 0, syz = 0, szx = 0, szy = 0, szz = 0;
  for (let k = 0; k < n; k++) {
    const [mx, my, mz] = sub(mobile[k]!, cm);
    const [tx, ty, tz] = sub(target[k]!, ct);
    sxx += mx * tx; sxy += mx * ty; sxz += mx * tz;
    syx += my * tx; syy += my * ty; syz += my * tz;
    szx += mz * tx; szy += mz * ty; szz += mz * tz;
  }
  const horn = [
    [sxx + syy + szz, syz - szy, szx - sxz, sxy - syx],
    [syz - szy, sxx - syy - szz, sxy + syx, szx + sxz],
    [szx - sxz, sxy + syx, -sxx + syy - szz, syz + szy],
    [sxy - syx, szx + sxz, syz + szy, -sxx - syy + szz],
  ];
  const q = symmetricEigen(horn).vectors[0]!;
  const rotation = quaternionToMatrix(q);
  const rc = applyMat3(rotation, cm);
  const translation: Vec3 = [ct[0] - rc[0], ct[1] - rc[1], ct[2] - rc[2]];
  let sum = 0;
  for (let k = 0; k < n; k++) {
    const p = applyMat3(rotation, mobile[k]!);
    const d = sub([p[0] + translation[0], p[1] + translation[1], p[2] + translation[2]], target[k]!);
    sum += d[0] * d[0] + d[1] * d[1] + d[2] * d[2];
  }
  return { rmsdA: Math.sqrt(sum / n), rotation, translation };
}
