/**
 * Test molecules generated here with openchemlib 9.25 (SMILES → 3D conformer with explicit H, fixed seed),
 * converted to conformark Molecules. Reference library: openchemlib 9.25; @rdkit/rdkit 2026.9.1.
 */
import { ConformerGenerator, Molecule as OclMolecule, Resources } from 'openchemlib';
import type { Bond, Molecule } from '../../src/model/molecule.js';

let registered = false;
const cache = new Map<string, ReferenceMolecule>();

/** A generated molecule: conformark form plus what the reference libraries need. */
export interface ReferenceMolecule {
  readonly label: string;
  readonly smiles: string;
  /** Molecule with the bonds openchemlib knows (as a molfile would carry them). */
  readonly withFileBonds: Molecule;
  /** The same coordinates with no bonds, as an XYZ export would give. */
  readonly coordinatesOnly: Molecule;
  /** openchemlib's V2000 molfile of the conformer (atom order kept), for RDKit. */
  readonly molfile: string;
  /** openchemlib RingCollection rings (it lists every ring up to 7 atoms), 0-based atoms. */
  readonly oclRings: number[][];
}

/** Builds a 3D conformer of `smiles` with openchemlib (seed fixed, so coordinates are reproducible); cached. */
export function referenceMolecule(label: string, smiles: string, seed = 20261201): ReferenceMolecule {
  const cacheKey = `${smiles} ${seed}`;
  const known = cache.get(cacheKey);
  if (known) return known;
  const made = generate(label, smiles, seed);
  cache.set(cacheKey, made);
  return made;
}

function generate(label: string, smiles: string, seed: number): ReferenceMolecule {
  if (!registered) {
    Resources.registerFromNodejs();
    registered = true;
  }
  const generator = new ConformerGenerator(seed);
  const input = OclMolecule.fromSmiles(smiles);
  if (!generator.initializeConformers(input, {})) throw new Error(`openchemlib cannot set up ${label}`);
  const mol = generator.getNextConformerAsMolecule();
  if (!mol) throw new Error(`openchemlib made no conformer for ${label}`);
  mol.ensureHelperArrays(OclMolecule.cHelperRings);
  const n = mol.getAllAtoms();
  const coords = new Float64Array(3 * n);
  const atoms = [];
  for (let i = 0; i < n; i++) {
    // openchemlib's y and z are the negatives of the file's (seen with openchemlib 9.25); irrelevant for bonds, kept right
    coords.set([mol.getAtomX(i), -mol.getAtomY(i), -mol.getAtomZ(i)], 3 * i);
    atoms.push({ element: mol.getAtomLabel(i), name: null });
  }
  const bonds: Bond[] = [];
  for (let k = 0; k < mol.getAllBonds(); k++) {
    const p = mol.getBondAtom(0, k);
    const q = mol.getBondAtom(1, k);
    bonds.push({ a: Math.min(p, q), b: Math.max(p, q), order: mol.getBondOrder(k), perceived: false });
  }
  bonds.sort((x, y) => x.a - y.a || x.b - y.b);
  const ringSet = mol.getRingSet();
  const oclRings: number[][] = [];
  for (let r = 0; r < ringSet.getSize(); r++) oclRings.push(ringSet.getRingAtoms(r));
  const source = { file: `${label}.sdf`, format: 'sdf' as const, index: 1, line: 1 };
  const withFileBonds: Molecule = { title: label, atoms, coords, bonds, properties: {}, source };
  const coordinatesOnly: Molecule = { ...withFileBonds, bonds: null, source: { ...source, file: `${label}.xyz`, format: 'xyz' } };
  return { label, smiles, withFileBonds, coordinatesOnly, molfile: mol.toMolfile(), oclRings };
}

/** Fused, bridged, spiro, hetero, sugar, polycyclic and macrocyclic test cases (SMILES written by us). */
export const REFERENCE_SMILES: readonly (readonly [string, string])[] = [
  ['cyclohexane', 'C1CCCCC1'],
  ['methylcyclohexane', 'CC1CCCCC1'],
  ['trans-decalin', 'C1CC[C@H]2CCCC[C@@H]2C1'],
  ['norbornane', 'C1CC2CCC1C2'],
  ['camphor', 'CC1(C)C2CCC1(C)C(=O)C2'],
  ['adamantane', 'C1C2CC3CC1CC(C2)C3'],
  ['spiro[4.5]decane', 'C1CCC2(CC1)CCCC2'],
  ['spiropentane', 'C1CC11CC1'],
  ['cubane', 'C12C3C4C1C5C2C3C45'],
  ['bicyclo[2.2.2]octane', 'C1CC2CCC1CC2'],
  ['quinuclidine', 'C1CN2CCC1CC2'],
  ['indole', 'c1ccc2[nH]ccc2c1'],
  ['naphthalene', 'c1ccc2ccccc2c1'],
  ['caffeine', 'Cn1cnc2c1c(=O)n(C)c(=O)n2C'],
  ['morpholine', 'C1COCCN1'],
  ['1,4-dioxane', 'C1COCCO1'],
  ['tetrahydrofuran', 'C1CCOC1'],
  ['oxirane', 'C1CO1'],
  ['beta-D-glucopyranose', 'OC[C@H]1O[C@@H](O)[C@H](O)[C@@H](O)[C@@H]1O'],
  ['sucrose', 'OC[C@H]1O[C@H](O[C@]2(CO)O[C@H](CO)[C@@H](O)[C@@H]2O)[C@H](O)[C@@H](O)[C@@H]1O'],
  ['biphenyl', 'c1ccc(cc1)-c1ccccc1'],
  ['testosterone', 'C[C@]12CC[C@H]3[C@@H](CCC4=CC(=O)CC[C@]34C)[C@@H]1CC[C@@H]2O'],
  ['triptycene', 'c1ccc2c(c1)C1c3ccccc3C2c2ccccc12'],
  ['morphine', 'CN1CC[C@]23c4c5ccc(O)c4O[C@H]2[C@@H](O)C=C[C@H]3[C@H]1C5'],
  ['[2.2]paracyclophane', 'C1Cc2ccc(cc2)CCc2ccc1cc2'],
  ['18-crown-6', 'C1COCCOCCOCCOCCOCCO1'],
];
