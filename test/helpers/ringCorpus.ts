/**
 * Test corpus of ring molecules for the chair figures: SMILES → 3D with our own builder (openchemlib conformer
 * search + MMFF94s, `buildConformers`), lowest-energy conformer first; `flip` entries also get the other chair
 * (`ringForms`), so each flip pair is two records of one compound. Stereo SMILES written for these tests.
 */
import { buildConformers } from '../../src/api/build/build.js';
import type { Molecule } from '../../src/model/molecule.js';

export interface CorpusEntry {
  readonly name: string;
  readonly smiles: string;
  /** Also build the ring-flipped chair. */
  readonly flip?: boolean;
}

export const RING_CORPUS: readonly CorpusEntry[] = [
  { name: 'methyl β-D-glucopyranoside', smiles: 'CO[C@@H]1O[C@H](CO)[C@@H](O)[C@H](O)[C@H]1O', flip: true },
  { name: 'β-D-glucose pentaacetate', smiles: 'CC(=O)OC[C@H]1O[C@@H](OC(C)=O)[C@H](OC(C)=O)[C@@H](OC(C)=O)[C@@H]1OC(C)=O' },
  { name: 'methyl α-D-mannopyranoside', smiles: 'CO[C@H]1O[C@H](CO)[C@@H](O)[C@H](O)[C@@H]1O' },
  { name: 'β-D-galactopyranose', smiles: 'OC[C@H]1O[C@@H](O)[C@H](O)[C@@H](O)[C@H]1O' },
  { name: 'α-L-fucopyranose', smiles: 'C[C@H]1[C@H]([C@H]([C@@H]([C@@H](O1)O)O)O)O' },
  { name: 'N-acetyl-β-D-glucosamine', smiles: 'CC(=O)N[C@H]1[C@@H](O)O[C@H](CO)[C@@H](O)[C@@H]1O' },
  { name: 'β-D-xylopyranose', smiles: 'O[C@@H]1CO[C@@H](O)[C@H](O)[C@H]1O' },
  { name: 'menthol', smiles: 'CC(C)[C@@H]1CC[C@@H](C)C[C@H]1O', flip: true },
  { name: 'trans-4-tert-butylcyclohexanol', smiles: 'CC(C)(C)[C@H]1CC[C@H](O)CC1' },
  { name: 'cis-4-tert-butylcyclohexanol', smiles: 'CC(C)(C)[C@H]1CC[C@@H](O)CC1' },
  { name: '4-tert-butylcyclohexyl acetate', smiles: 'CC(=O)O[C@H]1CC[C@H](CC1)C(C)(C)C' },
  { name: '4-tert-butylcyclohexanone', smiles: 'CC(C)(C)C1CCC(=O)CC1' },
  { name: 'cyclohexanone', smiles: 'O=C1CCCCC1' },
  { name: 'piperidine', smiles: 'C1CCNCC1' },
  { name: 'N-methylpiperidine', smiles: 'CN1CCCCC1' },
  { name: '2-methylpiperidine', smiles: 'C[C@H]1CCCCN1' },
  { name: '1,3-dioxane', smiles: 'C1COCOC1' },
  { name: '2-methyl-1,3-dioxane', smiles: 'CC1OCCCO1' },
  { name: '5-tert-butyl-1,3-dioxane', smiles: 'CC(C)(C)C1COCOC1' },
  { name: 'myo-inositol', smiles: 'O[C@H]1[C@H](O)[C@@H](O)[C@H](O)[C@@H](O)[C@@H]1O' },
  { name: 'trans-1,2-dimethylcyclohexane', smiles: 'C[C@@H]1CCCC[C@H]1C', flip: true },
  { name: 'cis-1,3-dimethylcyclohexane', smiles: 'C[C@H]1CCC[C@@H](C)C1', flip: true },
  { name: 'methylcyclohexane', smiles: 'CC1CCCCC1' },
  { name: 'cyclohexanol', smiles: 'OC1CCCCC1' },
  { name: 'chlorocyclohexane', smiles: 'ClC1CCCCC1' },
  { name: 'trans-2-methylcyclohexanol', smiles: 'C[C@@H]1CCCC[C@H]1O' },
  { name: 'tetrahydropyran', smiles: 'C1CCOCC1' },
  { name: 'morpholine', smiles: 'C1COCCN1' },
  { name: '1,4-dioxane', smiles: 'C1COCCO1' },
  { name: '2-chlorotetrahydropyran', smiles: 'ClC1CCCCO1' },
  { name: 'isopropylcyclohexane', smiles: 'CC(C)C1CCCCC1' },
  { name: 'cis-decalin', smiles: 'C1CC[C@H]2CCCC[C@H]2C1' },
  { name: 'trans-decalin', smiles: 'C1CC[C@@H]2CCCC[C@H]2C1' },
  { name: '5α-dihydrotestosterone', smiles: 'C[C@]12CC[C@H]3[C@H]([C@@H]1CC[C@@H]2O)CC[C@@H]4[C@@]3(CCC(=O)C4)C' },
];

/** Built records of one entry: the lowest-energy conformer, and for `flip` entries every conformer built. */
export async function corpusMolecules(entry: CorpusEntry): Promise<Molecule[]> {
  const { molecules } = await buildConformers(entry.smiles, { conformers: entry.flip ? 3 : 1, ringForms: entry.flip ?? false, seed: 7 });
  return entry.flip ? molecules : molecules.slice(0, 1);
}
