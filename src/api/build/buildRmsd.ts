/**
 * Private to `build`: the smallest heavy-atom RMSD between two conformers over the symmetry permutations of
 * `buildSymmetry.ts` and over proper and improper superpositions (so mirror-image conformers of an achiral
 * molecule, such as the two twist-boat enantiomers of cyclohexane, count as one). Optimal rotation by
 * Horn's quaternion method (Horn 1987, J. Opt. Soc. Am. A 4, 629 — from memory):
 * RMSD² = (ΣA² + ΣB² − 2λmax)/N with λmax the largest eigenvalue of the 4×4 key matrix. The 4×4 eigenproblem is the shared
 * `symmetricEigen` (cyclic Jacobi); the symmetry and mirror search is what this adds to `heavyAtomRmsd`.
 */
import { symmetricEigen } from '../../analysis/symmetricEigen.js';

/**
 * Minimum RMSD (Å) between atoms `heavy` of two coordinate arrays (3 per atom), over the permutations
 * (positions into `heavy`) and over reflection.
 */
export function symmetricRmsd(
  a: Float64Array,
  b: Float64Array,
  heavy: readonly number[],
  permutations: readonly Int32Array[],
): number {
  const n = heavy.length;
  if (n === 0) return 0;
  const pa = centred(a, heavy);
  const pb = centred(b, heavy);
  const mirrored = pb.map((v, k) => (k % 3 === 0 ? -v : v));
  let best = Infinity;
  for (const perm of permutations) {
    best = Math.min(best, superposedRmsd(pa, pb, perm), superposedRmsd(pa, mirrored, perm));
    if (best < 1e-6) break;
  }
  return best;
}

/** Coordinates of the chosen atoms, centred on their centroid, packed 3 per atom. */
function centred(coords: Float64Array, atoms: readonly number[]): Float64Array {
  const out = new Float64Array(atoms.length * 3);
  const c = [0, 0, 0];
  atoms.forEach((atom, k) => {
    for (let d = 0; d < 3; d++) {
      out[3 * k + d] = coords[3 * atom + d]!;
      c[d]! += coords[3 * atom + d]! / atoms.length;
    }
  });
  for (let k = 0; k < out.length; k++) out[k]! -= c[k % 3]!;
  return out;
}

/** RMSD after the best rotation, pairing atom k of `a` with atom perm[k] of `b`. */
function superposedRmsd(a: Float64Array, b: Float64Array, perm: Int32Array): number {
  const n = perm.length;
  const s = new Float64Array(9); // s[3i + j] = Σ a_i b_j
  let sum = 0;
  for (let k = 0; k < n; k++) {
    const m = perm[k]!;
    for (let i = 0; i < 3; i++) {
      const ai = a[3 * k + i]!;
      sum += ai * ai + b[3 * m + i]! * b[3 * m + i]!;
      for (let j = 0; j < 3; j++) s[3 * i + j]! += ai * b[3 * m + j]!;
    }
  }
  const [xx, xy, xz, yx, yy, yz, zx, zy, zz] = s as unknown as number[];
  const key = [
    [xx! + yy! + zz!, yz! - zy!, zx! - xz!, xy! - yx!],
    [yz! - zy!, xx! - yy! - zz!, xy! + yx!, zx! + xz!],
    [zx! - xz!, xy! + yx!, -xx! + yy! - zz!, yz! + zy!],
    [xy! - yx!, zx! + xz!, yz! + zy!, -xx! - yy! + zz!],
  ];
  const lambda = Math.max(...symmetricEigen(key).values);
  return Math.sqrt(Math.max(0, (sum - 2 * lambda) / n));
}
