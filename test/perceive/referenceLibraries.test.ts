/**
 * Bonds and rings against two reference libraries on molecules generated here from SMILES:
 * reference library: openchemlib 9.25 (conformers, bond list, RingCollection) and @rdkit/rdkit 2026.9.1
 * (atomRings of its symmetrised SSSR). openchemlib lists every ring of up to 7 atoms; RDKit may add rings
 * that are equal-size alternatives (adamantane's fourth six-ring). Both are compared through the cycle
 * space: the minimum cycle basis has a unique multiset of sizes.
 */
import { beforeAll, describe, expect, it } from 'vitest';
import rdkitPkg from '@rdkit/rdkit';
import { perceiveBonds } from '../../src/perceive/perceiveBonds.js';
import { findRings } from '../../src/perceive/findRings.js';
import { buildGraph } from '../../src/perceive/graph.js';
import { pairs } from './fixtures.js';
import { REFERENCE_SMILES, referenceMolecule } from './referenceMolecules.js';
import { bondIndexOf, componentCount, cycleBits, greedyBasisSizes, rankOf } from './cycleSpace.js';

interface RDKitModule {
  get_mol(input: string, details?: string): { get_json(): string; delete(): void } | null;
}
let RDKit: RDKitModule;

beforeAll(async () => {
  const init = rdkitPkg as unknown as () => Promise<RDKitModule>;
  RDKit = await init();
});

function rdkitRings(molfile: string): { atoms: number; rings: number[][] } {
  const mol = RDKit.get_mol(molfile, JSON.stringify({ removeHs: false }));
  if (!mol) throw new Error('RDKit could not read the molfile');
  try {
    const json = JSON.parse(mol.get_json()) as { molecules: { atoms: unknown[]; extensions: { atomRings?: number[][] }[] }[] };
    const record = json.molecules[0]!;
    return { atoms: record.atoms.length, rings: record.extensions[0]?.atomRings ?? [] };
  } finally {
    mol.delete();
  }
}

const key = (atoms: readonly number[]) => [...atoms].sort((p, q) => p - q).join(',');
const sizes = (rings: readonly (readonly number[])[]) => rings.map((r) => r.length).sort((p, q) => p - q);

describe('perceive against openchemlib and RDKit', () => {
  it('the reference set has at least 20 varied molecules', () => {
    expect(REFERENCE_SMILES.length).toBeGreaterThanOrEqual(20);
  });

  it.each(REFERENCE_SMILES)('perceiveBonds and findRings agree with the references for %s', (label, smiles) => {
    const ref = referenceMolecule(label, smiles);
    const fileMol = ref.withFileBonds;
    const n = fileMol.atoms.length;

    // bonds perceived from coordinates only equal the molfile's bonds (openchemlib's bond list)
    const perceived = perceiveBonds(ref.coordinatesOnly);
    expect(pairs(perceived)).toEqual(pairs(fileMol.bonds!));

    const graph = buildGraph(n, fileMol.bonds!);
    const rings = findRings(graph);
    expect(findRings(buildGraph(n, perceived))).toEqual(rings);

    // each ring is a simple closed walk; the set is independent with E − V + C members
    const index = bondIndexOf(graph);
    const ours = rings.map((r) => cycleBits(graph, r, index));
    expect(ours.every((b) => b !== null)).toBe(true);
    for (const r of rings) expect(new Set(r).size).toBe(r.length);
    expect(rankOf(ours as bigint[])).toBe(rings.length);
    expect(rings.length).toBe(index.size - n + componentCount(graph));

    // RDKit: same atom count; our rings are among its rings; same basis sizes; its rings lie in our span
    const rd = rdkitRings(ref.molfile);
    expect(rd.atoms).toBe(n);
    const rdKeys = new Set(rd.rings.map(key));
    for (const r of rings) expect(rdKeys.has(key(r)), `RDKit has ring ${r.map((a) => a + 1).join('-')}`).toBe(true);
    expect(sizes(rings)).toEqual(greedyBasisSizes(graph, rd.rings));
    for (const r of rd.rings) {
      const bits = cycleBits(graph, r, index);
      expect(bits).not.toBeNull();
      expect(rankOf([...(ours as bigint[]), bits!])).toBe(rings.length);
    }

    // openchemlib (rings up to 7 atoms): our small rings are among its rings; its rings lie in our span
    const oclKeys = new Set(ref.oclRings.map(key));
    for (const r of rings.filter((x) => x.length <= 7)) expect(oclKeys.has(key(r))).toBe(true);
    if (rings.every((r) => r.length <= 7)) expect(sizes(rings)).toEqual(greedyBasisSizes(graph, ref.oclRings));
    for (const r of ref.oclRings) expect(rankOf([...(ours as bigint[]), cycleBits(graph, r, index)!])).toBe(rings.length);
  });

  it('findRings matches the expected ring sizes of well-known skeletons (derived by hand)', () => {
    const expected: Record<string, number[]> = {
      adamantane: [6, 6, 6],
      cubane: [4, 4, 4, 4, 4],
      norbornane: [5, 5],
      'spiro[4.5]decane': [5, 6],
      testosterone: [5, 6, 6, 6],
      '[2.2]paracyclophane': [6, 6, 12],
      '18-crown-6': [18],
      triptycene: [6, 6, 6, 6, 6],
    };
    for (const [label, want] of Object.entries(expected)) {
      const smiles = REFERENCE_SMILES.find(([l]) => l === label)![1];
      const mol = referenceMolecule(label, smiles).withFileBonds;
      expect(sizes(findRings(buildGraph(mol.atoms.length, mol.bonds!))), label).toEqual(want);
    }
  });
});
