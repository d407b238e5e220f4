import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import {
  GAS_CONSTANT_KCAL,
  GAS_CONSTANT_KJ,
  boltzmannPopulations,
  convertEnergy,
  ensembleAverage,
} from '../../src/analysis/boltzmann.js';

/** |actual − expected| ≤ rel·|expected|. */
const closeRel = (actual: number | undefined, expected: number, rel: number) =>
  expect(Math.abs(actual! - expected)).toBeLessThanOrEqual(rel * Math.abs(expected));

describe('boltzmannPopulations', () => {
  it('boltzmannPopulations reproduces the docs/methods.md#boltzmann butane check values, g_gauche = 2 (derived arithmetic, 1e-4 relative)', () => {
    closeRel(boltzmannPopulations([0, 0.66], { degeneracies: [1, 2] }).populations[1], 0.3963, 1e-4);
    closeRel(boltzmannPopulations([0, 0.9], { degeneracies: [1, 2] }).populations[1], 0.3045, 1e-4);
    closeRel(boltzmannPopulations([0, 3.8], { unit: 'kJ/mol', degeneracies: [1, 2] }).populations[1], 0.3016, 1e-4);
  });

  it('boltzmannPopulations reproduces the methylcyclohexane check values x_eq 0.9496 (K 18.86) and 0.9463 (K 17.62) (derived, docs/methods.md#boltzmann)', () => {
    const a = boltzmannPopulations([0, 1.74]).populations;
    const b = boltzmannPopulations([0, 1.7]).populations;
    closeRel(a[0], 0.9496, 1e-4);
    closeRel(b[0], 0.9463, 1e-4);
    closeRel(a[0]! / a[1]!, 18.86, 1e-3);
    closeRel(b[0]! / b[1]!, 17.62, 1e-3);
  });

  it('boltzmannPopulations gives t-Bu x_ax 2.56e-4 (A 4.9) and twist-boat 9.3e-5 (5.5) to the printed precision (derived, docs/methods.md#boltzmann)', () => {
    // these two are printed with 3 and 2 significant figures, so the tolerance is half a unit in the last digit
    expect(Math.abs(boltzmannPopulations([0, 4.9]).populations[1]! - 2.56e-4)).toBeLessThanOrEqual(0.005e-4);
    expect(Math.abs(boltzmannPopulations([0, 5.5]).populations[1]! - 9.3e-5)).toBeLessThanOrEqual(0.05e-5);
  });

  it('boltzmannPopulations uses RT = 0.592485 kcal/mol = 2.478957 kJ/mol at 298.15 K (derived, docs/methods.md#boltzmann)', () => {
    expect(GAS_CONSTANT_KCAL * 298.15).toBeCloseTo(0.592485, 6);
    expect(GAS_CONSTANT_KJ * 298.15).toBeCloseTo(2.478957, 6);
    expect(GAS_CONSTANT_KJ / 4.184).toBeCloseTo(GAS_CONSTANT_KCAL, 12);
  });

  it('boltzmannPopulations returns relative energies in the input unit and survives large absolute energies (log-sum-exp)', () => {
    const r = boltzmannPopulations([-1000.2, -1000.2 + 0.001, -1000.2 + 0.5], { unit: 'hartree' });
    expect(r.relativeEnergies[1]).toBeCloseTo(0.001, 9);
    expect(r.lowest).toBe(0);
    expect(r.populations.reduce((a, b) => a + b, 0)).toBeCloseTo(1, 12);
    expect(r.populations[2]).toBeLessThan(1e-200); // exp(−530): tiny, but never NaN or Infinity
    expect(r.populations[1]! / r.populations[0]!).toBeCloseTo(Math.exp(-0.627509474 / (GAS_CONSTANT_KCAL * 298.15)), 9);
  });

  it('boltzmannPopulations with degeneracy g equals shifting ΔE by −RT ln g (docs/methods.md#boltzmann)', () => {
    fc.assert(
      fc.property(
        fc.array(fc.double({ min: -5, max: 5, noNaN: true }), { minLength: 1, maxLength: 8 }),
        fc.integer({ min: 1, max: 6 }),
        (energies, g) => {
          const rt = GAS_CONSTANT_KCAL * 298.15;
          const a = boltzmannPopulations(energies, { degeneracies: energies.map((_, i) => (i === 0 ? g : 1)) });
          const b = boltzmannPopulations(energies.map((e, i) => (i === 0 ? e - rt * Math.log(g) : e)));
          a.populations.forEach((p, i) => expect(p).toBeCloseTo(b.populations[i]!, 12));
          expect(a.populations.reduce((s, p) => s + p, 0)).toBeCloseTo(1, 12);
        },
      ),
      { seed: 4242, numRuns: 200 },
    );
  });

  it('boltzmannPopulations gives equal populations at equal energies and in order of energy', () => {
    expect(boltzmannPopulations([2, 2, 2]).populations).toEqual([1 / 3, 1 / 3, 1 / 3].map((x) => expect.closeTo(x, 12)));
    const p = boltzmannPopulations([0.5, 0, 1], { temperatureK: 500 }).populations;
    expect(p[1]! > p[0]! && p[0]! > p[2]!).toBe(true);
    expect(boltzmannPopulations([]).populations).toEqual([]);
  });

  it('boltzmannPopulations rejects bad temperatures, energies, degeneracies and units as user errors', () => {
    expect(() => boltzmannPopulations([0, 1], { temperatureK: 0 })).toThrow(/temperature/);
    expect(() => boltzmannPopulations([0, Number.NaN])).toThrow(/energy 2/);
    expect(() => boltzmannPopulations([0, 1], { degeneracies: [1] })).toThrow(/degeneracies/);
    expect(() => boltzmannPopulations([0, 1], { degeneracies: [1, 0] })).toThrow(/degeneracy 2/);
    expect(() => boltzmannPopulations([0, 1], { unit: 'kcal' as never })).toThrow(/unknown energy unit/);
  });
});

describe('convertEnergy', () => {
  it('convertEnergy uses 4.184 kJ/kcal and the CODATA 2018 hartree and eV (Tiesinga et al. 2021, Rev. Mod. Phys. 93, 025010)', () => {
    expect(convertEnergy(1, 'kcal/mol', 'kJ/mol')).toBeCloseTo(4.184, 12);
    expect(convertEnergy(1, 'hartree', 'kcal/mol')).toBeCloseTo(2625.4996394799 / 4.184, 9);
    expect(convertEnergy(1, 'hartree', 'kcal/mol')).toBeCloseTo(627.509474, 6);
    expect(convertEnergy(1, 'eV', 'kcal/mol')).toBeCloseTo(23.0605, 4);
    expect(convertEnergy(convertEnergy(3.7, 'eV', 'hartree'), 'hartree', 'eV')).toBeCloseTo(3.7, 12);
  });
});

describe('ensembleAverage', () => {
  it('ensembleAverage averages J, not torsions: chair couplings 13.1 and 3.9 Hz at 50:50 give 8.5 Hz', () => {
    expect(ensembleAverage([0.5, 0.5], [13.1, 3.9])).toBeCloseTo(8.5, 12);
  });

  it('ensembleAverage refuses lists of different length', () => {
    expect(() => ensembleAverage([1], [1, 2])).toThrow(/2 values given for 1 populations/);
  });
});
