import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { perceiveBonds, BOND_TOLERANCE_A, METAL_TOLERANCE_A } from '../../src/perceive/perceiveBonds.js';
import { elementInfo, isMetal } from '../../src/model/elements.js';
import { ConformarkError } from '../../src/model/errors.js';
import { molecule, pairs } from './fixtures.js';

const pair = (a: string, b: string, d: number) => molecule([a, b], [[0, 0, 0], [d, 0, 0]]);
const bonded = (a: string, b: string, d: number, toleranceA?: number) =>
  perceiveBonds(pair(a, b, d), toleranceA === undefined ? {} : { toleranceA }).length === 1;

describe('perceiveBonds', () => {
  it('perceiveBonds bonds a metal only within r_M + r_X + 0.25 Å: no Na···C at 2.79 Å, Na–O 2.41 and Zn–N 2.10 kept', () => {
    // Cordero radii: Na 1.66, C 0.76, O 0.66, Zn 1.22, N 0.71, S 1.05; the general ε 0.40 would bond Na···C up to 2.82 Å
    expect(bonded('Na', 'C', 2.79)).toBe(false);
    expect(bonded('Na', 'C', 2.79, 0.4)).toBe(false);
    expect(bonded('Na', 'O', 2.41)).toBe(true);
    expect(bonded('Zn', 'N', 2.1)).toBe(true);
    expect(bonded('Zn', 'S', 2.33)).toBe(true);
    expect(bonded('Zn', 'N', 2.2)).toBe(false); // 1.93 + 0.25 = 2.18 Å
    expect(bonded('C', 'C', 1.9)).toBe(true); // non-metals keep ε 0.40
    expect(perceiveBonds(pair('Na', 'C', 2.79), { metalToleranceA: 0.4 })).toHaveLength(1);
    expect(bonded('Na', 'O', 2.45)).toBe(true);
    expect(bonded('Na', 'O', 2.45, 0.1)).toBe(false); // a smaller general ε also tightens the metal rule
  });

  it('perceiveBonds rejects a negative metalToleranceA', () => {
    expect(() => perceiveBonds(pair('Na', 'O', 2.4), { metalToleranceA: -1 })).toThrow(ConformarkError);
  });

  it('perceiveBonds follows the ε = 0.40 Å check table (Cordero et al. 2008, Dalton Trans. 2832; docs/methods.md#bond-perception, derived)', () => {
    expect(BOND_TOLERANCE_A).toBe(0.4);
    expect(bonded('C', 'C', 1.54)).toBe(true);
    expect(bonded('C', 'C', 2.5)).toBe(false); // 1,3 contact in a ring
    expect(bonded('C', 'H', 1.09)).toBe(true);
    expect(bonded('H', 'H', 1.78)).toBe(false); // geminal H···H
    expect(bonded('C', 'O', 1.43)).toBe(true);
    expect(bonded('C', 'Cl', 1.79)).toBe(true);
    expect(bonded('C', 'Br', 1.94)).toBe(true);
    expect(bonded('C', 'I', 2.14)).toBe(true);
  });

  it('perceiveBonds puts the C–C threshold at r_C + r_C + ε = 1.92 Å (derived, docs/methods.md#bond-perception)', () => {
    expect(bonded('C', 'C', 1.915)).toBe(true);
    expect(bonded('C', 'C', 1.925)).toBe(false);
    expect(bonded('C', 'Fe', 0.76 + 1.32 + 0.24)).toBe(true); // Fe low-spin radius 1.32; metal contacts take ε 0.25
    expect(bonded('C', 'Fe', 0.76 + 1.32 + 0.26)).toBe(false);
  });

  it('perceiveBonds rejects pairs closer than 0.4 Å (common practice, no source)', () => {
    expect(bonded('H', 'H', 0.39)).toBe(false);
    expect(bonded('H', 'H', 0.41)).toBe(true);
    expect(bonded('H', 'H', 0.74)).toBe(true); // H2
  });

  it('perceiveBonds honours toleranceA', () => {
    expect(bonded('C', 'C', 1.8)).toBe(true);
    expect(bonded('C', 'C', 1.8, 0.2)).toBe(false);
    expect(bonded('C', 'C', 2.0, 0.5)).toBe(true);
  });

  it('perceiveBonds rejects a bad tolerance, an unknown element and a non-finite coordinate', () => {
    const codeOf = (f: () => unknown) => {
      try {
        f();
      } catch (e) {
        expect(e).toBeInstanceOf(ConformarkError);
        return [(e as ConformarkError).code, (e as Error).message];
      }
      return null;
    };
    expect(codeOf(() => perceiveBonds(pair('C', 'C', 1.5), { toleranceA: -1 }))?.[0]).toBe('bad-option');
    expect(codeOf(() => perceiveBonds(pair('C', 'C', 1.5), { toleranceA: Number.NaN }))?.[0]).toBe('bad-option');
    expect(codeOf(() => perceiveBonds(pair('C', 'Xx', 1.5)))).toEqual([
      'unknown-element',
      "test.xyz: atom 2: element 'Xx' has no covalent radius, so bonds cannot be perceived",
    ]);
    expect(codeOf(() => perceiveBonds(molecule(['C', 'C'], [[0, 0, 0], [Number.NaN, 0, 0]])))?.[0]).toBe('bad-coordinate');
  });

  it('perceiveBonds keeps only the nearest partner of a hydrogen (common practice, no source)', () => {
    // C0 ··· H1 1.05 Å, H1 ··· C2 1.25 Å: both within 1.47 Å, only the nearer is kept
    const mol = molecule(['C', 'H', 'C'], [[0, 0, 0], [1.05, 0, 0], [2.3, 0, 0]]);
    expect(pairs(perceiveBonds(mol))).toEqual([[0, 1]]);
  });

  it('perceiveBonds drops the bicyclo[1.1.1]pentane bridgehead contact by the carbon valence cap', () => {
    // built here: bridgeheads 1.85 Å apart (about the observed C1···C3 distance, from memory), C–C 1.55, C–H 1.09
    const h = 0.925;
    const r = Math.sqrt(1.55 ** 2 - h ** 2);
    const positions: [number, number, number][] = [[0, 0, h], [0, 0, -h]];
    const elements = ['C', 'C'];
    for (let k = 0; k < 3; k++) {
      const t = (2 * Math.PI * k) / 3;
      positions.push([r * Math.cos(t), r * Math.sin(t), 0]);
      elements.push('C');
    }
    positions.push([0, 0, h + 1.09], [0, 0, -h - 1.09]);
    elements.push('H', 'H');
    for (let k = 0; k < 3; k++) {
      const t = (2 * Math.PI * k) / 3;
      for (const s of [1, -1]) positions.push([(r + 0.63) * Math.cos(t), (r + 0.63) * Math.sin(t), s * 0.89]);
      elements.push('H', 'H');
    }
    const mol = molecule(elements, positions);
    expect(Math.abs(positions[0]![2] - positions[1]![2])).toBeLessThan(0.76 + 0.76 + 0.4);
    const bonds = pairs(perceiveBonds(mol));
    expect(bonds).toHaveLength(14); // C5H8: six C–C, eight C–H
    expect(bonds).not.toContainEqual([0, 1]);
  });

  it('perceiveBonds does not cap carbon bonds to metals', () => {
    const mol = molecule(
      ['C', 'H', 'H', 'H', 'H', 'Li'],
      [[0, 0, 0], [0.63, 0.63, 0.63], [-0.63, -0.63, 0.63], [-0.63, 0.63, -0.63], [0.63, -0.63, -0.63], [0, 0, 2.1]],
    );
    expect(pairs(perceiveBonds(mol)).filter(([a]) => a === 0)).toHaveLength(5);
  });

  it('perceiveBonds on a grid equals the all-pairs test, metal contacts at the stricter tolerance (fast-check, no capped elements)', () => {
    const elements = ['N', 'O', 'S', 'Cl', 'Fe', 'Na'];
    const atom = fc.record({
      element: fc.constantFrom(...elements),
      x: fc.double({ min: -12, max: 12, noNaN: true }),
      y: fc.double({ min: -12, max: 12, noNaN: true }),
      z: fc.double({ min: -3, max: 3, noNaN: true }),
    });
    fc.assert(
      fc.property(fc.array(atom, { minLength: 0, maxLength: 80 }), fc.double({ min: 0, max: 0.8, noNaN: true }), (list, eps) => {
        const mol = molecule(list.map((a) => a.element), list.map((a) => [a.x, a.y, a.z]));
        const expected: [number, number][] = [];
        for (let i = 0; i < list.length; i++) {
          for (let j = i + 1; j < list.length; j++) {
            const d = Math.hypot(list[i]!.x - list[j]!.x, list[i]!.y - list[j]!.y, list[i]!.z - list[j]!.z);
            const metal = isMetal(list[i]!.element) || isMetal(list[j]!.element);
            const limit = elementInfo(list[i]!.element)!.radius + elementInfo(list[j]!.element)!.radius + (metal ? Math.min(eps, METAL_TOLERANCE_A) : eps);
            if (d >= 0.4 && d <= limit) expected.push([i, j]);
          }
        }
        const bonds = perceiveBonds(mol, { toleranceA: eps });
        expect(pairs(bonds)).toEqual(expected);
        expect(bonds.every((b) => b.order === 1 && b.perceived)).toBe(true);
      }),
      { seed: 20261202, numRuns: 300 },
    );
  });

  it('perceiveBonds is unchanged by a large translation and handles a sparse, far-flung box', () => {
    const base = molecule(['O', 'H', 'H', 'C', 'H'], [[0, 0, 0], [0.96, 0, 0], [-0.24, 0.93, 0], [1e6, 0, 0], [1e6 + 1.09, 0, 0]]);
    const shift = [123.4, -5678.9, 1e5];
    const moved = molecule(
      base.atoms.map((a) => a.element),
      Array.from({ length: 5 }, (_, i) => [0, 1, 2].map((d) => base.coords[3 * i + d]! + shift[d]!) as [number, number, number]),
    );
    expect(pairs(perceiveBonds(base))).toEqual([[0, 1], [0, 2], [3, 4]]);
    expect(pairs(perceiveBonds(moved))).toEqual([[0, 1], [0, 2], [3, 4]]);
    const huge = molecule(['C', 'C', 'C'], [[0, 0, 0], [1.5, 0, 0], [1e200, -1e200, 1e200]]);
    expect(pairs(perceiveBonds(huge))).toEqual([[0, 1]]);
  });

  it('perceiveBonds returns no bonds for an empty record or a single atom', () => {
    expect(perceiveBonds(molecule([], []))).toEqual([]);
    expect(perceiveBonds(molecule(['C'], [[0, 0, 0]]))).toEqual([]);
  });
});
