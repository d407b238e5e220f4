/**
 * Eigen-decomposition of a small real symmetric matrix by the cyclic Jacobi method (rotations that zero one
 * off-diagonal element at a time; e.g. Golub & Van Loan, Matrix Computations, §8.5 — from memory). Used for
 * the 4×4 quaternion matrix of Horn's superposition, where it is exact to rounding and never fails.
 */

/** Eigenvalues (descending) and matching unit eigenvectors (`vectors[k]` belongs to `values[k]`). */
export interface SymmetricEigen {
  readonly values: readonly number[];
  readonly vectors: readonly (readonly number[])[];
}

/**
 * Eigenvalues and eigenvectors of the symmetric matrix `matrix` (rows; only symmetry is assumed, not checked).
 * @example symmetricEigen([[2, 0], [0, 1]]).values // [2, 1]
 */
export function symmetricEigen(matrix: readonly (readonly number[])[], maxSweeps = 60): SymmetricEigen {
  const n = matrix.length;
  const a = matrix.map((row) => [...row]);
  const v: number[][] = Array.from({ length: n }, (_, i) => Array.from({ length: n }, (_, j) => (i === j ? 1 : 0)));
  const scale = Math.max(1e-300, ...a.flat().map(Math.abs));
  for (let sweep = 0; sweep < maxSweeps; sweep++) {
    let off = 0;
    for (let p = 0; p < n; p++) for (let q = p + 1; q < n; q++) off += a[p]![q]! * a[p]![q]!;
    if (Math.sqrt(off) <= 1e-15 * scale) break;
    for (let p = 0; p < n; p++) {
      for (let q = p + 1; q < n; q++) {
        const apq = a[p]![q]!;
        if (apq === 0) continue;
        const theta = (a[q]![q]! - a[p]![p]!) / (2 * apq);
        const t = Math.sign(theta || 1) / (Math.abs(theta) + Math.sqrt(theta * theta + 1));
        const c = 1 / Math.sqrt(t * t + 1);
        const s = t * c;
        for (let k = 0; k < n; k++) {
          const akp = a[k]![p]!;
          const akq = a[k]![q]!;
          a[k]![p] = c * akp - s * akq;
          a[k]![q] = s * akp + c * akq;
        }
        for (let k = 0; k < n; k++) {
          const apk = a[p]![k]!;
          const aqk = a[q]![k]!;
          a[p]![k] = c * apk - s * aqk;
          a[q]![k] = s * apk + c * aqk;
        }
        for (let k = 0; k < n; k++) {
          const vkp = v[k]![p]!;
          const vkq = v[k]![q]!;
          v[k]![p] = c * vkp - s * vkq;
          v[k]![q] = s * vkp + c * vkq;
        }
      }
    }
  }
  const order = Array.from({ length: n }, (_, i) => i).sort((i, j) => a[j]![j]! - a[i]![i]!);
  return {
    values: order.map((i) => a[i]![i]!),
    vectors: order.map((i) => v.map((row) => row[i]!)),
  };
}
