import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { boxFromLengths, boxFromVectors, longRingBond, makeWhole, nearestImage } from '../../src/geometry/periodicBox.js';

describe('boxFromLengths', () => {
  it('boxFromLengths(orthorhombic) gives the diagonal cell and its inverse', () => {
    const b = boxFromLengths(10, 20, 30)!;
    expect(Array.from(b.vectors)).toEqual([10, 0, 0, 0, 20, 0, 0, 0, 30]);
    expect(Array.from(b.inverse, (x) => x + 0)).toEqual([0.1, 0, 0, 0, 0.05, 0, 0, 0, 1 / 30]);
  });

  it('boxFromLengths(triclinic) keeps the lengths and angles and inverts the cell (derived)', () => {
    const b = boxFromLengths(30, 32, 34, 70, 80, 65)!;
    const v = b.vectors;
    const len = (k: number) => Math.hypot(v[3 * k]!, v[3 * k + 1]!, v[3 * k + 2]!);
    const angle = (i: number, j: number) => (Math.acos((v[3 * i]! * v[3 * j]! + v[3 * i + 1]! * v[3 * j + 1]! + v[3 * i + 2]! * v[3 * j + 2]!) / (len(i) * len(j))) * 180) / Math.PI;
    expect([len(0), len(1), len(2)].map((x) => +x.toFixed(9))).toEqual([30, 32, 34]);
    expect(angle(1, 2)).toBeCloseTo(70, 9);
    expect(angle(0, 2)).toBeCloseTo(80, 9);
    expect(angle(0, 1)).toBeCloseTo(65, 9);
    for (let r = 0; r < 3; r++) for (let c = 0; c < 3; c++) {
      let s = 0;
      for (let k = 0; k < 3; k++) s += v[3 * r + k]! * b.inverse[3 * k + c]!;
      expect(s).toBeCloseTo(r === c ? 1 : 0, 12);
    }
  });

  it('boxFromLengths refuses zero lengths and impossible angles', () => {
    expect(boxFromLengths(0, 10, 10)).toBeNull();
    expect(boxFromLengths(10, 10, 10, 90, 90, 0)).toBeNull();
    expect(boxFromLengths(10, 10, 10, 150, 150, 150)).toBeNull();
  });
});

describe('nearestImage', () => {
  it('nearestImage moves an atom shifted by any whole cell vectors back next to its partner (fast-check, triclinic)', () => {
    const box = boxFromLengths(25, 27, 29, 75, 85, 70)!;
    const v = box.vectors;
    fc.assert(
      fc.property(fc.integer({ min: -3, max: 3 }), fc.integer({ min: -3, max: 3 }), fc.integer({ min: -3, max: 3 }), fc.double({ min: -1.6, max: 1.6, noNaN: true }), (i, j, k, dx) => {
        const bond = [dx, 0.9, -0.5];
        const c = new Float64Array(6);
        c.set([3, 4, 5], 0);
        for (let a = 0; a < 3; a++) c[3 + a] = c[a]! + bond[a]! + i * v[a]! + j * v[3 + a]! + k * v[6 + a]!;
        nearestImage(c, 0, 1, box);
        for (let a = 0; a < 3; a++) expect(c[3 + a]! - c[a]!).toBeCloseTo(bond[a]!, 9);
      }),
      { seed: 16, numRuns: 200 },
    );
  });

  it('makeWhole joins a ring split across the box and longRingBond then finds no long bond', () => {
    const box = boxFromLengths(10, 10, 10)!;
    // a hexagon of radius 1.45 Å centred on the box corner, wrapped into [0, 10)
    const c = new Float64Array(18);
    for (let k = 0; k < 6; k++) {
      const x = 1.45 * Math.cos((k * Math.PI) / 3), y = 1.45 * Math.sin((k * Math.PI) / 3);
      c.set([(x + 10) % 10, (y + 10) % 10, 0.2], 3 * k);
    }
    const ring = [0, 1, 2, 3, 4, 5];
    const limits = new Float64Array(6).fill(1.9);
    expect(longRingBond(c, ring, limits)).toBeGreaterThanOrEqual(0);
    makeWhole(c, ring, box);
    expect(longRingBond(c, ring, limits)).toBe(-1);
  });
});

describe('boxFromVectors', () => {
  it('boxFromVectors(lower-triangular GROMACS vectors) keeps them and gives lengths and angles', () => {
    const b = boxFromVectors([30, 0, 0, 15, 15 * Math.sqrt(3), 0, 0, 0, 30])!;
    expect(Array.from(b.vectors)).toEqual([30, 0, 0, 15, 15 * Math.sqrt(3), 0, 0, 0, 30]);
    b.lengths.forEach((x) => expect(x).toBeCloseTo(30, 9));
    [90, 90, 60].forEach((x, k) => expect(b.anglesDeg[k]).toBeCloseTo(x, 9));
  });

  it('boxFromVectors(a rotated cell) is the same cell in the a-along-x setting; a zero box is null', () => {
    // the 30 × 20 × 10 box turned 90° about z: a along y
    const b = boxFromVectors([0, 30, 0, -20, 0, 0, 0, 0, 10])!;
    expect(b.lengths).toEqual([30, 20, 10]);
    expect(b.vectors[0]).toBeCloseTo(30, 9);
    expect(b.vectors[4]).toBeCloseTo(20, 9);
    expect(boxFromVectors([0, 0, 0, 0, 0, 0, 0, 0, 0])).toBeNull();
  });
});
