import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { analyzeRing, type RingAnalysis } from '../../src/analysis/ringAnalysis.js';
import { toReportRing } from '../../src/analysis/ringReport.js';
import { relativeConfiguration } from '../../src/analysis/substituents.js';
import { buildGraph } from '../../src/perceive/graph.js';
import type { Molecule } from '../../src/model/molecule.js';
import { minimisedConformers } from '../helpers/fromOpenchemlib.js';
import { fiveRingAt, ringMolecule, sixRingAt } from '../helpers/ringBuilders.js';

const lowest = (smiles: string) => {
  const c = minimisedConformers(smiles, 4)[0]!;
  const graph = buildGraph(c.mol.atoms.length, c.mol.bonds!);
  return { ...c, graph, ring: analyzeRing(c.mol, graph, c.rings[0]!) };
};
const heavy = (r: RingAnalysis) => r.substituents.filter((s) => s.element !== 'H');

/** True when no number anywhere in `value` is NaN or infinite. */
const allFinite = (value: unknown): boolean =>
  typeof value === 'number'
    ? Number.isFinite(value)
    : Array.isArray(value)
      ? value.every(allFinite)
      : value !== null && typeof value === 'object'
        ? Object.values(value).every(allFinite)
        : true;

describe('analyzeRing on openchemlib MMFF94s structures', () => {
  it('analyzeRing of β-D-glucopyranose gives 4C1 with every exocyclic heavy atom equatorial (common practice)', () => {
    const { ring, mol } = lowest('OC[C@H]1O[C@@H](O)[C@H](O)[C@@H](O)[C@@H]1O');
    expect(mol.atoms[ring.atoms[0]!]!.element).toBe('O');
    expect(ring.descriptor).toBe('4C1');
    expect(ring.shape).toBe('chair');
    expect(ring.puckering.thetaDeg!).toBeLessThan(15);
    expect(ring.puckering.Q).toBeGreaterThan(0.5);
    expect(ring.puckering.Q).toBeLessThan(0.65);
    const subs = heavy(ring);
    expect(subs).toHaveLength(5); // O1, O2, O3, O4, C6
    expect(subs.every((s) => s.position === 'equatorial')).toBe(true);
    // all-equatorial: neighbouring substituents trans, 1,3-related cis
    const onC = (j: number) => subs.find((s) => s.ringAtom === ring.atoms[j])!;
    expect(relativeConfiguration(ring, onC(1), onC(2))).toBe('trans');
    expect(relativeConfiguration(ring, onC(1), onC(3))).toBe('cis');
  });

  it('analyzeRing of α-D-glucopyranose gives 4C1 with the anomeric O axial (trade fact, common practice)', () => {
    const { ring } = lowest('OC[C@H]1O[C@H](O)[C@H](O)[C@@H](O)[C@@H]1O');
    expect(ring.descriptor).toBe('4C1');
    const o1 = heavy(ring).find((s) => s.ringAtom === ring.atoms[1] && s.element === 'O')!;
    expect(o1.position).toBe('axial');
    expect(heavy(ring).filter((s) => s !== o1).every((s) => s.position === 'equatorial')).toBe(true);
  });

  it('analyzeRing of cyclohexane gives a chair with six axial H (three up, three down, alternating) and six equatorial', () => {
    const { ring } = lowest('C1CCCCC1');
    expect(ring.shape).toBe('chair');
    expect(ring.referenceRule).toMatch(/lowest-index/);
    const axial = ring.substituents.filter((s) => s.position === 'axial');
    expect(axial).toHaveLength(6);
    expect(ring.substituents.filter((s) => s.position === 'equatorial')).toHaveLength(6);
    const faces = ring.atoms.map((a) => axial.find((s) => s.ringAtom === a)!.face);
    expect(faces.filter((f) => f === 'top')).toHaveLength(3);
    faces.forEach((f, j) => expect(f).not.toBe(faces[(j + 1) % 6]));
  });

  it('analyzeRing of methylcyclohexane puts the methyl equatorial (common practice)', () => {
    const { ring } = lowest('CC1CCCCC1');
    const methyl = heavy(ring);
    expect(methyl).toHaveLength(1);
    expect(methyl[0]!.position).toBe('equatorial');
  });

  it('analyzeRing is unchanged by rigid motion, and a mirror image turns 4C1 into 1C4 and flips faces', () => {
    const { ring, mol, graph, rings } = lowest('OC[C@H]1O[C@@H](O)[C@H](O)[C@@H](O)[C@@H]1O');
    const c = mol.coords;
    const [ca, sa] = [Math.cos(1.1), Math.sin(1.1)];
    const moved: Molecule = {
      ...mol,
      coords: c.map((v, i) => (i % 3 === 0 ? ca * v - sa * c[i + 1]! + 3 : i % 3 === 1 ? sa * c[i - 1]! + ca * v - 2 : v + 5)),
    };
    const m = analyzeRing(moved, graph, rings[0]!);
    expect(m.puckering.Q).toBeCloseTo(ring.puckering.Q, 10);
    expect(m.puckering.thetaDeg!).toBeCloseTo(ring.puckering.thetaDeg!, 8);
    expect(m.descriptor).toBe(ring.descriptor);
    expect(m.substituents.map((s) => [s.position, s.face])).toEqual(ring.substituents.map((s) => [s.position, s.face]));
    const mirror = analyzeRing({ ...mol, coords: c.map((v, i) => (i % 3 === 2 ? -v : v)) }, graph, rings[0]!);
    expect(mirror.descriptor).toBe('1C4');
    expect(mirror.puckering.thetaDeg!).toBeCloseTo(180 - ring.puckering.thetaDeg!, 8);
    mirror.substituents.forEach((s, i) => expect(s.face).not.toBe(ring.substituents[i]!.face));
  });
});

describe('analyzeRing edge cases', () => {
  it('analyzeRing of a planar ring gives Q 0, shape planar, phi null and a warning, with no NaN anywhere', () => {
    const { mol, graph, ring } = ringMolecule(sixRingAt(0, 0, 0), { hydrogens: true });
    const r = analyzeRing(mol, graph, ring);
    expect(r.puckering.Q).toBeLessThan(1e-12);
    expect([r.shape, r.descriptor, r.puckering.phiDeg, r.puckering.thetaDeg]).toEqual(['planar', null, null, null]);
    expect(r.warnings.map((w) => w.code)).toEqual(['ring-nearly-planar']);
    expect(allFinite(r)).toBe(true);
    const five = ringMolecule(fiveRingAt(0.02, 40));
    const p5 = analyzeRing(five.mol, five.graph, five.ring);
    expect([p5.shape, p5.pseudorotation, p5.puckering.phiDeg]).toEqual(['planar', null, null]);
  });

  it('analyzeRing flags a ring 20–30° from every form as distorted and calls one beyond 30° puckered', () => {
    const { mol, graph, ring } = ringMolecule(sixRingAt(0.6, 25, 0)); // 25° from the chair pole, 29.7° from 1E
    const r = analyzeRing(mol, graph, ring);
    expect(r.shape).toBe('chair');
    expect(r.fit!.quality).toBe('distorted');
    expect(r.fit!.nearest.map((f) => f.descriptor)).toEqual(['1C4', '1E']);
    expect(r.warnings.map((w) => w.code)).toContain('ring-form-distorted');
    const loose = analyzeRing(mol, graph, ring, { distortedDeg: 22 });
    expect([loose.shape, loose.descriptor]).toEqual(['puckered', null]);
  });

  it('analyzeRing of a pure-q2 seven-ring is a boat-family form with pseudo words, and of a furanose reports pseudorotation', () => {
    const seven = ringMolecule(
      Array.from({ length: 7 }, (_, j) => {
        const a = (-2 * Math.PI * j) / 7;
        return [1.7 * Math.cos(a), 1.7 * Math.sin(a), 0.3 * Math.cos(2 * a)] as const;
      }),
      { hydrogens: true },
    );
    const r7 = analyzeRing(seven.mol, seven.graph, seven.ring);
    // the boat family of seven-rings is nearly pure q2 (docs/methods.md#medium-rings, derived)
    expect(['boat', 'twist-boat']).toContain(r7.shape);
    expect([r7.descriptor, r7.pseudorotation]).toEqual([null, null]);
    expect(r7.substituents.every((s) => s.position!.startsWith('pseudo-') || s.position === 'isoclinal')).toBe(true);
    const fur = ringMolecule(fiveRingAt(0.4, 288), { elements: ['O', 'C', 'C', 'C', 'C'] }); // 3E
    const r5 = analyzeRing(fur.mol, fur.graph, fur.ring, { pseudorotation: 'fourier' });
    expect(r5.descriptor).toBe('3E');
    expect(r5.pseudorotation!.method).toBe('fourier');
    expect(Math.abs(r5.pseudorotation!.phaseDeg - 18)).toBeLessThan(1); // C3′-endo region (docs/methods.md#five-ring-forms table)
    const as = analyzeRing(fur.mol, fur.graph, fur.ring);
    expect(as.pseudorotation!.method).toBe('closed-form');
  });

  it('analyzeRing of camphor (P near 90°) reports the Altona–Sundaralingam closed-form P within 0.01°', () => {
    // camphor's five-rings sit near P = 90°/270°, where a Fourier P differs by up to 0.7°
    const c = minimisedConformers('CC1(C)C2CCC1(C)C(=O)C2', 1)[0]!;
    const graph = buildGraph(c.mol.atoms.length, c.mol.bonds!);
    const fives = c.rings.filter((r) => r.length === 5).map((r) => analyzeRing(c.mol, graph, r));
    expect(fives.length).toBeGreaterThanOrEqual(2);
    const sin = Math.sin(Math.PI / 5) + Math.sin((2 * Math.PI) / 5);
    let nearNinety = 0;
    for (const r of fives) {
      const t = r.torsions.map((x) => x.angleDeg!);
      const [n0, n1, n2, n3, n4] = [t[4]!, t[0]!, t[1]!, t[2]!, t[3]!]; // ν0 = torsion (N,1,2,3)
      // tan P = [(ν4 + ν1) − (ν3 + ν0)] / [2 ν2 (sin 36° + sin 72°)] (Altona & Sundaralingam 1972)
      const p = ((Math.atan2(n4 + n1 - (n3 + n0), 2 * n2 * sin) * 180) / Math.PI + 360) % 360;
      expect(Math.abs(r.pseudorotation!.phaseDeg - p)).toBeLessThan(0.01);
      if (Math.abs(Math.cos((p * Math.PI) / 180)) < 0.3) {
        nearNinety++;
        expect(r.pseudorotation!.method).not.toBe('closed-form');
      }
    }
    expect(nearNinety).toBeGreaterThan(0);
  });

  it('analyzeRing with ordered keeps the given numbering and toReportRing gives 1-based atoms', () => {
    const { mol, graph } = ringMolecule(sixRingAt(0.6, 0, 0), { hydrogens: true });
    const r = analyzeRing(mol, graph, [1, 2, 3, 4, 5, 0], { ordered: true, id: 2 });
    expect(r.atoms).toEqual([1, 2, 3, 4, 5, 0]);
    expect(r.puckering.thetaDeg!).toBeCloseTo(180, 6); // start one atom later: θ → 180 − θ (docs/methods.md#ring-orientation)
    expect(r.referenceRule).toMatch(/user-given/);
    const report = toReportRing(r);
    expect(report.id).toBe(2);
    expect(report.atoms).toEqual([2, 3, 4, 5, 6, 1]);
    expect(report.torsions[0]!.atoms).toEqual([2, 3, 4, 5]);
    expect(report.substituents[0]!.ringAtom).toBe(2);
    expect(Object.keys(report).slice(0, 8)).toEqual([
      'id', 'atoms', 'size', 'puckering', 'shape', 'descriptor', 'torsions', 'substituents',
    ]);
    expect(allFinite(JSON.parse(JSON.stringify(report)))).toBe(true);
  });
});

describe('analyzeRing properties', () => {
  it('analyzeRing of a random distorted pyranose gives the same result for any cyclic input order, never NaN', () => {
    const jitter = fc.array(fc.double({ min: -0.1, max: 0.1, noNaN: true }), { minLength: 18, maxLength: 18 });
    fc.assert(
      fc.property(
        fc.double({ min: 0, max: 0.8, noNaN: true }),
        fc.double({ min: 0, max: 180, noNaN: true }),
        fc.double({ min: 0, max: 359, noNaN: true }),
        jitter,
        fc.integer({ min: 0, max: 5 }),
        fc.boolean(),
        (Q, theta, phi, dx, start, reverse) => {
          const points = sixRingAt(Q, theta, phi).map(
            (p, j) => [p[0] + dx[3 * j]!, p[1] + dx[3 * j + 1]!, p[2] + dx[3 * j + 2]!] as const,
          );
          const { mol, graph, ring } = ringMolecule(points, { elements: ['O', 'C', 'C', 'C', 'C', 'C'], hydrogens: true });
          const base = analyzeRing(mol, graph, ring);
          const order = ring.map((_, k) => ring[(start + (reverse ? -k : k) + 6) % 6]!);
          const other = analyzeRing(mol, graph, order);
          expect(other.atoms).toEqual(base.atoms);
          expect(other.descriptor).toBe(base.descriptor);
          expect(other.puckering.Q).toBeCloseTo(base.puckering.Q, 10);
          expect(allFinite(base)).toBe(true);
          expect(base.substituents).toHaveLength(12);
        },
      ),
      { seed: 20260501, numRuns: 150 },
    );
  });
});
