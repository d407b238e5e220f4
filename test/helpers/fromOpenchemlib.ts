/**
 * Test helper: 3D structures made with openchemlib (ConformerGenerator + MMFF94s minimisation), converted to
 * conformark Molecules. Bonds come from openchemlib's bond list; coordinates from getAtomX/Y/Z (openchemlib's
 * internal y and z are the negatives of file coordinates: a 180° rotation, harmless for every check here).
 */
import { ConformerGenerator, ForceFieldMMFF94, Molecule as OclMolecule, Resources } from 'openchemlib';
import type { Bond, Molecule } from '../../src/model/molecule.js';

let registered = false;
const register = (): void => {
  if (!registered) Resources.registerFromNodejs();
  registered = true;
};

/** Converts an openchemlib molecule (with 3D coordinates) into a conformark Molecule. */
export function fromOpenchemlib(ocl: OclMolecule, title = ''): Molecule {
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
  for (let b = 0; b < ocl.getAllBonds(); b++) {
    const x = ocl.getBondAtom(0, b);
    const y = ocl.getBondAtom(1, b);
    bonds.push({ a: Math.min(x, y), b: Math.max(x, y), order: ocl.getBondOrder(b), perceived: false });
  }
  return {
    title,
    atoms,
    coords,
    bonds,
    properties: {},
    source: { file: 'openchemlib', format: 'sdf', index: 1, line: 1 },
  };
}

/** Result of `minimisedConformers`: the molecule, its MMFF94s energy (kcal/mol) and its rings (ordered atoms). */
export interface OclConformer {
  readonly mol: Molecule;
  readonly energy: number;
  readonly rings: number[][];
}

/**
 * Up to `count` conformers of `smiles` (fixed seed), each minimised with MMFF94s, sorted by energy (lowest first).
 */
export function minimisedConformers(smiles: string, count = 5, seed = 1234): OclConformer[] {
  register();
  const base = OclMolecule.fromSmiles(smiles);
  const generator = new ConformerGenerator(seed);
  generator.initializeConformers(base);
  const out: OclConformer[] = [];
  for (let k = 0; k < count; k++) {
    const conf = generator.getNextConformerAsMolecule();
    if (!conf) break;
    const ff = new ForceFieldMMFF94(conf, 'MMFF94s');
    ff.minimise();
    const ringSet = conf.getRingSet();
    const rings = Array.from({ length: ringSet.getSize() }, (_, r) =>
      Array.from(ringSet.getRingAtoms(r) as ArrayLike<number>),
    );
    out.push({ mol: fromOpenchemlib(conf, smiles), energy: ff.getTotalEnergy(), rings });
  }
  return out.sort((a, b) => a.energy - b.energy);
}

/** First conformer of a SMILES (fixed seed), minimised with MMFF94s. */
export function mmffConformer(smiles: string, seed = 1234): Molecule {
  register();
  const mol = OclMolecule.fromSmiles(smiles);
  const gen = new ConformerGenerator(seed);
  const conf = gen.getOneConformerAsMolecule(mol);
  if (!conf) throw new Error(`openchemlib made no conformer for ${smiles}`);
  new ForceFieldMMFF94(conf, 'MMFF94s').minimise();
  return fromOpenchemlib(conf, smiles);
}
