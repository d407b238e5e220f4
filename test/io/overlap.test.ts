import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { findOverlap } from '../../src/io/overlap.js';

/** The definition: the smallest j with an earlier atom closer than d, and the smallest such i. */
function allPairs(c: Float64Array, n: number, d: number): [number, number] | null {
  if (!(d > 0)) return null;
  for (let j = 1; j < n; j++) {
    for (let i = 0; i < j; i++) {
      const dx = c[3 * i]! - c[3 * j]!;
      const dy = c[3 * i + 1]! - c[3 * j + 1]!;
      const dz = c[3 * i + 2]! - c[3 * j + 2]!;
      if (dx * dx + dy * dy + dz * dz < d * d) return [i, j];
    }
  }
  return null;
}

describe('findOverlap', () => {
  it('findOverlap(coords, n, d) gives the all-pairs answer for small and gridded records (fast-check, seed 22)', () => {
    // clustered atoms at scales around d, so close pairs, near misses and empty answers all occur
    const record = fc.record({
      n: fc.integer({ min: 0, max: 400 }),
      scale: fc.constantFrom(0.5, 2, 8, 40, 1e4),
      d: fc.constantFrom(0.4, 0.1, 1, 0),
      seed: fc.integer(),
      offset: fc.constantFrom(0, -123.4, 1e6),
    });
    fc.assert(
      fc.property(record, ({ n, scale, d, seed, offset }) => {
        let s = seed >>> 0;
        const rand = () => ((s = (Math.imul(s, 1664525) + 1013904223) >>> 0) / 2 ** 32);
        const c = new Float64Array(3 * n);
        for (let k = 0; k < 3 * n; k++) c[k] = offset + (rand() - 0.5) * scale * Math.cbrt(n + 1);
        // sometimes an exact duplicate, sometimes a pair just inside or just outside d
        if (n > 3 && seed % 3 === 0) c.copyWithin(3 * (n - 1), 3 * (n >> 1), 3 * (n >> 1) + 3);
        if (n > 3 && seed % 3 === 1) c[3 * (n - 2)] = c[3]! + d * (seed % 2 ? 0.999999 : 1.000001);
        expect(findOverlap(c, n, d)).toEqual(allPairs(c, n, d));
      }),
      { seed: 22, numRuns: 300 },
    );
  });

  it('findOverlap finds a close pair among atoms spread over a huge range, and ignores non-finite coordinates', () => {
    const n = 100;
    const c = new Float64Array(3 * n);
    for (let k = 0; k < n; k++) c.set([k * 1e9, k * 1e9, 0], 3 * k);
    c.set([70e9 + 0.3, 70e9, 0], 3 * 90);
    c.set([NaN, 0, 0], 3 * 95);
    expect(findOverlap(c, n, 0.4)).toEqual([70, 90]);
    expect(findOverlap(c, n, 0.4)).toEqual(allPairs(c, n, 0.4));
  });
});
