/**
 * Test glue (area E): 3D conformers from openchemlib 9.25 (ConformerGenerator + MMFF94s) turned into our
 * Molecule type, atoms and bonds in openchemlib's order. Demo/test structures are generated here, never copied.
 */
import { ConformerGenerator, ForceFieldMMFF94, Molecule as OclMolecule, Resources } from 'openchemlib';
import type { Bond, Molecule } from '../../src/model/molecule.js';

let registered = false;

/** Converts an openchemlib molecule with 3D coordinates into a conformark Molecule. */
export function fromOpenchemlib(ocl: OclMolecule, title = 'openchemlib'): Molecule {
  const n = ocl.getAllAtoms();
  const coords = new Float64Array(3 * n);
  const atoms = [];
  for (let i = 0; i < n; i++) {
    coords[3 * i] = ocl.getAtomX(i);
    coords[3 * i + 1] = ocl.getAtomY(i);
    coords[3 * i + 2] = ocl.getAtomZ(i);
    atoms.push({ element: ocl.getAtomLabel(i), name: null });
  }
  const bonds: Bond[] = [];
  for (let k = 0; k < ocl.getAllBonds(); k++) {
    const a = ocl.getBondAtom(0, k);
    const b = ocl.getBondAtom(1, k);
    bonds.push({ a: Math.min(a, b), b: Math.max(a, b), order: ocl.getBondOrder(k), perceived: false });
  }
  return { title, atoms, coords, bonds, properties: {}, source: { file: title, format: 'sdf', index: 1, line: 1 } };
}

/** First conformer of a SMILES (fixed seed), minimised with MMFF94s. */
export function mmffConformer(smiles: string, seed = 1234): Molecule {
  if (!registered) {
    Resources.registerFromNodejs();
    registered = true;
  }
  const mol = OclMolecule.fromSmiles(smiles);
  const gen = new ConformerGenerator(seed);
  const conf = gen.getOneConformerAsMolecule(mol);
  if (!conf) throw new Error(`openchemlib made no conformer for ${smiles}`);
  new ForceFieldMMFF94(conf, 'MMFF94s').minimise();
  return fromOpenchemlib(conf, smiles);
}
