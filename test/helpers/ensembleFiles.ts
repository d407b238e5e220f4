/** Test ensembles made with conformark's own builder (openchemlib + MMFF94s), written as SDF. */
import { buildConformers, type Molecule } from '../../src/index.js';

let cache: Promise<{ mch: Molecule[]; dmch: Molecule[] }> | undefined;

/** Methylcyclohexane and trans-1,2-dimethylcyclohexane: both chairs and twist-boats (ring forms), fixed seed. */
export function cyclohexaneEnsembles(): Promise<{ mch: Molecule[]; dmch: Molecule[] }> {
  cache ??= (async () => {
    const mch = (await buildConformers('CC1CCCCC1', { conformers: 1, ringForms: true, title: 'methylcyclohexane' })).molecules;
    const dmch = (await buildConformers('C[C@@H]1CCCC[C@H]1C', { conformers: 1, ringForms: true, title: 'trans-1,2-dimethylcyclohexane' })).molecules;
    return { mch, dmch };
  })();
  return cache;
}

/** A copy of a molecule with new SD properties (replacing the old ones). */
export function withProperties(mol: Molecule, properties: Record<string, string>, title = mol.title): Molecule {
  return { ...mol, title, properties };
}
