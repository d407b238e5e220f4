import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import {
  cremerPople,
  displacementsFromModes,
  ringFromDisplacements,
  sixRingModes,
} from '../../src/geometry/cremerPople.js';
import { torsion } from '../../src/geometry/torsion.js';
import type { Vec3 } from '../../src/model/molecule.js';
import { c2vBoat, d2TwistBoat, d3dChair, renumberToPhi } from '../helpers/ringBuilders.js';

const ringTorsions = (p: readonly Vec3[]) =>
  p.map((_, j) => torsion(p[j]!, p[(j + 1) % p.length]!, p[(j + 2) % p.length]!, p[(j + 3) % p.length]!)!);
const angDiff = (a: number, b: number) => Math.abs(((a - b + 540) % 360) - 180);

const rotate = (p: Vec3, [ax, ay, az]: readonly number[], t: Vec3): Vec3 => {
  let [x, y, z] = p;
  [y, z] = [y * Math.cos(ax!) - z * Math.sin(ax!), y * Math.sin(ax!) + z * Math.cos(ax!)];
  [x, z] = [x * Math.cos(ay!) + z * Math.sin(ay!), -x * Math.sin(ay!) + z * Math.cos(ay!)];
  [x, y] = [x * Math.cos(az!) - y * Math.sin(az!), x * Math.sin(az!) + y * Math.cos(az!)];
  return [x + t[0], y + t[1], z + t[2]];
};

/** A random distorted ring: inverse formula at random modes plus random jitter of every coordinate. */
const distortedRing = (n: number) =>
  fc
    .tuple(
      fc.double({ min: 0.2, max: 0.8, noNaN: true }),
      fc.double({ min: 10, max: 170, noNaN: true }),
      fc.double({ min: 0, max: 359, noNaN: true }),
      fc.array(fc.double({ min: -0.08, max: 0.08, noNaN: true }), { minLength: 3 * n, maxLength: 3 * n }),
    )
    .map(([Q, theta, phi, jitter]) => {
      const modes = n === 6 ? sixRingModes(Q, theta, phi) : [{ m: 2, q: Q, phaseDeg: phi }];
      const ring = ringFromDisplacements(displacementsFromModes(n, modes), 1.4);
      return ring.map((p, j) => [p[0] + jitter[3 * j]!, p[1] + jitter[3 * j + 1]!, p[2] + jitter[3 * j + 2]!] as Vec3);
    });

describe('cremerPople check geometries (docs/methods.md#cremer-pople-checks, derived)', () => {
  it('cremerPople of the GED-like D3d chair (C–C 1.536, C–C–C 111.4) gives h 0.2305, ω 54.94, Q 0.5646, θ 0', () => {
    const { points, h } = d3dChair(1.536, 111.4);
    const cp = cremerPople(points)!;
    expect(h).toBeCloseTo(0.2305, 3);
    expect(Math.abs(h - 0.2305)).toBeLessThan(0.0005);
    expect(Math.abs(cp.Q - 0.5646)).toBeLessThan(0.0005);
    expect(cp.Q).toBeCloseTo(Math.sqrt(6) * h, 12);
    expect(cp.thetaDeg!).toBeLessThan(0.01);
    expect(cp.phiDeg).toBeNull();
    const omega = ringTorsions(points).map(Math.abs);
    for (const w of omega) expect(Math.abs(w - 54.94)).toBeLessThan(0.01);
    // identity cos ω = −cos α / (1 + cos α)
    const c = Math.cos((111.4 * Math.PI) / 180);
    expect(Math.cos((omega[0]! * Math.PI) / 180)).toBeCloseTo(-c / (1 + c), 10);
  });

  it('cremerPople of the tetrahedral chair (C–C 1.540, 109.4712) gives h 0.2567, ω 60.00, Q 0.6287', () => {
    const { points, h } = d3dChair(1.54, 109.4712);
    expect(Math.abs(h - 0.2567)).toBeLessThan(0.0005);
    expect(Math.abs(cremerPople(points)!.Q - 0.6287)).toBeLessThan(0.0005);
    for (const w of ringTorsions(points)) expect(Math.abs(Math.abs(w) - 60)).toBeLessThan(0.01);
  });

  it('cremerPople of the equal-bond boat gives θ 90, φ 0, torsions (0, +54.9, −54.9, 0, +54.9, −54.9), Q 0.762', () => {
    const boat = renumberToPhi(c2vBoat(1.536, 111.4), 0);
    const cp = cremerPople(boat)!;
    expect(cp.thetaDeg!).toBeCloseTo(90, 6);
    expect(angDiff(cp.phiDeg!, 0)).toBeLessThan(1e-6);
    expect(Math.abs(cp.Q - 0.762)).toBeLessThan(0.005);
    const expected = [0, 54.9, -54.9, 0, 54.9, -54.9];
    ringTorsions(boat).forEach((t, j) => expect(Math.abs(t - expected[j]!)).toBeLessThan(0.2));
  });

  it('cremerPople of the equal-bond twist-boat gives θ 90, φ 30, torsions (+30.6, +30.6, −64.4, …), Q 0.765', () => {
    const twist = renumberToPhi(d2TwistBoat(1.536, 111.4), 30);
    const cp = cremerPople(twist)!;
    expect(cp.thetaDeg!).toBeCloseTo(90, 6);
    expect(angDiff(cp.phiDeg!, 30)).toBeLessThan(1e-6);
    expect(Math.abs(cp.Q - 0.765)).toBeLessThan(0.005);
    const expected = [30.6, 30.6, -64.4, 30.6, 30.6, -64.4];
    ringTorsions(twist).forEach((t, j) => expect(Math.abs(t - expected[j]!)).toBeLessThan(0.2));
  });

  it('cremerPople of a planar ring gives Q 0 and no phase', () => {
    const flat = ringFromDisplacements([0, 0, 0, 0, 0, 0]);
    const cp = cremerPople(flat)!;
    expect(cp.Q).toBeLessThan(1e-12);
    expect(cp.phiDeg).toBeNull();
    expect(cp.normal[2]).toBeCloseTo(1, 12); // numbered clockwise from +z → n = +z (docs/methods.md#ring-orientation)
  });
});

describe('cremerPople invariants (docs/methods.md#ring-orientation table, derived)', () => {
  const run = { seed: 424242, numRuns: 200 };

  it('displacementsFromModes inverts cremerPople exactly', () => {
    fc.assert(
      fc.property(distortedRing(6), (ring) => {
        const cp = cremerPople(ring)!;
        const z = displacementsFromModes(6, cp.amplitudes);
        z.forEach((zj, j) => expect(zj).toBeCloseTo(cp.z[j]!, 12));
        const q2 = cp.amplitudes.reduce((s, m) => s + m.q * m.q, 0);
        expect(Math.sqrt(q2)).toBeCloseTo(cp.Q, 12);
      }),
      run,
    );
  });

  it('cremerPople of a renumbered six-ring moves (θ, φ) as the renumbering table says (docs/methods.md#ring-orientation)', () => {
    fc.assert(
      fc.property(distortedRing(6), (r) => {
        const cp = cremerPople(r)!;
        const t = cp.thetaDeg!;
        const p = cp.amplitudes[0]!.phaseDeg!;
        const at = (order: number[]) => {
          const c = cremerPople(order.map((i) => r[i]!))!;
          return [c.thetaDeg!, c.amplitudes[0]!.phaseDeg!] as const;
        };
        const cases: [number[], number, number][] = [
          [[1, 2, 3, 4, 5, 0], 180 - t, p + 120],
          [[2, 3, 4, 5, 0, 1], t, p + 240],
          [[0, 5, 4, 3, 2, 1], 180 - t, 180 - p],
          [[5, 4, 3, 2, 1, 0], t, 300 - p],
        ];
        for (const [order, tt, pp] of cases) {
          const [t2, p2] = at(order);
          expect(t2).toBeCloseTo(tt, 8);
          expect(angDiff(p2, pp)).toBeLessThan(1e-7);
        }
      }),
      run,
    );
  });

  it('cremerPople of a renumbered five-ring moves φ2 as the renumbering table says (docs/methods.md#ring-orientation)', () => {
    fc.assert(
      fc.property(distortedRing(5), (r) => {
        const p = cremerPople(r)!.phiDeg!;
        const phi = (order: number[]) => cremerPople(order.map((i) => r[i]!))!.phiDeg!;
        expect(angDiff(phi([1, 2, 3, 4, 0]), p + 144)).toBeLessThan(1e-7);
        expect(angDiff(phi([0, 4, 3, 2, 1]), 180 - p)).toBeLessThan(1e-7);
        expect(angDiff(cremerPople(r.map(([x, y, z]) => [-x, y, z] as Vec3))!.phiDeg!, p + 180)).toBeLessThan(1e-7);
      }),
      run,
    );
  });

  it('cremerPople is unchanged by rigid motion and a mirror image gives θ → 180 − θ, φ → φ + 180', () => {
    const angles = fc.tuple(fc.double({ min: -3, max: 3, noNaN: true }), fc.double({ min: -3, max: 3, noNaN: true }), fc.double({ min: -3, max: 3, noNaN: true }));
    const shift = fc.tuple(fc.double({ min: -9, max: 9, noNaN: true }), fc.double({ min: -9, max: 9, noNaN: true }), fc.double({ min: -9, max: 9, noNaN: true }));
    fc.assert(
      fc.property(distortedRing(6), angles, shift, (r, rot, t) => {
        const cp = cremerPople(r)!;
        const moved = cremerPople(r.map((p) => rotate(p, rot, t as Vec3)))!;
        expect(moved.Q).toBeCloseTo(cp.Q, 10);
        expect(moved.thetaDeg!).toBeCloseTo(cp.thetaDeg!, 8);
        expect(angDiff(moved.amplitudes[0]!.phaseDeg!, cp.amplitudes[0]!.phaseDeg!)).toBeLessThan(1e-7);
        const mirror = cremerPople(r.map(([x, y, z]) => [x, y, -z] as Vec3))!;
        expect(mirror.Q).toBeCloseTo(cp.Q, 10);
        expect(mirror.thetaDeg!).toBeCloseTo(180 - cp.thetaDeg!, 8);
        expect(angDiff(mirror.amplitudes[0]!.phaseDeg!, cp.amplitudes[0]!.phaseDeg! + 180)).toBeLessThan(1e-7);
      }),
      run,
    );
  });
});
