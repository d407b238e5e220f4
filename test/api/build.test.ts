import { beforeAll, describe, expect, it } from 'vitest';
import { Molecule as OclMolecule } from 'openchemlib';
import { buildConformers, BUILD_ENERGY_FIELD } from '../../src/api/build/build.js';
import type { BuildResult } from '../../src/api/build/build.js';
import { formatSdf } from '../../src/io/writeSdf.js';
import { cremerPople } from '../../src/geometry/cremerPople.js';
import { angleBetween, DEG, sub } from '../../src/geometry/vec3.js';
import { atomPosition } from '../../src/model/molecule.js';
import type { Molecule } from '../../src/model/molecule.js';
import { ConformarkError } from '../../src/model/errors.js';

const energy = (m: Molecule) => Number(m.properties[BUILD_ENERGY_FIELD]);
const shapes = (r: BuildResult) => r.molecules.map((m) => m.properties['six-ring shapes']);

function neighbours(mol: Molecule): number[][] {
  const list: number[][] = mol.atoms.map(() => []);
  for (const { a, b } of mol.bonds ?? []) {
    list[a]!.push(b);
    list[b]!.push(a);
  }
  return list;
}

/** The six-ring of heavy atoms in bonded order, starting at `start` (found by a small depth-first search). */
function sixRing(mol: Molecule, start: number): number[] {
  const nb = neighbours(mol);
  const heavy = (i: number) => mol.atoms[i]!.element !== 'H';
  const walk = (path: number[]): number[] | null => {
    const last = path[path.length - 1]!;
    if (path.length === 6) return nb[last]!.includes(start) ? path : null;
    for (const k of nb[last]!) {
      if (heavy(k) && !path.includes(k)) {
        const found = walk([...path, k]);
        if (found) return found;
      }
    }
    return null;
  };
  return walk([start])!;
}

/** Angle (deg, folded to 0–90) between bond ring atom → substituent and the Cremer–Pople normal (docs/methods.md#axial-equatorial). */
function angleToNormal(mol: Molecule, ring: number[], ringAtom: number, substituent: number): number {
  const p = cremerPople(ring.map((i) => atomPosition(mol, i)))!;
  const bond = sub(atomPosition(mol, substituent), atomPosition(mol, ringAtom));
  const a = angleBetween(bond, p.normal) * DEG;
  return Math.min(a, 180 - a);
}

/** Exocyclic heavy substituents of a ring: [ring atom, substituent]. */
function heavySubstituents(mol: Molecule, ring: number[]): [number, number][] {
  const nb = neighbours(mol);
  return ring.flatMap((r) =>
    nb[r]!.filter((k) => !ring.includes(k) && mol.atoms[k]!.element !== 'H').map((k) => [r, k] as [number, number]),
  );
}

describe('buildConformers', () => {
  let cyclohexane: BuildResult;
  let methyl: BuildResult;
  let trans12: BuildResult;
  beforeAll(async () => {
    cyclohexane = await buildConformers('C1CCCCC1', { ringForms: true });
    methyl = await buildConformers('CC1CCCCC1', { ringForms: true });
    trans12 = await buildConformers('C[C@@H]1CCCC[C@H]1C', { ringForms: true });
  });

  it('buildConformers(cyclohexane, ringForms) gives one chair and one twist-boat, ΔE 4–7.5 kcal/mol', () => {
    // ≈ 5.5 kcal/mol commonly quoted (docs/methods.md#reference-geometries; Squillacote et al. 1975 attribution from memory)
    expect(shapes(cyclohexane)).toEqual(['chair', 'twist-boat']);
    const [chair, twist] = cyclohexane.molecules;
    expect(chair!.atoms).toHaveLength(18); // hydrogens explicit
    const dE = energy(twist!) - energy(chair!);
    expect(dE).toBeGreaterThan(4);
    expect(dE).toBeLessThan(7.5);
    expect(cyclohexane.notes.join('\n')).toMatch(/boat start.*relaxed to a twist-boat/);
  });

  it('buildConformers(methylcyclohexane, ringForms) gives both chairs, axial methyl 0.8–2.5 kcal/mol higher', () => {
    // A-value of CH3 1.7 kcal/mol (Eliel & Wilen 1994, docs/methods.md#reference-geometries); range allows for the force field
    const chairs = methyl.molecules.filter((m) => m.properties['six-ring shapes'] === 'chair');
    expect(chairs).toHaveLength(2);
    const [low, high] = chairs as [Molecule, Molecule];
    const methylC = 0; // first atom of the SMILES
    const ringAtom = 1;
    const ring = sixRing(low, ringAtom);
    // axial ≤ 35°, equatorial ≥ 55° to the normal (docs/methods.md#axial-equatorial, common practice, no source)
    expect(angleToNormal(low, ring, ringAtom, methylC)).toBeGreaterThanOrEqual(55);
    expect(angleToNormal(high, sixRing(high, ringAtom), ringAtom, methylC)).toBeLessThanOrEqual(35);
    const dE = energy(high) - energy(low);
    expect(dE).toBeGreaterThan(0.8);
    expect(dE).toBeLessThan(2.5);
    expect(shapes(methyl)).toContain('twist-boat');
  });

  it('buildConformers(trans-1,2-dimethylcyclohexane) gives the diequatorial chair below the diaxial one', () => {
    const chairs = trans12.molecules.filter((m) => m.properties['six-ring shapes'] === 'chair');
    expect(chairs).toHaveLength(2);
    const position = (m: Molecule) => {
      const ring = sixRing(m, 1);
      return heavySubstituents(m, ring).map(([r, s]) => angleToNormal(m, ring, r, s));
    };
    const [low, high] = chairs as [Molecule, Molecule];
    expect(position(low).every((a) => a >= 55)).toBe(true);
    expect(position(high).every((a) => a <= 35)).toBe(true);
    expect(energy(high)).toBeGreaterThan(energy(low));
    expect(trans12.molecules[0]).toBe(low); // sorted by energy
  });

  it('buildConformers(β-D-glucose) gives a 4C1 chair with every exocyclic heavy atom equatorial', async () => {
    const glucose = 'OC[C@H]1O[C@@H](O)[C@H](O)[C@@H](O)[C@@H]1O';
    const { molecules } = await buildConformers(glucose, { conformers: 3, ringForms: true });
    // every record, ring forms included, keeps the configuration of the SMILES (read back by openchemlib)
    const expected = OclMolecule.fromSmiles(glucose).toIsomericSmiles();
    for (const r of molecules) expect(OclMolecule.fromMolfile(formatSdf([r])).toIsomericSmiles()).toBe(expected);
    expect(shapes({ molecules, notes: [] })).toContain('twist-boat');
    const m = molecules[0]!;
    const nb = neighbours(m);
    // pyranose order O5, C1, C2, C3, C4, C5 (docs/methods.md#ring-orientation): O5 is atom 4 (index 3), C1 the anomeric carbon
    const o5 = 3;
    const c1 = nb[o5]!.find((k) => nb[k]!.some((x) => x !== o5 && m.atoms[x]!.element === 'O'))!;
    expect(c1).toBe(4);
    const ring = sixRing(m, o5);
    const ordered = ring[1] === c1 ? ring : [o5, ...ring.slice(1).reverse()];
    const p = cremerPople(ordered.map((i) => atomPosition(m, i)))!;
    expect(p.thetaDeg!).toBeLessThan(15); // 4C1 at θ ≈ 0 (docs/methods.md#six-ring-forms, derived)
    const substituents = heavySubstituents(m, ring);
    expect(substituents).toHaveLength(5);
    for (const [r, s] of substituents) expect(angleToNormal(m, ring, r, s)).toBeGreaterThanOrEqual(55);
  });

  it('buildConformers with the same seed gives the same SD bytes', async () => {
    const a = await buildConformers('CCCC', { seed: 7, conformers: 4 });
    const b = await buildConformers('CCCC', { seed: 7, conformers: 4 });
    expect(formatSdf(a.molecules)).toBe(formatSdf(b.molecules));
    const again = await buildConformers('C1CCCCC1', { ringForms: true });
    expect(formatSdf(again.molecules)).toBe(formatSdf(cyclohexane.molecules));
    const e = a.molecules.map(energy);
    expect([...e].sort((x, y) => x - y)).toEqual(e);
    expect(a.molecules[0]!.title).toBe('CCCC conformer 1');
  });

  it('buildConformers names the energy field with its unit and titles records from the title option', async () => {
    const { molecules } = await buildConformers('CCO', { title: 'ethanol', conformers: 2 });
    expect(BUILD_ENERGY_FIELD).toMatch(/energy/i);
    expect(BUILD_ENERGY_FIELD).toMatch(/kcal\/mol/);
    expect(Number.isFinite(energy(molecules[0]!))).toBe(true);
    expect(molecules.map((m) => m.title)[0]).toBe('ethanol conformer 1');
    expect(molecules[0]!.atoms.map((a) => a.element).sort().join('')).toBe('CCHHHHHHO');
  });

  const failure = async (smiles: string, options = {}) => {
    try {
      await buildConformers(smiles, options);
    } catch (err) {
      expect(err).toBeInstanceOf(ConformarkError);
      return (err as ConformarkError).code;
    }
    return 'no error';
  };

  it('buildConformers rejects bad SMILES, MMFF-less elements, failed minimisations and bad options', async () => {
    expect(await failure('C1CC((')).toBe('bad-smiles');
    expect(await failure('   ')).toBe('bad-smiles');
    expect(await failure('Xx')).toBe('bad-smiles');
    expect(await failure('F[Xe]F')).toBe('mmff-unsupported');
    await expect(buildConformers('F[Xe]F')).rejects.toThrow(/atom 2 \(Xe\)/); // 1-based for the user
    expect(await failure('CCCCCC', { maxIterations: 1 })).toBe('minimisation-failed');
    expect(await failure('CC', { conformers: 0 })).toBe('bad-option');
    expect(await failure('CC', { seed: 1.5 })).toBe('bad-option');
  });

  it('buildConformers with ringForms on a molecule without saturated six-rings says so', async () => {
    const { molecules, notes } = await buildConformers('c1ccccc1', { ringForms: true, conformers: 1 });
    expect(molecules).toHaveLength(1);
    expect(notes.join('\n')).toContain('no saturated six-ring');
  });
});
