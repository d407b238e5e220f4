import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { symmetricRmsd } from '../../src/api/build/buildRmsd.js';
import { heavyAtomPermutations } from '../../src/api/build/buildSymmetry.js';
import type { Atom, Bond } from '../../src/model/molecule.js';

const carbon: Atom = { element: 'C', name: null };
const ringBonds: Bond[] = [0, 1, 2, 3, 4, 5].map((i) => ({ a: i, b: (i + 1) % 6, order: 1, perceived: false }));

/** Rotation about an arbitrary axis (Rodrigues), then a translation. */
function moved(coords: Float64Array, axis: [number, number, number], angle: number, shift: number): Float64Array {
  const len = Math.hypot(...axis) || 1;
  const [kx, ky, kz] = axis.map((v) => v / len) as [number, number, number];
  const c = Math.cos(angle);
  const s = Math.sin(angle);
  const out = new Float64Array(coords.length);
  for (let i = 0; i < coords.length; i += 3) {
    const [x, y, z] = [coords[i]!, coords[i + 1]!, coords[i + 2]!];
    const dot = kx * x + ky * y + kz * z;
    out[i] = x * c + (ky * z - kz * y) * s + kx * dot * (1 - c) + shift;
    out[i + 1] = y * c + (kz * x - kx * z) * s + ky * dot * (1 - c) - shift;
    out[i + 2] = z * c + (kx * y - ky * x) * s + kz * dot * (1 - c) + 2 * shift;
  }
  return out;
}

describe('heavyAtomPermutations', () => {
  it('heavyAtomPermutations finds the 12 symmetries of the cyclohexane ring and 2 of methylcyclohexane', () => {
    expect(heavyAtomPermutations(Array(6).fill(carbon), ringBonds).permutations).toHaveLength(12);
    const methyl = [...ringBonds, { a: 0, b: 6, order: 1, perceived: false }];
    const { permutations } = heavyAtomPermutations(Array(7).fill(carbon), methyl);
    expect(permutations.map((p) => [...p])).toEqual([
      [0, 1, 2, 3, 4, 5, 6],
      [0, 5, 4, 3, 2, 1, 6],
    ]);
  });

  it('heavyAtomPermutations leaves hydrogens out and keeps elements apart', () => {
    const atoms: Atom[] = ['C', 'O', 'H', 'H'].map((element) => ({ element, name: null }));
    const bonds: Bond[] = [
      { a: 0, b: 1, order: 1, perceived: false },
      { a: 0, b: 2, order: 1, perceived: false },
      { a: 1, b: 3, order: 1, perceived: false },
    ];
    const { heavy, permutations } = heavyAtomPermutations(atoms, bonds);
    expect(heavy).toEqual([0, 1]);
    expect(permutations).toHaveLength(1);
  });
});

describe('symmetricRmsd', () => {
  const chair = Float64Array.from(
    [0, 1, 2, 3, 4, 5].flatMap((j) => {
      const a = (-2 * Math.PI * j) / 6;
      return [1.45 * Math.cos(a), 1.45 * Math.sin(a), j % 2 === 0 ? 0.25 : -0.25];
    }),
  );
  const { heavy, permutations } = heavyAtomPermutations(Array(6).fill(carbon), ringBonds);

  it('symmetricRmsd is 0 for a rotated, translated copy and positive for a flattened ring', () => {
    fc.assert(
      fc.property(
        fc.tuple(
          fc.double({ min: -1, max: 1, noNaN: true }),
          fc.double({ min: -1, max: 1, noNaN: true }),
          fc.double({ min: 0.1, max: 1, noNaN: true }),
        ),
        fc.double({ min: -3, max: 3, noNaN: true }),
        fc.double({ min: -10, max: 10, noNaN: true }),
        (axis, angle, shift) => {
          expect(symmetricRmsd(chair, moved(chair, axis, angle, shift), heavy, permutations)).toBeLessThan(1e-6);
        },
      ),
      { seed: 20261203, numRuns: 200 },
    );
    const flat = chair.map((v, k) => (k % 3 === 2 ? 0 : v));
    // derived: every atom moves by 0.25 Å along the normal
    expect(symmetricRmsd(chair, flat, heavy, permutations)).toBeCloseTo(0.25, 6);
  });

  it('symmetricRmsd matches a renumbered and mirrored copy (derived: the chair flip of cyclohexane)', () => {
    const flipped = chair.map((v, k) => (k % 3 === 2 ? -v : v)); // a mirror image with the same numbering
    expect(symmetricRmsd(chair, flipped, heavy, permutations)).toBeLessThan(1e-6);
    expect(symmetricRmsd(chair, flipped, heavy, [permutations[0]!])).toBeLessThan(1e-6); // by reflection alone
  });
});
