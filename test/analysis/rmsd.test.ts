import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { heavyAtomRmsd } from '../../src/analysis/rmsd.js';
import { findDuplicates } from '../../src/analysis/duplicates.js';
import { compareTorsionFingerprints, torsionFingerprint } from '../../src/analysis/torsionFingerprint.js';
import type { Molecule, Vec3 } from '../../src/model/molecule.js';
import { cyclohexaneChair, moleculeOf } from '../helpers/chairModelE.js';

/** A copy of `mol` with every position mapped through `f`. */
const mapped = (mol: Molecule, f: (p: Vec3) => Vec3): Molecule => {
  const coords = new Float64Array(mol.coords.length);
  for (let i = 0; i < mol.atoms.length; i++) coords.set(f([mol.coords[3 * i]!, mol.coords[3 * i + 1]!, mol.coords[3 * i + 2]!]), 3 * i);
  return { ...mol, coords };
};
/** A copy of `mol` with every coordinate shifted by the matching entry of `noise` (cycled). */
const moved = (mol: Molecule, noise: readonly number[]): Molecule => ({ ...mol, coords: mol.coords.map((c, k) => c + noise[k % noise.length]!) });
const turn = (p: Vec3): Vec3 => [0.6 * p[0] - 0.8 * p[1] + 3, 0.8 * p[0] + 0.6 * p[1] - 1, p[2] + 2];

describe('heavyAtomRmsd', () => {
  const chair = cyclohexaneChair();

  it('heavyAtomRmsd is 0 for a rigidly moved copy and compares only the six carbons', () => {
    const r = heavyAtomRmsd(chair, mapped(chair, turn));
    expect(r.rmsdA).toBeLessThan(1e-9);
    expect(r.atoms).toEqual([0, 1, 2, 3, 4, 5]);
    expect(heavyAtomRmsd(chair, chair, { includeHydrogens: true }).atoms).toHaveLength(18);
  });

  it('heavyAtomRmsd ignores hydrogens unless asked: moving one H changes only the all-atom value', () => {
    const moved = mapped(chair, (p) => p);
    const coords = Float64Array.from(moved.coords);
    coords[3 * 6] = coords[3 * 6]! + 0.5;
    const other = { ...moved, coords };
    expect(heavyAtomRmsd(chair, other).rmsdA).toBeLessThan(1e-9);
    expect(heavyAtomRmsd(chair, other, { includeHydrogens: true }).rmsdA).toBeGreaterThan(0.05);
  });

  it('heavyAtomRmsd cannot superpose mirror images: atoms match by index, so even the achiral chair needs a relabelling', () => {
    const mirror = (p: Vec3): Vec3 => [p[0], -p[1], p[2]];
    // y → −y maps ring atom j onto the place of atom 6 − j: superposable only after that relabelling
    const mirrored = mapped(chair, mirror);
    expect(heavyAtomRmsd(chair, mirrored).rmsdA).toBeGreaterThan(0.3);
    const relabel = [0, 5, 4, 3, 2, 1];
    const coords = Float64Array.from(mirrored.coords);
    relabel.forEach((from, to) => coords.set(mirrored.coords.subarray(3 * from, 3 * from + 3), 3 * to));
    expect(heavyAtomRmsd(chair, { ...mirrored, coords }).rmsdA).toBeLessThan(1e-9);
    const chiral = moleculeOf(
      ['C', 'C', 'C', 'C', 'C'],
      [[0, 0, 0], [1.5, 0, 0], [0, 1.5, 0.2], [0, -0.3, 1.5], [-0.9, -0.9, -0.9]],
      [[0, 1], [0, 2], [0, 3], [0, 4]],
    );
    expect(heavyAtomRmsd(chiral, mapped(chiral, mirror)).rmsdA).toBeGreaterThan(0.1);
  });

  it('heavyAtomRmsd refuses records with different atoms', () => {
    const fewer = { ...chair, atoms: chair.atoms.slice(0, 17), coords: chair.coords.slice(0, 51) };
    expect(() => heavyAtomRmsd(chair, fewer)).toThrow(/18 and 17 atoms/);
    const renamed = { ...chair, atoms: chair.atoms.map((a, i) => (i === 2 ? { ...a, element: 'N' } : a)) };
    expect(() => heavyAtomRmsd(chair, renamed)).toThrow(/atom 3 is C in one record and N/);
  });
});

describe('findDuplicates', () => {
  it('findDuplicates marks a moved copy as a duplicate of the first record and keeps a distorted one', () => {
    const chair = cyclohexaneChair();
    const flat = mapped(chair, (p) => [p[0], p[1], p[2] * 0.3]);
    expect(findDuplicates([chair, flat, mapped(chair, turn), mapped(flat, turn)])).toEqual([null, null, 0, 1]);
    expect(findDuplicates([chair, flat], { rmsdThresholdA: 10 })).toEqual([null, 0]);
    expect(() => findDuplicates([chair], { rmsdThresholdA: -1 })).toThrow(/non-negative/);
  });

  it('findDuplicates with energies keeps same-skeleton records apart when their energies differ by more than the window', () => {
    const chair = cyclohexaneChair();
    const copy = mapped(chair, turn);
    expect(findDuplicates([chair, copy], { energies: [0, 0.02] })).toEqual([null, 0]);
    expect(findDuplicates([chair, copy], { energies: [0, 0.3] })).toEqual([null, null]);
    expect(findDuplicates([chair, copy], { energies: [0, 0.3], energyWindow: 0.5 })).toEqual([null, 0]);
  });

  it('findDuplicates (bounds and a grid) gives exactly what comparing every pair gives, ties and near-threshold copies included', () => {
    const chair = cyclohexaneChair();
    // the plain definition: the first earlier unique record within the window and the threshold
    const everyPair = (records: readonly Molecule[], threshold: number, energies: readonly number[]) => {
      const unique: number[] = [];
      return records.map((r, i) => {
        const m = unique.find((u) => Math.abs(energies[u]! - energies[i]!) <= 0.05 && heavyAtomRmsd(records[u]!, r).rmsdA <= threshold);
        if (m !== undefined) return m;
        unique.push(i);
        return null;
      });
    };
    fc.assert(
      fc.property(
        fc.array(fc.record({ noise: fc.array(fc.double({ min: -0.15, max: 0.15, noNaN: true }), { minLength: 54, maxLength: 54 }), energy: fc.constantFrom(0, 0, 0.01, 1), scale: fc.double({ min: 0.9, max: 1.25, noNaN: true }) }), { minLength: 1, maxLength: 25 }),
        fc.constantFrom(0.05, 0.125, 0.3),
        (specs, threshold) => {
          // scaled records spread over many grid cells, so pairs across cell borders are tested too
          const records = specs.map(({ noise, scale }) => mapped(moved(chair, noise), (p) => turn([scale * p[0], scale * p[1], scale * p[2]])));
          const energies = specs.map((s) => s.energy);
          expect(findDuplicates(records, { rmsdThresholdA: threshold, energies })).toEqual(everyPair(records, threshold, energies));
        },
      ),
      { seed: 21, numRuns: 150 },
    );
  });

  it('findDuplicates refuses records with different atoms and non-finite energies with a ConformarkError', () => {
    const chair = cyclohexaneChair();
    const fewer = { ...chair, atoms: chair.atoms.slice(1), coords: chair.coords.slice(3) };
    expect(() => findDuplicates([chair, fewer])).toThrow(expect.objectContaining({ code: 'atoms-differ' }));
    expect(() => findDuplicates([chair, chair], { energies: [0, Number.NaN] })).toThrow(expect.objectContaining({ code: 'bad-energies' }));
    expect(() => findDuplicates('records' as never)).toThrow(expect.objectContaining({ code: 'bad-argument' }));
  });
});

describe('torsionFingerprint', () => {
  it('torsionFingerprint gives the ring torsions ±54.9 of the chair model (derived, docs/methods.md#cremer-pople-checks)', () => {
    const fp = torsionFingerprint(cyclohexaneChair(), [[0, 1, 2, 3], [1, 2, 3, 4]]);
    expect(Math.abs(fp[0]!)).toBeCloseTo(54.94, 1);
    expect(fp[0]! * fp[1]!).toBeLessThan(0);
  });

  it('compareTorsionFingerprints takes the circular difference across ±180 and skips nulls', () => {
    const d = compareTorsionFingerprints([179, 60, null, -10], [-179, 65, 30, 10]);
    expect(d.maxDifferenceDeg).toBeCloseTo(20, 12);
    expect(d.index).toBe(3);
    expect(d.compared).toBe(3);
    expect(compareTorsionFingerprints([179], [-179]).maxDifferenceDeg).toBeCloseTo(2, 12);
    expect(compareTorsionFingerprints([], [])).toEqual({ maxDifferenceDeg: 0, index: null, compared: 0 });
    expect(() => compareTorsionFingerprints([1], [1, 2])).toThrow(/1 and 2 torsions/);
  });
});
