import { describe, expect, it } from 'vitest';
import { reshapeRing, ringTargets, ringWalk, sixRingShape } from '../../src/api/build/buildRingForms.js';
import { cremerPople, displacementsFromModes, ringFromDisplacements, sixRingModes } from '../../src/geometry/cremerPople.js';
import { angleBetween, DEG } from '../../src/geometry/vec3.js';
import type { Vec3 } from '../../src/model/molecule.js';

/** A ring of six atoms (indices 0–5) at (θ, φ) with one substituent atom (index 6) on atom 0. */
function ringWithSubstituent(thetaDeg: number, phiDeg: number, substituent: Vec3): Float64Array {
  const ring = ringFromDisplacements(displacementsFromModes(6, sixRingModes(0.56, thetaDeg, phiDeg)));
  const s: Vec3 = [ring[0]![0] + substituent[0], ring[0]![1] + substituent[1], ring[0]![2] + substituent[2]];
  return Float64Array.from([...ring, s].flat());
}
const neighbors = [[1, 5, 6], [0, 2], [1, 3], [2, 4], [3, 5], [0, 4], [0]];
const ring = [0, 1, 2, 3, 4, 5];
const at = (c: Float64Array, i: number): Vec3 => [c[3 * i]!, c[3 * i + 1]!, c[3 * i + 2]!];

describe('reshapeRing', () => {
  it('reshapeRing puts the ring at each target (θ, φ) of ringTargets (derived: docs/methods.md#cremer-pople inverse)', () => {
    const coords = ringWithSubstituent(0, 0, [0, 0, 1.1]);
    for (const target of ringTargets({ Q: 0.56, thetaDeg: 0, phiDeg: null })) {
      const p = cremerPople(ring.map((i) => at(reshapeRing(coords, ring, neighbors, target)!, i)))!;
      expect(p.thetaDeg!).toBeCloseTo(target.thetaDeg, 6);
      expect(p.Q).toBeCloseTo(target.Q, 6);
      if (target.kind !== 'flipped-chair') expect(p.phiDeg!).toBeCloseTo(target.phiDeg, 6);
    }
  });

  it('reshapeRing keeps an exocyclic bond on its face and its bond length when the chair flips', () => {
    const coords = ringWithSubstituent(0, 0, [0, 0, 1.1]); // axial, up (atom 0 is an up atom at θ = 0)
    const flipped = reshapeRing(coords, ring, neighbors, { kind: 'flipped-chair', thetaDeg: 180, phiDeg: 0, Q: 0.56 })!;
    const bond = (c: Float64Array) => at(c, 6).map((v, d) => v - at(c, 0)[d]!) as unknown as Vec3;
    expect(Math.hypot(...bond(flipped))).toBeCloseTo(1.1, 9);
    expect(bond(flipped)[2]).toBeGreaterThan(0); // same (top) face
    // atom 0 is now a down atom: an upward bond there is equatorial, far from the normal (docs/methods.md#axial-equatorial)
    expect(angleBetween(bond(flipped), [0, 0, 1]) * DEG).toBeGreaterThan(55);
  });
});

describe('sixRingShape', () => {
  it('sixRingShape names ideal chairs, boats, twist-boats and half-chairs (docs/methods.md#six-ring-forms, derived)', () => {
    const shape = (t: number, p: number) => sixRingShape(ringWithSubstituent(t, p, [0, 0, 1]), ring).shape;
    expect([shape(0, 0), shape(180, 0), shape(90, 0), shape(90, 30), shape(90, 240), shape(45, 30)]).toEqual([
      'chair', 'chair', 'boat', 'twist-boat', 'boat', 'half-chair',
    ]);
  });

  it('ringWalk orders ring atoms along bonds from the lowest index', () => {
    expect(ringWalk([5, 3, 1, 0, 2, 4], neighbors)).toEqual([0, 1, 2, 3, 4, 5]);
    expect(ringWalk([0, 1, 2], neighbors)).toBeNull();
  });
});
