import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { PuckerKernel, PuckerValues } from '../../src/geometry/puckerKernel.js';
import { torsionAt } from '../../src/geometry/torsionAt.js';
import { cremerPople, displacementsFromModes, ringFromDisplacements, sixRingModes } from '../../src/geometry/cremerPople.js';
import { altonaSundaralingamFit } from '../../src/geometry/pseudorotation.js';
import { torsion } from '../../src/geometry/torsion.js';
import type { Vec3 } from '../../src/model/molecule.js';

const flat = (pts: readonly Vec3[]) => Float64Array.from(pts.flat());
const angleDiff = (a: number, b: number) => Math.abs(((a - b + 540) % 360) - 180);

/** A ring of n atoms near a regular polygon with random displacements and jitter. */
const ringArb = (n: number) =>
  fc.array(fc.tuple(fc.double({ min: -0.25, max: 0.25, noNaN: true }), fc.double({ min: -0.6, max: 0.6, noNaN: true })), { minLength: n, maxLength: n })
    .map((d) => d.map(([jitter, z], j): Vec3 => {
      const a = (-2 * Math.PI * j) / n;
      return [(1.45 + jitter) * Math.cos(a), (1.45 - jitter) * Math.sin(a), z];
    }));

describe('PuckerKernel', () => {
  it('measure(coords, ring, out) equals cremerPople(points) for rings of 4 to 8 atoms (fast-check, seed 11)', () => {
    for (const n of [4, 5, 6, 7, 8]) {
      const kernel = new PuckerKernel(n);
      const out = new PuckerValues();
      const ring = Int32Array.from({ length: n }, (_, j) => n - 1 - j); // atoms stored in reverse file order
      fc.assert(
        fc.property(ringArb(n), (pts) => {
          const ref = cremerPople(pts)!;
          fc.pre(ref.Q > 1e-6); // θ and φ of a flat ring are rounding noise
          const stored = [...pts].reverse();
          expect(kernel.measure(flat(stored), ring, out)).toBe(true);
          expect(out.Q).toBeCloseTo(ref.Q, 10);
          expect(out.q2).toBeCloseTo(ref.amplitudes[0]!.q, 10);
          if (n > 4 && ref.amplitudes[0]!.q > 1e-6) expect(angleDiff(out.phaseDeg, ref.amplitudes[0]!.phaseDeg!)).toBeLessThan(1e-6);
          if (n === 6) expect(out.thetaDeg).toBeCloseTo(ref.thetaDeg!, 8);
          else expect(out.thetaDeg).toBeNaN();
        }),
        { seed: 11, numRuns: 150 },
      );
    }
  });

  it('measure gives the five-ring phase P and amplitude as analyzeRing would (closed-form P; τm closed form, fit or blend)', () => {
    const kernel = new PuckerKernel(5);
    const out = new PuckerValues();
    const ring = Int32Array.from([0, 1, 2, 3, 4]);
    fc.assert(
      fc.property(fc.double({ min: 0.15, max: 0.5, noNaN: true }), fc.double({ min: 0, max: 359.9, noNaN: true }), (q, phi) => {
        const pts = ringFromDisplacements(displacementsFromModes(5, [{ m: 2, q, phaseDeg: phi }]), 1.26);
        kernel.measure(flat(pts), ring, out);
        const t = (j: number) => torsion(pts[j % 5]!, pts[(j + 1) % 5]!, pts[(j + 2) % 5]!, pts[(j + 3) % 5]!)!;
        const nu = [t(4), t(0), t(1), t(2), t(3)];
        const ref = altonaSundaralingamFit(nu)!;
        expect(angleDiff(out.pDeg, ref.phaseDeg)).toBeLessThan(1e-6);
        expect(out.tauMDeg).toBeCloseTo(ref.amplitudeDeg, 6);
        // derived: P ≈ φ2 + 90 within about 0.6° for ideal rings in reference order
        expect(angleDiff(out.pDeg, phi + 90)).toBeLessThan(1);
      }),
      { seed: 12, numRuns: 200 },
    );
  });

  it('measure is unchanged by a rigid motion of the coordinates', () => {
    const kernel = new PuckerKernel(6);
    const a = new PuckerValues();
    const b = new PuckerValues();
    const pts = ringFromDisplacements(displacementsFromModes(6, sixRingModes(0.6, 40, 130)));
    const c = Math.cos(1), s = Math.sin(1);
    const moved = pts.map(([x, y, z]): Vec3 => [c * x - s * z + 3, y - 2, s * x + c * z + 7]);
    const ring = Int32Array.from([0, 1, 2, 3, 4, 5]);
    kernel.measure(flat(pts), ring, a);
    kernel.measure(flat(moved), ring, b);
    expect(b.thetaDeg).toBeCloseTo(40, 8);
    expect(b.phaseDeg).toBeCloseTo(130, 8);
    expect(b.Q).toBeCloseTo(a.Q, 10);
  });

  it('measure returns false for collinear ring atoms and for non-finite coordinates', () => {
    const kernel = new PuckerKernel(6);
    const out = new PuckerValues();
    const ring = Int32Array.from([0, 1, 2, 3, 4, 5]);
    expect(kernel.measure(Float64Array.from({ length: 18 }, (_, i) => (i % 3 === 0 ? i : 0)), ring, out)).toBe(false);
    const bad = flat(ringFromDisplacements([0.3, -0.3, 0.3, -0.3, 0.3, -0.3]));
    bad[4] = NaN;
    expect(kernel.measure(bad, ring, out)).toBe(false);
    expect(out.Q).toBeNaN();
  });
});

describe('torsionAt', () => {
  it('torsionAt(coords, a, b, c, d) equals torsion(A, B, C, D) (fast-check, seed 13)', () => {
    const p = fc.tuple(fc.double({ min: -3, max: 3, noNaN: true }), fc.double({ min: -3, max: 3, noNaN: true }), fc.double({ min: -3, max: 3, noNaN: true }));
    fc.assert(
      fc.property(p, p, p, p, (a, b, c, d) => {
        const ref = torsion(a as Vec3, b as Vec3, c as Vec3, d as Vec3);
        const got = torsionAt(Float64Array.from([...d, ...c, ...b, ...a]), 3, 2, 1, 0);
        if (ref === null) expect(got).toBeNaN();
        else expect(angleDiff(got, ref)).toBeLessThan(1e-7);
      }),
      { seed: 13, numRuns: 300 },
    );
  });
});
