import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { applyMat3, superpose, type Mat3 } from '../../src/analysis/superpose.js';
import { symmetricEigen } from '../../src/analysis/symmetricEigen.js';
import type { Vec3 } from '../../src/model/molecule.js';

const coord = fc.double({ min: -4, max: 4, noNaN: true });
const point = fc.tuple(coord, coord, coord) as fc.Arbitrary<Vec3>;
const cloud = fc.array(point, { minLength: 4, maxLength: 12 });
/** A random proper rotation from a (non-zero) quaternion. */
const rotation = fc
  .tuple(fc.double({ min: -1, max: 1, noNaN: true }), coord, coord, coord)
  .filter((q) => Math.hypot(...q) > 0.1)
  .map(([w, x, y, z]): Mat3 => {
    const n = Math.hypot(w, x, y, z);
    [w, x, y, z] = [w / n, x / n, y / n, z / n];
    return [
      [w * w + x * x - y * y - z * z, 2 * (x * y - w * z), 2 * (x * z + w * y)],
      [2 * (x * y + w * z), w * w - x * x + y * y - z * z, 2 * (y * z - w * x)],
      [2 * (x * z - w * y), 2 * (y * z + w * x), w * w - x * x - y * y + z * z],
    ];
  });
const move = (pts: readonly Vec3[], r: Mat3, t: Vec3) =>
  pts.map((p) => applyMat3(r, p)).map((p): Vec3 => [p[0] + t[0], p[1] + t[1], p[2] + t[2]]);
const rawRmsd = (a: readonly Vec3[], b: readonly Vec3[]) =>
  Math.sqrt(a.reduce((s, p, i) => s + (p[0] - b[i]![0]) ** 2 + (p[1] - b[i]![1]) ** 2 + (p[2] - b[i]![2]) ** 2, 0) / a.length);
const det = (m: Mat3) =>
  m[0][0] * (m[1][1] * m[2][2] - m[1][2] * m[2][1]) -
  m[0][1] * (m[1][0] * m[2][2] - m[1][2] * m[2][0]) +
  m[0][2] * (m[1][0] * m[2][1] - m[1][1] * m[2][0]);

describe('superpose', () => {
  it('superpose of a set with itself gives RMSD 0 and the identity', () => {
    const pts: Vec3[] = [[0, 0, 0], [1.5, 0, 0], [0, 1.2, 0.3], [0.4, -0.7, 1.1]];
    const fit = superpose(pts, pts);
    expect(fit.rmsdA).toBeLessThan(1e-12);
    fit.rotation.forEach((row, i) => row.forEach((x, j) => expect(x).toBeCloseTo(i === j ? 1 : 0, 12)));
  });

  it('superpose gives RMSD 0 for any rigid motion and recovers it (fast-check)', () => {
    fc.assert(
      fc.property(cloud, rotation, point, (pts, r, t) => {
        const fit = superpose(pts, move(pts, r, t));
        expect(fit.rmsdA).toBeLessThan(1e-6);
      }),
      { seed: 777, numRuns: 300 },
    );
  });

  it('superpose RMSD is unchanged by moving either set rigidly, and no rotation does better (fast-check)', () => {
    fc.assert(
      fc.property(cloud, rotation, point, rotation, (pts, r, t, trial) => {
        const other = pts.map((p, i): Vec3 => [p[0] + Math.sin(i), p[1] - 0.3 * i, p[2] + Math.cos(3 * i)]);
        const fit = superpose(pts, other);
        expect(superpose(move(pts, r, t), other).rmsdA).toBeCloseTo(fit.rmsdA, 6);
        expect(det(fit.rotation)).toBeCloseTo(1, 9);
        const moved = move(pts, fit.rotation, fit.translation);
        expect(rawRmsd(moved, other)).toBeCloseTo(fit.rmsdA, 9);
        // a random rotation about the centroids is never better than the optimum
        const c = (s: readonly Vec3[]) => s.reduce((a, p) => [a[0] + p[0] / s.length, a[1] + p[1] / s.length, a[2] + p[2] / s.length] as Vec3, [0, 0, 0] as Vec3);
        const [ca, cb] = [c(pts), c(other)];
        const tried = pts.map((p) => applyMat3(trial, [p[0] - ca[0], p[1] - ca[1], p[2] - ca[2]])).map((p): Vec3 => [p[0] + cb[0], p[1] + cb[1], p[2] + cb[2]]);
        expect(rawRmsd(tried, other)).toBeGreaterThanOrEqual(fit.rmsdA - 1e-9);
      }),
      { seed: 4711, numRuns: 200 },
    );
  });

  it('superpose of a square onto a rotated square twice its size gives RMSD 1 Å (derived)', () => {
    const a: Vec3[] = [[1, 0, 0], [0, 1, 0], [-1, 0, 0], [0, -1, 0]];
    const b: Vec3[] = [[0, 2, 5], [-2, 0, 5], [0, -2, 5], [2, 0, 5]]; // 90° about z, doubled, shifted
    expect(superpose(a, b).rmsdA).toBeCloseTo(1, 12);
  });

  it('superpose cannot reflect: a chiral set and its mirror image stay apart, an achiral planar set does not', () => {
    const chiral: Vec3[] = [[0, 0, 0], [1.1, 0, 0], [0, 1.5, 0], [0, 0, 1.9], [-0.6, -0.6, -0.6]];
    const mirror = (p: Vec3): Vec3 => [-p[0], p[1], p[2]];
    expect(superpose(chiral, chiral.map(mirror)).rmsdA).toBeGreaterThan(0.2);
    const planar: Vec3[] = [[0, 0, 0], [1.1, 0.2, 0], [0.3, 1.5, 0], [-0.8, 0.4, 0]];
    expect(superpose(planar, planar.map(mirror)).rmsdA).toBeLessThan(1e-9);
  });
});

describe('symmetricEigen', () => {
  it('symmetricEigen of [[2,1],[1,2]] gives eigenvalues 3 and 1', () => {
    const e = symmetricEigen([[2, 1], [1, 2]]);
    expect(e.values[0]).toBeCloseTo(3, 14);
    expect(e.values[1]).toBeCloseTo(1, 14);
    expect(Math.abs(e.vectors[0]![0]!)).toBeCloseTo(Math.SQRT1_2, 14);
  });

  it('symmetricEigen satisfies A v = λ v for random symmetric 4×4 matrices, values descending (fast-check)', () => {
    fc.assert(
      fc.property(fc.array(coord, { minLength: 10, maxLength: 10 }), (u) => {
        const idx = [[0, 1, 2, 3], [1, 4, 5, 6], [2, 5, 7, 8], [3, 6, 8, 9]];
        const a = idx.map((row) => row.map((k) => u[k]!));
        const { values, vectors } = symmetricEigen(a);
        values.forEach((lambda, k) => {
          const v = vectors[k]!;
          a.forEach((row, i) => expect(row.reduce((s, x, j) => s + x * v[j]!, 0)).toBeCloseTo(lambda * v[i]!, 9));
          if (k > 0) expect(lambda).toBeLessThanOrEqual(values[k - 1]! + 1e-12);
        });
      }),
      { seed: 99, numRuns: 200 },
    );
  });
});
