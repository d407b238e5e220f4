import { describe, expect, it } from 'vitest';
import { analyzeRing } from '../../src/analysis/ringAnalysis.js';
import { relativeConfiguration } from '../../src/analysis/substituents.js';
import { THETA_HALF_CHAIR } from '../../src/analysis/ringForms.js';
import { c2vBoat, d2TwistBoat, d3dChair, renumberToPhi, ringMolecule, sixRingAt } from '../helpers/ringBuilders.js';
import type { Vec3 } from '../../src/model/molecule.js';

/** Ring with two H per atom (C–H 1.10, H–C–H 107.5, bisector plane: the docs/methods.md#axial-equatorial model), analysed. */
const analyse = (points: Vec3[]) => {
  const { mol, graph, ring } = ringMolecule(points, { hydrogens: true });
  return analyzeRing(mol, graph, ring);
};
const byRingAtom = (r: ReturnType<typeof analyse>, j: number) =>
  r.substituents.filter((s) => s.ringAtom === r.atoms[j]).sort((a, b) => a.angleToNormalDeg - b.angleToNormalDeg);

describe('ringSubstituents on the docs/methods.md#axial-equatorial models (derived)', () => {
  it('a GED-like chair has axial H at α 4.1 and equatorial H at α 68.4, axial faces alternating with z', () => {
    const r = analyse(d3dChair(1.536, 111.4).points);
    expect(r.shape).toBe('chair');
    for (let j = 0; j < 6; j++) {
      const [ax, eq] = byRingAtom(r, j);
      expect(ax!.position).toBe('axial');
      expect(eq!.position).toBe('equatorial');
      expect(Math.abs(ax!.angleToNormalDeg - 4.1)).toBeLessThan(0.1);
      expect(Math.abs(eq!.angleToNormalDeg - 68.4)).toBeLessThan(0.1);
      expect(ax!.face).toBe(r.z[j]! > 0 ? 'top' : 'bottom'); // sign(n·b) = sign(z_j) for axial bonds
    }
  });

  it('an equal-bond boat has flagpole (α ≈ 13) and bowsprit (α ≈ 86) at bow and stern, pseudo words elsewhere', () => {
    const r = analyse(renumberToPhi(c2vBoat(1.536, 111.4), 0));
    expect(r.descriptor).toBe('1,4B');
    for (let j = 0; j < 6; j++) {
      const [a, b] = byRingAtom(r, j);
      if (j === 0 || j === 3) {
        expect([a!.position, b!.position]).toEqual(['flagpole', 'bowsprit']);
        expect(Math.abs(a!.angleToNormalDeg - 13)).toBeLessThan(1.5);
        expect(Math.abs(b!.angleToNormalDeg - 86)).toBeLessThan(1.5);
      } else {
        expect([a!.position, b!.position]).toEqual(['pseudo-axial', 'pseudo-equatorial']);
        expect(Math.abs(a!.angleToNormalDeg - 20)).toBeLessThan(1.5);
        expect(Math.abs(b!.angleToNormalDeg - 61)).toBeLessThan(1.5);
      }
    }
  });

  it('an equal-bond twist-boat has isoclinal H (α ≈ 40) on the C2-axis atoms and pseudo words elsewhere', () => {
    const r = analyse(renumberToPhi(d2TwistBoat(1.536, 111.4), 30));
    expect(r.shape).toBe('twist-boat');
    for (let j = 0; j < 6; j++) {
      const [a, b] = byRingAtom(r, j);
      if (j === 2 || j === 5) {
        expect([a!.position, b!.position]).toEqual(['isoclinal', 'isoclinal']);
        expect(Math.abs(a!.angleToNormalDeg - 40)).toBeLessThan(2);
      } else {
        expect([a!.position, b!.position]).toEqual(['pseudo-axial', 'pseudo-equatorial']);
        expect(Math.abs(a!.angleToNormalDeg - 10)).toBeLessThan(2);
        expect(Math.abs(b!.angleToNormalDeg - 78)).toBeLessThan(2);
      }
    }
  });

  it('a half-chair uses plain words at its two exoplanar atoms and pseudo words (α ≈ 19 / 57) at the allylic atoms', () => {
    // 1H2 in carbocycle locants: j = 1, 2 exoplanar; j = 3, 6 allylic; j = 4, 5 the (here sp3) olefinic pair
    const r = analyse(sixRingAt(0.5, THETA_HALF_CHAIR, 30));
    expect(r.descriptor).toBe('1H2');
    const words = [0, 1, 2, 3, 4, 5].map((j) => byRingAtom(r, j).map((s) => s.position));
    expect(words.slice(0, 2)).toEqual([['axial', 'equatorial'], ['axial', 'equatorial']]);
    for (const j of [2, 5]) {
      expect(words[j]).toEqual(['pseudo-axial', 'pseudo-equatorial']);
      const [a, b] = byRingAtom(r, j);
      expect(Math.abs(a!.angleToNormalDeg - 19)).toBeLessThan(1);
      expect(Math.abs(b!.angleToNormalDeg - 57)).toBeLessThan(1);
    }
    // the two bonds at each in-plane olefinic-position atom differ by < 10°: isoclinal in this all-sp3 model
    expect(words[3]).toEqual(['isoclinal', 'isoclinal']);
  });

  it('relativeConfiguration: axial H on neighbouring chair atoms are trans, on 1,3-atoms cis', () => {
    const r = analyse(d3dChair(1.536, 111.4).points);
    const axial = [0, 1, 2].map((j) => byRingAtom(r, j)[0]!);
    expect(relativeConfiguration(r, axial[0]!, axial[1]!)).toBe('trans');
    expect(relativeConfiguration(r, axial[0]!.atom, axial[2]!.atom)).toBe('cis');
    expect(() => relativeConfiguration(r, 0, 1)).toThrow(/not a substituent/);
  });

  it('a planar ring reports faces but no positions, and an sp2 ring atom in-plane substituent is skipped', () => {
    const flat = analyse(sixRingAt(0, 0, 0));
    expect(flat.shape).toBe('planar');
    expect(flat.substituents.every((s) => s.position === null && s.face !== null)).toBe(true);
    // benzene-like: one in-plane H per ring atom
    const points = sixRingAt(0, 0, 0);
    const { mol, graph, ring } = ringMolecule(points);
    const withH = {
      ...mol,
      atoms: [...mol.atoms, ...points.map(() => ({ element: 'H', name: null }))],
      coords: Float64Array.from([...mol.coords, ...points.flatMap((p) => [p[0] * 1.75, p[1] * 1.75, 0])]),
    };
    const bonds = [...mol.bonds!, ...points.map((_, j) => ({ a: j, b: 6 + j, order: 1, perceived: false }))];
    const g = { ...graph, neighbors: graph.neighbors.map((l, j) => [...l, 6 + j]).concat(points.map((_, j) => [j])) };
    const benzene = { ...withH, bonds };
    const r = analyzeRing(benzene, g, ring);
    expect(r.substituents).toHaveLength(6);
    expect(r.substituents.every((s) => s.position === null && s.face === null)).toBe(true);
  });
});
