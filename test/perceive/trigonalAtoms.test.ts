import { describe, expect, it } from 'vitest';
import { buildGraph } from '../../src/perceive/graph.js';
import { perceiveBonds } from '../../src/perceive/perceiveBonds.js';
import { isTrigonalRing, trigonalAtoms } from '../../src/perceive/trigonalAtoms.js';
import { mmffConformer } from '../helpers/fromOpenchemlib.js';

describe('trigonalAtoms', () => {
  // phenylcyclohexane, then 2-phenyloxolane, MMFF94s (openchemlib): atoms 0–5 are the benzene ring in SMILES order
  const cases = [
    ['c1ccccc1C1CCCCC1', [6, 7, 8, 9, 10, 11]],
    ['c1ccccc1C1CCCO1', [6, 7, 8, 9, 10]],
  ] as const;

  it.each(cases)('trigonalAtoms(%s) flags the aromatic ring from bond orders and from geometry alone, not the saturated ring', (smiles, saturated) => {
    const mol = mmffConformer(smiles);
    const fromOrders = buildGraph(mol.atoms.length, mol.bonds!);
    const perceived = { ...mol, bonds: null };
    const fromGeometry = buildGraph(mol.atoms.length, perceiveBonds(perceived));
    for (const graph of [fromOrders, fromGeometry]) {
      const flags = trigonalAtoms(mol, graph);
      expect(flags.slice(0, 6)).toEqual([true, true, true, true, true, true]);
      expect(saturated.filter((a) => flags[a])).toEqual([]);
      expect(isTrigonalRing(mol, graph, [0, 1, 2, 3, 4, 5])).toBe(true);
      expect(isTrigonalRing(mol, graph, saturated)).toBe(false);
    }
  });
});
