import { describe, expect, it } from 'vitest';
import { withBonds } from '../../src/perceive/withBonds.js';
import { bondsOf, molecule, pairs } from './fixtures.js';

const water = [[0, 0, 0], [0.96, 0, 0], [-0.24, 0.93, 0]] as [number, number, number][];

describe('withBonds', () => {
  it('withBonds returns the molecule itself when the file gave bonds, even none', () => {
    const fromFile = molecule(['O', 'H', 'H'], water, bondsOf([[0, 1]]));
    expect(withBonds(fromFile)).toBe(fromFile);
    const noneInFile = molecule(['O', 'H', 'H'], water, []);
    expect(withBonds(noneInFile)).toBe(noneInFile);
  });

  it('withBonds perceives bonds for a coordinates-only record without mutating it', () => {
    const xyz = molecule(['O', 'H', 'H'], water);
    const before = Array.from(xyz.coords);
    const result = withBonds(xyz);
    expect(result).not.toBe(xyz);
    expect(xyz.bonds).toBeNull();
    expect(Array.from(xyz.coords)).toEqual(before);
    expect(pairs(result.bonds!)).toEqual([[0, 1], [0, 2]]);
    expect(result.bonds!.every((b) => b.perceived)).toBe(true);
    expect(result.atoms).toBe(xyz.atoms);
  });

  it('withBonds passes toleranceA on', () => {
    const stretched = molecule(['C', 'C'], [[0, 0, 0], [1.8, 0, 0]]);
    expect(withBonds(stretched).bonds).toHaveLength(1);
    expect(withBonds(stretched, { toleranceA: 0.2 }).bonds).toHaveLength(0);
  });
});
