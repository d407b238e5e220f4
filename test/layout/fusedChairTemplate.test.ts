/**
 * Fused chairs (src/layout/ring/fusedChairTemplate.ts): trans- and cis-decalin and the A/B/C rings of a
 * 5α-androstane-type skeleton, built with our own builder (openchemlib conformer search + MMFF94s, fixed seed).
 * Each ring's outline rules and each substituent's face are read back from the placement and compared with the
 * 3D coordinates; a trans fusion must be a pure translation (the trade's drawing), a cis fusion a turned ring
 * whose bond at the cis fusion atom takes the axial slot of the first ring [common practice, no source].
 */
import { beforeAll, describe, expect, it } from 'vitest';
import { buildConformers } from '../../src/api/build/build.js';
import { prepareRecord } from '../../src/api/prepare.js';
import { analyzeRing, type RingAnalysis } from '../../src/analysis/ringAnalysis.js';
import { fusedChairTemplate, fusedSystem, type FusedPlacement } from '../../src/layout/ring/fusedChairTemplate.js';
import { chairFigure } from '../../src/api/figures/chair.js';
import { figureLegibility } from '../../src/layout/text/figureLegibility.js';
import { measureText } from '../../src/render/svgWindow.js';
import { ConformarkError } from '../../src/model/errors.js';
import type { Molecule } from '../../src/model/molecule.js';

const SMILES = {
  trans: 'C1CC[C@H]2CCCC[C@@H]2C1',
  cis: 'C1CC[C@@H]2CCCC[C@@H]2C1',
  // all-trans A/B/C (and a C/D five-ring the fused figure leaves out)
  steroid: 'C[C@@]12CCC[C@H]1[C@@H]1CC[C@H]3CCCC[C@]3(C)[C@H]1CC2',
};
const mols: Record<string, Molecule> = {};

beforeAll(async () => {
  for (const [name, smiles] of Object.entries(SMILES)) mols[name] = (await buildConformers(smiles, { conformers: 1, seed: 1 })).molecules[0]!;
}, 120_000);

function fused(name: string): { placement: FusedPlacement; rings: RingAnalysis[]; mol: Molecule } {
  const { molecule, graph, rings } = prepareRecord(mols[name]!);
  const six = rings.findIndex((r) => r.length === 6);
  const analysed = fusedSystem(rings, six).map((i) => analyzeRing(molecule, graph, rings[i]!, { id: i + 1 }));
  return { placement: fusedChairTemplate(analysed, molecule, { hydrogens: 'all' }), rings: analysed, mol: molecule };
}

const dist = (p: { x: number; y: number }, q: { x: number; y: number }) => Math.hypot(p.x - q.x, p.y - q.y);
const dot = (a: readonly number[], b: readonly number[]) => a[0]! * b[0]! + a[1]! * b[1]! + a[2]! * b[2]!;

/** The outline rules of every ring, read back from the placement: unit bonds, opposite bonds parallel, a peak and a valley. */
function expectOutlines(p: FusedPlacement): void {
  for (const f of p.fused) {
    const v = f.vertices;
    for (let k = 0; k < 6; k++) expect(dist(v[k]!, v[(k + 1) % 6]!)).toBeCloseTo(1, 9);
    for (let k = 0; k < 3; k++) {
      const [a, b, c, d] = [v[k]!, v[k + 1]!, v[k + 3]!, v[(k + 4) % 6]!];
      expect((b.x - a.x) * (d.y - c.y) - (b.y - a.y) * (d.x - c.x)).toBeCloseTo(0, 9);
    }
  }
}

/** Every drawn substituent of a ring atom points to its measured face (seen from the first ring's side). */
function expectFaces(p: FusedPlacement, mol: Molecule): void {
  const n = p.fused[0]!.ring.normal;
  const turnedUp = (f: FusedPlacement['fused'][number]) => ({ x: Math.sin((f.turnDeg * Math.PI) / 180), y: -Math.cos((f.turnDeg * Math.PI) / 180) });
  let checked = 0;
  for (const b of p.bonds.filter((x) => x.role === 'axial')) {
    const [ringAtom, atom] = b.atoms;
    const owner = p.fused.find((f) => f.atoms.includes(ringAtom))!;
    const d = [0, 1, 2].map((k) => mol.coords[3 * atom + k]! - mol.coords[3 * ringAtom + k]!);
    const up = turnedUp(owner);
    const drawn = (p.points.get(atom)!.x - p.points.get(ringAtom)!.x) * up.x + (p.points.get(atom)!.y - p.points.get(ringAtom)!.y) * up.y;
    expect(Math.sign(drawn)).toBe(Math.sign(dot(d, n)));
    checked++;
  }
  expect(checked).toBeGreaterThan(0);
}

describe('fusedChairTemplate', () => {
  it('fusedSystem([[0..5],[4,5,6..9]], 0) joins rings that share one bond, not a spiro ring', () => {
    expect(fusedSystem([[0, 1, 2, 3, 4, 5], [4, 5, 6, 7, 8, 9], [9, 10, 11, 12, 13, 14]], 0)).toEqual([0, 1]);
    expect(fusedSystem([[0, 1, 2, 3, 4, 5], [6, 7, 8, 9, 10, 11]], 1)).toEqual([1]);
  });

  it('trans-decalin: the second chair is the first translated onto the shared bond, both angular H axial and opposite', () => {
    const { placement, mol } = fused('trans');
    expect(placement.fused).toHaveLength(2);
    expect(placement.fused[1]!.turnDeg).toBeCloseTo(0, 9);
    expectOutlines(placement);
    expectFaces(placement, mol);
    const angular = placement.bonds.filter((b) => b.role === 'axial' && mol.atoms[b.atoms[1]]!.element === 'H' && placement.fused.every((f) => f.atoms.includes(b.atoms[0])));
    expect(angular).toHaveLength(2);
    const dy = angular.map((b) => placement.points.get(b.atoms[1])!.y - placement.points.get(b.atoms[0])!.y);
    expect(dy[0]! * dy[1]!).toBeLessThan(0);
    angular.forEach((b) => expect(placement.points.get(b.atoms[1])!.x).toBeCloseTo(placement.points.get(b.atoms[0])!.x, 9));
  });

  it('cis-decalin: the second chair is turned so its bond at the cis fusion atom takes the first ring\'s axial slot', () => {
    const { placement, mol, rings } = fused('cis');
    expect(Math.abs(placement.fused[1]!.turnDeg)).toBeGreaterThan(20);
    expectOutlines(placement);
    expectFaces(placement, mol);
    const [a, b] = rings;
    const fusion = a!.atoms.filter((x) => b!.atoms.includes(x));
    const axialInto = a!.substituents.filter((s) => fusion.includes(s.ringAtom) && b!.atoms.includes(s.atom) && s.position === 'axial');
    expect(axialInto).toHaveLength(1);
    const [from, to] = [placement.points.get(axialInto[0]!.ringAtom)!, placement.points.get(axialInto[0]!.atom)!];
    const angleFromVertical = (Math.atan2(Math.abs(to.x - from.x), Math.abs(to.y - from.y)) * 180) / Math.PI;
    expect(angleFromVertical).toBeLessThan(25);
  });

  it('an all-trans A/B/C system: three chairs, each a translation, no ring drawn over another', () => {
    const { placement, mol } = fused('steroid');
    expect(placement.fused).toHaveLength(3);
    placement.fused.forEach((f) => expect(f.turnDeg).toBeCloseTo(0, 9));
    expectOutlines(placement);
    expectFaces(placement, mol);
    const centres = placement.fused.map((f) => ({ x: f.vertices.reduce((t, v) => t + v.x, 0) / 6, y: f.vertices.reduce((t, v) => t + v.y, 0) / 6 }));
    for (let i = 0; i < 3; i++) for (let j = i + 1; j < 3; j++) expect(dist(centres[i]!, centres[j]!)).toBeGreaterThan(1.2);
  });

  it('chairFigure draws the fused system by default, one ring with ring or fused: false, and refuses rings that are not fused', () => {
    const f = chairFigure(mols.trans!);
    expect(f.rings?.map((r) => r.id)).toEqual([1, 2]);
    expect(f.svg).toContain('Fused chair drawing');
    expect(f.scene.items.filter((it) => it.type === 'line' && it.role === 'ring-bond')).toHaveLength(11);
    expect(chairFigure(mols.trans!, { ring: 1 }).rings).toBeUndefined();
    expect(chairFigure(mols.trans!, { fused: false }).rings).toBeUndefined();
    expect(chairFigure(mols.trans!, { fused: [2, 1] }).rings?.map((r) => r.id)).toEqual([2, 1]);
    expect(() => chairFigure(mols.trans!, { fused: [1, 3] })).toThrow(ConformarkError);
    expect(() => chairFigure(mols.trans!, { fused: [1, 2], view: 'projected' })).toThrow(/chair template/);
  });

  it('fused decalin figures pass the legibility check with zero counts (default hydrogens)', () => {
    for (const name of ['trans', 'cis']) {
      const f = chairFigure(mols[name]!);
      const check = figureLegibility(f.scene, { measure: measureText });
      expect(check.problems.map((p) => p.message)).toEqual([]);
    }
  });
});
