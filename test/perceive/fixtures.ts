/** Small hand-made molecules and graphs for the perceive tests (coordinates derived, no source). */
import type { Bond, Molecule } from '../../src/model/molecule.js';

/** A Molecule from elements and positions; `bonds` null means "coordinates only" (as from XYZ). */
export function molecule(
  elements: readonly string[],
  positions: readonly (readonly [number, number, number])[],
  bonds: readonly Bond[] | null = null,
  names: readonly (string | null)[] = [],
): Molecule {
  const coords = new Float64Array(positions.flat());
  return {
    title: 'test',
    atoms: elements.map((element, i) => ({ element, name: names[i] ?? null })),
    coords,
    bonds,
    properties: {},
    source: { file: 'test.xyz', format: 'xyz', index: 1, line: 1 },
  };
}

/** Bonds from index pairs (order 1, as read from a file). */
export function bondsOf(pairs: readonly (readonly [number, number])[]): Bond[] {
  return pairs.map(([p, q]) => ({ a: Math.min(p, q), b: Math.max(p, q), order: 1, perceived: false }));
}

/** Pairs `[a, b]` of a bond list, for comparisons. */
export const pairs = (bonds: readonly Bond[]): [number, number][] => bonds.map((b) => [b.a, b.b]);

/** A ring of `n` points of radius `r` in the plane at height `z`. */
export function ringPositions(n: number, r: number, z = 0): [number, number, number][] {
  return Array.from({ length: n }, (_, k) => [r * Math.cos((2 * Math.PI * k) / n), r * Math.sin((2 * Math.PI * k) / n), z]);
}
