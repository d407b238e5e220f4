import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { torsion } from '../../src/geometry/torsion.js';
import { klynePrelog, torsionRelation } from '../../src/geometry/klynePrelog.js';
import type { Vec3 } from '../../src/model/molecule.js';

const rotate = (p: Vec3, [ax, ay, az]: Vec3, t: Vec3): Vec3 => {
  // rotation about x, then y, then z, then translation
  let [x, y, z] = p;
  [y, z] = [y * Math.cos(ax) - z * Math.sin(ax), y * Math.sin(ax) + z * Math.cos(ax)];
  [x, z] = [x * Math.cos(ay) + z * Math.sin(ay), -x * Math.sin(ay) + z * Math.cos(ay)];
  [x, y] = [x * Math.cos(az) - y * Math.sin(az), x * Math.sin(az) + y * Math.cos(az)];
  return [x + t[0], y + t[1], z + t[2]];
};
const coord = fc.double({ min: -5, max: 5, noNaN: true });
const point = fc.tuple(coord, coord, coord) as fc.Arbitrary<Vec3>;

describe('torsion', () => {
  it('torsion(A, B, C, D) gives +90 on the IUPAC sign example (docs/methods.md#torsion, derived)', () => {
    expect(torsion([1, 0, 0], [0, 0, 0], [0, 0, 1], [0, 1, 1])).toBeCloseTo(90, 12);
  });

  it('torsion of ideal staggered ethane H–C–C–H is ±60 and 180 (IUCr teaching pamphlet 15)', () => {
    const h = (deg: number, z: number): Vec3 => [Math.cos((deg * Math.PI) / 180), Math.sin((deg * Math.PI) / 180), z];
    const c1: Vec3 = [0, 0, 0];
    const c2: Vec3 = [0, 0, 1.54];
    const values = [60, 180, 300].map((back) => torsion(h(0, -0.36), c1, c2, h(back, 1.9)));
    // looking down C1→C2 from the front the clockwise sense is the negative mathematical sense
    expect(values.map((v) => Math.round(Math.abs(v!)))).toEqual([60, 180, 60]);
    expect(Math.sign(values[0]!)).toBe(-Math.sign(values[2]!));
  });

  it('torsion is unchanged by rotation and translation and flips sign under reflection', () => {
    fc.assert(
      fc.property(point, point, point, point, point, point, (a, b, c, d, r, t) => {
        const tau = torsion(a, b, c, d);
        fc.pre(tau !== null && Math.abs(Math.abs(tau) - 180) > 1e-3);
        const moved = torsion(rotate(a, r, t), rotate(b, r, t), rotate(c, r, t), rotate(d, r, t));
        const mirror = (p: Vec3): Vec3 => [-p[0], p[1], p[2]];
        const mirrored = torsion(mirror(a), mirror(b), mirror(c), mirror(d));
        expect(moved!).toBeCloseTo(tau!, 6);
        expect(mirrored!).toBeCloseTo(-tau!, 6);
        expect(torsion(d, c, b, a)!).toBeCloseTo(tau!, 6);
      }),
      { seed: 20261201, numRuns: 500 },
    );
  });

  it('torsion returns null for collinear atoms', () => {
    expect(torsion([0, 0, -1], [0, 0, 0], [0, 0, 1], [1, 0, 1])).toBeNull();
  });
});

describe('klynePrelog', () => {
  it('klynePrelog uses half-open ranges (IUPAC Gold Book T06406; boundaries common practice, no source)', () => {
    expect([0, 29.9, 30, -30, 89.9, 90, -90, 149.9, 150, -150, 180].map(klynePrelog)).toEqual([
      'sp', 'sp', '+sc', '-sc', '+sc', '+ac', '-ac', '+ac', 'ap', 'ap', 'ap',
    ]);
    expect([10, 60, 120, 175].map(torsionRelation)).toEqual(['eclipsed', 'gauche', 'anticlinal', 'anti']);
  });
});
