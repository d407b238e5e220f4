/**
 * Chemical numbering checked on molecules built in the test (openchemlib SMILES → 3D), in several atom orders.
 * Sources: carbohydrate numbering, IUPAC-IUBMB Nomenclature of Carbohydrates 1996, 2-Carb-2 (McNaught, Pure Appl.
 * Chem. 68, 1919); other rings, IUPAC 2013 Recommendations P-31.1.4 (Favre & Powell, RSC 2014) — e.g.
 * 2-methylcyclohexan-1-ol, piperidine (N1), 1,3-dioxane (O1, O3), decahydronaphthalene (C4a, C8a).
 */
import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { chemicalNumbering } from '../../src/analysis/chemicalNumbering.js';
import { buildGraph } from '../../src/perceive/graph.js';
import { findRings } from '../../src/perceive/findRings.js';
import type { Molecule } from '../../src/model/molecule.js';
import { mmffConformer } from '../helpers/fromOpenchemlib.js';

/** The molecule with its atoms in a new order: atom i of the result is atom perm[i] of `mol`. */
function permuted(mol: Molecule, perm: readonly number[]): Molecule {
  const inv = new Map(perm.map((old, i) => [old, i]));
  const coords = new Float64Array(mol.coords.length);
  perm.forEach((old, i) => coords.set(mol.coords.subarray(3 * old, 3 * old + 3), 3 * i));
  return { ...mol, atoms: perm.map((old) => mol.atoms[old]!), coords, bonds: mol.bonds!.map((b) => ({ ...b, a: inv.get(b.a)!, b: inv.get(b.b)! })) };
}

function named(mol: Molecule) {
  const graph = buildGraph(mol.atoms.length, mol.bonds!);
  const numbering = chemicalNumbering(mol, graph, findRings(graph));
  return { graph, numbering, name: (i: number) => numbering.names.get(i) };
}

const el = (mol: Molecule, i: number) => mol.atoms[i]!.element;

describe('chemicalNumbering', () => {
  const glucoside = mmffConformer('CO[C@@H]1O[C@H](CO)[C@@H](O)[C@H](O)[C@H]1O');

  it('chemicalNumbering gives methyl β-D-glucopyranoside O5, C1…C6 from any atom order', () => {
    fc.assert(
      fc.property(fc.array(fc.double({ min: 0, max: 1, noNaN: true }), { minLength: glucoside.atoms.length, maxLength: glucoside.atoms.length }), (keys) => {
        const perm = keys.map((k, i) => [k, i] as const).sort((a, b) => a[0] - b[0] || a[1] - b[1]).map(([, i]) => i);
        const mol = permuted(glucoside, perm);
        const { graph, name, numbering } = named(mol);
        const ring = findRings(graph)[0]!;
        const ringO = ring.find((a) => el(mol, a) === 'O')!;
        expect(name(ringO)).toBe('O5');
        // C1: the ring carbon next to O5 that carries the OMe oxygen
        const c1 = graph.neighbors[ringO]!.find((a) => graph.neighbors[a]!.some((b) => !ring.includes(b) && el(mol, b) === 'O' && graph.neighbors[b]!.filter((c) => el(mol, c) === 'C').length === 2))!;
        expect(name(c1)).toBe('C1');
        const c5 = graph.neighbors[ringO]!.find((a) => a !== c1)!;
        expect(name(c5)).toBe('C5');
        const c6 = graph.neighbors[c5]!.find((a) => !ring.includes(a) && el(mol, a) === 'C')!;
        expect(name(c6)).toBe('C6');
        expect(ring.map((a) => name(a)).sort()).toEqual(['C1', 'C2', 'C3', 'C4', 'C5', 'O5']);
        // the exocyclic oxygens take their carbon's number; H1 sits on C1
        const o6 = graph.neighbors[c6]!.find((a) => el(mol, a) === 'O')!;
        expect(name(o6)).toBe('O6');
        expect(name(graph.neighbors[c1]!.find((a) => el(mol, a) === 'H')!)).toBe('H1');
        expect(numbering.systems[0]!.carbohydrate).toBe(true);
      }),
      { seed: 13, numRuns: 12 },
    );
  });

  it('chemicalNumbering puts the OH of 2-methylcyclohexan-1-ol on C1 and the CH₃ on C2, in either atom order', () => {
    const base = mmffConformer('CC1CCCCC1O');
    for (const mol of [base, permuted(base, [...base.atoms.keys()].reverse())]) {
      const { graph, name } = named(mol);
      const ring = findRings(graph)[0]!;
      const cOH = ring.find((a) => graph.neighbors[a]!.some((b) => el(mol, b) === 'O'))!;
      const cMe = ring.find((a) => graph.neighbors[a]!.some((b) => !ring.includes(b) && el(mol, b) === 'C'))!;
      expect(name(cOH)).toBe('C1');
      expect(name(cMe)).toBe('C2');
      expect(name(graph.neighbors[cOH]!.find((b) => el(mol, b) === 'O')!)).toBe('O1');
    }
  });

  it('chemicalNumbering gives piperidine N1, 1,3-dioxane O1/O3 and piperidin-4-ol its OH on C4', () => {
    const pip = mmffConformer('C1CCNCC1');
    const p = named(pip);
    expect(p.name(pip.atoms.findIndex((a) => a.element === 'N'))).toBe('N1');
    const diox = mmffConformer('C1COCOC1');
    const d = named(diox);
    expect(diox.atoms.flatMap((a, i) => (a.element === 'O' ? [d.name(i)] : [])).sort()).toEqual(['O1', 'O3']);
    const ol = mmffConformer('OC1CCNCC1');
    const o = named(ol);
    const ring = findRings(o.graph)[0]!;
    expect(o.name(ring.find((a) => o.graph.neighbors[a]!.some((b) => el(ol, b) === 'O'))!)).toBe('C4');
  });

  it('chemicalNumbering numbers decalin 1–8 with the fusion atoms C4a and C8a', () => {
    const dec = mmffConformer('C1CCC2CCCCC2C1');
    const { graph, name } = named(dec);
    const rings = findRings(graph);
    const fusion = rings[0]!.filter((a) => rings[1]!.includes(a));
    expect(fusion.map((a) => name(a)).sort()).toEqual(['C4a', 'C8a']);
    expect(dec.atoms.flatMap((a, i) => (a.element === 'C' ? [name(i)] : [])).sort()).toEqual(['C1', 'C2', 'C3', 'C4', 'C4a', 'C5', 'C6', 'C7', 'C8', 'C8a']);
  });
});
