/**
 * Seven- and eight-membered ring forms (docs/methods.md#medium-rings): ideal forms from
 * scripts/fixtures/medium-ring-forms.mjs (derived), force-field minima from conformark's own build and from
 * openchemlib directly, and an independent check that each named form has the symmetry of its torsions
 * (Hendrickson 1967, J. Am. Chem. Soc. 89, 7036 and 7047: chair and boat Cs, twist-chair and twist-boat C2;
 * boat-chair Cs, twist-boat-chair C2, twist-chair-chair D2 — from memory).
 */
import { readFileSync } from 'node:fs';
import { beforeAll, describe, expect, it } from 'vitest';
import { parseText } from '../../src/io/parseText.js';
import { prepareRecord } from '../../src/api/prepare.js';
import { analyzeRing, type RingAnalysis } from '../../src/analysis/ringAnalysis.js';
import { mediumRingForms, MEDIUM_RING_FORMS } from '../../src/analysis/mediumRingForms.js';
import { buildConformers } from '../../src/api/build/build.js';
import type { Molecule } from '../../src/model/molecule.js';
import { minimisedConformers } from '../helpers/fromOpenchemlib.js';

const analyse = (mol: Molecule): RingAnalysis => {
  const { molecule, graph, rings } = prepareRecord(mol);
  return analyzeRing(molecule, graph, rings[0]!);
};
const torsions = (r: RingAnalysis): number[] => r.torsions.map((t) => t.angleDeg!);
const wrap = (x: number): number => ((((x + 180) % 360) + 360) % 360) - 180;

/** Symmetry elements of a cyclic torsion sequence, found independently of the classifier (tolerance 3°). */
function symmetry(w: readonly number[]): { mirror: boolean; axis: boolean; halfPeriod: boolean } {
  const n = w.length;
  const matches = (sign: number): boolean =>
    Array.from({ length: n }, (_, s) => s).some((s) =>
      w.every((v, j) => Math.abs(wrap(v - sign * w[(((s - j) % n) + n) % n]!)) < 3),
    );
  return {
    mirror: matches(-1), // ω_j = −ω_{s−j}: a mirror plane
    axis: matches(1), // ω_j = +ω_{s−j}: a two-fold axis in the mean plane
    halfPeriod: n % 2 === 0 && w.every((v, j) => Math.abs(wrap(v - w[(j + n / 2) % n]!)) < 3),
  };
}

const IDEAL = parseText(readFileSync('test/data/medium-rings/ideal-7.xyz', 'utf8'), { file: 'ideal-7.xyz' });

describe('medium-ring forms', () => {
  it('MEDIUM_RING_FORMS lists four seven-ring and six eight-ring forms, each a unit pattern with Σz = 0', () => {
    expect(MEDIUM_RING_FORMS.filter((f) => f.size === 7).map((f) => f.shape)).toEqual(['chair', 'twist-chair', 'boat', 'twist-boat']);
    expect(MEDIUM_RING_FORMS.filter((f) => f.size === 8)).toHaveLength(6);
    for (const f of MEDIUM_RING_FORMS) {
      expect(Math.hypot(...f.z)).toBeCloseTo(1, 12);
      expect(Math.abs(f.z.reduce((a, b) => a + b, 0))).toBeLessThan(2e-3);
    }
  });

  it('analyzeRing names each ideal seven-ring form (equal bonds 1.54 Å and angles 115°, derived) within 0.1°', () => {
    expect(IDEAL.map((m) => m.title.split(' ')[0])).toEqual(['chair', 'twist-chair', 'boat', 'twist-boat']);
    for (const mol of IDEAL) {
      const r = analyse(mol);
      expect(r.shape, mol.title).toBe(mol.title.split(' ')[0]);
      expect(r.fit!.quality).toBe('close');
      expect(r.fit!.distanceDeg).toBeLessThan(0.1);
      expect(r.descriptor).toBeNull();
    }
  });

  it('the ideal seven-ring forms have the symmetry of their names: chair and boat a mirror, twist forms an axis', () => {
    const sym = IDEAL.map((m) => symmetry(torsions(analyse(m))));
    expect(sym.map((s) => [s.mirror, s.axis])).toEqual([[true, false], [false, true], [true, false], [false, true]]);
  });

  it('the ideal twist-chair has the torsions 39, 39, −88, 72, −54, 72, −88 within 6° (Hendrickson 1967; from memory)', () => {
    const w = torsions(analyse(IDEAL[1]!));
    const ref = [39.1, 39.1, -88.1, 72.3, -54.3, 72.3, -88.1];
    const n = w.length;
    const fits = (sign: number): boolean =>
      Array.from({ length: n }, (_, s) => s).some((s) => ref.every((v, j) => Math.abs(sign * w[(s + j) % n]! - v) < 6));
    expect(fits(1) || fits(-1)).toBe(true);
  });

  it('mediumRingForms is unchanged by renumbering (any start, either direction) and by the mirror image', () => {
    const z = MEDIUM_RING_FORMS.find((f) => f.shape === 'boat-chair')!.z;
    for (let s = 0; s < 8; s++) {
      const rotated = z.map((_, j) => z[(j + s) % 8]!);
      const reversed = z.map((_, j) => z[(((s - j) % 8) + 8) % 8]!);
      for (const v of [rotated, reversed, rotated.map((x) => -2 * x)]) {
        const best = mediumRingForms(v)[0]!;
        expect(best.form.shape).toBe('boat-chair');
        expect(best.distanceDeg).toBeLessThan(1e-4);
      }
    }
    expect(mediumRingForms([0.1, -0.1, 0.1, -0.1, 0.1, -0.1])).toEqual([]);
  });

  describe('force-field minima', () => {
    let c7: Molecule[];
    let c8: Molecule[];
    beforeAll(async () => {
      c7 = (await buildConformers('C1CCCCCC1', { conformers: 6, seed: 7 })).molecules;
      c8 = (await buildConformers('C1CCCCCCC1', { conformers: 10, seed: 5 })).molecules;
    }, 120_000);

    it('buildConformers(cycloheptane) gives a twist-chair (the lowest form; Hendrickson 1967, from memory) with pseudo words', () => {
      const r = analyse(c7[0]!);
      expect(r.shape).toBe('twist-chair');
      expect(r.fit!.distanceDeg).toBeLessThan(10);
      expect(symmetry(torsions(r)).axis).toBe(true);
      expect(r.substituents.every((s) => s.position!.startsWith('pseudo-') || s.position === 'isoclinal')).toBe(true);
    });

    it('buildConformers(cyclooctane) gives a boat-chair as the lowest form (Hendrickson 1967, from memory), a mirror form', () => {
      const r = analyse(c8[0]!);
      expect(r.shape).toBe('boat-chair');
      expect(r.fit!.quality).toBe('close');
      const s = symmetry(torsions(r));
      expect([s.mirror, s.axis]).toEqual([true, false]);
    });

    it('every distinct cyclooctane minimum is named, and each name agrees with the symmetry of its torsions', () => {
      for (const mol of c8) {
        const r = analyse(mol);
        const s = symmetry(torsions(r));
        if (r.shape === 'boat-chair') expect([s.mirror, s.axis]).toEqual([true, false]);
        else if (r.shape === 'twist-boat-chair') expect([s.mirror, s.axis]).toEqual([false, true]);
        else if (r.shape === 'twist-chair-chair') expect([s.axis, s.halfPeriod]).toEqual([true, true]);
        else expect(['crown', 'boat-boat', 'twist-boat', 'puckered']).toContain(r.shape);
      }
    });

    it('openchemlib conformers minimised directly with MMFF94s (another seed) are named by the symmetry of their torsions', () => {
      const seven = minimisedConformers('C1CCCCCC1', 4, 99);
      expect(analyse(seven[0]!.mol).shape).toBe('twist-chair');
      const eight = minimisedConformers('C1CCCCCCC1', 12, 99).map((c) => analyse(c.mol));
      const names = new Set(eight.map((r) => r.shape));
      expect(names.has('boat-chair') || names.has('twist-chair-chair')).toBe(true);
      for (const r of eight) {
        const s = symmetry(torsions(r));
        if (r.shape === 'boat-chair') expect(s.mirror).toBe(true);
        if (r.shape === 'twist-boat-chair') expect(s.axis).toBe(true);
        if (r.shape === 'twist-chair-chair') expect(s.halfPeriod).toBe(true);
        expect(r.shape).not.toBe('planar');
      }
    }, 60_000);

    it('the fit windows apply: the same twist-chair is distorted with closeDeg below its distance, puckered beyond distortedDeg', () => {
      const { molecule, graph, rings } = prepareRecord(c7[0]!);
      const d = analyzeRing(molecule, graph, rings[0]!).fit!.distanceDeg;
      expect(d).toBeGreaterThan(0.05);
      const tight = analyzeRing(molecule, graph, rings[0]!, { closeDeg: d / 2 });
      expect([tight.shape, tight.fit!.quality]).toEqual(['twist-chair', 'distorted']);
      const none = analyzeRing(molecule, graph, rings[0]!, { closeDeg: d / 4, distortedDeg: d / 2 });
      expect([none.shape, none.fit]).toEqual(['puckered', null]);
    });
  });
});
